import {
  defineRule,
  railPhrase,
  rangeMargin,
  record,
  spareOrShort,
  stageAs,
  voltageVerdict,
  volts,
  type Rails,
  type Range,
} from "../src/core/rule-kit/index.ts";
import { formatVolts } from "../src/core/units.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";

export const outputSwing = defineRule({
  id: "output-swing",
  unit: "V",
  checks: "The output reaches both ends of what the stage must drive, at these rails.",
  formula:
    "low = V− + out_neg_headroom_v, high = V+ − out_pos_headroom_v; buffer margin = min(−W − low, high − W); rectifier margin = min(−Vf − low, high − (W + Vf)); level shifter on one rail (V− = 0 V): needs b − a·peak … b + a·peak, the reference buffer of its network V_ref",
  source: "Datasheet output swing at the rated load, read inward from each rail (common practice).",
  policy: "headroom_margin_v",
  kinds: ["op-amp"],
  needs: { "op-amp": ["out_neg_headroom_v", "out_pos_headroom_v"] },
  measure({ rails, stage, policy }, part, out) {
    const s = stageAs(stage, "op-amp", "output-swing");
    const m = rangeMargin(s.output, outputReach(part, rails));
    const limit = Math.max(Math.abs(m.needed), policy.headroom_margin_v);
    record(out, voltageVerdict(m.margin, policy), m.needed, m.reached, m.margin, limit);
  },
  describe({ needed, available, margin }, { rails, stage }, part) {
    const p = part;
    const s = stageAs(stage, "op-amp", "output-swing");
    const reach = outputReach(p, rails);
    const side = rangeMargin(s.output, reach).side;
    const headroom = side === "high" ? p.out_pos_headroom_v : p.out_neg_headroom_v;
    const only = margin < 0 ? "only " : "";
    return {
      reason: `needs the output to reach ${volts(needed)}; ${railPhrase(side, rails)} it reaches ${only}${volts(available)} (${formatVolts(headroom)} headroom): ${spareOrShort(margin, "V")}`,
      steps: [
        { label: "lowest output = V− + out_neg_headroom_v", value: reach.low, unit: "V" },
        { label: "highest output = V+ − out_pos_headroom_v", value: reach.high, unit: "V" },
        { label: "needed low", value: s.output.low, unit: "V" },
        { label: "needed high", value: s.output.high, unit: "V" },
        { label: "margin = min(needed low − lowest, highest − needed high)", value: margin, unit: "V" },
      ],
    };
  },
});

function outputReach(p: OpAmp, rails: Rails): Range {
  return { low: rails.negative_v + p.out_neg_headroom_v, high: rails.positive_v - p.out_pos_headroom_v };
}
