// The long lists of a design page's role, one table row per part: the fits
// below the ones shown in full, and every rejection with each reason that
// rejects it. A row links to the part's own page, where the same part in the
// same role has every finding, the arithmetic and its rail diagram; the rows
// stay a few hundred bytes so a 2,000-part catalogue gives a page a browser
// opens without effort.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { RoleResult } from "../core/engine/result.ts";
import { closestFinding } from "./deciding.ts";
import { placeAnchor, resultAnchor, type SiteLinks } from "./links.ts";
import { escapeHtml } from "./escape.ts";
import { renderRejectionReasons } from "./findings.ts";
import { renderVerdict } from "./verdict.ts";

export type ListLinks = Pick<SiteLinks, "partUrl">;

export type RoleListInput = {
  designId: string;
  role: RoleResult;
  links: ListLinks;
  /** Parts shown in full elsewhere on the page: their rows carry no id, so ids stay unique. */
  inFull: ReadonlySet<string>;
};

/** Marks a reader needs beside a part's name: BOM, used by the design, a kind standing in for another. */
export function partMarks(result: PartResult, role: RoleResult): string {
  const marks: string[] = [];
  if (result.bom) marks.push(`<span class="mark mark-bom">in the BOM</span>`);
  else if (role.chosen === result.part.id) marks.push(`<span class="mark mark-chosen">used by the design</span>`);
  if (result.part.kind !== role.kind)
    marks.push(`<span class="mark">${escapeHtml(result.part.kind)} standing in</span>`);
  return marks.length === 0 ? "" : ` ${marks.join(" ")}`;
}

function partHeader(result: PartResult, { designId, role, links }: RoleListInput): string {
  const { part } = result;
  const href = `${links.partUrl(part.id)}#${placeAnchor(designId, role.role)}`;
  return `<th scope="row"><a href="${escapeHtml(href)}">${escapeHtml(part.name)}</a> <code>${escapeHtml(part.id)}</code>${partMarks(result, role)}</th>`;
}

function rowId(result: PartResult, input: RoleListInput): string {
  return input.inFull.has(result.part.id) ? "" : ` id="${escapeHtml(resultAnchor(input.role.role, result.part.id))}"`;
}

function standing(result: PartResult): string {
  const { part } = result;
  return escapeHtml(
    `${part.status}, ${part.cost_band === undefined ? "cost not given" : `cost ${part.cost_band} of 5`}`,
  );
}

/** Fits ranked `from` (1-based) to the last, each with the finding closest to its limit. */
export function renderFitsTable(input: RoleListInput, from: number, caption: string): string {
  const rows = input.role.fits.slice(from - 1).map((r, i) => {
    const f = closestFinding(r);
    const closest = f ? `${escapeHtml(f.rule)}: ${escapeHtml(f.reason)}` : "";
    return `<tr${rowId(r, input)}><td class="num">${from + i}</td>${partHeader(r, input)}<td class="verdict-cell">${renderVerdict(r.verdict)}</td><td>${standing(r)}</td><td>${closest}</td></tr>`;
  });
  return (
    `<div class="table-scroll"><table class="fits-summary"><caption>${escapeHtml(caption)}</caption>` +
    `<thead><tr><th scope="col" class="num">Rank</th><th scope="col">Part</th><th scope="col">Verdict</th><th scope="col">Status, cost</th><th scope="col">Closest to its limit</th></tr></thead>` +
    `<tbody>${rows.join("")}</tbody></table></div>`
  );
}

/** Every rejected part with each failing or unrated finding, in the role's order. */
export function renderRejectedTable(input: RoleListInput, caption: string): string {
  const rows = input.role.rejected.map(
    (r) =>
      `<tr${rowId(r, input)}>${partHeader(r, input)}<td class="verdict-cell">${renderVerdict(r.verdict)}</td><td>${renderRejectionReasons(r.findings)}</td></tr>`,
  );
  return (
    // The heading above says the same for sighted readers; the caption names the table for screen readers.
    `<div class="table-scroll"><table class="rejected-summary"><caption class="visually-hidden">${escapeHtml(caption)}</caption>` +
    `<thead><tr><th scope="col">Part</th><th scope="col">Verdict</th><th scope="col">Why it does not fit</th></tr></thead>` +
    `<tbody>${rows.join("")}</tbody></table></div>`
  );
}
