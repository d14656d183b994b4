import { defineRule, record, shareVerdict, spareOrShort, stageAs } from "../src/core/rule-kit/index.ts";
import { formatQuantity, formatSI } from "../src/core/units.ts";

export const zeroCrossing = defineRule({
  id: "zero-crossing",
  unit: "s",
  checks: "At each zero crossing the rectifier's output jumps through two diode drops fast enough.",
  formula: "jump time = 2·Vf / slew; limit = timing_fraction / f",
  source: "Precision-rectifier dead time from slew through the diode drops (common practice).",
  policy: "timing_fraction",
  kinds: ["op-amp"],
  needs: { "op-amp": ["slew_v_per_us"] },
  measure({ stage, design, policy }, part, out) {
    const jump = stageAs(stage, "op-amp", "zero-crossing").zero_crossing_v ?? 0;
    const time = jump / (part.slew_v_per_us * 1e6);
    const limit = policy.timing_fraction / design.signal.max_frequency_hz;
    const margin = limit - time;
    record(out, shareVerdict(margin, limit, policy), limit, time, margin, limit);
  },
  describe({ available: time, margin, needed: limit }, { stage, design, policy }, part) {
    const jump = stageAs(stage, "op-amp", "zero-crossing").zero_crossing_v ?? 0;
    const slew = part.slew_v_per_us * 1e6;
    const f = design.signal.max_frequency_hz;
    return {
      reason: `jumps ${formatSI(jump, "V")} (two diode drops) at ${formatQuantity(slew, "V/s")} in ${formatSI(time, "s")}; the limit is ${formatSI(limit, "s")} (${policy.timing_fraction * 100} % of the ${formatSI(1 / f, "s")} period): ${spareOrShort(margin, "s")}`,
      steps: [
        { label: "jump = 2·Vf", value: jump, unit: "V" },
        { label: "slew rate", value: slew, unit: "V/s" },
        { label: "jump time = jump / slew", value: time, unit: "s" },
        { label: "limit = timing_fraction / f", value: limit, unit: "s" },
        { label: "margin = limit − jump time", value: margin, unit: "s" },
      ],
    };
  },
});
