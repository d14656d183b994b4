// The reading is compared with the input one shared phase delay earlier (chain-delay.ts).
// A single pole's output is |H|·x(t − φ/ω) with |H| = 1/√(1 + (f/fc)²) and φ = atan(f/fc)
// (T. Fiore, Operational Amplifiers & Linear Integrated Circuits, ch. 5, open textbook):
// against the delayed input only the amplitude loss is left, which is what the static
// budget's bandwidth term holds; against the same instant it would be |1 − H|·peak.
import { describe, expect, it } from "vitest";
import { chainDelay } from "../../../src/core/sim/chain-delay.ts";
import { runChain } from "../../../src/core/sim/simulate.ts";
import type { Chain, OpAmpModel } from "../../../src/core/sim/chain.ts";
import { IDEAL_AMP, levelShiftChain, rectifyChain } from "./chains.ts";

const amp = (gbw: number): OpAmpModel => ({ ...IDEAL_AMP, gbw_hz: gbw });
// 1 V peak through a = 1 around 2.5 V into a 20-bit, 5 V converter: Q = 4.77 µV, far below the errors tested.
const follower = (gbw: number) => levelShiftChain({ peak: 1, a: 1, b: 2.5, amp: amp(gbw), bits: 20, vref: 5 });

describe("chainDelay", () => {
  it("is atan(f/fc)/(2πf) for one follower: GBW 1 MHz at 142.49 kHz gives 0.14155 rad, 158.1 ns", () => {
    const f = 0.14249e6;
    const expected = Math.atan(0.14249) / (2 * Math.PI * f);
    expect(chainDelay(follower(1e6), f)).toBeCloseTo(expected, 15);
    expect(expected * 1e9).toBeCloseTo(158.1, 1);
  });

  it("adds the poles in series: two followers of fc 1 MHz and an RC of fc 1/(2π·1 µs) = 159.15 kHz", () => {
    const f = 10e3;
    const base = follower(1e6);
    const chain: Chain = {
      ...base,
      stages: [
        ...base.stages,
        {
          kind: "linear",
          id: "second",
          inputs: [{ from: "follower", weight: 1 }],
          offset_v: 0,
          noise_gain: 1,
          amp: amp(1e6),
        },
        { kind: "rc", id: "pin", from: "second", tau_s: 1e-6 },
      ],
      adc: { ...base.adc, from: "pin" },
    };
    const w = 2 * Math.PI * f;
    const expected = (2 * Math.atan(f / 1e6) + Math.atan(w * 1e-6)) / w;
    expect(chainDelay(chain, f)).toBeCloseTo(expected, 15);
  });

  it("shares only the common part where paths meet: a signed rectifier's sign path keeps its own lag", () => {
    const chain = rectifyChain({ peak: 10, k: 0.25, amp: amp(1e6) });
    // The sign decides from before the rectifier: the delay shared by both is at most the sign path's.
    const sign = chain.sign;
    if (!sign) throw new Error("the rectifier chain has a sign comparator");
    const f = 1e3;
    expect(chainDelay(chain, f)).toBeLessThanOrEqual(
      chainDelay({ ...chain, adc: { ...chain.adc, from: sign.from } }, f) + 1e-18,
    );
  });
});

describe("the error is measured after the shared delay", () => {
  it("GBW 1 MHz follower at f/fc = 0.14249: largest error 1 % of the peak (amplitude), not the 14.1 % of |1 − H|", () => {
    const f = 0.14249e6;
    const tr = runChain(follower(1e6), { frequency_hz: f, steps_per_period: 2048 });
    expect(tr.reference_delay_s).toBeCloseTo(Math.atan(0.14249) / (2 * Math.PI * f), 15);
    expect(tr.max_error_v).toBeGreaterThan(0.0099);
    expect(tr.max_error_v).toBeLessThan(0.0101);
    // The same run compared at the same instant: H = 1/(1 + jx), |1 − H| = x/√(1 + x²) = 14.11 % of the peak.
    const same = runChain(follower(1e6), { frequency_hz: f, steps_per_period: 2048, reference_delay_s: 0 });
    const x = 0.14249;
    expect(same.max_error_v).toBeCloseTo(x / Math.sqrt(1 + x * x), 3);
  });
});
