// slew-rate (SPEC §7): needed 2π·f·W (rectifier 2π·f·(W + Vf)); margin slew − needed;
// marginal below marginal_fraction (0.2) × needed. Reference: full-power bandwidth
// f = SR/(2π·Vp), 0.5 V/µs at 2.5 V peak → 31.83 kHz, 2 V/µs at 12 V peak → 26.53 kHz
// (worked example, NPTEL course 117107094, lecture 7); 10 V peak at 20 kHz needs 1.2566 V/µs.
import { describe, expect, it } from "vitest";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";
import { bufferStage, check, expectFinding, reasons, rectifierStage, type RuleCase } from "../helpers/rules.ts";

const at = (f: number) => design({ signal: { max_frequency_hz: f } });
const need = (f: number, v: number) => 2 * Math.PI * f * v;

const cases: RuleCase[] = [
  {
    label: "10 V peak at 20 kHz needs 1.2566 V/µs; 2 V/µs slews it",
    run: { part: opAmp({ slew_v_per_us: 2 }), stage: bufferStage({ w: 10 }), design: at(20e3) },
    expected: { verdict: "pass", needed: need(20e3, 10), available: 2e6, margin: 2e6 - need(20e3, 10) },
  },
  {
    label: "0.5 V/µs at 2.5 V peak and 31.83 kHz: at its full-power bandwidth",
    run: { part: opAmp({ slew_v_per_us: 0.5 }), stage: bufferStage({ w: 2.5 }), design: at(31.83e3) },
    expected: { verdict: "marginal", needed: need(31.83e3, 2.5), available: 5e5, margin: 5e5 - need(31.83e3, 2.5) },
  },
  {
    label: "2 V/µs at 12 V peak and 26.52 kHz: just inside its full-power bandwidth",
    run: { part: opAmp({ slew_v_per_us: 2 }), stage: bufferStage({ w: 12 }), design: at(26.52e3) },
    expected: { verdict: "marginal", needed: need(26.52e3, 12), available: 2e6, margin: 2e6 - need(26.52e3, 12) },
  },
  {
    label: "2 V/µs at 12 V peak and 26.53 kHz: just past its full-power bandwidth",
    run: { part: opAmp({ slew_v_per_us: 2 }), stage: bufferStage({ w: 12 }), design: at(26.53e3) },
    expected: { verdict: "fail", needed: need(26.53e3, 12), available: 2e6, margin: 2e6 - need(26.53e3, 12) },
  },
  {
    label: "10 V peak at 20 kHz with 1 V/µs",
    run: { part: opAmp({ slew_v_per_us: 1 }), stage: bufferStage({ w: 10 }), design: at(20e3) },
    expected: { verdict: "fail", needed: need(20e3, 10), available: 1e6, margin: 1e6 - need(20e3, 10) },
  },
  {
    label: "rectifier slews W + Vf = 3.1 V at 20 kHz",
    run: { part: opAmp({ slew_v_per_us: 0.3 }), stage: rectifierStage({ w: 2.5, vf: 0.6 }), design: at(20e3) },
    expected: { verdict: "fail", needed: need(20e3, 3.1), available: 3e5, margin: 3e5 - need(20e3, 3.1) },
  },
];

describe("slew-rate", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("slew-rate", run), expected));

  it("needs 1.2566 V/µs for 10 V at 20 kHz, and full-power bandwidth is SR/(2π·Vp)", () => {
    expect(check("slew-rate", cases[0]?.run ?? ({} as never)).needed).toBeCloseTo(1.2566e6, -2);
    expect(5e5 / (2 * Math.PI * 2.5)).toBeCloseTo(31.83e3, -1);
    expect(2e6 / (2 * Math.PI * 12)).toBeCloseTo(26.53e3, -1);
  });

  it("says why, with the numbers", () => {
    expect(reasons("slew-rate", cases)).toMatchInlineSnapshot(`
      {
        "0.5 V/µs at 2.5 V peak and 31.83 kHz: at its full-power bandwidth": "marginal: needs 0.500 V/µs (2π × 31.8 kHz × 2.50 V); slews 0.500 V/µs: 0.0000155 V/µs to spare",
        "10 V peak at 20 kHz needs 1.2566 V/µs; 2 V/µs slews it": "pass: needs 1.26 V/µs (2π × 20.0 kHz × 10.0 V); slews 2.00 V/µs: 0.743 V/µs to spare",
        "10 V peak at 20 kHz with 1 V/µs": "fail: needs 1.26 V/µs (2π × 20.0 kHz × 10.0 V); slews 1.00 V/µs: 0.257 V/µs short",
        "2 V/µs at 12 V peak and 26.52 kHz: just inside its full-power bandwidth": "marginal: needs 2.00 V/µs (2π × 26.5 kHz × 12.0 V); slews 2.00 V/µs: 0.000439 V/µs to spare",
        "2 V/µs at 12 V peak and 26.53 kHz: just past its full-power bandwidth": "fail: needs 2.00 V/µs (2π × 26.5 kHz × 12.0 V); slews 2.00 V/µs: 0.000315 V/µs short",
        "rectifier slews W + Vf = 3.1 V at 20 kHz": "fail: needs 0.390 V/µs (2π × 20.0 kHz × 3.10 V); slews 0.300 V/µs: 0.0896 V/µs short",
      }
    `);
  });
});
