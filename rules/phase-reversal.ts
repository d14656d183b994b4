import { defineRule, record } from "../src/core/rule-kit/index.ts";
import { formatVolts } from "../src/core/units.ts";
import { commonModeMargin } from "./input-common-mode.ts";

// A part that reverses is only as safe as its common-mode margin: inside the
// range it works, but an overload transient can latch the output the wrong way.
export const phaseReversal = defineRule({
  id: "phase-reversal",
  unit: "V",
  checks: "The output does not invert when an input leaves the common-mode range.",
  formula:
    "no reversal: pass; reversal with common-mode margin ≥ 0: marginal; reversal with common-mode margin < 0: fail (margin = the input-common-mode margin)",
  source: "Output phase reversal of some JFET- and bipolar-input classes (datasheet; common practice).",
  policy: null,
  kinds: ["op-amp"],
  needs: { "op-amp": ["phase_reversal"] },
  measure(ctx, part, out) {
    const cm = commonModeMargin(ctx, part).margin;
    const reverses = part.phase_reversal === true;
    const verdict = !reverses ? "pass" : cm < 0 ? "fail" : "marginal";
    record(out, verdict, 0, cm, reverses ? cm : Math.max(0, cm), undefined);
  },
  describe({ available: cmMargin }, _ctx, part) {
    const reverses = part.phase_reversal === true;
    const reason = !reverses
      ? "does not reverse its output phase when the inputs leave the common-mode range"
      : cmMargin < 0
        ? `reverses its output phase outside the common-mode range, and the inputs already leave it by ${formatVolts(-cmMargin)}: the output can latch the wrong way`
        : `reverses its output phase outside the common-mode range; inside it here with ${formatVolts(cmMargin)} to spare, but an overload can latch the output the wrong way`;
    return {
      reason,
      steps: [
        { label: "phase_reversal (1 = yes)", value: reverses ? 1 : 0, unit: "" },
        { label: "input common-mode margin", value: cmMargin, unit: "V" },
      ],
    };
  },
});
