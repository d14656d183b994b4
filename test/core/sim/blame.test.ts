// What the chain was doing at its largest error: the mechanism a page names when
// the simulation and the static budget disagree.
import { describe, expect, it } from "vitest";
import { runChain } from "../../../src/core/sim/simulate.ts";
import { BIPOLAR_AMP, FLAT_06, IDEAL_AMP, rectifyChain } from "./chains.ts";

const deepRail = { ...BIPOLAR_AMP, out_low_v: -3.58 };

describe("at_max_error", () => {
  it.each([
    {
      what: "a 1 MHz rectifier at 200 Hz errs most around its zero crossing",
      chain: rectifyChain({ peak: 10, k: 0.245, amp: deepRail }),
      expected: [{ stage: "rectifier-1", state: "dead-time" }],
    },
    {
      what: "stage 1 on a −2.48 V rail cannot reach −(W + Vf) ≈ −3.15 V and clips at the peak",
      chain: rectifyChain({ peak: 10, k: 0.245, amp: BIPOLAR_AMP }),
      expected: [{ stage: "rectifier-1", state: "clipped" }],
    },
    {
      what: "a 20 µs comparator leaves the sign wrong",
      chain: rectifyChain({ peak: 10, k: 0.25, amp: IDEAL_AMP, diode: FLAT_06, comparator: { delay_s: 20e-6 } }),
      expected: [{ stage: "sign", state: "sign-wrong" }],
    },
  ])("$what", ({ chain, expected }) => {
    expect(runChain(chain, { frequency_hz: 200 }).at_max_error).toEqual(expected);
  });

  it("a clipped stage 1 reads 2·(W − |vA|)/k too low at the peak, |vA| = 2.48 V − Vf(3|vA|/R)", () => {
    // Summer out = −(x + 2·vA) (SPEC §11.2); with vA held at the rail plus one drop
    // (diode law of SPEC §4, current |vA|/R + |vA|/(R/2)), the ADC sees 2|vA| − W instead of W.
    const k = 0.245;
    const w = 10 * k;
    let va = 1.8;
    for (let i = 0; i < 50; i++) va = 2.48 - (0.65 + 0.06 * Math.log10((3 * va) / 10e3 / 1e-3));
    const expected = (2 * (w - va)) / k;
    expect(expected).toBeCloseTo(4.935, 3);
    const tr = runChain(rectifyChain({ peak: 10, k, amp: BIPOLAR_AMP }), { frequency_hz: 200 });
    // Within 2 % plus half a step: the 2 mV offsets of three stages and quantization move it slightly.
    expect(Math.abs(tr.max_error_v - expected)).toBeLessThan(0.02 * expected + 5 / 1024 / k / 2);
  });
});
