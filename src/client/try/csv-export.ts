// The shortlist and the rejections of every role as one CSV sheet, a row per
// part and role. Cells go through the shared CSV writer, which quotes them and
// neutralises anything a spreadsheet would run as a formula (= + - @ tab CR):
// part names and notes come from a team's catalogue and are not trusted.
import { csvLine } from "../../core/csv-escape.ts";
import type { PartResult } from "../../core/engine/evaluate-part.ts";
import type { DesignResult } from "../../core/engine/result.ts";

export const CSV_HEADER = [
  "design",
  "topology",
  "role",
  "list",
  "rank",
  "part",
  "name",
  "kind",
  "status",
  "cost_band",
  "verdict",
  "bom",
  "rules_not_passed",
  "reasons",
] as const;

/** Findings worth a reader's attention: every one that did not plainly pass. */
function notPassed(p: PartResult) {
  return p.findings.filter((f) => f.verdict !== "pass");
}

/**
 * The sheet's text: UTF-8 with a byte-order mark (so spreadsheets read "µ" and "−"), CRLF line ends.
 * A design compared across topologies gives every topology's rows, each named.
 */
export function shortlistCsv(result: DesignResult): string {
  const lines = [csvLine(CSV_HEADER)];
  for (const one of result.comparison?.results ?? [result]) pushRows(lines, one);
  return `\uFEFF${lines.join("\r\n")}\r\n`;
}

function pushRows(lines: string[], result: DesignResult): void {
  for (const role of result.roles) {
    for (const [list, parts] of [
      ["fit", role.fits],
      ["rejected", role.rejected],
    ] as const) {
      parts.forEach((p, index) => {
        const open = notPassed(p);
        lines.push(
          csvLine([
            result.design.id,
            result.topology,
            role.role,
            list,
            index + 1,
            p.part.id,
            p.part.name,
            p.part.kind,
            p.part.status,
            p.part.cost_band,
            p.verdict,
            p.bom ? "yes" : "no",
            open.map((f) => f.rule).join("; "),
            open.map((f) => `${f.rule}: ${f.reason}`).join(" | "),
          ]),
        );
      });
    }
  }
}

export function shortlistCsvName(result: DesignResult): string {
  return `${result.design.id}-parts.csv`;
}
