// Integration: halving the grid step changes the max error by less than 1 %
// (issue 19 item 1), on chains where every mechanism acts: offsets, the
// single pole, slewing, the rectifier's dead time, a late comparator, sampling.
import { describe, expect, it } from "vitest";
import { runChain, simulateChain, STEPS_PER_PERIOD } from "../../../src/core/sim/simulate.ts";
import { BIPOLAR_AMP, rectifyChain } from "./chains.ts";

// A −3.6 V pumped rail, so stage 1 reaches −(W + Vf) ≈ −3.15 V.
const amp = { ...BIPOLAR_AMP, out_low_v: -3.58 };

describe("grid convergence", () => {
  it.each([
    { what: "bipolar parts at 200 Hz", f: 200, extra: {} },
    { what: "bipolar parts at 2 Hz", f: 2, extra: {} },
    { what: "a slow comparator at 1 kHz", f: 1e3, extra: { comparator: { delay_s: 5e-6, hysteresis_v: 0.01 } } },
    { what: "sampled at 10 kS/s, 200 Hz", f: 200, extra: { sampleRate: 10e3 } },
    { what: "slewing at 20 kHz", f: 20e3, extra: {} },
  ])("$what", ({ f, extra }) => {
    const chain = rectifyChain({ peak: 10, k: 0.245, amp, ...extra });
    // From the default grid (STEPS_PER_PERIOD = 512) to half and a quarter of its step.
    const a = runChain(chain, { frequency_hz: f });
    const b = runChain(chain, { frequency_hz: f, steps_per_period: 2 * STEPS_PER_PERIOD });
    const c = runChain(chain, { frequency_hz: f, steps_per_period: 4 * STEPS_PER_PERIOD });
    expect(a.max_error_v).toBeGreaterThan(0);
    expect(Math.abs(b.max_error_v / a.max_error_v - 1)).toBeLessThan(0.01);
    expect(Math.abs(c.max_error_v / b.max_error_v - 1)).toBeLessThan(0.01);
  });
});

describe("simulateChain", () => {
  it("runs the highest frequency and one hundredth of it", () => {
    const run = simulateChain(rectifyChain({ peak: 10, k: 0.245, amp }), 200);
    expect(run.fast.frequency_hz).toBe(200);
    expect(run.slow.frequency_hz).toBe(2);
    // Dead-time error grows as √f (SPEC §11.3: 2π·f·peak·t with t ∝ 1/√f): the slow run reads closer.
    expect(run.slow.max_error_v).toBeLessThan(run.fast.max_error_v);
  });
});

describe("a late sign (SPEC §11.4: the reading is off by twice the input while the sign is wrong)", () => {
  it("a 20 µs comparator at 200 Hz, 10 V peak: max error 2·2π·f·peak·tpd = 0.5027 V (+ at most Q/(2k))", () => {
    const k = 0.25;
    const ideal = { gbw_hz: 1e12, slew_v_per_s: 1e15, out_low_v: -100, out_high_v: 100, vos_v: 0 };
    const chain = rectifyChain({
      peak: 10,
      k,
      amp: ideal,
      diode: { vf_1ma_v: 0.6, vf_10ma_v: 0.6 },
      comparator: { delay_s: 20e-6 },
    });
    const tr = runChain(chain, { frequency_hz: 200, steps_per_period: 8192 });
    const expected = 2 * 2 * Math.PI * 200 * 10 * 20e-6;
    expect(expected).toBeCloseTo(0.50265, 5);
    const halfStep = 5 / 1024 / k / 2;
    expect(tr.max_error_v).toBeGreaterThan(expected * 0.99 - halfStep);
    expect(tr.max_error_v).toBeLessThan(expected * 1.01 + halfStep);
  });
});
