import {
  defineRule,
  rangeMargin,
  record,
  spareOrShort,
  voltageVerdict,
  volts,
  type PartOf,
  type RoleContext,
} from "../src/core/rule-kit/index.ts";

/** Reachable input range and the binding margin, flat (it runs for every candidate); phase-reversal reuses it. */
export function commonModeMargin({ rails, stage }: RoleContext, p: PartOf<"op-amp" | "comparator">) {
  if (stage.stage === "diode") throw new Error("input-common-mode applies to amplifier stages only");
  const low = rails.negative_v + p.icm_neg_headroom_v;
  const high = rails.positive_v - p.icm_pos_headroom_v;
  const { margin, needed, reached } = rangeMargin(stage.input, { low, high });
  return { margin, needed, reached, low, high };
}

export const inputCommonMode = defineRule({
  id: "input-common-mode",
  unit: "V",
  checks: "The inputs stay inside the part's common-mode range over the whole signal window.",
  formula:
    "low = V− + icm_neg_headroom_v, high = V+ − icm_pos_headroom_v; margin = min(needed low − low, high − needed high); needed is ±W for a follower after the divider, b ± a·peak for a level shifter and V_ref for the reference buffer of its network",
  source: "Datasheet input common-mode range, read inward from each rail (common practice).",
  policy: "headroom_margin_v",
  kinds: ["op-amp", "comparator"],
  needs: {
    "op-amp": ["icm_neg_headroom_v", "icm_pos_headroom_v"],
    comparator: ["icm_neg_headroom_v", "icm_pos_headroom_v"],
  },
  measure(ctx, part, out) {
    const m = commonModeMargin(ctx, part);
    const limit = Math.max(Math.abs(m.needed), ctx.policy.headroom_margin_v);
    record(out, voltageVerdict(m.margin, ctx.policy), m.needed, m.reached, m.margin, limit);
  },
  describe({ margin }, ctx, part) {
    const { rails } = ctx;
    const m = commonModeMargin(ctx, part);
    const range = ctx.stage.stage === "diode" ? m : ctx.stage.input;
    return {
      reason: `needs inputs from ${volts(range.low)} to ${volts(range.high)}; with V− = ${volts(rails.negative_v)} and V+ = ${volts(rails.positive_v)} it accepts ${volts(m.low)} to ${volts(m.high)}: ${spareOrShort(margin, "V")}`,
      steps: [
        { label: "lowest input = V− + icm_neg_headroom_v", value: m.low, unit: "V" },
        { label: "highest input = V+ − icm_pos_headroom_v", value: m.high, unit: "V" },
        { label: "needed low − lowest input", value: range.low - m.low, unit: "V" },
        { label: "highest input − needed high", value: m.high - range.high, unit: "V" },
        { label: "margin = the smaller", value: margin, unit: "V" },
      ],
    };
  },
});
