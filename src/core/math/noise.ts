// Random noise of a signal chain (SPEC §11.9) and what it leaves of a
// converter's bits.
//
// Johnson–Nyquist: e = √(4kTR) (Johnson, Nyquist, Phys. Rev. 32, 1928; k from
// the SI Brochure, 9th ed., exact). A single pole's noise bandwidth is
// (π/2)·fc (textbook). The resistors of an inverting or summing stage act as
// one resistor R_par (all of them in parallel, as the inverting node sees
// them) at the non-inverting input times the noise gain: Σ 4kT·Ri·(Rf/Ri)² +
// 4kT·Rf = 4kT·R_par·NG² (algebra; the stage's own gain equation).
// IEEE Std 1241-2010: Q = V_FS/2^N, quantization noise Q/√12, a full-scale
// sine has rms V_FS/(2√2), ENOB = (SINAD − 1.76)/6.02.

export const BOLTZMANN = 1.380649e-23;

/** √(4kTR), V/√Hz. */
export function johnsonDensity(ohm: number, kelvin: number): number {
  return Math.sqrt(4 * BOLTZMANN * kelvin * ohm);
}

/** Equivalent noise bandwidth of a single pole at fc: (π/2)·fc. */
export function noiseBandwidth(fc: number): number {
  return (Math.PI / 2) * fc;
}

export type StageNoiseInput = {
  /** Voltage noise density, V/√Hz. */
  en: number;
  /** Current noise density, A/√Hz (0 when not rated). */
  in: number;
  gbw_hz: number;
  noise_gain: number;
  /** Resistance the inputs see (R_par of the feedback network, or the source's Thevenin resistance), Ω. */
  r_ohm: number;
  kelvin: number;
};

export type StageNoise = {
  /** fc = GBW / noise gain. */
  fc_hz: number;
  /** (π/2)·fc. */
  bandwidth_hz: number;
  /** Input-side density, √(en² + (in·R)² + 4kTR), V/√Hz. */
  density: number;
  /** RMS at the stage output: density × noise gain × √bandwidth. */
  output_rms_v: number;
};

export function stageNoise(s: StageNoiseInput): StageNoise {
  const fc = s.gbw_hz / s.noise_gain;
  const bw = noiseBandwidth(fc);
  const johnson = johnsonDensity(s.r_ohm, s.kelvin);
  const density = Math.sqrt(s.en * s.en + (s.in * s.r_ohm) ** 2 + johnson * johnson);
  return { fc_hz: fc, bandwidth_hz: bw, density, output_rms_v: density * s.noise_gain * Math.sqrt(bw) };
}

/** SINAD of a full-scale sine, dB: noise (rms at the converter) plus quantization Q/√12. */
export function sinadDb(bits: number, fullScale: number, noiseAtAdc: number): number {
  const q = fullScale / 2 ** bits;
  const signal = fullScale / (2 * Math.SQRT2);
  return 20 * Math.log10(signal / Math.sqrt(noiseAtAdc * noiseAtAdc + (q * q) / 12));
}

/** ENOB = (SINAD − 1.76)/6.02 (IEEE Std 1241-2010). */
export function enobOf(sinad: number): number {
  return (sinad - 1.76) / 6.02;
}
