import type { Rule } from "../src/core/engine/types.ts";
import { finding } from "../src/core/engine/finding.ts";
import { shareVerdict, spareOrShort } from "../src/core/engine/verdict.ts";
import { formatSI } from "../src/core/units.ts";
import type { Diode } from "../src/core/schemas/diode.ts";

// Each pump diode conducts for at most half of every cycle yet must pass the
// whole load charge, so its current while on averages twice the load.
export const forwardCurrent: Rule = {
  id: "forward-current",
  unit: "A",
  checks: "The diode carries the current of its position within its rating.",
  formula: "pump diode: needed = 2 · load_a (the load charge passes in half of each cycle); margin = if_max − needed",
  source: "Charge-balance of the diode charge pump (common practice).",
  policy: "marginal_fraction",
  kinds: ["diode"],
  needs: { diode: ["if_max_ma"] },
  evaluate({ part, stage, policy }) {
    const d = part as Diode;
    if (stage.stage !== "diode" || stage.forward_a === undefined)
      throw new Error("forward-current needs a diode stage with a current");
    const needed = stage.forward_a;
    const rated = d.if_max_ma * 1e-3;
    const margin = rated - needed;
    return finding("forward-current", {
      verdict: shareVerdict(margin, needed, policy),
      needed,
      available: rated,
      margin,
      unit: "A",
      limit: needed,
      reason: () =>
        `carries ${formatSI(needed, "A")} while conducting (twice the load); rated ${formatSI(rated, "A")}: ${spareOrShort(margin, "A")}`,
      steps: () => [
        { label: "needed = 2 × load_a", value: needed, unit: "A" },
        { label: "if_max", value: rated, unit: "A" },
        { label: "margin = if_max − needed", value: margin, unit: "A" },
      ],
    });
  },
};
