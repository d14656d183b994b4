import { defineRule } from "../src/core/engine/finding.ts";
import { shareVerdict, spareOrShort } from "../src/core/engine/verdict.ts";
import { formatQuantity, formatSI } from "../src/core/units.ts";
import { outputHigh, outputLow } from "./levels.ts";

export const propagationDelay = defineRule({
  id: "propagation-delay",
  unit: "s",
  checks: "The sign decision follows a zero crossing within a small share of the signal period.",
  formula:
    "comparator: tpd ≤ timing_fraction / f; op amp as comparator: delay ≈ (V_OH − V_OL) / slew, and at best marginal because overload recovery is not rated",
  source: "Comparator propagation delay (datasheet); the op-amp estimate is common practice.",
  policy: "timing_fraction",
  kinds: ["comparator", "op-amp"],
  needs: { comparator: ["tpd_ns"], "op-amp": ["slew_v_per_us"] },
  measure({ design, rails, policy }, part) {
    const limit = policy.timing_fraction / design.signal.max_frequency_hz;
    if (part.kind === "op-amp") {
      const swing = (outputHigh(part, rails) ?? rails.positive_v) - outputLow(part, rails);
      const slew = part.slew_v_per_us * 1e6;
      const delay = swing / slew;
      const margin = limit - delay;
      const computed = shareVerdict(margin, limit, policy);
      const verdict = computed === "pass" ? "marginal" : computed;
      return { verdict, needed: limit, available: delay, margin, limit, swing, slew };
    }
    if (part.kind !== "comparator") throw new Error("propagation-delay applies to comparators and op amps");
    const delay = part.tpd_ns * 1e-9;
    const margin = limit - delay;
    return {
      verdict: shareVerdict(margin, limit, policy),
      needed: limit,
      available: delay,
      margin,
      limit,
      swing: 0,
      slew: 0,
    };
  },
  describe({ available: delay, margin, limit, swing, slew }, { design, policy }, part) {
    const period = `${policy.timing_fraction * 100} % of the ${formatSI(1 / design.signal.max_frequency_hz, "s")} period`;
    if (part.kind === "op-amp") {
      return {
        reason: `an op amp used as a comparator: about ${formatSI(delay, "s")} to slew ${formatSI(swing, "V")} at ${formatQuantity(slew, "V/s")} against a limit of ${formatSI(limit, "s")} (${period}): ${spareOrShort(margin, "s")}; its overload recovery is not rated, so at best marginal`,
        steps: [
          { label: "output swing V_OH − V_OL", value: swing, unit: "V" },
          { label: "slew rate", value: slew, unit: "V/s" },
          { label: "delay ≈ swing / slew", value: delay, unit: "s" },
          { label: "limit = timing_fraction / f", value: limit, unit: "s" },
          { label: "margin = limit − delay", value: margin, unit: "s" },
        ],
      };
    }
    return {
      reason: `switches in ${formatSI(delay, "s")}; the limit is ${formatSI(limit, "s")} (${period}): ${spareOrShort(margin, "s")}`,
      steps: [
        { label: "tpd", value: delay, unit: "s" },
        { label: "limit = timing_fraction / f", value: limit, unit: "s" },
        { label: "margin = limit − tpd", value: margin, unit: "s" },
      ],
    };
  },
});
