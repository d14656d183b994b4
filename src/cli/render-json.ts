// The JSON report of SPEC §10.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { DesignResult } from "../core/engine/result.ts";
import type { Finding } from "../core/engine/types.ts";
import { designHolds } from "../core/engine/result.ts";
import { outcomeReport, simulationJson } from "./render-simulation.ts";

/** What the JSON and CSV reports say of a finding: its data and sentence, not its steps (that is `explain`). */
export function reportedFinding(f: Finding) {
  return {
    rule: f.rule,
    verdict: f.verdict,
    needed: f.needed,
    available: f.available,
    margin: f.margin,
    unit: f.unit,
    reason: f.reason,
    // Only for a role of several stages (SPEC §11.2's rectifier): which stage the finding is about.
    ...(f.stage !== undefined ? { stage: f.stage } : {}),
  };
}

function partJson(p: PartResult) {
  return {
    part: p.part.id,
    verdict: p.verdict,
    ...(p.bom ? { bom: true } : {}),
    findings: p.findings.map(reportedFinding),
  };
}

export function designJson(result: DesignResult): Record<string, unknown> {
  const x = result.derived;
  return {
    id: result.design.id,
    title: result.design.title,
    topology: result.topology,
    // The design's verdict (SPEC §11.11): roles, BOM parts and the budget together.
    verdict: result.verdict,
    // Roles and BOM parts only (every role has a fit, every BOM part fits); the budget is in `verdict`.
    holds: designHolds(result),
    rails: { positive_v: x.rails.positive_v, negative_v: x.rails.negative_v },
    divider: x.divider
      ? {
          top_ohm: x.divider.top_ohm,
          bottom_ohm: x.divider.bottom_ohm,
          source_ohm: x.divider.source_ohm,
          ratio: x.divider.ratio,
          chosen_by: x.divider.chosen_by,
        }
      : null,
    window_v: x.window_v,
    roles: result.roles.map((r) => ({
      role: r.role,
      kind: r.kind,
      ...(r.chosen !== undefined ? { chosen: r.chosen } : {}),
      fits: r.fits.map(partJson),
      rejected: r.rejected.map(partJson),
    })),
    budget: budgetJson(result),
    conversion: result.conversion,
    ...(result.simulation ? { simulation: simulationJson(outcomeReport(result.simulation)) } : {}),
    ...(result.comparison ? { comparison: comparisonJson(result) } : {}),
    notes: result.notes,
  };
}

function budgetJson(result: DesignResult) {
  const b = result.budget;
  return {
    terms: b.terms.map((t) => ({
      name: t.name,
      label: t.label,
      v: t.v,
      formula: t.formula,
      removed_by: t.removed_by,
      calibrates_out: t.calibrates_out,
      ...(t.from ? { from: t.from } : {}),
    })),
    worst_case_v: b.worst_case_v,
    rss_v: b.rss_v,
    required_v: b.required_v,
    verdict: b.verdict,
    dominant: b.dominant,
    calibrated: b.calibrated,
    calibrated_two_point: b.calibrated_two_point,
    codes_spanned_bits: b.codes_spanned_bits,
    ...(b.noise ? { noise: b.noise } : {}),
    missing: b.missing,
  };
}

function comparisonJson(result: DesignResult) {
  const c = result.comparison;
  if (!c) return undefined;
  return {
    recommended: c.recommended,
    reason: c.reason,
    rows: c.rows,
    topologies: c.results
      .filter((r) => r.topology !== result.topology)
      .map((r) => designJson({ ...r, comparison: undefined })),
  };
}

export function renderJson(results: DesignResult[]): string {
  return `${JSON.stringify({ designs: results.map(designJson) }, null, 2)}\n`;
}
