// Human-readable report of one evaluated design, readable at 80 columns.
import { needsCaution } from "../core/caution.ts";
import type { PartResult } from "../core/engine/evaluate-part.ts";
import { STATE_WORDS } from "../core/engine/design-verdict.ts";
import type { DesignResult, RoleResult } from "../core/engine/result.ts";
import type { Verdict } from "../core/engine/types.ts";
import { formatSI } from "../core/units.ts";
import { paint, type Io } from "./io.ts";
import { outcomeReport, simulationLine } from "./render-simulation.ts";
import { shortfalls } from "./summary.ts";
import { wrap } from "./wrap.ts";

const WIDTH = 80;
export const VERDICT_MARK: Record<Verdict, string> = { pass: "+", marginal: "~", unrated: "?", fail: "x" };

export function renderDesignText(result: DesignResult, io: Pick<Io, "color">): string {
  const c = result.comparison;
  if (!c) return renderSingle(result, io);
  return [renderComparison(result, io), ...c.results.map((r) => renderSingle(r, io))].join("\n");
}

function renderComparison(result: DesignResult, io: Pick<Io, "color">): string {
  const c = result.comparison;
  if (!c) return "";
  const out = [paint(io, "bold", wrap(`${result.design.id} — both topologies compared`, WIDTH, "  ", ""))];
  for (const row of c.rows) {
    out.push(`  ${row.topology}${row.topology === c.recommended ? "  (recommended)" : ""}`);
    out.push(
      wrap(
        `roles: ${row.roles.map((r) => `${r.role} ${r.fits} fit${r.fits === 1 ? "" : "s"}${r.chosen ? ` (${r.chosen})` : ""}`).join("; ")}`,
        WIDTH,
        "      ",
        "    ",
      ),
    );
    out.push(
      wrap(
        `budget ${row.budget_verdict} (worst case ${formatSI(row.budget_worst_case_v, "V")}, largest term ${row.dominant ?? "none"}); design ${row.state}; codes spanned ${row.codes_spanned_bits.toFixed(1)} bits; ${row.part_count} parts, cost bands ${row.cost_total}`,
        WIDTH,
        "      ",
        "    ",
      ),
    );
  }
  out.push(wrap(`recommendation: ${c.recommended}, because ${c.reason}`, WIDTH, "    ", "  "));
  return `${out.join("\n")}\n`;
}

function renderSingle(result: DesignResult, io: Pick<Io, "color">): string {
  const d = result.design;
  const out: string[] = [];
  out.push(paint(io, "bold", wrap(`${d.id} — ${d.title}`, WIDTH, "  ", "")));
  out.push(`  topology   ${result.topology}`);
  // The topology words its own derived values; the design page and the try page print the same rows.
  for (const group of result.display) {
    out.push(`  ${group.title}`);
    for (const row of group.rows) out.push(wrap(`${row.label}: ${row.value}`, WIDTH, "        ", "    "));
  }
  for (const note of result.notes) out.push(wrap(`note: ${note}`, WIDTH, "    ", "  "));
  if (needsCaution(d)) {
    out.push(
      wrap(
        "caution: voltages above extra-low-voltage limits need isolation and protection designed to local codes and licensed practice, which this guide does not assess.",
        WIDTH,
        "    ",
        "  ",
      ),
    );
  }
  out.push(...renderBudget(result));
  if (result.simulation) out.push(wrap(simulationLine(outcomeReport(result.simulation)), WIDTH, "    ", "  "));
  for (const role of result.roles) out.push("", ...renderRole(role, io));
  const problems = shortfalls(result);
  out.push("");
  if (problems.length === 0) out.push(paint(io, "pass", "  result: every role has a fit and every BOM part fits"));
  else for (const p of problems) out.push(paint(io, "fail", wrap(`result: ${p}`, WIDTH, "    ", "  ")));
  // The design's verdict (SPEC §11.11), roles, BOM and budget together, in the words of every other surface.
  const v = result.verdict;
  const why = v.reasons.filter((r) => r.kind.startsWith("budget-")).map((r) => r.text);
  const look: Verdict = v.state === "holds" ? "pass" : v.state === "marginal" ? "marginal" : "fail";
  out.push(
    paint(
      io,
      look,
      wrap(`design: ${STATE_WORDS[v.state]}${why.length > 0 ? `: ${why.join("; ")}` : ""}`, WIDTH, "    ", "  "),
    ),
  );
  return `${out.join("\n")}\n`;
}

