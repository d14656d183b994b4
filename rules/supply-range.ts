import { defineRule, record, spareOrShort, voltageVerdict } from "../src/core/rule-kit/index.ts";
import { formatVolts } from "../src/core/units.ts";

export const supplyRange = defineRule({
  id: "supply-range",
  unit: "V",
  checks: "The total supply V+ − V− lies inside the part's rated supply range.",
  formula: "Vs = V+ − V−; margin = min(Vs − supply_min_v, supply_max_v − Vs)",
  source: "Datasheet absolute and recommended operating limits (common practice).",
  policy: "headroom_margin_v",
  kinds: ["op-amp", "comparator"],
  needs: { "op-amp": ["supply_min_v", "supply_max_v"], comparator: ["supply_min_v", "supply_max_v"] },
  measure({ rails, policy }, part, out) {
    const p = part;
    const vs = rails.positive_v - rails.negative_v;
    const aboveMin = vs - p.supply_min_v;
    const belowMax = p.supply_max_v - vs;
    const margin = Math.min(aboveMin, belowMax);
    const binding = aboveMin <= belowMax ? p.supply_min_v : p.supply_max_v;
    record(out, voltageVerdict(margin, policy), vs, binding, margin, vs);
  },
  describe({ needed: vs, margin }, { rails }, part) {
    const p = part;
    return {
      reason: `needs a supply of ${formatVolts(vs)} (V+ ${formatVolts(rails.positive_v)}, V− ${formatVolts(rails.negative_v)}); rated ${formatVolts(p.supply_min_v)} to ${formatVolts(p.supply_max_v)}: ${spareOrShort(margin, "V")}`,
      steps: [
        { label: "Vs = V+ − V−", value: vs, unit: "V" },
        { label: "Vs − supply_min_v", value: vs - p.supply_min_v, unit: "V" },
        { label: "supply_max_v − Vs", value: p.supply_max_v - vs, unit: "V" },
        { label: "margin = the smaller", value: margin, unit: "V" },
      ],
    };
  },
});
