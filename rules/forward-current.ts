import { defineRule, record, shareVerdict, spareOrShort, stageAs } from "../src/core/rule-kit/index.ts";
import { formatSI } from "../src/core/units.ts";

// Each pump diode conducts for at most half of every cycle yet must pass the
// whole load charge, so its current while on averages twice the load.
export const forwardCurrent = defineRule({
  id: "forward-current",
  unit: "A",
  checks: "The diode carries the current of its position within its rating.",
  formula: "pump diode: needed = 2 · load_a (the load charge passes in half of each cycle); margin = if_max − needed",
  source: "Charge-balance of the diode charge pump (common practice).",
  policy: "marginal_fraction",
  kinds: ["diode"],
  needs: { diode: ["if_max_ma"] },
  measure({ stage, policy }, part, out) {
    const needed = stageAs(stage, "diode", "forward-current").forward_a;
    if (needed === undefined) throw new Error("forward-current needs a diode stage with a current");
    const rated = part.if_max_ma * 1e-3;
    const margin = rated - needed;
    record(out, shareVerdict(margin, needed, policy), needed, rated, margin, needed);
  },
  describe({ needed, available: rated, margin }) {
    return {
      reason: `carries ${formatSI(needed, "A")} while conducting (twice the load); rated ${formatSI(rated, "A")}: ${spareOrShort(margin, "A")}`,
      steps: [
        { label: "needed = 2 × load_a", value: needed, unit: "A" },
        { label: "if_max", value: rated, unit: "A" },
        { label: "margin = if_max − needed", value: margin, unit: "A" },
      ],
    };
  },
});