/** The budget table's label column: label, value (9) and the largest-term mark fit 80 columns. */
const LABEL_WIDTH = 54;

/** One budget row; a long label wraps onto indented lines rather than being cut (the cut part often names the part). */
function budgetRow(label: string, v: number, mark = ""): string[] {
  const lines = wrap(label, 4 + LABEL_WIDTH, "      ", "    ").split("\n");
  const last = lines.pop() ?? "";
  return [...lines, `${last.padEnd(4 + LABEL_WIDTH)} ${formatSI(v, "V").padStart(9)}${mark}`];
}

function renderBudget(result: DesignResult): string[] {
  const b = result.budget;
  const out = ["", `  accuracy budget (input-referred; required ${formatSI(b.required_v, "V")})`];
  for (const t of b.terms) out.push(...budgetRow(t.label, t.v, t.name === b.dominant ? " <- largest" : ""));
  out.push(...budgetRow("worst case (sum)", b.worst_case_v));
  out.push(...budgetRow("root-sum-square (JCGM 100:2008)", b.rss_v));
  out.push(
    wrap(
      `verdict: ${b.verdict}; after a one-point gain calibration: ${b.calibrated.verdict} (worst case ${formatSI(b.calibrated.worst_case_v, "V")})`,
      WIDTH,
      "      ",
      "    ",
    ),
  );
  if (b.missing.length > 0) out.push(`    incomplete: no part for ${b.missing.join(", ")}, so its errors are unknown`);
  if (b.noise) {
    out.push(
      `    noise ${formatSI(b.noise.rms_v, "V")} rms at the input; SINAD ${b.noise.sinad_db.toFixed(2)} dB, ENOB ${b.noise.enob.toFixed(2)} bits (IEEE 1241)`,
    );
  }
  out.push(`    codes spanned by the signal: ${b.codes_spanned_bits.toFixed(2)} bits`);
  const c = result.conversion;
  out.push(
    "",
    "  firmware conversion",
    wrap(c.formula, WIDTH, "      ", "    "),
    wrap(c.sign, WIDTH, "      ", "    "),
  );
  return out;
}

function renderRole(role: RoleResult, io: Pick<Io, "color">): string[] {
  const lines: string[] = [
    wrap(`${paint(io, "bold", role.role)} — ${role.label}`, WIDTH + (io.color ? 8 : 0), "      ", "  "),
  ];
  lines.push(`    fits (${role.fits.length}):${role.fits.length === 0 ? " none" : ""}`);
  role.fits.forEach((p, i) => lines.push(...renderPart(p, `${i + 1}.`, io)));
  lines.push(`    rejected (${role.rejected.length}):${role.rejected.length === 0 ? " none" : ""}`);
  for (const p of role.rejected) lines.push(...renderPart(p, "-", io));
  return lines;
}

function renderPart(p: PartResult, bullet: string, io: Pick<Io, "color">): string[] {
  const marks = [
    p.part.status,
    p.part.cost_band !== undefined ? `cost ${p.part.cost_band}` : "cost ?",
    ...(p.bom ? ["BOM"] : []),
  ];
  const verdict = paint(io, p.verdict, `${VERDICT_MARK[p.verdict]} ${p.verdict}`);
  const lines = [`    ${bullet} ${verdict}  ${p.part.id}  [${marks.join(", ")}]`];
  for (const f of p.findings) {
    if (f.verdict === "pass") continue;
    lines.push(wrap(`${VERDICT_MARK[f.verdict]} ${f.rule}: ${f.reason}`, WIDTH, "          ", "        "));
  }
  return lines;
}
