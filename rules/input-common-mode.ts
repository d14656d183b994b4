import type { Rule, RuleContext } from "../src/core/engine/types.ts";
import { finding, rangeMargin, volts } from "../src/core/engine/finding.ts";
import { spareOrShort, voltageVerdict } from "../src/core/engine/verdict.ts";
import type { Comparator } from "../src/core/schemas/comparator.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";

/** Reachable input range and the binding margin; phase-reversal reuses it. */
export function commonModeMargin({ part, rails, stage }: RuleContext) {
  const p = part as OpAmp | Comparator;
  const reach = { low: rails.negative_v + p.icm_neg_headroom_v, high: rails.positive_v - p.icm_pos_headroom_v };
  if (stage.stage === "diode") throw new Error("input-common-mode applies to amplifier stages only");
  return { reach, range: stage.input, ...rangeMargin(stage.input, reach) };
}

export const inputCommonMode: Rule = {
  id: "input-common-mode",
  unit: "V",
  checks: "The inputs stay inside the part's common-mode range over the whole signal window.",
  formula:
    "low = V− + icm_neg_headroom_v, high = V+ − icm_pos_headroom_v; margin = min(needed low − low, high − needed high); needed is ±W for rectify-and-sign, b ± a·peak for the offset-to-mid-rail level shifter and V_ref for its reference buffer",
  source: "Datasheet input common-mode range, read inward from each rail (common practice).",
  policy: "headroom_margin_v",
  kinds: ["op-amp", "comparator"],
  needs: {
    "op-amp": ["icm_neg_headroom_v", "icm_pos_headroom_v"],
    comparator: ["icm_neg_headroom_v", "icm_pos_headroom_v"],
  },
  evaluate(ctx) {
    const m = commonModeMargin(ctx);
    return finding("input-common-mode", {
      verdict: voltageVerdict(m.margin, ctx.policy),
      needed: m.needed,
      available: m.reached,
      margin: m.margin,
      unit: "V",
      limit: Math.max(Math.abs(m.needed), ctx.policy.headroom_margin_v),
      reason: () =>
        `needs inputs from ${volts(m.range.low)} to ${volts(m.range.high)}; with V− = ${volts(ctx.rails.negative_v)} and V+ = ${volts(ctx.rails.positive_v)} it accepts ${volts(m.reach.low)} to ${volts(m.reach.high)}: ${spareOrShort(m.margin, "V")}`,
      steps: () => [
        { label: "lowest input = V− + icm_neg_headroom_v", value: m.reach.low, unit: "V" },
        { label: "highest input = V+ − icm_pos_headroom_v", value: m.reach.high, unit: "V" },
        { label: "needed low − lowest input", value: m.range.low - m.reach.low, unit: "V" },
        { label: "highest input − needed high", value: m.reach.high - m.range.high, unit: "V" },
        { label: "margin = the smaller", value: m.margin, unit: "V" },
      ],
    });
  },
};
