// differential-input (issue 21): the sign stage's inputs sit at ±W and at ground, so they
// differ by up to W. Back-to-back input clamps conduct at about 0.7 V (common practice [M]);
// the 10 mA clamp current and the 0.3 V floor are common practice [M]. Each expected value
// is arithmetic on those: D = W; margin = vdiff_max_v − D; with a series resistor the
// clamp current is (D − vdiff_max_v)/R and the tolerated difference vdiff_max_v + R·10 mA.
import { describe, expect, it } from "vitest";
import { design } from "../helpers/designs.ts";
import { comparator, opAmp } from "../helpers/parts.ts";
import { check, expectFinding, reasons, signStage, type RuleCase } from "../helpers/rules.ts";

const series = (ohm: number) => design({ front_end: { sign_series_ohm: ohm } });

const cases: RuleCase[] = [
  {
    label: "comparator rated 36 V on a ±2.5 V window",
    run: { part: comparator({ vdiff_max_v: 36 }), stage: signStage({ w: 2.5 }), role: "sign" },
    expected: { verdict: "pass", needed: 2.5, available: 36, margin: 33.5 },
  },
  {
    label: "rated 2.55 V: 50 mV to spare, under the 0.1 V headroom margin",
    run: { part: comparator({ vdiff_max_v: 2.55 }), stage: signStage({ w: 2.5 }), role: "sign" },
    expected: { verdict: "marginal", needed: 2.5, available: 2.55, margin: 0.05 },
  },
  {
    label: "acceptance: op amp with 0.7 V clamps on a ±2.5 V window",
    run: { part: opAmp({ vdiff_max_v: 0.7 }), stage: signStage({ w: 2.5 }), role: "sign" },
    expected: { verdict: "fail", needed: 2.5, available: 0.7, margin: -1.8 },
  },
  {
    label: "the same behind 10 kΩ: 180 µA into the clamps, at best marginal",
    run: { part: opAmp({ vdiff_max_v: 0.7 }), stage: signStage({ w: 2.5 }), role: "sign", design: series(10e3) },
    expected: { verdict: "marginal", needed: 2.5, available: 0.7 + 10e3 * 10e-3, margin: 0.7 + 100 - 2.5 },
  },
  {
    label: "behind 100 Ω: 18 mA, past the 10 mA limit",
    run: { part: opAmp({ vdiff_max_v: 0.7 }), stage: signStage({ w: 2.5 }), role: "sign", design: series(100) },
    expected: { verdict: "fail", needed: 2.5, available: 1.7, margin: -0.8 },
  },
  {
    label: "not rated on a ±2.5 V window",
    run: { part: opAmp({ vdiff_max_v: undefined }), stage: signStage({ w: 2.5 }), role: "sign" },
    expected: { verdict: "unrated", needed: 2.5, available: 0.3, margin: -2.2 },
  },
  {
    label: "not rated on a ±0.25 V window: below any clamp",
    run: { part: opAmp({ vdiff_max_v: undefined }), stage: signStage({ w: 0.25 }), role: "sign" },
    expected: { verdict: "pass", needed: 0.25, available: 0.3, margin: 0.05 },
  },
];

describe("differential-input", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("differential-input", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("differential-input", cases)).toMatchInlineSnapshot(`
      {
        "acceptance: op amp with 0.7 V clamps on a ±2.5 V window": "fail: its inputs (one at the signal, one at ground) differ by up to 2.50 V against a 0.70 V limit: its input clamps conduct, load the signal and can be damaged (1.80 V short); add a series resistor (front_end.sign_series_ohm) or choose a part rated for the difference",
        "behind 100 Ω: 18 mA, past the 10 mA limit": "fail: its inputs (one at the signal, one at ground) differ by up to 2.50 V against a 0.70 V limit, so its input clamps conduct at every crossing; the 100 Ω series resistor only holds their current to 18.0 mA against 10.0 mA (common practice): a larger resistor or a part rated for the difference is needed",
        "comparator rated 36 V on a ±2.5 V window": "pass: its inputs (one at the signal, one at ground) differ by up to 2.50 V; rated for 36.00 V between its inputs: 33.50 V to spare",
        "not rated on a ±0.25 V window: below any clamp": "pass: its inputs (one at the signal, one at ground) differ by up to 0.25 V, below the 0.30 V at which any input clamp starts to conduct (common practice): no rating needed",
        "not rated on a ±2.5 V window": "unrated: not rated: its inputs (one at the signal, one at ground) differ by up to 2.50 V and 'vdiff_max_v' is empty for this part; many op amps clamp their inputs at about 0.7 V",
        "rated 2.55 V: 50 mV to spare, under the 0.1 V headroom margin": "marginal: its inputs (one at the signal, one at ground) differ by up to 2.50 V; rated for 2.55 V between its inputs: 0.05 V to spare",
        "the same behind 10 kΩ: 180 µA into the clamps, at best marginal": "marginal: its inputs (one at the signal, one at ground) differ by up to 2.50 V against a 0.70 V limit, so its input clamps conduct at every crossing; the 10.0 kΩ series resistor holds their current to 180 µA against 10.0 mA (common practice): at best marginal",
      }
    `);
  });
});
