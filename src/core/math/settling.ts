// Driving a sampling converter (SPEC §12.3): how long a step takes to settle,
// what an RC at the pin does when the sampling capacitor connects, and how
// much an RC passes at the frequency that folds back onto the signal.

/**
 * Time constants a single-pole step needs to settle to within ½ LSB of an
 * N-bit full-scale step: e^(−t/τ) = 2^−(N+1) ⇒ t/τ = (N+1)·ln 2
 * (first-order step response; 9.011 at 12 bits, 7.625 at 10 bits).
 */
export function halfLsbTimeConstants(bits: number): number {
  return (bits + 1) * Math.LN2;
}

/** Time constants for a step of `step_v` to decay below `error_v`: ln(step/error); 0 when it already is. */
export function timeConstantsFor(stepV: number, errorV: number): number {
  return stepV > errorV ? Math.log(stepV / errorV) : 0;
}

/**
 * The closed-loop pole of an op amp with a single dominant pole:
 * f_cl = GBW / noise gain, τ = 1/(2π·f_cl) (Franco, Design with Operational
 * Amplifiers and Analog Integrated Circuits, ch. 6; from memory).
 */
export function amplifierTau(gbwHz: number, noiseGain: number): number {
  return noiseGain / (2 * Math.PI * gbwHz);
}

/** The RC between the driver and the sampling capacitor: an optional R and C at the pin, then the switch. */
export type SamplingNetwork = {
  /** Driver output to the pin (the optional series R), Ω; 0 when absent. */
  pin_r_ohm: number;
  /** Capacitor from the pin to ground, F; 0 when absent. */
  pin_c_f: number;
  switch_ohm: number;
  sample_cap_f: number;
};

/**
 * The sum of the network's time constants, the Elmore delay of the two-section
 * RC ladder: b1 = R_pin·(C_pin + C_s) + R_sw·C_s (W. C. Elmore, J. Appl. Phys.
 * 19, 1948). It bounds the slowest pole from above, so settling judged by it is
 * never optimistic for the late, small-error part of the step.
 */
export function samplingTau(n: SamplingNetwork): number {
  return n.pin_r_ohm * (n.pin_c_f + n.sample_cap_f) + n.switch_ohm * n.sample_cap_f;
}

/**
 * Charge sharing (charge conservation, Q = C·V): an empty sampling capacitor
 * C_s connected to a pin capacitor C_pin held at V pulls the pin down by
 * V·C_s/(C_s + C_pin).
 */
export function chargeShareStep(v: number, sampleCapF: number, pinCapF: number): number {
  return (v * sampleCapF) / (sampleCapF + pinCapF);
}

/** |H| of a first-order low pass at f: 1/√(1 + (f/fc)²), fc = 1/(2πRC). */
export function rcAttenuation(frequencyHz: number, rOhm: number, cF: number): number {
  if (!(rOhm > 0 && cF > 0)) return 1;
  const fc = 1 / (2 * Math.PI * rOhm * cF);
  return 1 / Math.sqrt(1 + (frequencyHz / fc) ** 2);
}

/**
 * The exact step error of two real poles τ1, τ2 in cascade at time t (for
 * tests of the sum-of-time-constants bound): (τ1·e^(−t/τ1) − τ2·e^(−t/τ2))/(τ1 − τ2).
 */
export function twoPoleStepError(t: number, tau1: number, tau2: number): number {
  if (Math.abs(tau1 - tau2) < 1e-15 * Math.max(tau1, tau2)) return (1 + t / tau1) * Math.exp(-t / tau1);
  return (tau1 * Math.exp(-t / tau1) - tau2 * Math.exp(-t / tau2)) / (tau1 - tau2);
}
