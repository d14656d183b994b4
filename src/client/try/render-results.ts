// The try page's results as HTML strings: derived values, and per role the
// shortlist, the rejections with their reasons and a rail diagram. Pure (no
// DOM), so the unit tests read exactly what the page shows. Every piece of
// catalogue or design text goes through escapeHtml: names are a team's free text.
import type { PartResult } from "../../core/engine/evaluate-part.ts";
import type { DesignResult, RoleResult } from "../../core/engine/result.ts";
import type { Finding } from "../../core/engine/types.ts";
import { escapeHtml } from "../../render/escape.ts";
import { renderRailDiagram } from "../../render/rail-diagram.ts";
import { renderVerdict } from "../../render/verdict.ts";
import { partUrl } from "../../site/links.ts";
import { summarizeDesign } from "../../site/design-summary.ts";
import { derivedGroups } from "../../site/design-view.ts";
import { ROLE_NAMES } from "../../site/roles.ts";
import { renderBudget, renderComparison } from "./render-budget.ts";

/** Rows shown before a "show all" button: keeps each keystroke's DOM work bounded on a large catalogue. */
export const FIRST_ROWS = 8;

/** Which long lists the visitor opened, by key "<role>:fits" / "<role>:rejected". */
export type ViewState = { expanded: ReadonlySet<string> };

const KIND_WORD = { "op-amp": "op amp", comparator: "comparator", diode: "diode" } as const;

/** The derived values grouped and worded as on the design pages. */
export function renderDerived(result: DesignResult): string {
  const groups = derivedGroups(result).map(
    (g) =>
      `<div class="try-derived-group"><h4>${escapeHtml(g.title)}</h4><dl>${g.rows.map((r) => `<div><dt>${escapeHtml(r.label)}</dt><dd>${escapeHtml(r.value)}</dd></div>`).join("")}</dl></div>`,
  );
  return `<div class="try-derived">${groups.join("")}</div>`;
}

