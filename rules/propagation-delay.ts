import { defineRule, record, shareVerdict, spareOrShort, type Rails } from "../src/core/rule-kit/index.ts";
import { formatQuantity, formatSI } from "../src/core/units.ts";
import { outputHigh, outputLow, type Driver } from "./levels.ts";

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
  measure({ design, rails, policy }, part, out) {
    const limit = policy.timing_fraction / design.signal.max_frequency_hz;
    const delay = switchingDelay(part, rails).delay;
    const margin = limit - delay;
    const computed = shareVerdict(margin, limit, policy);
    // An op amp's overload recovery is not rated, so it is at best marginal here.
    const verdict = part.kind === "op-amp" && computed === "pass" ? "marginal" : computed;
    record(out, verdict, limit, delay, margin, limit);
  },
  describe({ available: delay, margin, needed: limit }, { design, rails, policy }, part) {
    const period = `${policy.timing_fraction * 100} % of the ${formatSI(1 / design.signal.max_frequency_hz, "s")} period`;
    if (part.kind === "op-amp") {
      const { swing, slew } = switchingDelay(part, rails);
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

/** A comparator's rated delay, or the time an op amp takes to slew from one output level to the other. */
function switchingDelay(part: Driver, rails: Rails): { delay: number; swing: number; slew: number } {
  if (part.kind === "comparator") return { delay: part.tpd_ns * 1e-9, swing: 0, slew: 0 };
  const swing = (outputHigh(part, rails) ?? rails.positive_v) - outputLow(part, rails);
  const slew = part.slew_v_per_us * 1e6;
  return { delay: swing / slew, swing, slew };
}
