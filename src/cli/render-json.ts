// The JSON report of SPEC §10.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { DesignResult } from "../core/engine/result.ts";
import { designHolds } from "../core/engine/result.ts";

function partJson(p: PartResult) {
  return {
    part: p.part.id,
    verdict: p.verdict,
    ...(p.bom ? { bom: true } : {}),
    findings: p.findings.map((f) => ({
      rule: f.rule,
      verdict: f.verdict,
      needed: f.needed,
      available: f.available,
      margin: f.margin,
      unit: f.unit,
      reason: f.reason,
    })),
  };
}

export function designJson(result: DesignResult) {
  const x = result.derived;
  return {
    id: result.design.id,
    title: result.design.title,
    topology: result.topology,
    holds: designHolds(result),
    rails: { positive_v: x.rails.positive_v, negative_v: x.rails.negative_v },
    divider: x.divider ? { top_ohm: x.divider.top_ohm, bottom_ohm: x.divider.bottom_ohm, ratio: x.divider.ratio } : null,
    window_v: x.window_v,
    roles: result.roles.map((r) => ({
      role: r.role,
      kind: r.kind,
      ...(r.chosen !== undefined ? { chosen: r.chosen } : {}),
      fits: r.fits.map(partJson),
      rejected: r.rejected.map(partJson),
    })),
    notes: result.notes,
  };
}

export function renderJson(results: DesignResult[]): string {
  return `${JSON.stringify({ designs: results.map(designJson) }, null, 2)}\n`;
}