/** The finding closest to failing: the first not-pass one, else the smallest relative margin. */
function tightest(p: PartResult): Finding | undefined {
  let best: Finding | undefined;
  let bestRel = Infinity;
  for (const f of p.findings) {
    if (f.verdict !== "pass") return f;
    if (f.margin === null || f.limit === undefined || !(f.limit > 0)) continue;
    const rel = f.margin / f.limit;
    if (rel < bestRel) {
      bestRel = rel;
      best = f;
    }
  }
  return best;
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

function fitRow(p: PartResult, rank: number, role: RoleResult): string {
  const f = tightest(p);
  const what = f ? `<ul class="try-reasons">${reason(f)}</ul>` : "";
  return `<tr data-part="${escapeHtml(p.part.id)}" data-verdict="${p.verdict}"><td>${rank}</td>${partCell(p, role)}<td>${renderVerdict(p.verdict)}</td><td>${what}</td></tr>`;
}

function rejectedRow(p: PartResult, role: RoleResult): string {
  const open = p.findings.filter((f) => f.verdict === "fail" || f.verdict === "unrated");
  return `<tr data-part="${escapeHtml(p.part.id)}" data-verdict="${p.verdict}">${partCell(p, role)}<td>${renderVerdict(p.verdict)}</td><td><ul class="try-reasons">${open.map(reason).join("")}</ul></td></tr>`;
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

function listTable(caption: string, head: (keyof typeof COLUMNS)[], rows: string[]): string {
  const cols = head.map((h) => `<th scope="col" class="try-col-${h}">${escapeHtml(COLUMNS[h])}</th>`).join("");
  return `<table class="try-parts"><caption>${escapeHtml(caption)}</caption><thead><tr>${cols}</tr></thead><tbody>${rows.join("")}</tbody></table>`;
}

function diagram(role: RoleResult, result: DesignResult): string {
  if (role.stage.stage === "diode" || role.chosen === undefined) return "";
  const pick = [...role.fits, ...role.rejected].find((p) => p.part.id === role.chosen);
  if (!pick || pick.part.kind === "diode") return "";
  const svg = renderRailDiagram({
    part: pick.part,
    stage: role.stage,
    rails: result.derived.rails,
    findings: pick.findings,
    id: `try-rd-${role.role}`,
  });
  return `<figure class="try-diagram">${svg}<figcaption>${escapeHtml(`${pick.part.id} as the ${ROLE_NAMES[role.role].toLowerCase()}`)}</figcaption></figure>`;
}

export function renderRole(role: RoleResult, result: DesignResult, view: ViewState): string {
  const name = ROLE_NAMES[role.role];
  const id = `try-role-${role.role}`;
  const fitsKey = `${role.role}:fits`;
  const rejectedKey = `${role.role}:rejected`;
  const allFits = view.expanded.has(fitsKey);
  const allRejected = view.expanded.has(rejectedKey);
  const fits = allFits ? role.fits : role.fits.slice(0, FIRST_ROWS);
  const rejected = allRejected ? role.rejected : role.rejected.slice(0, FIRST_ROWS);
  const total = role.fits.length + role.rejected.length;
  const kinds = role.kinds.map((k) => KIND_WORD[k]).join(" or ");
  const chosen =
    role.chosen === undefined
      ? "No part chosen: nothing fits."
      : role.bom !== undefined
        ? `BOM part: ${role.bom}.`
        : `Best fit: ${role.chosen}.`;

  const out = [
    `<section class="try-role" id="${id}" aria-labelledby="${id}-h">`,
    `<h3 id="${id}-h">${escapeHtml(name)} <span class="try-kind">${escapeHtml(kinds)}</span></h3>`,
    `<p class="try-role-label">${escapeHtml(role.label)}</p>`,
    `<p class="try-role-count"><strong>${role.fits.length}</strong> of ${total} fit. ${escapeHtml(chosen)}</p>`,
    diagram(role, result),
  ];
  if (role.fits.length > 0) {
    out.push(
      listTable(
        `${name}: shortlist, best first`,
        ["rank", "part", "verdict", "closest"],
        fits.map((p, i) => fitRow(p, i + 1, role)),
      ),
    );
    out.push(moreButton(fitsKey, fits.length, role.fits.length, allFits, "fits"));
  }
  if (role.rejected.length > 0) {
    out.push(
      listTable(
        `${name}: rejected, with reasons`,
        ["part", "verdict", "why"],
        rejected.map((p) => rejectedRow(p, role)),
      ),
    );
    out.push(moreButton(rejectedKey, rejected.length, role.rejected.length, allRejected, "rejected parts"));
  }
  out.push(`</section>`);
  return out.join("");
}

/** One sentence on whether the design holds (SPEC §10's exit-0 condition), worded as on the design pages. */
export function holdsLine(result: DesignResult): { holds: boolean; line: string } {
  const summary = summarizeDesign({
    id: result.design.id,
    file: "",
    design: result.design,
    evaluation: { ok: true, result },
  });
  return { holds: summary.ok && summary.holds, line: summary.line };
}

/** One independently updated piece of the results: a role, the budget, the derived values … */
export type ResultBlock = { key: string; html: string };

/** Everything below the form for one evaluation, block by block, in page order. */
export function renderBlocks(result: DesignResult, view: ViewState): ResultBlock[] {
  const notes =
    result.notes.length > 0
      ? `<ul class="try-notes">${result.notes.map((n) => `<li>${escapeHtml(n)}</li>`).join("")}</ul>`
      : "";
  return [
    {
      key: "derived",
      html: `<section class="try-block" aria-labelledby="try-derived-h"><h3 id="try-derived-h">Derived values</h3>${renderDerived(result)}</section>`,
    },
    { key: "comparison", html: renderComparison(result) },
    { key: "budget", html: renderBudget(result) },
    { key: "notes", html: notes },
    ...result.roles.map((role) => ({ key: `role-${role.role}`, html: renderRole(role, result, view) })),
  ];
}

export function renderResults(result: DesignResult, view: ViewState): string {
  return renderBlocks(result, view)
    .map((b) => b.html)
    .join("");
}
