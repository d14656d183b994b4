// input-common-mode (SPEC §7): reachable low V− + icm_neg_headroom_v, high V+ − icm_pos_headroom_v;
// margin = min(−W − low, high − W). Class headroom values are common practice [M].
import { describe, expect, it } from "vitest";
import { comparator, opAmp } from "../helpers/parts.ts";
import {
  bufferStage,
  check,
  expectFinding,
  GROUND_5V,
  reasons,
  signStage,
  SPLIT_5V,
  type RuleCase,
} from "../helpers/rules.ts";

const cases: RuleCase[] = [
  {
    label: "ground-sensing bipolar on ±5 V, window ±2.5 V: 1.00 V below its top",
    run: { part: opAmp(), stage: bufferStage(), rails: SPLIT_5V },
    expected: { verdict: "pass", needed: 2.5, available: 3.5, margin: 1 },
  },
  {
    label: "an input range ending 2.45 V below V+: 0.05 V to spare",
    run: { part: opAmp({ icm_pos_headroom_v: 2.45 }), stage: bufferStage(), rails: SPLIT_5V },
    expected: { verdict: "marginal", needed: 2.5, available: 2.55, margin: 0.05 },
  },
  {
    label: "JFET input needing 3.5 V above V−: the negative peak is 1.00 V outside",
    run: {
      part: opAmp({ icm_neg_headroom_v: 3.5, supply_min_v: 9, supply_max_v: 36 }),
      stage: bufferStage(),
      rails: SPLIT_5V,
    },
    expected: { verdict: "fail", needed: -2.5, available: -1.5, margin: -1 },
  },
  {
    label: "ground-sensing bipolar on a single 5 V rail: reaches only 0.3 V below ground",
    run: { part: opAmp(), stage: bufferStage(), rails: GROUND_5V },
    expected: { verdict: "fail", needed: -2.5, available: -0.3, margin: -2.2 },
  },
  {
    label: "rail-to-rail comparator on ±5 V",
    run: { part: comparator(), stage: signStage(), rails: SPLIT_5V },
    expected: { verdict: "pass", needed: -2.5, available: -5.2, margin: 2.7 },
  },
];

describe("input-common-mode", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("input-common-mode", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("input-common-mode", cases)).toMatchInlineSnapshot(`
      {
        "JFET input needing 3.5 V above V−: the negative peak is 1.00 V outside": "fail: needs inputs from −2.50 V to +2.50 V; with V− = −5.00 V and V+ = +5.00 V it accepts −1.50 V to +3.50 V: 1.00 V short",
        "an input range ending 2.45 V below V+: 0.05 V to spare": "marginal: needs inputs from −2.50 V to +2.50 V; with V− = −5.00 V and V+ = +5.00 V it accepts −5.30 V to +2.55 V: 0.05 V to spare",
        "ground-sensing bipolar on a single 5 V rail: reaches only 0.3 V below ground": "fail: needs inputs from −2.50 V to +2.50 V; with V− = 0.00 V and V+ = +5.00 V it accepts −0.30 V to +3.50 V: 2.20 V short",
        "ground-sensing bipolar on ±5 V, window ±2.5 V: 1.00 V below its top": "pass: needs inputs from −2.50 V to +2.50 V; with V− = −5.00 V and V+ = +5.00 V it accepts −5.30 V to +3.50 V: 1.00 V to spare",
        "rail-to-rail comparator on ±5 V": "pass: needs inputs from −2.50 V to +2.50 V; with V− = −5.00 V and V+ = +5.00 V it accepts −5.20 V to +5.20 V: 2.70 V to spare",
      }
    `);
  });
});
