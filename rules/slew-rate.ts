import { defineRule } from "../src/core/engine/finding.ts";
import { shareVerdict, spareOrShort } from "../src/core/engine/verdict.ts";
import { formatQuantity, formatSI } from "../src/core/units.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";

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
  measure({ stage, design, policy }, part) {
    if (stage.stage !== "op-amp") throw new Error("slew-rate applies to op-amp stages only");
    const needed = 2 * Math.PI * design.signal.max_frequency_hz * stage.slew_amplitude_v;
    const slew = (part as OpAmp).slew_v_per_us * 1e6;
    const margin = slew - needed;
    return { verdict: shareVerdict(margin, needed, policy), needed, available: slew, margin, limit: needed };
  },
  describe({ needed, available: slew, margin }, { stage, design }) {
    const amplitude = stage.stage === "op-amp" ? stage.slew_amplitude_v : 0;
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
