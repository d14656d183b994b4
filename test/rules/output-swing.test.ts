// output-swing (SPEC §7): low V− + out_neg_headroom_v, high V+ − out_pos_headroom_v;
// buffer margin min(−W − low, high − W); rectifier min(−Vf − low, high − (W + Vf)).
import { describe, expect, it } from "vitest";
import { opAmp } from "../helpers/parts.ts";
import {
  bufferStage,
  check,
  expectFinding,
  GROUND_5V,
  reasons,
  rectifierStage,
  SPLIT_5V,
  type RuleCase,
} from "../helpers/rules.ts";

const cases: RuleCase[] = [
  {
    // Issue 3 acceptance: fixed ±5 V, 2.5 V window, output to V+ − 1.5 V → 1.00 V to spare.
    label: "ground-sensing bipolar (out_pos_headroom 1.5) on ±5 V, window 2.5 V",
    run: { part: opAmp({ out_pos_headroom_v: 1.5 }), stage: bufferStage({ w: 2.5 }), rails: SPLIT_5V },
    expected: { verdict: "pass", needed: 2.5, available: 3.5, margin: 1 },
  },
  {
    label: "an output that stops 2.45 V below V+",
    run: { part: opAmp({ out_pos_headroom_v: 2.45 }), stage: bufferStage(), rails: SPLIT_5V },
    expected: { verdict: "marginal", needed: 2.5, available: 2.55, margin: 0.05 },
  },
  {
    // Issue 3 acceptance: with only a ground rail no op amp reaches the negative half.
    label: "ground-only design: the output cannot go below +0.02 V",
    run: { part: opAmp(), stage: bufferStage(), rails: GROUND_5V },
    expected: { verdict: "fail", needed: -2.5, available: 0.02, margin: -2.52 },
  },
  {
    label: "classic bipolar 2 V inside each rail on ±5 V: 0.50 V short of +2.5 V",
    run: {
      part: opAmp({ supply_min_v: 10, out_neg_headroom_v: 1.5, out_pos_headroom_v: 3 }),
      stage: bufferStage(),
      rails: SPLIT_5V,
    },
    expected: { verdict: "fail", needed: 2.5, available: 2, margin: -0.5 },
  },
  {
    label: "rectifier (−0.6 V … 3.1 V) with a ground-sensing bipolar on ±5 V",
    run: { part: opAmp(), stage: rectifierStage({ w: 2.5, vf: 0.6 }), rails: SPLIT_5V },
    expected: { verdict: "pass", needed: 3.1, available: 3.5, margin: 0.4 },
  },
  {
    label: "rectifier whose output stops 1.85 V below V+",
    run: { part: opAmp({ out_pos_headroom_v: 1.85 }), stage: rectifierStage({ w: 2.5, vf: 0.6 }), rails: SPLIT_5V },
    expected: { verdict: "marginal", needed: 3.1, available: 3.15, margin: 0.05 },
  },
  {
    label: "rectifier on a ground rail: cannot reach −Vf",
    run: { part: opAmp(), stage: rectifierStage({ w: 2.5, vf: 0.6 }), rails: GROUND_5V },
    expected: { verdict: "fail", needed: -0.6, available: 0.02, margin: -0.62 },
  },
];

describe("output-swing", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("output-swing", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("output-swing", cases)).toMatchInlineSnapshot(`
      {
        "an output that stops 2.45 V below V+": "marginal: needs the output to reach +2.50 V; at V+ = 5.00 V it reaches +2.55 V (2.45 V headroom): 0.05 V to spare",
        "classic bipolar 2 V inside each rail on ±5 V: 0.50 V short of +2.5 V": "fail: needs the output to reach +2.50 V; at V+ = 5.00 V it reaches only +2.00 V (3.00 V headroom): 0.50 V short",
        "ground-only design: the output cannot go below +0.02 V": "fail: needs the output to reach −2.50 V; with V− = 0.00 V it reaches only +0.02 V (0.02 V headroom): 2.52 V short",
        "ground-sensing bipolar (out_pos_headroom 1.5) on ±5 V, window 2.5 V": "pass: needs the output to reach +2.50 V; at V+ = 5.00 V it reaches +3.50 V (1.50 V headroom): 1.00 V to spare",
        "rectifier (−0.6 V … 3.1 V) with a ground-sensing bipolar on ±5 V": "pass: needs the output to reach +3.10 V; at V+ = 5.00 V it reaches +3.50 V (1.50 V headroom): 0.40 V to spare",
        "rectifier on a ground rail: cannot reach −Vf": "fail: needs the output to reach −0.60 V; with V− = 0.00 V it reaches only +0.02 V (0.02 V headroom): 0.62 V short",
        "rectifier whose output stops 1.85 V below V+": "marginal: needs the output to reach +3.10 V; at V+ = 5.00 V it reaches +3.15 V (1.85 V headroom): 0.05 V to spare",
      }
    `);
  });
});
