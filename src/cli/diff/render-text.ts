// The diff as text at 80 columns: per design what moved, then why `diff` fails.
import { formatSI } from "../../core/units.ts";
import { findingLabel } from "../finding-label.ts";
import { paint, type Io } from "../io.ts";
import { VERDICT_MARK } from "../render-text.ts";
import { wrap } from "../wrap.ts";
import type { BudgetChange, DesignDiff, DiffReport, PartChange, RoleDiff, RuleChange } from "./compare.ts";
import { CHANGE_WORDS, count, presenceLine, stateWords, termWords } from "./words.ts";

const WIDTH = 80;

export function renderDiffText(report: DiffReport, io: Pick<Io, "color">): string {
  const out: string[] = [paint(io, "bold", `railsieve diff: ${report.before} → ${report.after}`)];
  out.push(
    `  ${count(report.changed.length, "design changes", "designs change")}, ${count(report.unchanged.length, "design unchanged", "designs unchanged")}`,
  );
  for (const d of report.changed) out.push("", ...renderDesign(d, io));
  out.push("");
  if (report.regressions.length === 0)
    out.push(paint(io, "pass", "  result: no design stops holding and no BOM part stops fitting"));
  else for (const r of report.regressions) out.push(paint(io, "fail", wrap(`regression: ${r}`, WIDTH, "    ", "  ")));
  return `${out.join("\n")}\n`;
}

function renderDesign(d: DesignDiff, io: Pick<Io, "color">): string[] {
  const out = [paint(io, "bold", wrap(`${d.id} — ${d.title}`, WIDTH, "  ", ""))];
  const presence = presenceLine(d);
  if (presence) out.push(`  ${presence}`);
  const { before, after } = d.state;
  if (before?.state !== after?.state) {
    out.push(`  design: ${stateWords(d)}`);
    if (before) for (const r of before.reasons) out.push(wrap(`before: ${r}`, WIDTH, "      ", "    "));
    if (after) for (const r of after.reasons) out.push(wrap(`after: ${r}`, WIDTH, "      ", "    "));
  }
  if (d.budget) out.push(...renderBudget(d.budget));
  for (const role of d.roles) out.push(...renderRole(role, io));
  return out;
}

function renderBudget(b: BudgetChange): string[] {
  const v = (x: number) => formatSI(x, "V");
  const out = [
    wrap(
      `budget: worst case ${v(b.before.worst_case_v)} → ${v(b.after.worst_case_v)}, root-sum-square ${v(b.before.rss_v)} → ${v(b.after.rss_v)}, required ${v(b.after.required_v)}; ${b.before.verdict} → ${b.after.verdict}`,
      WIDTH,
      "    ",
      "  ",
    ),
  ];
  for (const t of b.terms) out.push(wrap(termWords(t), WIDTH, "      ", "    "));
  return out;
}

function renderRole(r: RoleDiff, io: Pick<Io, "color">): string[] {
  const out = [`  ${paint(io, "bold", r.role)} — ${r.label}${r.presence === "both" ? "" : ` (role ${r.presence})`}`];
  out.push(`    fits: ${r.fits.before} → ${r.fits.after}`);
  if (r.best) out.push(`    best part: ${r.best.before ?? "none"} → ${r.best.after ?? "none"}`);
  if (r.bom) {
    const fit = (f: boolean | null) => (f === null ? "not named" : f ? "fits" : "does not fit");
    const same = r.bom.before === r.bom.after;
    out.push(
      wrap(
        same
          ? `BOM part ${r.bom.after}: ${fit(r.bom.fitsBefore)} → ${fit(r.bom.fitsAfter)}`
          : `BOM part ${r.bom.before ?? "none"} (${fit(r.bom.fitsBefore)}) → ${r.bom.after ?? "none"} (${fit(r.bom.fitsAfter)})`,
        WIDTH,
        "      ",
        "    ",
      ),
    );
  }
  for (const p of r.parts) out.push(...renderPart(p, io));
  return out;
}

function renderPart(p: PartChange, io: Pick<Io, "color">): string[] {
  const side = (v: string | null) => v ?? "not a candidate";
  const mark = paint(io, p.after ?? "fail", p.after ? VERDICT_MARK[p.after] : "-");
  const out = [
    `    ${mark} ${p.part}${p.bom ? " (BOM)" : ""}: ${side(p.before)} → ${side(p.after)}, ${CHANGE_WORDS[p.change]}`,
  ];
  for (const r of p.rules) out.push(...renderRule(r));
  return out;
}

function renderRule(r: RuleChange): string[] {
  const out = [
    `        ${findingLabel(r)}: ${r.before?.verdict ?? "not checked"} → ${r.after?.verdict ?? "not checked"}`,
  ];
  if (r.before) out.push(wrap(`before: ${r.before.reason}`, WIDTH, "                  ", "          "));
  if (r.after) out.push(wrap(`after:  ${r.after.reason}`, WIDTH, "                  ", "          "));
  return out;
}
