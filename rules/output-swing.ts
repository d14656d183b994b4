import { defineRule, railPhrase, rangeMargin, volts } from "../src/core/engine/finding.ts";
import { spareOrShort, voltageVerdict } from "../src/core/engine/verdict.ts";
import { formatVolts } from "../src/core/units.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";

export const outputSwing = defineRule({
  id: "output-swing",
  unit: "V",
  checks: "The output reaches both ends of what the stage must drive, at these rails.",
  formula:
    "low = V− + out_neg_headroom_v, high = V+ − out_pos_headroom_v; buffer margin = min(−W − low, high − W); rectifier margin = min(−Vf − low, high − (W + Vf)); offset-to-mid-rail level shifter (V− = 0 V): needs b − a·peak … b + a·peak, its reference buffer V_ref",
  source: "Datasheet output swing at the rated load, read inward from each rail (common practice).",
  policy: "headroom_margin_v",
  kinds: ["op-amp"],
  needs: { "op-amp": ["out_neg_headroom_v", "out_pos_headroom_v"] },
  measure({ rails, stage, policy }, part) {
    const p = part as OpAmp;
    if (stage.stage !== "op-amp") throw new Error("output-swing applies to op-amp stages only");
    const reach = { low: rails.negative_v + p.out_neg_headroom_v, high: rails.positive_v - p.out_pos_headroom_v };
    const m = rangeMargin(stage.output, reach);
    return {
      verdict: voltageVerdict(m.margin, policy),
      needed: m.needed,
      available: m.reached,
      margin: m.margin,
      limit: Math.max(Math.abs(m.needed), policy.headroom_margin_v),
      reach,
      side: m.side,
    };
  },
  describe({ needed, available, margin, reach, side }, { rails, stage }, part) {
    const p = part as OpAmp;
    const headroom = side === "high" ? p.out_pos_headroom_v : p.out_neg_headroom_v;
    const only = margin < 0 ? "only " : "";
    const output = stage.stage === "op-amp" ? stage.output : { low: needed, high: needed };
    return {
      reason: `needs the output to reach ${volts(needed)}; ${railPhrase(side, rails)} it reaches ${only}${volts(available)} (${formatVolts(headroom)} headroom): ${spareOrShort(margin, "V")}`,
      steps: [
        { label: "lowest output = V− + out_neg_headroom_v", value: reach.low, unit: "V" },
        { label: "highest output = V+ − out_pos_headroom_v", value: reach.high, unit: "V" },
        { label: "needed low", value: output.low, unit: "V" },
        { label: "needed high", value: output.high, unit: "V" },
        { label: "margin = min(needed low − lowest, highest − needed high)", value: margin, unit: "V" },
      ],
    };
  },
});
