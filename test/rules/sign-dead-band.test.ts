// sign-dead-band (SPEC §7, §11.4): error (2 · Vos + Vh) / k (input-referred; hysteresis moves each
// threshold by Vh/2, so the band widens by Vh/k); limit sign_share · A.
import { describe, expect, it } from "vitest";
import { comparator, opAmp } from "../helpers/parts.ts";
import { check, expectFinding, reasons, signStage, type RuleCase } from "../helpers/rules.ts";

const behindDivider = signStage({ k: 0.25 }); // 10 V into a 2.5 V window

const cases: RuleCase[] = [
  {
    label: "2 mV comparator behind k = 0.25: 16 mV against 50 mV",
    run: { part: comparator({ vos_max_mv: 2 }), stage: behindDivider },
    expected: { verdict: "pass", needed: 0.05, available: 0.016, margin: 0.034 },
  },
  {
    label: "5.5 mV comparator behind k = 0.25: 44 mV against 50 mV",
    run: { part: comparator({ vos_max_mv: 5.5 }), stage: behindDivider },
    expected: { verdict: "marginal", needed: 0.05, available: 0.044, margin: 0.006 },
  },
  {
    label: "7 mV comparator behind k = 0.25: 56 mV against 50 mV",
    run: { part: comparator({ vos_max_mv: 7 }), stage: behindDivider },
    expected: { verdict: "fail", needed: 0.05, available: 0.056, margin: -0.006 },
  },
  {
    label: "7 mV op amp as comparator, no divider: 14 mV",
    run: { part: opAmp({ vos_max_mv: 7 }), stage: signStage({ k: 1 }) },
    expected: { verdict: "pass", needed: 0.05, available: 0.014, margin: 0.036 },
  },
  {
    label: "2 mV comparator with 3 mV hysteresis behind k = 0.25: (4 + 3) mV / 0.25 = 28 mV",
    run: { part: comparator({ vos_max_mv: 2, hysteresis_mv: 3 }), stage: behindDivider },
    expected: { verdict: "pass", needed: 0.05, available: 0.028, margin: 0.022 },
  },
  {
    label: "2 mV comparator with 7 mV hysteresis behind k = 0.25: 44 mV",
    run: { part: comparator({ vos_max_mv: 2, hysteresis_mv: 7 }), stage: behindDivider },
    expected: { verdict: "marginal", needed: 0.05, available: 0.044, margin: 0.006 },
  },
  {
    label: "2 mV comparator with 10 mV hysteresis behind k = 0.25: 56 mV",
    run: { part: comparator({ vos_max_mv: 2, hysteresis_mv: 10 }), stage: behindDivider },
    expected: { verdict: "fail", needed: 0.05, available: 0.056, margin: -0.006 },
  },
];

describe("sign-dead-band", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("sign-dead-band", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("sign-dead-band", cases)).toMatchInlineSnapshot(`
      {
        "2 mV comparator behind k = 0.25: 16 mV against 50 mV": "pass: the sign can be wrong within 16.0 mV of zero at the input (2 × 2.00 mV ÷ 0.25); the limit is 50.0 mV: 34.0 mV to spare",
        "2 mV comparator with 10 mV hysteresis behind k = 0.25: 56 mV": "fail: the sign can be wrong within 56.0 mV of zero at the input ((2 × 2.00 mV + 10.0 mV hysteresis) ÷ 0.25); the limit is 50.0 mV: 6.00 mV short",
        "2 mV comparator with 3 mV hysteresis behind k = 0.25: (4 + 3) mV / 0.25 = 28 mV": "pass: the sign can be wrong within 28.0 mV of zero at the input ((2 × 2.00 mV + 3.00 mV hysteresis) ÷ 0.25); the limit is 50.0 mV: 22.0 mV to spare",
        "2 mV comparator with 7 mV hysteresis behind k = 0.25: 44 mV": "marginal: the sign can be wrong within 44.0 mV of zero at the input ((2 × 2.00 mV + 7.00 mV hysteresis) ÷ 0.25); the limit is 50.0 mV: 6.00 mV to spare",
        "5.5 mV comparator behind k = 0.25: 44 mV against 50 mV": "marginal: the sign can be wrong within 44.0 mV of zero at the input (2 × 5.50 mV ÷ 0.25); the limit is 50.0 mV: 6.00 mV to spare",
        "7 mV comparator behind k = 0.25: 56 mV against 50 mV": "fail: the sign can be wrong within 56.0 mV of zero at the input (2 × 7.00 mV ÷ 0.25); the limit is 50.0 mV: 6.00 mV short",
        "7 mV op amp as comparator, no divider: 14 mV": "pass: the sign can be wrong within 14.0 mV of zero at the input (2 × 7.00 mV ÷ 1); the limit is 50.0 mV: 36.0 mV to spare",
      }
    `);
  });
});
