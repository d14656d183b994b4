// The simulator against closed forms (SPEC §13, issue 19 item 4). Each check
// names its source; the tolerance is 1 % (5 % for the dead time).
import { describe, expect, it } from "vitest";
import { runChain } from "../../../src/core/sim/simulate.ts";
import { advancePole } from "../../../src/core/sim/pole.ts";
import type { Chain, OpAmpModel } from "../../../src/core/sim/chain.ts";
import { FLAT_06, IDEAL_AMP, levelShiftChain, oneStage, rectifyChain } from "./chains.ts";

const within = (actual: number, expected: number, share: number) => {
  expect(Math.abs(actual / expected - 1)).toBeLessThan(share);
};

// Read at 4096 points a period so the sampled peak is within (π/4096)²/2 ≈ 3·10⁻⁷ of the true one.
function outputPeak(chain: Chain, f: number, column = "stage"): number {
  const tr = runChain(chain, { frequency_hz: f, steps_per_period: 4096 });
  const col = tr.values[tr.columns.indexOf(column)] as Float64Array;
  let peak = 0;
  for (const v of col) peak = Math.max(peak, Math.abs(v));
  return peak;
}

// The stand-in for an ideal op amp (1 THz) still lags by its slope/ωc: a few
// parts per million of a step, the allowance below.
const LAG = 1e-5;

describe("an ideal chain reads within half a step (IEEE Std 1241-2010: error ±Q/2, rms Q/√12)", () => {
  it("level shift: 12 bit at 5 V through a = 0.2, b = 2.5 V: max ≤ Q/(2a) = 3.0518 mV, rms ≈ Q/(a√12)", () => {
    const q = 5 / 4096 / 0.2;
    const tr = runChain(levelShiftChain({ peak: 10, a: 0.2, b: 2.5, amp: IDEAL_AMP, bits: 12, vref: 5 }), {
      frequency_hz: 50,
    });
    expect(tr.max_error_v).toBeLessThanOrEqual((q / 2) * (1 + LAG));
    expect(tr.max_error_v).toBeGreaterThan(0.99 * (q / 2));
    within(tr.rms_error_v, q / Math.sqrt(12), 0.01);
  });

  it("rectify-and-sign: 10 bit at 5 V through k = 0.25, fast parts: max ≤ Q/(2k) = 9.7656 mV", () => {
    const q = 5 / 1024 / 0.25;
    const tr = runChain(rectifyChain({ peak: 10, k: 0.25, amp: IDEAL_AMP, diode: FLAT_06 }), {
      frequency_hz: 200,
    });
    expect(tr.max_error_v).toBeLessThanOrEqual((q / 2) * (1 + LAG));
    expect(tr.max_error_v).toBeGreaterThan(0.99 * (q / 2));
    within(tr.rms_error_v, q / Math.sqrt(12), 0.01);
  });
});

describe("single pole: |H| = 1/√(1 + (f/fc)²) (T. Fiore, Operational Amplifiers & Linear ICs, ch. 5)", () => {
  const fast = (gbw: number): OpAmpModel => ({ ...IDEAL_AMP, gbw_hz: gbw });

  it("GBW 1 MHz follower at f/fc = 0.14249 loses 1 % of its amplitude", () => {
    const error = 1 - outputPeak(oneStage(fast(1e6), 1), 0.14249e6);
    within(error, 0.01, 0.01);
  });

  it("GBW 1 MHz at noise gain 2 (inverting, gain −1) loses 0.1 % at 22.377 kHz", () => {
    const error = 1 - outputPeak(oneStage(fast(1e6), 1, -1, 2), 22.377e3);
    within(error, 0.001, 0.01);
  });

  it("an RC of τ = 1 µs loses 1 % at f = 0.14249/(2πτ) (the same law, fc = 1/(2πτ))", () => {
    const chain: Chain = {
      ...oneStage(IDEAL_AMP, 1),
      stages: [{ kind: "rc", id: "stage", from: "front", tau_s: 1e-6 }],
    };
    within(1 - outputPeak(chain, 0.14249 / (2 * Math.PI * 1e-6)), 0.01, 0.01);
  });
});

