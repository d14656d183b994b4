// Topology "all": both front ends side by side and a one-line recommendation.
import type { Catalogue } from "../catalogue-index.ts";
import { formatSI } from "../units.ts";
import { designHolds, type Comparison, type ComparisonRow, type DesignResult } from "./result.ts";

const VERDICT_RANK = { pass: 0, marginal: 1, fail: 2 } as const;

export function compare(results: DesignResult[], catalogue: Catalogue): Comparison {
  const rows: ComparisonRow[] = results.map((r) => {
    let count = 0;
    let cost = 0;
    for (const role of r.roles) {
      if (role.chosen === undefined) continue;
      const n = role.count ?? 1;
      count += n;
      cost += n * (catalogue.byId.get(role.chosen)?.cost_band ?? 3);
    }
    return {
      topology: r.topology,
      holds: designHolds(r),
      state: r.verdict.state,
      roles: r.roles.map((role) => ({
        role: role.role,
        fits: role.fitCount,
        ...(role.chosen !== undefined ? { chosen: role.chosen } : {}),
      })),
      codes_spanned_bits: r.budget.codes_spanned_bits,
      budget_verdict: r.budget.verdict,
      budget_worst_case_v: r.budget.worst_case_v,
      dominant: r.budget.dominant,
      part_count: count,
      cost_total: cost,
    };
  });
  const ranked = [...rows].sort(
    (a, b) =>
      Number(b.holds) - Number(a.holds) ||
      VERDICT_RANK[a.budget_verdict] - VERDICT_RANK[b.budget_verdict] ||
      a.cost_total - b.cost_total ||
      b.codes_spanned_bits - a.codes_spanned_bits,
  );
  const best = ranked[0];
  const other = ranked[1];
  if (!best) throw new Error("nothing to compare");
  return { rows, recommended: best.topology, reason: reasonFor(best, other), results };
}

function reasonFor(best: ComparisonRow, other: ComparisonRow | undefined): string {
  if (!other) return "it is the only topology evaluated";
  if (best.holds !== other.holds) return `every role has a fit, while ${other.topology} leaves a role without one`;
  if (best.budget_verdict !== other.budget_verdict) {
    return `its budget ${best.budget_verdict === "pass" ? "passes" : "is marginal"} (worst case ${formatSI(best.budget_worst_case_v, "V")}), while ${other.topology}'s ${other.budget_verdict === "fail" ? "fails" : "is only marginal"}, decided by its ${other.dominant ?? "largest"} term (worst case ${formatSI(other.budget_worst_case_v, "V")})`;
  }
  if (best.cost_total !== other.cost_total) {
    return `both budgets ${best.budget_verdict === "pass" ? "pass" : best.budget_verdict === "marginal" ? "are marginal" : "fail"}, and it costs less (cost bands ${best.cost_total} against ${other.cost_total}, ${best.part_count} parts against ${other.part_count})`;
  }
  return `as good on budget and cost, and its signal spans ${best.codes_spanned_bits.toFixed(1)} bits of codes against ${other.codes_spanned_bits.toFixed(1)}`;
}
