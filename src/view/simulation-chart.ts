// One simulated period as a picture: the input and the firmware's reading on
// top, the error below with the static budget's worst case and the required
// accuracy as bands. Inline SVG as a string, pure (build time and browser),
// classes only (the CSP allows no inline style). The viewBox is as narrow as a
// phone's column, so its 12-unit text never renders under 11 px there; a table
// of the same numbers follows as the text alternative.
import { formatSI } from "../core/units.ts";
import { escapeHtml } from "./escape.ts";

export type SimulationPicture = {
  /** Distinguishes ids when a page holds several pictures. */
  id: string;
  /** "at 200 Hz (the highest frequency)". */
  caption: string;
  time: ArrayLike<number>;
  input: ArrayLike<number>;
  reading: ArrayLike<number>;
  error: ArrayLike<number>;
  max_error_v: number;
  max_error_at_s: number;
  rms_error_v: number;
  /** The static budget's worst case, V (null when there is none to compare). */
  worst_case_v: number | null;
  required_v: number;
};

const W = 340;
const LEFT = 58;
const RIGHT = 8;
const PANEL_H = 110;
const GAP = 30;
const TOP = 8;
const TABLE_ROWS = 16;

export function renderSimulationFigure(p: SimulationPicture): string {
  const titleId = escapeHtml(`${p.id}-title`);
  const descId = escapeHtml(`${p.id}-desc`);
  const n = p.time.length;
  const t0 = n > 0 ? (p.time[0] ?? 0) : 0;
  const t1 = n > 0 ? (p.time[n - 1] ?? 1) : 1;
  const span = t1 > t0 ? t1 - t0 : 1;
  const x = (t: number) => LEFT + ((t - t0) / span) * (W - LEFT - RIGHT);

  let vMax = 0;
  for (let i = 0; i < n; i++) vMax = Math.max(vMax, Math.abs(p.input[i] ?? 0), Math.abs(p.reading[i] ?? 0));
  vMax = vMax || 1;
  const top = TOP;
  const yv = (v: number) => top + PANEL_H / 2 - (v / vMax) * (PANEL_H / 2 - 2);

  const bound = Math.max(p.max_error_v, p.required_v, p.worst_case_v ?? 0) * 1.1 || 1;
  const top2 = TOP + PANEL_H + GAP;
  const ye = (v: number) => top2 + PANEL_H / 2 - (Math.max(-bound, Math.min(bound, v)) / bound) * (PANEL_H / 2 - 2);
  const height = top2 + PANEL_H + 28;

  const over = p.worst_case_v !== null && p.max_error_v > p.worst_case_v;
  const desc =
    `One period ${p.caption}: the reading follows the input; its error peaks at ${formatSI(p.max_error_v, "V")} ` +
    `(rms ${formatSI(p.rms_error_v, "V")}) at ${formatSI(p.max_error_at_s, "s")}` +
    (p.worst_case_v === null
      ? "."
      : over
        ? `, beyond the static worst case of ${formatSI(p.worst_case_v, "V")}.`
        : `, inside the static worst case of ${formatSI(p.worst_case_v, "V")}.`);

  const parts: string[] = [
    `<svg class="sim-chart" viewBox="0 0 ${W} ${height}" width="100%" role="img" aria-labelledby="${titleId} ${descId}" xmlns="http://www.w3.org/2000/svg">`,
    `<title id="${titleId}">${escapeHtml(`Simulated input, reading and error ${p.caption}`)}</title>`,
    `<desc id="${descId}">${escapeHtml(desc)}</desc>`,
    // Panel 1: input and reading.
    `<line class="sim-axis" x1="${LEFT}" x2="${W - RIGHT}" y1="${yv(0).toFixed(1)}" y2="${yv(0).toFixed(1)}"/>`,
    `<text class="sim-tick" x="${LEFT - 4}" y="${(yv(vMax) + 10).toFixed(1)}" text-anchor="end">${escapeHtml(formatSI(vMax, "V", { digits: 2 }))}</text>`,
    `<text class="sim-tick" x="${LEFT - 4}" y="${yv(-vMax).toFixed(1)}" text-anchor="end">${escapeHtml(formatSI(-vMax, "V", { digits: 2 }))}</text>`,
    `<polyline class="sim-input" points="${trace(p.time, p.input, n, x, yv)}"/>`,
    `<polyline class="sim-reading" points="${trace(p.time, p.reading, n, x, yv)}"/>`,
    `<text class="sim-key sim-key-input" x="${LEFT + 4}" y="${top + 12}">input</text>`,
    `<text class="sim-key sim-key-reading" x="${LEFT + 48}" y="${top + 12}">reading</text>`,
    // Panel 2: error with bands.
    `<text class="sim-key" x="${LEFT + 4}" y="${top2 - 6}">error (reading − input)</text>`,
    band("sim-required", p.required_v, "required", ye, bound, "start"),
    p.worst_case_v === null ? "" : band("sim-worst", p.worst_case_v, "worst case", ye, bound, "end"),
    `<line class="sim-axis" x1="${LEFT}" x2="${W - RIGHT}" y1="${ye(0).toFixed(1)}" y2="${ye(0).toFixed(1)}"/>`,
    `<text class="sim-tick" x="${LEFT - 4}" y="${(ye(bound) + 10).toFixed(1)}" text-anchor="end">${escapeHtml(formatSI(bound, "V", { digits: 2 }))}</text>`,
    `<text class="sim-tick" x="${LEFT - 4}" y="${ye(-bound).toFixed(1)}" text-anchor="end">${escapeHtml(formatSI(-bound, "V", { digits: 2 }))}</text>`,
    `<polyline class="sim-error${over ? " sim-error-over" : ""}" points="${trace(p.time, p.error, n, x, ye)}"/>`,
    `<text class="sim-tick" x="${LEFT}" y="${height - 6}">0</text>`,
    `<text class="sim-tick" x="${W - RIGHT}" y="${height - 6}" text-anchor="end">${escapeHtml(formatSI(span, "s", { digits: 3 }))}</text>`,
    "</svg>",
  ];
  return [
    `<figure class="sim-figure" id="${escapeHtml(p.id)}">`,
    parts.join(""),
    `<figcaption>${escapeHtml(desc)}</figcaption>`,
    table(p),
    "</figure>",
  ].join("");
}

