// The accuracy budget of SPEC §8 (terms, worst case, RSS, verdict), the ADC
// conversion constants and, for topology "all", the side-by-side comparison,
// for the design page (Budget.astro) and the try page alike. Kept apart from
// the role lists so budget changes in the engine touch one file.
import { CALIBRATION_WORDS } from "../core/engine/budget.ts";
import type { DesignResult } from "../core/engine/result.ts";
import { formatQuantity } from "../core/units.ts";
import { renderBudgetChart } from "./budget-chart.ts";
import { escapeHtml } from "./escape.ts";
import { renderVerdict } from "./verdict.ts";

const small = (v: number) => escapeHtml(formatQuantity(v, "V-prefixed"));
const cell = (tag: "th" | "td", text: string) => `<${tag}${tag === "th" ? ' scope="row"' : ""}>${text}</${tag}>`;

export type BudgetOptions = {
  /** Distinguishes ids when a page shows more than one budget. */
  idPrefix: string;
  /** Heading level of the section: 2 on the design page, 3 on the try page. */
  level: 2 | 3;
  /** Words after "Accuracy budget" in the heading (topology "all": which topology). */
  suffix?: string;
};

/**
 * The accuracy budget of SPEC §8, as the design page and the try page both show
 * it: every input-referred term with its share, the sums and verdicts with and
 * without a one-point gain calibration, a bar chart, and the firmware conversion.
 */
export function renderBudget(result: DesignResult, options: BudgetOptions): string {
  const b = result.budget;
  if (!b) return "";
  const { idPrefix, level } = options;
  const sub = level + 1;
  const dominant = b.terms.find((t) => t.name === b.dominant);
  const share = (v: number) => `${((100 * v) / b.worst_case_v || 0).toFixed(0)} %`;
  const rows = b.terms.map(
    (t) =>
      `<tr${t.name === b.dominant ? ' class="budget-dominant"' : ""}>${cell("th", `${escapeHtml(t.label)}${t.name === b.dominant ? '<span class="mark"> largest</span>' : ""}`)}` +
      `<td class="num">${small(t.v)}</td><td class="num">${escapeHtml(share(t.v))}</td>` +
      `<td class="formula">${escapeHtml(t.formula)}</td>${cell("td", escapeHtml(CALIBRATION_WORDS[t.removed_by]))}</tr>`,
  );
  const missing =
    b.missing.length > 0
      ? `<p class="caution">Incomplete: no part for ${escapeHtml(b.missing.join(", "))}, so its errors are unknown and the budget cannot pass.</p>`
      : "";
  const c = result.conversion;
  const conversion = c
    ? `<h${sub}>Firmware conversion</h${sub}><dl class="values">` +
      `<dt>Volts per code (at the input)</dt><dd>${escapeHtml(c.volts_per_code.toPrecision(6))} V (${small(c.volts_per_code)})</dd>` +
      `<dt>Reading</dt><dd><code>${escapeHtml(c.formula)}</code> (the + 0.5 centres each code on its step)</dd>` +
      `<dt>Sign</dt><dd>${escapeHtml(c.sign)}</dd>` +
      `<dt>ADC codes the signal spans</dt><dd>${escapeHtml(b.codes_spanned_bits.toFixed(2))} bits of ${escapeHtml(String(result.design.adc.bits))}</dd>` +
      (b.noise
        ? `<dt>Noise at the input, and ENOB (IEEE Std 1241)</dt><dd>${small(b.noise.rms_v)} rms; SINAD ${escapeHtml(b.noise.sinad_db.toFixed(2))} dB; ENOB ${escapeHtml(b.noise.enob.toFixed(2))} bits</dd>`
        : "") +
      `</dl>`
    : "";
  return (
    `<section aria-labelledby="${escapeHtml(idPrefix)}-h" class="budget">` +
    `<h${level} id="${escapeHtml(idPrefix)}-h">Accuracy budget${options.suffix ? ` — ${escapeHtml(options.suffix)}` : ""}</h${level}>` +
    `<p>Every error referred to the signal input, for the BOM parts or else the best-ranked fit of each role, against the required ${small(b.required_v)}. ` +
    `It passes when the worst case fits, is marginal when only the root-sum-square fits (JCGM 100:2008), and fails otherwise.</p>` +
    `<p class="state">${renderVerdict(b.verdict)} worst case ${small(b.worst_case_v)}, root-sum-square ${small(b.rss_v)}${dominant ? `; the largest term is ${escapeHtml(dominant.label)}` : ""}. ` +
    `After a one-point gain calibration (the gain terms removed): ${renderVerdict(b.calibrated.verdict)} worst case ${small(b.calibrated.worst_case_v)}.</p>` +
    missing +
    `<div class="table-scroll"><table class="budget-table"><caption>Error terms, input-referred</caption>` +
    `<thead><tr><th scope="col">Term</th><th scope="col" class="num">Error</th><th scope="col" class="num">Share of worst case</th><th scope="col">Formula, with this design's numbers</th><th scope="col">Removed by</th></tr></thead>` +
    `<tbody>${rows.join("")}</tbody><tfoot>` +
    `<tr>${cell("th", "Worst case (sum)")}<td class="num">${small(b.worst_case_v)}</td><td class="num">100 %</td><td></td>${cell("td", `${small(b.calibrated.worst_case_v)} after a one-point gain calibration`)}</tr>` +
    `<tr>${cell("th", "Root-sum-square")}<td class="num">${small(b.rss_v)}</td><td></td><td></td>${cell("td", `${small(b.calibrated.rss_v)} after a one-point gain calibration`)}</tr>` +
    `</tfoot></table></div><figure class="budget-figure">${renderBudgetChart(b, idPrefix)}<figcaption>Bars to scale; the line marks the requirement.</figcaption></figure>` +
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
