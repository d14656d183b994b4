// supply-range (SPEC §7): Vs = V+ − V−; margin = min(Vs − supply_min_v, supply_max_v − Vs);
// marginal below headroom_margin_v (0.1 V). Supply ranges of the classes are common practice [M].
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
    label: "ground-sensing bipolar (3–32 V) on ±5 V: 7 V above its minimum",
    run: { part: opAmp(), stage: bufferStage(), rails: SPLIT_5V },
    expected: { verdict: "pass", needed: 10, available: 3, margin: 7 },
  },
  {
    // Issue 3 acceptance: a class rated only for 10 V and more is marginal at ±5 V.
    label: "classic split-supply class (10–36 V) on ±5 V: exactly at its minimum",
    run: { part: opAmp({ supply_min_v: 10, supply_max_v: 36 }), stage: bufferStage(), rails: SPLIT_5V },
    expected: { verdict: "marginal", needed: 10, available: 10, margin: 0 },
  },
  {
    label: "CMOS rail-to-rail (1.8–5.5 V) at 5.45 V: 0.05 V below its maximum",
    run: {
      part: opAmp({ supply_min_v: 1.8, supply_max_v: 5.5 }),
      stage: bufferStage(),
      rails: { positive_v: 5.45, negative_v: 0 },
    },
    expected: { verdict: "marginal", needed: 5.45, available: 5.5, margin: 0.05 },
  },
  {
    label: "CMOS rail-to-rail (1.8–5.5 V) on ±5 V: 4.5 V over its maximum",
    run: { part: opAmp({ supply_min_v: 1.8, supply_max_v: 5.5 }), stage: bufferStage(), rails: SPLIT_5V },
    expected: { verdict: "fail", needed: 10, available: 5.5, margin: -4.5 },
  },
  {
    label: "classic split-supply class (10–36 V) on a single 5 V rail: 5 V short",
    run: { part: opAmp({ supply_min_v: 10, supply_max_v: 36 }), stage: bufferStage(), rails: GROUND_5V },
    expected: { verdict: "fail", needed: 5, available: 10, margin: -5 },
  },
  {
    label: "push-pull CMOS comparator (1.8–5.5 V) on 5 V",
    run: { part: comparator(), stage: signStage(), rails: GROUND_5V },
    expected: { verdict: "pass", needed: 5, available: 5.5, margin: 0.5 },
  },
  {
    label: "CMOS rail-to-rail on 5 V and a −2.53 V pumped rail",
    run: {
      part: opAmp({ supply_min_v: 1.8, supply_max_v: 5.5 }),
      stage: bufferStage(),
      rails: { positive_v: 5, negative_v: -2.53 },
    },
    expected: { verdict: "fail", needed: 7.53, available: 5.5, margin: -2.03 },
  },
];

describe("supply-range", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("supply-range", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("supply-range", cases)).toMatchInlineSnapshot(`
      {
        "CMOS rail-to-rail (1.8–5.5 V) at 5.45 V: 0.05 V below its maximum": "marginal: needs a supply of 5.45 V (V+ 5.45 V, V− 0.00 V); rated 1.80 V to 5.50 V: 0.05 V to spare",
        "CMOS rail-to-rail (1.8–5.5 V) on ±5 V: 4.5 V over its maximum": "fail: needs a supply of 10.00 V (V+ 5.00 V, V− −5.00 V); rated 1.80 V to 5.50 V: 4.50 V short",
        "CMOS rail-to-rail on 5 V and a −2.53 V pumped rail": "fail: needs a supply of 7.53 V (V+ 5.00 V, V− −2.53 V); rated 1.80 V to 5.50 V: 2.03 V short",
        "classic split-supply class (10–36 V) on a single 5 V rail: 5 V short": "fail: needs a supply of 5.00 V (V+ 5.00 V, V− 0.00 V); rated 10.00 V to 36.00 V: 5.00 V short",
        "classic split-supply class (10–36 V) on ±5 V: exactly at its minimum": "marginal: needs a supply of 10.00 V (V+ 5.00 V, V− −5.00 V); rated 10.00 V to 36.00 V: 0.00 V to spare",
        "ground-sensing bipolar (3–32 V) on ±5 V: 7 V above its minimum": "pass: needs a supply of 10.00 V (V+ 5.00 V, V− −5.00 V); rated 3.00 V to 32.00 V: 7.00 V to spare",
        "push-pull CMOS comparator (1.8–5.5 V) on 5 V": "pass: needs a supply of 5.00 V (V+ 5.00 V, V− 0.00 V); rated 1.80 V to 5.50 V: 0.50 V to spare",
      }
    `);
  });
});
