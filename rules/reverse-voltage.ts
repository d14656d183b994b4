import { defineRule, record, spareOrShort, stageAs, voltageVerdict } from "../src/core/rule-kit/index.ts";
import { formatVolts } from "../src/core/units.ts";

export const reverseVoltage = defineRule({
  id: "reverse-voltage",
  unit: "V",
  checks: "The diode blocks the largest reverse voltage its position sees.",
  formula: "pump diode ≥ 2 · drive_v; rectifier diode ≥ 2 · W; clamp diode ≥ |V−|; margin = vr_max_v − needed",
  source: "Datasheet maximum reverse voltage (common practice).",
  policy: "headroom_margin_v",
  kinds: ["diode"],
  needs: { diode: ["vr_max_v"] },
  measure({ stage, policy }, part, out) {
    const needed = stageAs(stage, "diode", "reverse-voltage").reverse_v;
    const rated = part.vr_max_v;
    const margin = rated - needed;
    record(out, voltageVerdict(margin, policy), needed, rated, margin, needed);
  },
  describe({ needed, available: rated, margin }, { stage }) {
    const what = stageAs(stage, "diode", "reverse-voltage").reverse_what;
    return {
      reason: `must block ${formatVolts(needed)} (${what ?? "reverse"}); rated ${formatVolts(rated)}: ${spareOrShort(margin, "V")}`,
      steps: [
        { label: `needed = ${what ?? "reverse voltage"}`, value: needed, unit: "V" },
        { label: "vr_max_v", value: rated, unit: "V" },
        { label: "margin = vr_max_v − needed", value: margin, unit: "V" },
      ],
    };
  },
});
