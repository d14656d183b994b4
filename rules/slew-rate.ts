import type { Rule } from "../src/core/engine/types.ts";
import { finding } from "../src/core/engine/finding.ts";
import { shareVerdict, spareOrShort } from "../src/core/engine/verdict.ts";
import { formatQuantity, formatSI } from "../src/core/units.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";

export const slewRate: Rule = {
  id: "slew-rate",
  unit: "V/s",
  checks: "The op amp slews fast enough to follow a full-scale sine at the highest signal frequency.",
  formula:
    "needed = 2π · f · W (rectifier: 2π · f · (W + Vf); level shifter: 2π · f · a · peak); margin = slew − needed",
  source: "Full-power bandwidth f = SR / (2π·Vp) (worked example, NPTEL course 117107094, lecture 7).",
  policy: "marginal_fraction",
  kinds: ["op-amp"],
  needs: { "op-amp": ["slew_v_per_us"] },
  evaluate({ part, stage, design, policy }) {
    const p = part as OpAmp;
    if (stage.stage !== "op-amp") throw new Error("slew-rate applies to op-amp stages only");
    const f = design.signal.max_frequency_hz;
    const needed = 2 * Math.PI * f * stage.slew_amplitude_v;
    const slew = p.slew_v_per_us * 1e6;
    const margin = slew - needed;
    return finding("slew-rate", {
      verdict: shareVerdict(margin, needed, policy),
      needed,
      available: slew,
      margin,
      unit: "V/s",
      limit: needed,
      reason: () =>
        `needs ${formatQuantity(needed, "V/s")} (2π × ${formatSI(f, "Hz")} × ${formatSI(stage.slew_amplitude_v, "V")}); slews ${formatQuantity(slew, "V/s")}: ${spareOrShort(margin, "V/s")}`,
      steps: () => [
        { label: "amplitude to follow", value: stage.slew_amplitude_v, unit: "V" },
        { label: "needed = 2π·f·amplitude", value: needed, unit: "V/s" },
        { label: "slew rate", value: slew, unit: "V/s" },
        { label: "margin = slew − needed", value: margin, unit: "V/s" },
      ],
    });
  },
};
