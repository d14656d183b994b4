// `diff --format markdown`: a review comment for a change to the data. One
// table per design that changes, a row per thing that moved (design state,
// budget, best part, BOM part, each part whose verdict changed) with the
// reasons before and after; the regressions that fail the run come first.
import { formatSI } from "../../core/units.ts";
import { findingLabel } from "../finding-label.ts";
import { mdCode, mdLink, mdTable, mdText } from "../formats/markdown.ts";
import type { GuideLinks } from "../guide-links.ts";
import type { DesignDiff, DiffReport, PartChange, RoleDiff, RuleChange, RuleSide } from "./compare.ts";
import { CHANGE_WORDS, count, presenceLine, stateWords, termWords } from "./words.ts";

const HEADERS = ["Role", "Part", "Change", "Before", "After"] as const;

export function renderDiffMarkdown(report: DiffReport, links?: GuideLinks): string {
  const out = [
    "# railsieve diff",
    "",
    `${mdCode(report.before)} → ${mdCode(report.after)}: ${count(report.changed.length, "design changes", "designs change")}, ${count(report.unchanged.length, "design unchanged", "designs unchanged")}.`,
  ];
  if (report.regressions.length > 0) {
    out.push("", `**${count(report.regressions.length, "regression", "regressions")}:**`, "");
    for (const r of report.regressions) out.push(`- ${mdText(r)}`);
  } else out.push("", "No design stops holding and no BOM part stops fitting.");
  for (const d of report.changed) out.push("", renderDesign(d, links));
  if (report.unchanged.length > 0) out.push("", `Unchanged: ${report.unchanged.map(mdCode).join(", ")}.`);
  return `${out.join("\n")}\n`;
}

function renderDesign(d: DesignDiff, links: GuideLinks | undefined): string {
  const title = `${d.id}: ${stateWords(d)}`;
  const heading = links && d.presence !== "removed" ? mdLink(title, links.design(d.id)) : mdText(title);
  const out = [`## ${heading}`, "", mdText(d.title)];
  const presence = presenceLine(d);
  if (presence) out.push("", mdText(presence));
  const rows: string[][] = [];
  const { before, after } = d.state;
  if (before?.state !== after?.state) {
    const side = (s: typeof before) =>
      s ? `${s.state}${s.reasons.length > 0 ? `: ${s.reasons.join("; ")}` : ""}` : "absent";
    rows.push(["design", "", "state changed", mdText(side(before)), mdText(side(after))]);
  }
  if (d.budget) {
    const b = d.budget;
    const side = (s: typeof b.before) =>
      `worst case ${formatSI(s.worst_case_v, "V")}, root-sum-square ${formatSI(s.rss_v, "V")} against ${formatSI(s.required_v, "V")}: ${s.verdict}`;
    const terms = b.terms.map(termWords);
    rows.push([
      "budget",
      "",
      "worst case moved",
      mdText(side(b.before)),
      mdText(`${side(b.after)}${terms.length > 0 ? `; ${terms.join("; ")}` : ""}`),
    ]);
  }
  for (const r of d.roles) rows.push(...roleRows(d.id, r, links));
  out.push("", mdTable(HEADERS, rows));
  return out.join("\n");
}

function roleRows(design: string, r: RoleDiff, links: GuideLinks | undefined): string[][] {
  const role = links && r.presence !== "removed" ? mdLink(r.role, links.design(design, r.role)) : mdCode(r.role);
  const part = (id: string | null) => (id === null ? "none" : links ? mdLink(id, links.part(id)) : mdCode(id));
  const rows: string[][] = [];
  if (r.presence !== "both") rows.push([role, "", `role ${r.presence}`, `${r.fits.before} fit`, `${r.fits.after} fit`]);
  if (r.best) rows.push([role, "", "best part changed", part(r.best.before), part(r.best.after)]);
  if (r.bom) {
    const fit = (f: boolean | null) => (f === null ? "" : f ? " fits" : " does not fit");
    rows.push([
      role,
      part(r.bom.after ?? r.bom.before),
      r.bom.stopsFitting ? "**BOM part stops fitting**" : "BOM part changed",
      `${part(r.bom.before)}${fit(r.bom.fitsBefore)}`,
      `${part(r.bom.after)}${fit(r.bom.fitsAfter)}`,
    ]);
  }
  for (const p of r.parts) rows.push(partRow(role, p, part));
  return rows;
}

function partRow(role: string, p: PartChange, part: (id: string) => string): string[] {
  const side = (verdict: string | null, pick: (c: RuleChange) => RuleSide | null) => {
    if (verdict === null) return "not a candidate";
    const reasons = p.rules.flatMap((c) => {
      const s = pick(c);
      return s ? [`${findingLabel(c)} ${s.verdict}: ${s.reason}`] : [];
    });
    return mdText(`${verdict}${reasons.length > 0 ? `: ${reasons.join("; ")}` : ""}`);
  };
  return [
    role,
    `${part(p.part)}${p.bom ? " (BOM)" : ""}`,
    CHANGE_WORDS[p.change],
    side(p.before, (c) => c.before),
    side(p.after, (c) => c.after),
  ];
}
