// The try page's results as a tree of HTML strings (pieces.ts): derived values,
// and per role the shortlist, the rejections with their reasons and a rail
// diagram. Pure (no DOM), so the unit tests read exactly what the page shows.
// Every piece of catalogue or design text goes through escapeHtml: names are a
// team's free text.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { DesignResult, RoleResult } from "../core/engine/result.ts";
import type { Finding } from "../core/engine/types.ts";
import { isRailedKind, kindWords } from "../core/kinds.ts";
import { escapeHtml } from "./escape.ts";
import { renderRailDiagram } from "./rail-diagram.ts";
import { renderVerdict } from "./verdict.ts";
import { closestFinding } from "./deciding.ts";
import { partUrl } from "./links.ts";
import { STATE_WORDS, type DesignState } from "../core/engine/design-verdict.ts";
import { summarizeDesign } from "./design-summary.ts";
import { derivedGroups } from "./design-view.ts";
import { roleName } from "./roles.ts";
import { pieceHtml, type Container, type Piece } from "./pieces.ts";
import { renderBudget, renderComparison } from "./render-budget.ts";

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

function partCell(p: PartResult, role: RoleResult): string {
  const bom = p.bom ? ` <span class="try-badge">BOM</span>` : "";
  const chosen = !p.bom && role.chosen === p.part.id ? ` <span class="try-badge">chosen</span>` : "";
  return `<th scope="row"><a href="${escapeHtml(partUrl(p.part.id))}">${escapeHtml(p.part.id)}</a>${bom}${chosen}<span class="try-part-name">${escapeHtml(p.part.name)}</span></th>`;
}

// The row already says pass, marginal, not rated or fail; each reason names its rule and the numbers.
function reason(f: Finding): string {
  return `<li><span class="try-rule">${escapeHtml(f.rule)}</span>: ${escapeHtml(f.reason)}</li>`;
}

/** A part's row, one piece per cell: an edit usually changes a reason's numbers and leaves the rest. */
function row(p: PartResult, cells: Piece[]): Container {
  return {
    key: p.part.id,
    open: `<tr data-part="${escapeHtml(p.part.id)}" data-verdict="${p.verdict}">`,
    close: "</tr>",
    children: cells,
  };
}

function fitRow(p: PartResult, rank: number, role: RoleResult): Container {
  const f = closestFinding(p);
  const what = f ? `<ul class="try-reasons">${reason(f)}</ul>` : "";
  return row(p, [
    { key: "rank", html: `<td>${rank}</td>` },
    { key: "part", html: partCell(p, role) },
    { key: "verdict", html: `<td>${renderVerdict(p.verdict)}</td>` },
    { key: "why", html: `<td>${what}</td>` },
  ]);
}

function rejectedRow(p: PartResult, role: RoleResult): Container {
  const open = p.findings.filter((f) => f.verdict === "fail" || f.verdict === "unrated");
  return row(p, [
    { key: "part", html: partCell(p, role) },
    { key: "verdict", html: `<td>${renderVerdict(p.verdict)}</td>` },
    { key: "why", html: `<td><ul class="try-reasons">${open.map(reason).join("")}</ul></td>` },
  ]);
}

function moreButton(key: string, shown: number, total: number, expanded: boolean, what: string): string {
  if (total <= FIRST_ROWS) return "";
  const text = expanded
    ? `Show the first ${FIRST_ROWS} ${what} only`
    : `Show all ${total} ${what} (${total - shown} more)`;
  return `<button type="button" class="try-more" data-toggle="${escapeHtml(key)}" aria-expanded="${expanded}">${escapeHtml(text)}</button>`;
}

/** Column heads with a class each, so the fixed table layout can size them. */
const COLUMNS = { rank: "#", part: "Part", verdict: "Verdict", closest: "Closest to its limit", why: "Why" } as const;

// Rows are keyed by part id, so a part that keeps its row keeps its element whatever its rank.
function listTable(id: string, caption: string, head: (keyof typeof COLUMNS)[], rows: Container[]): Container {
  const cols = head.map((h) => `<th scope="col" class="try-col-${h}">${escapeHtml(COLUMNS[h])}</th>`).join("");
  return {
    key: id,
    open: `<table class="try-parts" id="${id}">`,
    close: "</table>",
    children: [
      { key: "caption", html: `<caption>${escapeHtml(caption)}</caption>` },
      { key: "head", html: `<thead><tr>${cols}</tr></thead>` },
      { key: "body", open: "<tbody>", close: "</tbody>", children: rows },
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
  const fitsKey = `${role.role}:fits`;
  const rejectedKey = `${role.role}:rejected`;
  const allFits = view.expanded.has(fitsKey);
  const allRejected = view.expanded.has(rejectedKey);
  const fits = allFits ? role.fits : role.fits.slice(0, FIRST_ROWS);
  const rejected = allRejected ? role.rejected : role.rejected.slice(0, FIRST_ROWS);
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
  if (role.fits.length > 0) {
    children.push(
      listTable(
        `${id}-fits`,
        `${name}: shortlist, best first`,
        ["rank", "part", "verdict", "closest"],
        fits.map((p, i) => fitRow(p, i + 1, role)),
      ),
    );
    const more = moreButton(fitsKey, fits.length, role.fits.length, allFits, "fits");
    if (more !== "") children.push({ key: fitsKey, html: more });
  }
  if (role.rejected.length > 0) {
    children.push(
      listTable(
        `${id}-rejected`,
        `${name}: rejected, with reasons`,
        ["part", "verdict", "why"],
        rejected.map((p) => rejectedRow(p, role)),
      ),
    );
    const more = moreButton(rejectedKey, rejected.length, role.rejected.length, allRejected, "rejected parts");
    if (more !== "") children.push({ key: rejectedKey, html: more });
  }
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
  const state = summary.ok ? summary.state : "fails";
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
    { key: "budget", html: renderBudget(result) },
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
