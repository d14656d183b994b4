// The accuracy budget as a horizontal bar chart: inline SVG as a string, pure,
// so the design pages (build time) and the try page (browser) draw the same.
// No style attributes (the site's CSP allows no inline styles): classes only.
import type { Budget } from "../core/engine/budget.ts";
import { formatSI } from "../core/units.ts";
import { escapeHtml } from "./escape.ts";

const WIDTH = 640;
const LABEL_W = 250;
// Room right of the longest bar for its value and the "◆ largest" mark
// ("999 mV ◆ largest", 16 characters at about 7 px each in the 12 px font).
const VALUE_W = 130;
const ROW_H = 22;

export function renderBudgetChart(budget: Budget, idPrefix = "budget"): string {
  const rows = [...budget.terms].sort((a, b) => b.v - a.v);
  const scaleMax = Math.max(budget.required_v, budget.worst_case_v, ...rows.map((t) => t.v)) || 1;
  const barW = WIDTH - LABEL_W - VALUE_W;
  const x = (v: number) => LABEL_W + (Math.max(0, v) / scaleMax) * barW;
  const height = (rows.length + 3) * ROW_H + 10;
  const titleId = `${idPrefix}-chart-title`;
  const descId = `${idPrefix}-chart-desc`;
  const parts: string[] = [
    `<svg class="budget-chart" viewBox="0 0 ${WIDTH} ${height}" width="100%" role="img" aria-labelledby="${titleId} ${descId}" xmlns="http://www.w3.org/2000/svg">`,
    `<title id="${titleId}">Accuracy budget, input-referred</title>`,
    `<desc id="${descId}">${escapeHtml(
      `Each error term as a bar; the worst-case sum is ${formatSI(budget.worst_case_v, "V")}, the root-sum-square ${formatSI(budget.rss_v, "V")}, against a requirement of ${formatSI(budget.required_v, "V")}.`,
    )}</desc>`,
  ];
  rows.forEach((t, i) => {
    const y = i * ROW_H + 4;
    const dominant = t.name === budget.dominant;
    parts.push(
      `<text class="budget-label" x="${LABEL_W - 8}" y="${y + 15}" text-anchor="end">${escapeHtml(truncate(t.label, 36))}</text>`,
      `<rect class="budget-bar${dominant ? " budget-bar-dominant" : ""}${t.calibrates_out ? " budget-bar-calibrated" : ""}" x="${LABEL_W}" y="${y + 3}" width="${(x(t.v) - LABEL_W).toFixed(1)}" height="${ROW_H - 8}"/>`,
      `<text class="budget-value" x="${(x(t.v) + 6).toFixed(1)}" y="${y + 15}">${escapeHtml(formatSI(t.v, "V"))}${dominant ? " ◆ largest" : ""}</text>`,
    );
  });
  const yTotals = rows.length * ROW_H + 8;
  for (const [i, [label, v, cls]] of (
    [
      ["worst case (sum)", budget.worst_case_v, "budget-bar-total"],
      ["root-sum-square", budget.rss_v, "budget-bar-rss"],
    ] as const
  ).entries()) {
    const y = yTotals + i * ROW_H;
    parts.push(
      `<text class="budget-label budget-total-label" x="${LABEL_W - 8}" y="${y + 15}" text-anchor="end">${label}</text>`,
      `<rect class="budget-bar ${cls}" x="${LABEL_W}" y="${y + 3}" width="${(x(v) - LABEL_W).toFixed(1)}" height="${ROW_H - 8}"/>`,
      `<text class="budget-value" x="${(x(v) + 6).toFixed(1)}" y="${y + 15}">${escapeHtml(formatSI(v, "V"))}</text>`,
    );
  }
  const req = x(budget.required_v);
  parts.push(
    `<line class="budget-required" x1="${req.toFixed(1)}" x2="${req.toFixed(1)}" y1="0" y2="${height - 14}"/>`,
    `<text class="budget-required-label" x="${req.toFixed(1)}" y="${height - 2}" text-anchor="middle">required ${escapeHtml(formatSI(budget.required_v, "V"))}</text>`,
    "</svg>",
  );
  return parts.join("");
}

function truncate(text: string, max: number): string {
  return text.length > max ? `${text.slice(0, max - 1)}…` : text;
}
