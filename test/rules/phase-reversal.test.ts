// phase-reversal (SPEC §7): pass when the class does not reverse; marginal when it
// does but the input-common-mode margin is ≥ 0; fail when that margin is already
// negative. The margin carried is the input-common-mode margin.
import { describe, expect, it } from "vitest";
import { opAmp } from "../helpers/parts.ts";
import { bufferStage, check, expectFinding, reasons, SPLIT_5V, type RuleCase } from "../helpers/rules.ts";

const jfet = { supply_min_v: 9, supply_max_v: 36, icm_neg_headroom_v: 2, icm_pos_headroom_v: 1.5 };

const cases: RuleCase[] = [
  {
    label: "does not reverse, inputs 1.00 V inside the range",
    run: { part: opAmp({ phase_reversal: false }), stage: bufferStage(), rails: SPLIT_5V },
    expected: { verdict: "pass", needed: 0, available: 1, margin: 1 },
  },
  {
    label: "does not reverse, inputs outside the range (input-common-mode fails instead)",
    run: {
      part: opAmp({ ...jfet, icm_neg_headroom_v: 3.5, phase_reversal: false }),
      stage: bufferStage(),
      rails: SPLIT_5V,
    },
    expected: { verdict: "pass", needed: 0, available: -1, margin: 0 },
  },
  {
    label: "JFET class that reverses, inputs 0.50 V inside the range",
    run: { part: opAmp({ ...jfet, phase_reversal: true }), stage: bufferStage(), rails: SPLIT_5V },
    expected: { verdict: "marginal", needed: 0, available: 0.5, margin: 0.5 },
  },
  {
    label: "JFET class that reverses, inputs 1.00 V outside the range",
    run: {
      part: opAmp({ ...jfet, icm_neg_headroom_v: 3.5, phase_reversal: true }),
      stage: bufferStage(),
      rails: SPLIT_5V,
    },
    expected: { verdict: "fail", needed: 0, available: -1, margin: -1 },
  },
  {
    label: "phase reversal not stated",
    run: { part: opAmp({ phase_reversal: "" }), stage: bufferStage(), rails: SPLIT_5V },
    expected: { verdict: "unrated", needed: null, available: null, margin: null },
  },
];

describe("phase-reversal", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("phase-reversal", run), expected));

  it("says why", () => {
    expect(reasons("phase-reversal", cases)).toMatchInlineSnapshot(`
      {
        "JFET class that reverses, inputs 0.50 V inside the range": "marginal: reverses its output phase outside the common-mode range; inside it here with 0.50 V to spare, but an overload can latch the output the wrong way",
        "JFET class that reverses, inputs 1.00 V outside the range": "fail: reverses its output phase outside the common-mode range, and the inputs already leave it by 1.00 V: the output can latch the wrong way",
        "does not reverse, inputs 1.00 V inside the range": "pass: does not reverse its output phase when the inputs leave the common-mode range",
        "does not reverse, inputs outside the range (input-common-mode fails instead)": "pass: does not reverse its output phase when the inputs leave the common-mode range",
        "phase reversal not stated": "unrated: not rated: needs 'phase_reversal', which is empty for this part",
      }
    `);
  });
});
