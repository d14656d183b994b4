import type { Rule } from "../src/core/engine/types.ts";
import { finding } from "../src/core/engine/finding.ts";
import { shareVerdict, spareOrShort } from "../src/core/engine/verdict.ts";
import { formatSI } from "../src/core/units.ts";
import type { Diode } from "../src/core/schemas/diode.ts";

// A diode conducts backwards for trr after it is switched off: in the pump that
// charge is lost every half cycle, in the rectifier it smears each zero crossing.
export const recovery: Rule = {
  id: "recovery",
  unit: "s",
  checks: "The diode stops conducting backwards quickly compared with how often it switches.",
  formula:
    "pump diode: trr ≤ timing_fraction × the pump's half period 1/(2·frequency_hz); rectifier diode: trr ≤ timing_fraction / max_frequency_hz (the same allowance as the zero-crossing jump)",
  source: "Reverse-recovery time (datasheet); the allowance is our policy (timing_fraction), common practice.",
  policy: "timing_fraction",
  kinds: ["diode"],
  needs: { diode: ["trr_ns"] },
  evaluate({ part, stage, policy }) {
    const d = part as Diode;
    if (stage.stage !== "diode" || stage.recovery_limit_s === undefined)
      throw new Error("recovery needs a diode stage with a time limit");
    const trr = (d.trr_ns ?? 0) * 1e-9;
    const limit = stage.recovery_limit_s;
    const margin = limit - trr;
    return finding("recovery", {
      verdict: shareVerdict(margin, limit, policy),
      needed: limit,
      available: trr,
      margin,
      unit: "s",
      limit,
      reason: () =>
        `recovers in ${formatSI(trr, "s")}; the limit is ${formatSI(limit, "s")} (${stage.recovery_what ?? "timing allowance"}): ${spareOrShort(margin, "s")}`,
      steps: () => [
        { label: "trr", value: trr, unit: "s" },
        { label: `limit (${stage.recovery_what ?? "timing allowance"})`, value: limit, unit: "s" },
        { label: "margin = limit − trr", value: margin, unit: "s" },
      ],
    });
  },
};
