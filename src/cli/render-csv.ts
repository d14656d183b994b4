// CSV report: one row per design, role, part and rule.
import { csvLine } from "../core/csv-escape.ts";
import type { DesignResult } from "../core/engine/result.ts";

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
];

export function renderCsv(results: DesignResult[]): string {
  const lines = [csvLine(HEADER)];
  for (const r of results) {
    for (const role of r.roles) {
      for (const [fits, list] of [
        ["yes", role.fits],
        ["no", role.rejected],
      ] as const) {
        for (const p of list) {
          for (const f of p.findings) {
            lines.push(
              csvLine([
                r.design.id,
                r.topology,
                role.role,
                p.part.id,
                p.verdict,
                fits,
                p.bom ? "yes" : "no",
                f.rule,
                f.verdict,
                f.needed,
                f.available,
                f.margin,
                f.unit,
                f.reason,
              ]),
            );
          }
        }
      }
    }
    // Budget rows: the term's error in `available`, the requirement in `needed`.
    const b = r.budget;
    for (const t of b.terms) {
      lines.push(
        csvLine([
          r.design.id,
          r.topology,
          "budget",
          "",
          b.verdict,
          "",
          "",
          t.name,
          "",
          b.required_v,
          t.v,
          null,
          "V",
          t.label,
        ]),
      );
    }
    lines.push(
      csvLine([
        r.design.id,
        r.topology,
        "budget",
        "",
        b.verdict,
        "",
        "",
        "worst-case",
        b.verdict,
        b.required_v,
        b.worst_case_v,
        b.required_v - b.worst_case_v,
        "V",
        "sum of the terms' magnitudes",
      ]),
    );
    lines.push(
      csvLine([
        r.design.id,
        r.topology,
        "budget",
        "",
        b.verdict,
        "",
        "",
        "rss",
        b.verdict,
        b.required_v,
        b.rss_v,
        b.required_v - b.rss_v,
        "V",
        "root-sum-square of the terms (JCGM 100:2008)",
      ]),
    );
  }
  return `${lines.join("\r\n")}\r\n`;
}
