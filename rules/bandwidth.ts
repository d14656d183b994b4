import { defineRule } from "../src/core/engine/finding.ts";
import { shareVerdict, spareOrShortSmall } from "../src/core/engine/verdict.ts";
import { formatSI } from "../src/core/units.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";

/**
 * Gain error of a single-pole stage at f: 1 − 1/√(1 + (f/fc)²), written as
 * x²/(s(s+1)) with s = √(1+x²) so tiny ratios do not cancel to zero.
 */
export function singlePoleError(f: number, fc: number): number {
  const x = f / fc;
  const s = Math.sqrt(1 + x * x);
  return (x * x) / (s * (s + 1));
}

export const bandwidth = defineRule({
  id: "bandwidth",
  unit: "V",
  checks:
    "The closed-loop bandwidth keeps the gain error at the highest signal frequency inside this stage's share of the accuracy.",
  formula: "fc = gbw / noise_gain; error = (1 − 1/√(1 + (f/fc)²)) · peak_v; limit = speed_share · required_v",
  source:
    "Single-pole response |H| = 1/√(1+(f/fc)²) (T. Fiore, Operational Amplifiers & Linear Integrated Circuits, ch. 5).",
  policy: "speed_share",
  kinds: ["op-amp"],
  needs: { "op-amp": ["gbw_mhz"] },
  measure({ stage, design, policy }, part) {
    const p = part as OpAmp;
    if (stage.stage !== "op-amp") throw new Error("bandwidth applies to op-amp stages only");
    const gbw = p.gbw_mhz * 1e6;
    const fc = gbw / stage.noise_gain;
    const fraction = singlePoleError(design.signal.max_frequency_hz, fc);
    const error = fraction * stage.bandwidth_peak_v;
    const limit = policy.speed_share * design.accuracy.required_v;
    const margin = limit - error;
    return {
      verdict: shareVerdict(margin, limit, policy),
      needed: limit,
      available: error,
      margin,
      limit,
      fc,
      fraction,
    };
  },
  describe({ available: error, margin, limit, fc, fraction }, { stage, design }, part) {
    const gbw = (part as OpAmp).gbw_mhz * 1e6;
    const f = design.signal.max_frequency_hz;
    const gain = stage.stage === "op-amp" ? stage.noise_gain : 1;
    const peak = stage.stage === "op-amp" ? stage.bandwidth_peak_v : 0;
    return {
      reason: `at ${formatSI(f, "Hz")} with fc = ${formatSI(fc, "Hz")} (GBW ${formatSI(gbw, "Hz")} ÷ noise gain ${gain}) the gain falls short by ${formatSI(error, "V")} of the ${formatSI(peak, "V")} peak; the limit is ${formatSI(limit, "V")}: ${spareOrShortSmall(margin)}`,
      steps: [
        { label: "GBW", value: gbw, unit: "Hz" },
        { label: "fc = GBW / noise gain", value: fc, unit: "Hz" },
        { label: "f (highest signal frequency)", value: f, unit: "Hz" },
        { label: "gain error = 1 − 1/√(1+(f/fc)²)", value: fraction, unit: "" },
        { label: "error = gain error × peak", value: error, unit: "V" },
        { label: "limit = speed_share × required_v", value: limit, unit: "V" },
        { label: "margin = limit − error", value: margin, unit: "V" },
      ],
    };
  },
});
