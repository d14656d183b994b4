// A part page's full entries: for each design, each role that weighed the part.
// A fit shows every finding, all the arithmetic and, for an amplifier, the rail
// diagram. A rejection shows the rules that reject it (and any marginal one) with
// their arithmetic, names the rules it passes, and draws the diagram when its
// input or output range is among what falls short. This is where a rejection's
// whole case lives; the design page lists the part in a row that links here. A
// part page holds one entry per role per design (30-odd for an op amp), so a
// rejection is written as what decides it rather than every passing sentence.
import type { Part } from "../core/catalogue.ts";
import { isRailedKind } from "../core/kinds.ts";
import { placeAnchor, resultAnchor, type SiteLinks } from "./links.ts";
import type { PartPlace } from "./part-uses.ts";
import { roleName } from "./roles.ts";
import { escapeHtml } from "./escape.ts";
import { renderArithmetic, renderFindingsTable, renderPassedRules } from "./findings.ts";
import { DRAWN_RULES, renderRailDiagram } from "./rail-diagram.ts";
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
  const name = roleName(role.role);
  const standing = rank === undefined ? "rejected" : `fit, rank ${rank} of ${role.fits.length}`;
  // Under topology "all" a design weighs the part in both front ends; say which one this is.
  const topology = design.topology === "all" ? ` <span class="mark">${escapeHtml(place.topology)}</span>` : "";
  const onPage = links.designUrl(design.id, resultAnchor(role.role, part.id));
  const fit = rank !== undefined;
  const { findings } = result;
  const amplifier = isRailedKind(part.kind) && role.stage.stage !== "diode";
  const drawn = amplifier && (fit || findings.some((f) => f.verdict !== "pass" && DRAWN_RULES.includes(f.rule)));
  const diagram = drawn
    ? `<div class="diagram">${renderRailDiagram({ part, stage: role.stage, rails: place.rails, findings, id: `rd-${anchor}`, legend: false })}</div>`
    : "";
  const shown = fit ? findings : findings.filter((f) => f.verdict !== "pass");
  const label = `${fit ? "Findings" : "Rules not passed"} for ${part.name} as ${name.toLowerCase()} in ${design.title}`;
  return (
    `<li class="result result-${result.verdict}" id="${escapeHtml(anchor)}">` +
    `<div class="result-head"><h4>${escapeHtml(name)}</h4>${renderVerdict(result.verdict)} <span>${escapeHtml(standing)}</span>${partMarks(result, role)}${topology}` +
    ` <a href="${escapeHtml(onPage)}">on the design page</a></div>` +
    diagram +
    renderFindingsTable(shown, label, links.rulesUrl) +
    (fit ? "" : renderPassedRules(findings)) +
    renderArithmetic(findings, { failing: !fit }) +
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
