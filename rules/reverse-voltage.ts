import {
  defineRule,
  record,
  spareOrShort,
  stageAs,
  voltageVerdict,
  type DiodeStage,
} from "../src/core/rule-kit/index.ts";
import { forwardVoltageAt } from "../src/core/math/temperature.ts";
import type { Diode } from "../src/core/schemas/diode.ts";
import { formatVolts } from "../src/core/units.ts";

/** The reverse voltage this diode must block; with the part's own drop where the position says so. */
export function reverseNeeded(s: DiodeStage, part: Diode): { needed: number; vf: number } {
  const r = s.reverse_vf;
  if (r === undefined) return { needed: s.reverse_v, vf: 0 };
  const vf = forwardVoltageAt(part, r.current_a, r.temp_c);
  return { needed: Math.max(0, s.reverse_v + r.sign * vf), vf };
}

export const reverseVoltage = defineRule({
  id: "reverse-voltage",
  unit: "V",
  checks: "The diode blocks the largest reverse voltage its position sees.",
  formula:
    "two-diode inverting pump: each diode blocks drive_v − Vf (Vf at the hot end, where it is smallest); half-wave rectifier: the off diode sees W + Vf (Vf at the cold end); clamp diode: |V−| at its deepest (no load, or the ripple's trough); margin = vr_max_v − needed",
  source:
    "Node voltages of the diode charge-pump inverter and the inverting half-wave precision rectifier (SPEC §11.12; Vf −2 mV/°C, Sedra & Smith); datasheet maximum reverse voltage.",
  policy: "headroom_margin_v",
  kinds: ["diode"],
  needs: { diode: ["vr_max_v"] },
  measure({ stage, policy }, part, out) {
    const { needed } = reverseNeeded(stageAs(stage, "diode", "reverse-voltage"), part);
    const rated = part.vr_max_v;
    const margin = rated - needed;
    record(out, voltageVerdict(margin, policy), needed, rated, margin, needed);
  },
  describe({ needed, available: rated, margin }, { stage }, part) {
    const s = stageAs(stage, "diode", "reverse-voltage");
    const what = s.reverse_what ?? "reverse";
    const { vf } = reverseNeeded(s, part);
    const r = s.reverse_vf;
    const how = r === undefined ? what : `${what} ${r.sign > 0 ? "+" : "−"} its own ${formatVolts(vf)} drop ${r.at}`;
    return {
      reason: `must block ${formatVolts(needed)} (${how}); rated ${formatVolts(rated)}: ${spareOrShort(margin, "V")}`,
      steps: [
        ...(r === undefined ? [] : [{ label: `Vf ${r.at}`, value: vf, unit: "V" }]),
        { label: `needed = ${what}${r === undefined ? "" : r.sign > 0 ? " + Vf" : " − Vf"}`, value: needed, unit: "V" },
        { label: "vr_max_v", value: rated, unit: "V" },
        { label: "margin = vr_max_v − needed", value: margin, unit: "V" },
      ],
    };
  },
});
