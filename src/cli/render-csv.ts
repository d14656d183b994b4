// CSV report: one row per design, role, part and rule, then the budget terms.
import { csvLine } from "../core/csv-escape.ts";
import { CALIBRATION_WORDS } from "../core/engine/budget.ts";
import type { DesignResult } from "../core/engine/result.ts";
import { reportedFinding } from "./render-json.ts";

const HEADER = [
  "design",
  "topology",
  "role",
  "part",
  "part_verdict",
  "fits",
  "bom",
  "rule",
  "verdict",
  "needed",
  "available",
  "margin",
  "unit",
  "reason",
] as const;

type Row = Partial<Record<(typeof HEADER)[number], string | number | null>>;

const line = (row: Row) => csvLine(HEADER.map((column) => row[column] ?? null));

export function renderCsv(results: DesignResult[]): string {
  const lines = [csvLine(HEADER)];
  for (const r of results) {
    const design = { design: r.design.id, topology: r.topology };
    for (const role of r.roles) {
      for (const [fits, list] of [
        ["yes", role.fits],
        ["no", role.rejected],
      ] as const) {
        for (const p of list) {
          for (const f of p.findings) {
            lines.push(
              line({
                ...design,
                role: role.role,
                part: p.part.id,
                part_verdict: p.verdict,
                fits,
                bom: p.bom ? "yes" : "no",
                ...reportedFinding(f),
              }),
            );
          }
        }
      }
    }
    // The design's verdict (SPEC §11.11), one row per reason (one row with no reason when it holds).
    const verdict = { ...design, role: "design", rule: "verdict", verdict: r.verdict.state };
    if (r.verdict.reasons.length === 0) lines.push(line({ ...verdict, reason: "holds" }));
    for (const reason of r.verdict.reasons) lines.push(line({ ...verdict, part: reason.kind, reason: reason.text }));
    // Budget rows: the term's error in `available`, the requirement in `needed`; the reason carries its
    // formula and the least calibration that removes it.
    const b = r.budget;
    const budget = { ...design, role: "budget", part_verdict: b.verdict, needed: b.required_v, unit: "V" };
    for (const t of b.terms) {
      const reason = `${t.label}: ${t.formula}; removed by ${CALIBRATION_WORDS[t.removed_by]}`;
      lines.push(line({ ...budget, rule: t.name, available: t.v, reason }));
    }
    const totals = [
      ["worst-case", b.worst_case_v, "sum of the terms' magnitudes"],
      ["rss", b.rss_v, "root-sum-square of the terms (JCGM 100:2008)"],
    ] as const;
    for (const [rule, v, reason] of totals) {
      lines.push(line({ ...budget, rule, verdict: b.verdict, available: v, margin: b.required_v - v, reason }));
    }
  }
  return `${lines.join("\r\n")}\r\n`;
}
