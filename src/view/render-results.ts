// The try page's results as a tree of HTML strings (pieces.ts): derived values,
// and per role the shortlist, the rejections with their reasons and a rail
// diagram. Pure (no DOM), so the unit tests read exactly what the page shows.
// Every piece of catalogue or design text goes through escapeHtml: names are a
// team's free text.
import type { DesignResult, RoleResult } from "../core/engine/result.ts";
import { isRailedKind, kindWords } from "../core/kinds.ts";
import { escapeHtml } from "./escape.ts";
import { renderRailDiagram } from "./rail-diagram.ts";
import { partUrl, rulesUrl } from "./links.ts";
import { fitsPiece, rejectionsPiece, type RoleListInput } from "./role-lists.ts";
import { STATE_WORDS, type DesignState } from "../core/engine/design-verdict.ts";
import { summarizeDesign } from "./design-summary.ts";
import { derivedGroups } from "./design-view.ts";
import { roleName } from "./roles.ts";
import { pieceHtml, type Container, type Piece } from "./pieces.ts";
import { renderBudget, renderComparison } from "./render-budget.ts";

/** Rejections the try page groups by rule at every keystroke; a longer list is grouped when opened (role-lists.ts). */
export const GROUP_LIMIT = 300;

/** Rows shown before a "show all" button: keeps each keystroke's DOM work bounded on a large catalogue. */
export const FIRST_ROWS = 8;

/** Which long lists the visitor opened, by key "<role>:fits" / "<role>:rejected". */
export type ViewState = { expanded: ReadonlySet<string> };

/** The derived values grouped and worded as on the design pages, one piece per value. */
export function derivedPiece(result: DesignResult): Container {
  const groups: Piece[] = derivedGroups(result).map((g) => ({
    key: g.title,
    open: `<div class="try-derived-group">`,
    close: "</div>",
    children: [
      { key: "h", html: `<h4>${escapeHtml(g.title)}</h4>` },
      {
        key: "values",
        open: "<dl>",
        close: "</dl>",
        children: g.rows.map((r) => ({
          key: r.label,
          html: `<div><dt>${escapeHtml(r.label)}</dt><dd>${escapeHtml(r.value)}</dd></div>`,
        })),
      },
    ],
  }));
  return {
    key: "derived",
    open: `<section class="try-block" aria-labelledby="try-derived-h">`,
    close: "</section>",
    children: [
      { key: "h", html: `<h3 id="try-derived-h">Derived values</h3>` },
      { key: "groups", open: `<div class="try-derived">`, close: "</div>", children: groups },
    ],
  };
}

function diagram(role: RoleResult, result: DesignResult): string {
  if (role.stage.stage === "diode" || role.chosen === undefined) return "";
  const pick = role.resultOf(role.chosen);
  if (!pick || !isRailedKind(pick.part.kind)) return "";
  const svg = renderRailDiagram({
    part: pick.part,
    stage: role.stage,
    rails: result.derived.rails,
    findings: pick.findings,
    id: `try-rd-${role.role}`,
  });
  return `<figure class="try-diagram">${svg}<figcaption>${escapeHtml(`${pick.part.id} as the ${roleName(role.role).toLowerCase()}`)}</figcaption></figure>`;
}

/** One role: its heading and counts, the chosen op amp's rail diagram, the shortlist and the rejections. */
export function rolePiece(role: RoleResult, result: DesignResult, view: ViewState): Container {
  const name = roleName(role.role);
  const id = `try-role-${role.role}`;
  const total = role.fits.length + role.rejected.length;
  const kinds = role.kinds.map((k) => kindWords(k).one).join(" or ");
  const chosen =
    role.chosen === undefined
      ? "No part chosen: nothing fits."
      : role.bom !== undefined
        ? `BOM part: ${role.bom}.`
        : `Best fit: ${role.chosen}.`;

  const children: Piece[] = [
    { key: "h", html: `<h3 id="${id}-h">${escapeHtml(name)} <span class="try-kind">${escapeHtml(kinds)}</span></h3>` },
    { key: "label", html: `<p class="try-role-label">${escapeHtml(role.label)}</p>` },
    {
      key: "count",
      html: `<p class="try-role-count"><strong>${role.fits.length}</strong> of ${total} fit. ${escapeHtml(chosen)}</p>`,
    },
  ];
  const figure = diagram(role, result);
  if (figure !== "") children.push({ key: "diagram", html: figure });
  const lists: RoleListInput = {
    designId: result.design.id,
    role,
    links: { partUrl, rulesUrl },
    dataAttributes: true,
    groupLimit: GROUP_LIMIT,
    first: FIRST_ROWS,
    expanded: view.expanded,
  };
  if (role.fits.length > 0) children.push(fitsPiece(lists, 1, `${name}: shortlist, best first`, `${id}-fits`));
  if (role.rejected.length > 0) children.push(rejectionsPiece(lists));
  return {
    key: `role-${role.role}`,
    open: `<section class="try-role" id="${id}" aria-labelledby="${id}-h">`,
    close: "</section>",
    children,
  };
}

export function renderRole(role: RoleResult, result: DesignResult, view: ViewState): string {
  return pieceHtml(rolePiece(role, result, view));
}

/** One sentence on whether the design holds (SPEC §10's exit-0 condition), worded as on the design pages. */
export function holdsLine(result: DesignResult): { holds: boolean; state: DesignState; line: string } {
  const summary = summarizeDesign({
    id: result.design.id,
    file: "",
    design: result.design,
    evaluation: { ok: true, result },
  });
  // The try page's status says the design's state in the words of every other surface (SPEC §11.11).
  const state = summary.verdict;
  return { holds: state === "holds", state, line: `Design ${STATE_WORDS[state]}. ${summary.line}` };
}

/** Everything below the form for one evaluation, in page order; blocks with nothing to say are left out. */
export function resultPieces(result: DesignResult, view: ViewState): Piece[] {
  const notes =
    result.notes.length > 0
      ? `<ul class="try-notes">${result.notes.map((n) => `<li>${escapeHtml(n)}</li>`).join("")}</ul>`
      : "";
  const blocks = [
    { key: "comparison", html: renderComparison(result) },
    { key: "budget", html: renderBudget(result, { idPrefix: "try-budget", level: 3 }) },
    { key: "notes", html: notes },
  ];
  return [
    derivedPiece(result),
    ...blocks.filter((b) => b.html !== ""),
    ...result.roles.map((role) => rolePiece(role, result, view)),
  ];
}

export function renderResults(result: DesignResult, view: ViewState): string {
  return resultPieces(result, view).map(pieceHtml).join("");
}
