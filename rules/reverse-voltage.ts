import type { Rule } from "../src/core/engine/types.ts";
import { finding } from "../src/core/engine/finding.ts";
import { spareOrShort, voltageVerdict } from "../src/core/engine/verdict.ts";
import { formatVolts } from "../src/core/units.ts";
import type { Diode } from "../src/core/schemas/diode.ts";

export const reverseVoltage: Rule = {
  id: "reverse-voltage",
  unit: "V",
  checks: "The diode blocks the largest reverse voltage its position sees.",
  formula: "pump diode ≥ 2 · drive_v; rectifier diode ≥ 2 · W; clamp diode ≥ |V−|; margin = vr_max_v − needed",
  source: "Datasheet maximum reverse voltage (common practice).",
  policy: "headroom_margin_v",
  kinds: ["diode"],
  needs: { diode: ["vr_max_v"] },
  evaluate({ part, stage, policy }) {
    const d = part as Diode;
    if (stage.stage !== "diode") throw new Error("reverse-voltage applies to diode stages only");
    const margin = d.vr_max_v - stage.reverse_v;
    return finding("reverse-voltage", {
      verdict: voltageVerdict(margin, policy),
      needed: stage.reverse_v,
      available: d.vr_max_v,
      margin,
      unit: "V",
      limit: stage.reverse_v,
      reason: () =>
        `must block ${formatVolts(stage.reverse_v)} (${stage.reverse_what ?? "reverse"}); rated ${formatVolts(d.vr_max_v)}: ${spareOrShort(margin, "V")}`,
      steps: () => [
        { label: `needed = ${stage.reverse_what ?? "reverse voltage"}`, value: stage.reverse_v, unit: "V" },
        { label: "vr_max_v", value: d.vr_max_v, unit: "V" },
        { label: "margin = vr_max_v − needed", value: margin, unit: "V" },
      ],
    });
  },
};
