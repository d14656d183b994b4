import {
  defineRule,
  record,
  shareVerdict,
  spareOrShortSmall,
  type PartOf,
  type Stage,
} from "../src/core/rule-kit/index.ts";
import { formatSI } from "../src/core/units.ts";

export const signDeadBand = defineRule({
  id: "sign-dead-band",
  unit: "V",
  checks:
    "The band around zero where the sign may be wrong (the offset either way, widened by the hysteresis) stays inside its share of the accuracy.",
  formula:
    "dead band = (2 · Vos + Vh) / k (input-referred; Vh = hysteresis_mv, 0 when empty); limit = sign_share · required_v",
  source:
    "Comparator input offset referred through the divider (common practice); hysteresis moves each threshold by Vh/2 (SPEC §11.4).",
  policy: "sign_share",
  kinds: ["comparator", "op-amp"],
  needs: { comparator: ["vos_max_mv"], "op-amp": ["vos_max_mv"] },
  measure({ stage, design, policy }, part, out) {
    const band = (2 * part.vos_max_mv * 1e-3 + hysteresis(part)) / dividerRatio(stage);
    const limit = policy.sign_share * design.accuracy.required_v;
    const margin = limit - band;
    record(out, shareVerdict(margin, limit, policy), limit, band, margin, limit);
  },
  describe({ available: band, margin, needed: limit }, { stage }, part) {
    const vos = part.vos_max_mv * 1e-3;
    const vh = hysteresis(part);
    const k = dividerRatio(stage);
    const how =
      vh > 0
        ? `(2 × ${formatSI(vos, "V")} + ${formatSI(vh, "V")} hysteresis) ÷ ${Number(k.toPrecision(3))}`
        : `2 × ${formatSI(vos, "V")} ÷ ${Number(k.toPrecision(3))}`;
    return {
      reason: `the sign can be wrong within ${formatSI(band, "V")} of zero at the input (${how}); the limit is ${formatSI(limit, "V")}: ${spareOrShortSmall(margin)}`,
      steps: [
        { label: "Vos", value: vos, unit: "V" },
        { label: "hysteresis Vh", value: vh, unit: "V" },
        { label: "k", value: k, unit: "" },
        { label: "dead band = (2·Vos + Vh) / k", value: band, unit: "V" },
        { label: "limit = sign_share × required_v", value: limit, unit: "V" },
        { label: "margin = limit − dead band", value: margin, unit: "V" },
      ],
    };
  },
});

function hysteresis(part: PartOf<"comparator" | "op-amp">): number {
  return part.kind === "comparator" ? (part.hysteresis_mv ?? 0) * 1e-3 : 0;
}

function dividerRatio(stage: Stage): number {
  return stage.stage === "sign" ? stage.output_per_input : 1;
}
