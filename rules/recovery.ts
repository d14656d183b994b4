import { defineRule, record, shareVerdict, spareOrShort, stageAs } from "../src/core/rule-kit/index.ts";
import { formatSI } from "../src/core/units.ts";

// A diode conducts backwards for trr after it is switched off: in the pump that
// charge is lost every half cycle, in the rectifier it smears each zero crossing.
export const recovery = defineRule({
  id: "recovery",
  unit: "s",
  checks: "The diode stops conducting backwards quickly compared with how often it switches.",
  formula:
    "pump diode: trr ≤ timing_fraction × the pump's half period 1/(2·frequency_hz); rectifier diode: trr ≤ timing_fraction / max_frequency_hz (the same allowance as the zero-crossing jump)",
  source: "Reverse-recovery time (datasheet); the allowance is our policy (timing_fraction), common practice.",
  policy: "timing_fraction",
  kinds: ["diode"],
  needs: { diode: ["trr_ns"] },
  measure({ stage, policy }, part, out) {
    const limit = stageAs(stage, "diode", "recovery").recovery_limit_s;
    if (limit === undefined) throw new Error("recovery needs a diode stage with a time limit");
    const trr = (part.trr_ns ?? 0) * 1e-9;
    const margin = limit - trr;
    record(out, shareVerdict(margin, limit, policy), limit, trr, margin, limit);
  },
  describe({ needed: limit, available: trr, margin }, { stage }) {
    const what = stageAs(stage, "diode", "recovery").recovery_what ?? "timing allowance";
    return {
      reason: `recovers in ${formatSI(trr, "s")}; the limit is ${formatSI(limit, "s")} (${what}): ${spareOrShort(margin, "s")}`,
      steps: [
        { label: "trr", value: trr, unit: "s" },
        { label: `limit (${what})`, value: limit, unit: "s" },
        { label: "margin = limit − trr", value: margin, unit: "s" },
      ],
    };
  },
});