describe("slew-limited distortion starts at the full-power bandwidth SR/(2πVp) (NPTEL 117107094, lecture 7)", () => {
  // A wideband follower (GBW 1 GHz) so the slew rate alone decides.
  const onset = (sr: number, vp: number) => {
    const amp: OpAmpModel = { ...IDEAL_AMP, gbw_hz: 1e9, slew_v_per_s: sr };
    const slews = (f: number) => (runChain(oneStage(amp, vp), { frequency_hz: f }).stages[0]?.slewing_s ?? 0) > 0;
    let lo = 1e3;
    let hi = 1e6;
    expect(slews(lo)).toBe(false);
    expect(slews(hi)).toBe(true);
    for (let i = 0; i < 30; i++) {
      const mid = Math.sqrt(lo * hi);
      if (slews(mid)) hi = mid;
      else lo = mid;
    }
    return hi;
  };

  it.each([
    { sr: 0.5e6, vp: 2.5, fp: 31.83e3 },
    { sr: 2e6, vp: 12, fp: 26.53e3 },
  ])("$sr V/s at $vp V peak slews from $fp Hz", ({ sr, vp, fp }) => {
    within(onset(sr, vp), fp, 0.01);
  });

  it("below it the output is a clean sine, above it distorted", () => {
    const amp: OpAmpModel = { ...IDEAL_AMP, gbw_hz: 1e9, slew_v_per_s: 0.5e6 };
    const err = (f: number) => {
      const tr = runChain(oneStage(amp, 2.5), { frequency_hz: f });
      const x = tr.values[tr.columns.indexOf("input")] as Float64Array;
      const y = tr.values[tr.columns.indexOf("stage")] as Float64Array;
      let worst = 0;
      for (let i = 0; i < x.length; i++) worst = Math.max(worst, Math.abs((y[i] ?? 0) - (x[i] ?? 0)));
      return worst;
    };
    // Below: only the 1 GHz pole's lag, 2π·f·Vp/ωc ≈ 80 µV at 31.5 kHz.
    expect(err(0.99 * 31.83e3)).toBeLessThan(1e-3);
    // 20 % above: the output falls behind by tens of millivolts or more.
    expect(err(1.2 * 31.83e3)).toBeGreaterThan(0.05);
  });
});

describe("dead time at the zero crossing (SPEC §11.3; integrator model A = ωt/s, Fiore ch. 5)", () => {
  // Input 2.5 V peak at 1 kHz straight into stage 1. Rin = 20 kΩ, Rf = 10 kΩ,
  // load 10 kΩ make the open-loop coupling to the inverting node
  // (Rf + Rload)/(Rin + Rf + Rload) = ½, the β of the worked example; flat
  // 0.6 V diodes make 2·Vf = 1.2 V.
  const chainWith = (slew: number): Chain => ({
    source: { peak_v: 2.5, source_ohm: 0 },
    front: { gain: 1, offset_v: 0 },
    stages: [
      {
        kind: "half-wave",
        id: "rectifier-1",
        from: "front",
        r_in_ohm: 20e3,
        r_feedback_ohm: 10e3,
        load_ohm: 10e3,
        amp: { ...IDEAL_AMP, gbw_hz: 1e6, slew_v_per_s: slew },
        diode: FLAT_06,
      },
    ],
    sign: null,
    adc: { from: "rectifier-1", bits: 12, reference_v: 5, sample_rate_hz: null },
    reading: { volts_per_code: 5 / 4096, offset_v: 0, signed: false },
  });
  const dead = (slew: number) => runChain(chainWith(slew), { frequency_hz: 1e3 }).stages[0]?.dead_time_s ?? 0;

  it("GBW 1 MHz, β = ½, 1 kHz, W = 2.5 V, 2·Vf = 1.2 V: t = √(2ΔV/(ωt·β·S)) = 6.97 µs", () => {
    const s = 2 * Math.PI * 1e3 * 2.5;
    const t = Math.sqrt((2 * 1.2) / (2 * Math.PI * 1e6 * 0.5 * s));
    expect(t).toBeCloseTo(6.974e-6, 8);
    within(dead(1e12), t, 0.05);
  });

  it("with 0.2 V/µs the ramp meets the slew limit at 4.05 µs (0.405 V): 8.03 µs in all", () => {
    const s = 2 * Math.PI * 1e3 * 2.5;
    const k = 2 * Math.PI * 1e6 * 0.5 * s;
    const t1 = 0.2e6 / k;
    const t = t1 + (1.2 - (k * t1 * t1) / 2) / 0.2e6;
    expect(t).toBeCloseTo(8.027e-6, 8);
    within(dead(0.2e6), t, 0.05);
  });
});

describe("RC settling: 1 − e^(−t/τ) (first-order step response; ½ LSB of 12 bit at (N+1)·ln2·τ = 9.011 τ)", () => {
  it.each([0.1, 1, 3, 9.011])("after %f τ", (n) => {
    const tau = 1e-6;
    // One step of any length: the exponential integrator is exact for a held input.
    const y = advancePole(0, 1, 1, n * tau, 1 / tau, Infinity, -Infinity, Infinity, null);
    within(1 - y, Math.exp(-n), 0.01);
    if (n === 9.011) within(1 - y, 2 ** -13, 0.01);
  });

  it("in 100 steps as in one", () => {
    const tau = 1e-6;
    let y = 0;
    for (let i = 0; i < 100; i++) y = advancePole(y, 1, 1, 0.03 * tau, 1 / tau, Infinity, -Infinity, Infinity, null);
    within(1 - y, Math.exp(-3), 1e-9);
  });
});
