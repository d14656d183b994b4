import { defineRule, record, shareVerdict, spareOrShortSmall, stageAs } from "../src/core/rule-kit/index.ts";
import { formatSI } from "../src/core/units.ts";

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
  measure({ stage, design, policy }, part, out) {
    const s = stageAs(stage, "op-amp", "bandwidth");
    const fc = (part.gbw_mhz * 1e6) / s.noise_gain;
    const error = singlePoleError(design.signal.max_frequency_hz, fc) * s.bandwidth_peak_v;
    const limit = policy.speed_share * design.accuracy.required_v;
    const margin = limit - error;
    record(out, shareVerdict(margin, limit, policy), limit, error, margin, limit);
  },
  describe({ available: error, margin, needed: limit }, { stage, design }, part) {
    const s = stageAs(stage, "op-amp", "bandwidth");
    const gbw = part.gbw_mhz * 1e6;
    const fc = gbw / s.noise_gain;
    const f = design.signal.max_frequency_hz;
    return {
      reason: `at ${formatSI(f, "Hz")} with fc = ${formatSI(fc, "Hz")} (GBW ${formatSI(gbw, "Hz")} ÷ noise gain ${s.noise_gain}) the gain falls short by ${formatSI(error, "V")} of the ${formatSI(s.bandwidth_peak_v, "V")} peak; the limit is ${formatSI(limit, "V")}: ${spareOrShortSmall(margin)}`,
      steps: [
        { label: "GBW", value: gbw, unit: "Hz" },
        { label: "fc = GBW / noise gain", value: fc, unit: "Hz" },
        { label: "f (highest signal frequency)", value: f, unit: "Hz" },
        { label: "gain error = 1 − 1/√(1+(f/fc)²)", value: singlePoleError(f, fc), unit: "" },
        { label: "error = gain error × peak", value: error, unit: "V" },
        { label: "limit = speed_share × required_v", value: limit, unit: "V" },
        { label: "margin = limit − error", value: margin, unit: "V" },
      ],
    };
  },
});
