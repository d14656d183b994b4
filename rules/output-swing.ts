import type { Rule } from "../src/core/engine/types.ts";
import { finding, railPhrase, rangeMargin, volts } from "../src/core/engine/finding.ts";
import { spareOrShort, voltageVerdict } from "../src/core/engine/verdict.ts";
import { formatVolts } from "../src/core/units.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";

export const outputSwing: Rule = {
  id: "output-swing",
  unit: "V",
  checks: "The output reaches both ends of what the stage must drive, at these rails.",
  formula:
    "low = V− + out_neg_headroom_v, high = V+ − out_pos_headroom_v; buffer margin = min(−W − low, high − W); rectifier margin = min(−Vf − low, high − (W + Vf)); offset-to-mid-rail level shifter (V− = 0 V): needs b − a·peak … b + a·peak, its reference buffer V_ref",
  source: "Datasheet output swing at the rated load, read inward from each rail (common practice).",
  policy: "headroom_margin_v",
  kinds: ["op-amp"],
  needs: { "op-amp": ["out_neg_headroom_v", "out_pos_headroom_v"] },
  evaluate({ part, rails, stage, policy }) {
    const p = part as OpAmp;
    if (stage.stage !== "op-amp") throw new Error("output-swing applies to op-amp stages only");
    const reach = { low: rails.negative_v + p.out_neg_headroom_v, high: rails.positive_v - p.out_pos_headroom_v };
    const m = rangeMargin(stage.output, reach);
    const headroom = m.side === "high" ? p.out_pos_headroom_v : p.out_neg_headroom_v;
    const only = m.margin < 0 ? "only " : "";
    return finding("output-swing", {
      verdict: voltageVerdict(m.margin, policy),
      needed: m.needed,
      available: m.reached,
      margin: m.margin,
      unit: "V",
      limit: Math.max(Math.abs(m.needed), policy.headroom_margin_v),
      reason: () =>
        `needs the output to reach ${volts(m.needed)}; ${railPhrase(m.side, rails)} it reaches ${only}${volts(m.reached)} (${formatVolts(headroom)} headroom): ${spareOrShort(m.margin, "V")}`,
      steps: () => [
        { label: "lowest output = V− + out_neg_headroom_v", value: reach.low, unit: "V" },
        { label: "highest output = V+ − out_pos_headroom_v", value: reach.high, unit: "V" },
        { label: "needed low", value: stage.output.low, unit: "V" },
        { label: "needed high", value: stage.output.high, unit: "V" },
        { label: "margin = min(needed low − lowest, highest − needed high)", value: m.margin, unit: "V" },
      ],
    });
  },
};
