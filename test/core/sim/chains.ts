// Chains for the simulator's tests: a realistic rectify-and-sign chain and small
// single-purpose ones. The part values are generic classes from common
// practice (REFERENCES.md, "Common practice, no source" [M]), not a real part.
import type { Chain, OpAmpModel } from "../../../src/core/sim/chain.ts";

export const IDEAL_AMP: OpAmpModel = {
  gbw_hz: 1e12,
  slew_v_per_s: 1e15,
  out_low_v: -100,
  out_high_v: 100,
  vos_v: 0,
};

/** A ground-sensing bipolar class [M]: 1 MHz, 0.5 V/µs, 2 mV offset, on +5 V and a −2.5 V pumped rail. */
export const BIPOLAR_AMP: OpAmpModel = {
  gbw_hz: 1e6,
  slew_v_per_s: 0.5e6,
  out_low_v: -2.48,
  out_high_v: 3.5,
  vos_v: 2e-3,
};

export const SILICON = { vf_1ma_v: 0.65, vf_10ma_v: 0.71 };
export const FLAT_06 = { vf_1ma_v: 0.6, vf_10ma_v: 0.6 };

/** ±peak through a divider of ratio k, follower, two-stage rectifier, sign comparator, N-bit ADC. */
export function rectifyChain(o: {
  peak: number;
  k: number;
  amp: OpAmpModel;
  diode?: { vf_1ma_v: number; vf_10ma_v: number };
  bits?: number;
  vref?: number;
  r?: number;
  comparator?: Partial<Chain["sign"] & object>;
  sampleRate?: number | null;
}): Chain {
  const bits = o.bits ?? 10;
  const vref = o.vref ?? 5;
  const r = o.r ?? 10e3;
  return {
    source: { peak_v: o.peak, source_ohm: 0 },
    front: { gain: o.k, offset_v: 0 },
    stages: [
      { kind: "linear", id: "buffer", inputs: [{ from: "front", weight: 1 }], offset_v: 0, noise_gain: 1, amp: o.amp },
      {
        kind: "half-wave",
        id: "rectifier-1",
        from: "buffer",
        r_in_ohm: r,
        r_feedback_ohm: r,
        load_ohm: r / 2,
        amp: o.amp,
        diode: o.diode ?? SILICON,
      },
      {
        kind: "linear",
        id: "rectifier-2",
        inputs: [
          { from: "buffer", weight: -1 },
          { from: "rectifier-1", weight: -2 },
        ],
        offset_v: 0,
        noise_gain: 4,
        amp: o.amp,
      },
    ],
    sign: { from: "buffer", offset_v: 0, hysteresis_v: 0, overdrive_v: 0, delay_s: 0, ...o.comparator },
    adc: { from: "rectifier-2", bits, reference_v: vref, sample_rate_hz: o.sampleRate ?? null },
    reading: { volts_per_code: vref / 2 ** bits / o.k, offset_v: 0, signed: true },
  };
}

/** ±peak scaled by a and shifted by b, a follower, an N-bit ADC, reading (code + 0.5)·Q/a − b/a. */
export function levelShiftChain(o: {
  peak: number;
  a: number;
  b: number;
  amp: OpAmpModel;
  bits: number;
  vref: number;
}): Chain {
  return {
    source: { peak_v: o.peak, source_ohm: 0 },
    front: { gain: o.a, offset_v: o.b },
    stages: [
      {
        kind: "linear",
        id: "follower",
        inputs: [{ from: "front", weight: 1 }],
        offset_v: 0,
        noise_gain: 1,
        amp: o.amp,
      },
    ],
    sign: null,
    adc: { from: "follower", bits: o.bits, reference_v: o.vref, sample_rate_hz: null },
    reading: { volts_per_code: o.vref / 2 ** o.bits / o.a, offset_v: o.b / o.a, signed: false },
  };
}

/** One op-amp stage of signal gain g and noise gain ng straight from the source. */
export function oneStage(amp: OpAmpModel, peak: number, g = 1, ng = 1): Chain {
  return {
    source: { peak_v: peak, source_ohm: 0 },
    front: { gain: 1, offset_v: 0 },
    stages: [{ kind: "linear", id: "stage", inputs: [{ from: "front", weight: g }], offset_v: 0, noise_gain: ng, amp }],
    sign: null,
    adc: { from: "stage", bits: 16, reference_v: 100, sample_rate_hz: null },
    reading: { volts_per_code: 1, offset_v: 0, signed: false },
  };
}