/** A ± band with its label above the upper line, at the left or the right end (two bands never share an end). */
function band(
  cls: string,
  v: number,
  label: string,
  y: (v: number) => number,
  bound: number,
  end: "start" | "end",
): string {
  if (!(v > 0) || v > bound) return "";
  const a = y(v).toFixed(1);
  const b = y(-v).toFixed(1);
  const x = end === "start" ? LEFT + 2 : W - RIGHT;
  return (
    `<line class="${cls}" x1="${LEFT}" x2="${W - RIGHT}" y1="${a}" y2="${a}"/>` +
    `<line class="${cls}" x1="${LEFT}" x2="${W - RIGHT}" y1="${b}" y2="${b}"/>` +
    `<text class="sim-band-label ${cls}-label" x="${x}" y="${(Number(a) - 3).toFixed(1)}" text-anchor="${end}">${escapeHtml(`${label} ±${formatSI(v, "V", { digits: 2 })}`)}</text>`
  );
}

/** Polyline points, at most two per horizontal unit (each column's low and high, so spikes stay). */
function trace(
  time: ArrayLike<number>,
  values: ArrayLike<number>,
  n: number,
  x: (t: number) => number,
  y: (v: number) => number,
): string {
  const out: string[] = [];
  let column = -1;
  let lo = 0;
  let hi = 0;
  let loFirst = true;
  const flush = () => {
    if (column < 0) return;
    const a = loFirst ? lo : hi;
    const b = loFirst ? hi : lo;
    out.push(`${column},${y(a).toFixed(1)}`);
    if (a !== b) out.push(`${column},${y(b).toFixed(1)}`);
  };
  for (let i = 0; i < n; i++) {
    const c = Math.round(x(time[i] ?? 0));
    const v = values[i] ?? 0;
    if (c !== column) {
      flush();
      column = c;
      lo = hi = v;
      loFirst = true;
    } else {
      if (v < lo) {
        lo = v;
        loFirst = false;
      }
      if (v > hi) hi = v;
    }
  }
  flush();
  return out.join(" ");
}

/** The text alternative: evenly spaced rows of the same numbers, plus the row of the largest error. */
function table(p: SimulationPicture): string {
  const n = p.time.length;
  const picks = new Set<number>();
  for (let k = 0; k < TABLE_ROWS && n > 0; k++) picks.add(Math.round((k * (n - 1)) / (TABLE_ROWS - 1)));
  let worst = 0;
  for (let i = 0; i < n; i++) if (Math.abs(p.error[i] ?? 0) > Math.abs(p.error[worst] ?? 0)) worst = i;
  if (n > 0) picks.add(worst);
  const rows = [...picks]
    .sort((a, b) => a - b)
    .map((i) => {
      const cells = [p.time[i] ?? 0, p.input[i] ?? 0, p.reading[i] ?? 0, p.error[i] ?? 0];
      const [t, ...volts] = cells;
      return `<tr${i === worst ? ' class="sim-worst-row"' : ""}><td>${escapeHtml(formatSI(t ?? 0, "s", { digits: 4 }))}</td>${volts
        .map((v) => `<td>${escapeHtml(formatSI(v, "V", { digits: 4, signed: true }))}</td>`)
        .join("")}</tr>`;
    })
    .join("");
  return (
    `<details class="sim-table"><summary>${escapeHtml(`The same period as numbers (${picks.size} points)`)}</summary>` +
    `<table><caption>${escapeHtml(`Simulated reading ${p.caption}`)}</caption>` +
    `<thead><tr><th scope="col">time</th><th scope="col">input</th><th scope="col">reading</th><th scope="col">error</th></tr></thead>` +
    `<tbody>${rows}</tbody></table></details>`
  );
}
