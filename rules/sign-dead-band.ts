import { defineRule, record, shareVerdict, spareOrShortSmall, type Stage } from "../src/core/rule-kit/index.ts";
import { formatSI } from "../src/core/units.ts";

export const signDeadBand = defineRule({
  id: "sign-dead-band",
  unit: "V",
  checks: "The band around zero where the sign may be wrong stays inside its share of the accuracy.",
  formula: "dead band = 2 · Vos / k (input-referred); limit = sign_share · required_v",
  source: "Comparator input offset referred through the divider (common practice).",
  policy: "sign_share",
  kinds: ["comparator", "op-amp"],
  needs: { comparator: ["vos_max_mv"], "op-amp": ["vos_max_mv"] },
  measure({ stage, design, policy }, part, out) {
    const band = (2 * part.vos_max_mv * 1e-3) / dividerRatio(stage);
    const limit = policy.sign_share * design.accuracy.required_v;
    const margin = limit - band;
    record(out, shareVerdict(margin, limit, policy), limit, band, margin, limit);
  },
  describe({ available: band, margin, needed: limit }, { stage }, part) {
    const vos = part.vos_max_mv * 1e-3;
    const k = dividerRatio(stage);
    return {
      reason: `the sign can be wrong within ${formatSI(band, "V")} of zero at the input (2 × ${formatSI(vos, "V")} ÷ ${Number(k.toPrecision(3))}); the limit is ${formatSI(limit, "V")}: ${spareOrShortSmall(margin)}`,
      steps: [
        { label: "Vos", value: vos, unit: "V" },
        { label: "k", value: k, unit: "" },
        { label: "dead band = 2·Vos / k", value: band, unit: "V" },
        { label: "limit = sign_share × required_v", value: limit, unit: "V" },
        { label: "margin = limit − dead band", value: margin, unit: "V" },
      ],
    };
  },
});

function dividerRatio(stage: Stage): number {
  return stage.stage === "sign" ? stage.output_per_input : 1;
}
