// `check --format markdown`: a job summary or review comment. One table per
// design, a row per role: the part it uses, its verdict, how many parts fit and
// the finding that decides; then the budget and why the design does not hold.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { DesignResult, RoleResult } from "../core/engine/result.ts";
import type { Finding } from "../core/engine/types.ts";
import { formatSI } from "../core/units.ts";
import { closestFinding, decidingFinding } from "../view/deciding.ts";
import { designState, type DesignState } from "./design-state.ts";
import { mdCode, mdLink, mdTable, mdText } from "./formats/markdown.ts";
import type { GuideLinks } from "./guide-links.ts";

const STATE_WORDS: Readonly<Record<DesignState, string>> = { holds: "holds", marginal: "marginal", fails: "fails" };

export function renderCheckMarkdown(results: readonly DesignResult[], links?: GuideLinks): string {
  const states = results.map((r) => designState(r).state);
  const tally = (["holds", "marginal", "fails"] as const)
    .map((s) => [s, states.filter((x) => x === s).length] as const)
    .filter(([, n]) => n > 0)
    .map(
      ([s, n]) =>
        `${n} ${s === "holds" ? (n === 1 ? "holds" : "hold") : s === "fails" ? (n === 1 ? "fails" : "fail") : "marginal"}`,
    );
  const out = [
    "# railsieve check",
    "",
    `${results.length} design${results.length === 1 ? "" : "s"}: ${tally.join(", ") || "none"}.`,
  ];
  for (const r of results) out.push("", renderDesign(r, links));
  return `${out.join("\n")}\n`;
}

function partCell(id: string, links: GuideLinks | undefined): string {
  return links ? mdLink(id, links.part(id)) : mdCode(id);
}

function findingCell(label: string, f: Finding | undefined): string {
  if (!f) return "";
  const stage = f.stage === undefined ? "" : ` in ${mdText(f.stage)}`;
  return `${label === "" ? "" : `${mdText(label)} `}${mdCode(f.rule)}${stage} (${f.verdict}): ${mdText(f.reason)}`;
}

/** The row of one role: the part the design uses, else the closest candidate. */
function roleRow(designId: string, role: RoleResult, links: GuideLinks | undefined): string[] {
  const total = role.fitCount + role.rejected.length;
  const fits = `${role.fitCount} of ${total}`;
  const name = links ? mdLink(role.role, links.design(designId, role.role)) : mdCode(role.role);
  const used: PartResult | undefined = role.chosen === undefined ? undefined : role.resultOf(role.chosen);
  if (used) {
    const bom = role.bom !== undefined ? " (BOM)" : "";
    const fitsNow = used.verdict === "pass" || used.verdict === "marginal";
    const finding = fitsNow ? closestFinding(used) : decidingFinding(used);
    const label = fitsNow && used.verdict === "pass" ? "closest:" : "";
    return [name, `${partCell(used.part.id, links)}${bom}`, used.verdict, fits, findingCell(label, finding)];
  }
  if (role.optional && role.bom === undefined)
    return [name, "none", "optional", fits, mdText("no part fits; the role may be left out")];
  const closest = role.rejected[0];
  if (!closest) return [name, "none", "no fit", fits, mdText("the catalogue has no candidate of this kind")];
  return [
    name,
    "none",
    "no fit",
    fits,
    findingCell(`closest ${closest.part.id} is ${closest.verdict} on`, decidingFinding(closest)),
  ];
}

function renderDesign(r: DesignResult, links: GuideLinks | undefined): string {
  const { state, reasons } = designState(r);
  const title = `${r.design.id}: ${STATE_WORDS[state]}`;
  const heading = links ? `## ${mdLink(title, links.design(r.design.id))}` : `## ${mdText(title)}`;
  const out = [heading, "", `${mdText(r.design.title)} (topology ${mdCode(r.topology)})`, ""];
  out.push(
    mdTable(
      ["Role", "Part", "Verdict", "Fits", "Deciding finding"],
      r.roles.map((role) => roleRow(r.design.id, role, links)),
    ),
  );
  const b = r.budget;
  out.push(
    "",
    mdText(
      `Accuracy budget: worst case ${formatSI(b.worst_case_v, "V")}, root-sum-square ${formatSI(b.rss_v, "V")}, required ${formatSI(b.required_v, "V")}: ${b.verdict}${b.dominant ? ` (largest term: ${b.terms.find((t) => t.name === b.dominant)?.label ?? b.dominant})` : ""}.`,
    ),
  );
  if (reasons.length > 0) {
    out.push("", `Why it ${state === "fails" ? "fails" : "is marginal"}:`, "");
    for (const reason of reasons) out.push(`- ${mdText(reason)}`);
  }
  return out.join("\n");
}
