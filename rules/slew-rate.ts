import { defineRule, record, shareVerdict, spareOrShort, stageAs } from "../src/core/rule-kit/index.ts";
import { formatQuantity, formatSI } from "../src/core/units.ts";

export const slewRate = defineRule({
  id: "slew-rate",
  unit: "V/s",
  checks: "The op amp slews fast enough to follow a full-scale sine at the highest signal frequency.",
  formula:
    "needed = 2π · f · W (rectifier: 2π · f · (W + Vf); level shifter: 2π · f · a · peak); margin = slew − needed",
  source: "Full-power bandwidth f = SR / (2π·Vp) (worked example, NPTEL course 117107094, lecture 7).",
  policy: "marginal_fraction",
  kinds: ["op-amp"],
  needs: { "op-amp": ["slew_v_per_us"] },
  measure({ stage, design, policy }, part, out) {
    const s = stageAs(stage, "op-amp", "slew-rate");
    const needed = 2 * Math.PI * design.signal.max_frequency_hz * s.slew_amplitude_v;
    const slew = part.slew_v_per_us * 1e6;
    const margin = slew - needed;
    record(out, shareVerdict(margin, needed, policy), needed, slew, margin, needed);
  },
  describe({ needed, available: slew, margin }, { stage, design }) {
    const amplitude = stageAs(stage, "op-amp", "slew-rate").slew_amplitude_v;
    return {
      reason: `needs ${formatQuantity(needed, "V/s")} (2π × ${formatSI(design.signal.max_frequency_hz, "Hz")} × ${formatSI(amplitude, "V")}); slews ${formatQuantity(slew, "V/s")}: ${spareOrShort(margin, "V/s")}`,
      steps: [
        { label: "amplitude to follow", value: amplitude, unit: "V" },
        { label: "needed = 2π·f·amplitude", value: needed, unit: "V/s" },
        { label: "slew rate", value: slew, unit: "V/s" },
        { label: "margin = slew − needed", value: margin, unit: "V/s" },
      ],
    };
  },
});
