// A part page's full entries: for each design, each role that weighed the part,
// with every finding, the arithmetic and, for an amplifier, its rail diagram.
// This is where a rejection's whole case lives; the design page lists the part
// in a row that links here.
import type { Part } from "../core/catalogue.ts";
import { placeAnchor, resultAnchor, type SiteLinks } from "../site/links.ts";
import type { PartPlace } from "../site/part-uses.ts";
import { ROLE_NAMES } from "../site/roles.ts";
import { escapeHtml } from "./escape.ts";
import { renderArithmetic, renderFindingsTable } from "./findings.ts";
import { renderRailDiagram } from "./rail-diagram.ts";
import { partMarks } from "./role-lists.ts";
import { renderVerdict } from "./verdict.ts";

export type PlaceLinks = Pick<SiteLinks, "designUrl" | "rulesUrl">;

export type DesignPlacesInput = {
  part: Part;
  design: { id: string; title: string; topology: string };
  places: readonly PartPlace[];
  links: PlaceLinks;
};

function renderPlace(place: PartPlace, { part, design, links }: DesignPlacesInput): string {
  const { role, result, rank } = place;
  const anchor = placeAnchor(design.id, role.role);
  const roleName = ROLE_NAMES[role.role];
  const standing = rank === undefined ? "rejected" : `fit, rank ${rank} of ${role.fits.length}`;
  // Under topology "all" a design weighs the part in both front ends; say which one this is.
  const topology = design.topology === "all" ? ` <span class="mark">${escapeHtml(place.topology)}</span>` : "";
  const onPage = links.designUrl(design.id, resultAnchor(role.role, part.id));
  const diagram =
    part.kind !== "diode" && role.stage.stage !== "diode"
      ? `<div class="diagram">${renderRailDiagram({ part, stage: role.stage, rails: place.rails, findings: result.findings, id: `rd-${anchor}`, legend: false })}</div>`
      : "";
  const label = `Findings for ${part.name} as ${roleName.toLowerCase()} in ${design.title}`;
  return (
    `<li class="result result-${result.verdict}" id="${escapeHtml(anchor)}">` +
    `<div class="result-head"><h4>${escapeHtml(roleName)}</h4>${renderVerdict(result.verdict)} <span>${escapeHtml(standing)}</span>${partMarks(result, role)}${topology}` +
    ` <a href="${escapeHtml(onPage)}">on the design page</a></div>` +
    diagram +
    renderFindingsTable(result.findings, label, links.rulesUrl) +
    renderArithmetic(result.findings, { failing: rank === undefined }) +
    `</li>`
  );
}

/** One design's section: a heading linking to the design page, then an entry per role. */
export function renderDesignPlaces(input: DesignPlacesInput): string {
  const { design, links } = input;
  const heading = `in-${design.id}-h`;
  return (
    `<section class="in-design" aria-labelledby="${escapeHtml(heading)}">` +
    `<h3 id="${escapeHtml(heading)}"><a href="${escapeHtml(links.designUrl(design.id))}">${escapeHtml(design.title)}</a> <code>${escapeHtml(design.id)}</code></h3>` +
    `<ul class="results">${input.places.map((p) => renderPlace(p, input)).join("")}</ul>` +
    `</section>`
  );
}
