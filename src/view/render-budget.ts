// The accuracy budget of SPEC §8 (terms, worst case, RSS, verdict), the ADC
// conversion constant and, for topology "all", the side-by-side comparison.
// Kept apart from the role tables so budget changes in the engine touch one file.
import { CALIBRATION_WORDS } from "../core/engine/budget.ts";
import type { DesignResult } from "../core/engine/result.ts";
import { formatQuantity } from "../core/units.ts";
import { renderBudgetChart } from "./budget-chart.ts";
import { escapeHtml } from "./escape.ts";
import { renderVerdict } from "./verdict.ts";

const small = (v: number) => escapeHtml(formatQuantity(v, "V-prefixed"));
const cell = (tag: "th" | "td", text: string) => `<${tag}${tag === "th" ? ' scope="row"' : ""}>${text}</${tag}>`;

export function renderBudget(result: DesignResult): string {
  const b = result.budget;
  if (!b) return "";
  const rows = b.terms.map(
    (t) =>
      `<tr>${cell("th", escapeHtml(t.label))}${cell("td", small(t.v))}${cell("td", escapeHtml(CALIBRATION_WORDS[t.removed_by]))}</tr>`,
  );
  const dominant =
    b.dominant === null
      ? ""
      : ` Largest term: ${escapeHtml(b.terms.find((t) => t.name === b.dominant)?.label ?? b.dominant)}.`;
  const missing =
    b.missing.length > 0
      ? ` No part to take terms from for: ${escapeHtml(b.missing.join(", "))}, so the budget cannot pass.`
      : "";
  const conversion = result.conversion
    ? `<p>One ADC code is ${small(result.conversion.volts_per_code)} at the input; reading: <code>${escapeHtml(result.conversion.formula)}</code>. ${escapeHtml(result.conversion.sign)}</p>`
    : "";
  return (
    `<section class="try-block" aria-labelledby="try-budget-h"><h3 id="try-budget-h">Accuracy budget</h3>` +
    `<p>Budget: ${renderVerdict(b.verdict)} against ${small(b.required_v)} required; the signal spans ${escapeHtml(b.codes_spanned_bits.toFixed(1))} bits of ADC codes${b.noise ? `; ENOB ${escapeHtml(b.noise.enob.toFixed(2))} (IEEE 1241)` : ""}.${dominant}${missing}</p>` +
    `<table class="try-parts try-budget"><caption>Input-referred error terms</caption>` +
    `<thead><tr><th scope="col">Term</th><th scope="col">Error</th><th scope="col">Removed by</th></tr></thead>` +
    `<tbody>${rows.join("")}</tbody><tfoot>` +
    `<tr>${cell("th", "Worst case (sum)")}${cell("td", small(b.worst_case_v))}${cell("td", `${small(b.calibrated.worst_case_v)} after calibration`)}</tr>` +
    `<tr>${cell("th", "Root-sum-square")}${cell("td", small(b.rss_v))}${cell("td", `${small(b.calibrated.rss_v)} after calibration`)}</tr>` +
    `</tfoot></table><figure class="budget-figure">${renderBudgetChart(b, "try-budget")}<figcaption>Bars to scale; the line marks the requirement.</figcaption></figure>` +
    `${conversion}</section>`
  );
}

/** Topology "all": how the two front ends compare, and which one the results below show. */
export function renderComparison(result: DesignResult): string {
  const c = result.comparison;
  if (!c) return "";
  const rows = c.rows.map(
    (r) =>
      `<tr>${cell("th", escapeHtml(r.topology))}${cell("td", r.holds ? "yes" : "no")}${cell("td", renderVerdict(r.budget_verdict))}${cell("td", small(r.budget_worst_case_v))}` +
      `${cell("td", escapeHtml(r.codes_spanned_bits.toFixed(1)))}${cell("td", String(r.part_count))}</tr>`,
  );
  return (
    `<section class="try-block" aria-labelledby="try-compare-h"><h3 id="try-compare-h">Topologies compared</h3>` +
    `<table class="try-parts"><caption>Both front ends for this design</caption><thead><tr><th scope="col">Topology</th><th scope="col">Every role fits</th>` +
    `<th scope="col">Budget</th><th scope="col">Worst case</th><th scope="col">Codes spanned, bits</th><th scope="col">Parts</th></tr></thead><tbody>${rows.join("")}</tbody></table>` +
    `<p>Recommended: <strong>${escapeHtml(c.recommended)}</strong>. ${escapeHtml(c.reason)} The roles below are for ${escapeHtml(result.topology)}.</p></section>`
  );
}
