// Inline SVG of one amplifier against the rails: V− and V+, the ranges the
// part reaches (input common mode, output swing) and the windows the stage
// needs, with the margin at each end labelled. Pure string output, so the
// build and the try page in the browser draw the same picture. No `style`
// attributes: the page's Content-Security-Policy forbids them; colours come
// from classes in site.css, with presentation attributes as a fallback.
import type { Part } from "../core/catalogue.ts";
import { isRailedPart } from "../core/catalogue-index.ts";
import type { Finding, Range, Rails, Stage, Verdict } from "../core/engine/types.ts";
import { formatVolts } from "../core/units.ts";
import { escapeHtml } from "./escape.ts";

export type RailDiagramInput = {
  part: Part;
  stage: Stage;
  rails: Rails;
  /** The part's findings in this role; they colour each row by its rule's verdict. */
  findings?: readonly Finding[];
  /** Prefix for the ids of <title> and <desc>; must be unique on the page. */
  id?: string;
  /**
   * Draw the key under the plot (default). A page that stacks many diagrams
   * shows RAIL_LEGEND once instead and leaves the space out of each.
   */
  legend?: boolean;
};

export type Span = { low: number; high: number; x1: number; x2: number };

export type MarginMark = {
  side: "low" | "high";
  /** Signed margin in volts: negative means the part falls short. */
  volts: number;
  /** Ends of the dimension line: the needed end and the reached end. */
  x1: number;
  x2: number;
  y: number;
  /** Where the label sits (middle of the dimension, kept inside the plot). */
  labelX: number;
  label: string;
};

export type DiagramRow = {
  name: "input" | "output";
  /** Row name in the left gutter, and the line under it ("Input" / "common mode"). */
  title: string;
  subtitle: string;
  y: number;
  needed?: Span;
  reach?: Span;
  verdict?: Verdict;
  margins: MarginMark[];
  /** Said instead of bars when the row cannot be drawn (open-drain output, unrated column). */
  note?: string;
};

export type DiagramLayout = {
  width: number;
  height: number;
  plot: { left: number; right: number };
  /** Voltage → x. */
  x: (volts: number) => number;
  rails: { negative: { volts: number; x: number }; positive: { volts: number; x: number } };
  rows: DiagramRow[];
};

const WIDTH = 720;
/** Row names sit left of the plot so no label crosses a rail line. */
const GUTTER = 112;
const SIDE = 14;
const TOP = 30;
const ROW = 62;
const LEGEND = 24;
const BAR = 12;
const ROW_RULE: Record<DiagramRow["name"], string> = { input: "input-common-mode", output: "output-swing" };

/** The rules whose ranges the diagram draws: a page may draw it only where one of them matters. */
export const DRAWN_RULES: readonly string[] = Object.values(ROW_RULE);

function round(n: number): number {
  return Math.round(n * 10) / 10;
}

/** Geometry of the diagram, kept apart from the markup so it can be checked by number. */
export function layoutRailDiagram({ part, stage, rails, findings = [] }: RailDiagramInput): DiagramLayout {
  if (!isRailedPart(part) || stage.stage === "diode")
    throw new Error("rail diagrams are drawn for parts that run from the rails only");

  const inputReach: Range = {
    low: rails.negative_v + part.icm_neg_headroom_v,
    high: rails.positive_v - part.icm_pos_headroom_v,
  };
  const outputReach: Range | undefined =
    part.out_neg_headroom_v === undefined || part.out_pos_headroom_v === undefined
      ? undefined
      : { low: rails.negative_v + part.out_neg_headroom_v, high: rails.positive_v - part.out_pos_headroom_v };
  const outputNeeded = stage.stage === "op-amp" ? stage.output : undefined;

  const volts = [
    rails.negative_v,
    rails.positive_v,
    0,
    inputReach.low,
    inputReach.high,
    stage.input.low,
    stage.input.high,
  ];
  if (outputReach) volts.push(outputReach.low, outputReach.high);
  if (outputNeeded) volts.push(outputNeeded.low, outputNeeded.high);
  const lo = Math.min(...volts);
  const hi = Math.max(...volts);
  const pad = Math.max((hi - lo) * 0.06, 0.05);
  const vMin = lo - pad;
  const vMax = hi + pad;
  const left = GUTTER;
  const right = WIDTH - SIDE;
  const x = (v: number) => round(left + ((v - vMin) / (vMax - vMin)) * (right - left));
  const span = (r: Range): Span => ({ low: r.low, high: r.high, x1: x(r.low), x2: x(r.high) });
  const verdictOf = (name: DiagramRow["name"]) => findings.find((f) => f.rule === ROW_RULE[name])?.verdict;

  const marginsFor = (needed: Range, reach: Range, y: number): MarginMark[] => {
    const mark = (side: "low" | "high", neededV: number, reachedV: number, margin: number): MarginMark => {
      const x1 = x(neededV);
      const x2 = x(reachedV);
      const labelX = Math.min(right - 30, Math.max(left + 30, round((x1 + x2) / 2)));
      const label = margin < 0 ? `${formatVolts(-margin)} short` : formatVolts(margin);
      return { side, volts: margin, x1, x2, y, labelX, label };
    };
    return [
      mark("low", needed.low, reach.low, needed.low - reach.low),
      mark("high", needed.high, reach.high, reach.high - needed.high),
    ];
  };

  const rows: DiagramRow[] = [];
  const inputY = TOP + 22;
  const inputVerdict = verdictOf("input");
  rows.push({
    name: "input",
    title: "Input",
    subtitle: "common mode",
    y: inputY,
    needed: span(stage.input),
    reach: span(inputReach),
    ...(inputVerdict ? { verdict: inputVerdict } : {}),
    margins: marginsFor(stage.input, inputReach, inputY + BAR + 4),
  });

  const outputY = TOP + ROW + 22;
  const outputVerdict = verdictOf("output");
  const output: DiagramRow = {
    name: "output",
    title: "Output",
    subtitle: outputNeeded ? "swing" : "levels",
    y: outputY,
    ...(outputVerdict ? { verdict: outputVerdict } : {}),
    margins: [],
  };
  if (outputReach) output.reach = span(outputReach);
  if (outputNeeded) output.needed = span(outputNeeded);
  if (outputReach && outputNeeded) output.margins = marginsFor(outputNeeded, outputReach, outputY + BAR + 4);
  if (!outputReach) {
    output.note =
      part.kind === "comparator" && part.output === "open-drain"
        ? "Open-drain output: it pulls low and needs a resistor to go high."
        : "Output swing not rated.";
  }
  rows.push(output);

  return {
    width: WIDTH,
    height: TOP + ROW * rows.length + LEGEND,
    plot: { left, right },
    x,
    rails: {
      negative: { volts: rails.negative_v, x: x(rails.negative_v) },
      positive: { volts: rails.positive_v, x: x(rails.positive_v) },
    },
    rows,
  };
}

const range = (s: Span) => `${formatVolts(s.low, { signed: true })} to ${formatVolts(s.high, { signed: true })}`;

function describeRow(row: DiagramRow): string {
  const name = `${row.title} ${row.subtitle}`;
  if (row.note) return `${name}: ${row.note}`;
  const parts = [`${name}:`];
  if (row.needed) parts.push(`needs ${range(row.needed)};`);
  if (row.reach) parts.push(`the part reaches ${range(row.reach)}`);
  if (row.margins.length === 2) {
    const [low, high] = row.margins;
    const say = (m: MarginMark | undefined) => (m === undefined ? "" : m.volts < 0 ? m.label : `${m.label} to spare`);
    parts[parts.length - 1] += `, ${say(low)} at the low end and ${say(high)} at the high end`;
  }
  return `${parts.join(" ")}.`;
}

function bars(row: DiagramRow, plot: DiagramLayout["plot"]): string {
  const out: string[] = [];
  const y = row.y;
  const cls = row.verdict ? ` rd-${row.verdict}` : "";
  out.push(
    `<text class="rd-row-title" x="${SIDE}" y="${y}" fill="currentColor">${escapeHtml(row.title)}</text>`,
    `<text class="rd-row-subtitle" x="${SIDE}" y="${y + 14}" fill="currentColor">${escapeHtml(row.subtitle)}</text>`,
  );
  if (row.verdict === "fail")
    out.push(`<text class="rd-row-short" x="${SIDE}" y="${y + 28}" fill="currentColor">falls short</text>`);
  if (row.note) {
    out.push(`<text class="rd-note" x="${plot.left}" y="${y + 4}" fill="currentColor">${escapeHtml(row.note)}</text>`);
  }
  if (row.reach) {
    const w = round(Math.max(row.reach.x2 - row.reach.x1, 1));
    out.push(
      `<rect class="rd-reach${cls}" x="${row.reach.x1}" y="${y - BAR / 2}" width="${w}" height="${BAR}" fill="#9ab" />`,
    );
  }
  if (row.needed) {
    const w = round(Math.max(row.needed.x2 - row.needed.x1, 1));
    out.push(
      `<rect class="rd-need" x="${row.needed.x1}" y="${y - BAR / 2 - 3}" width="${w}" height="${BAR + 6}" fill="none" stroke="currentColor" stroke-width="2" stroke-dasharray="5 3" />`,
    );
  }
  for (const m of row.margins) {
    const short = m.volts < 0 ? " rd-short" : "";
    const a = Math.min(m.x1, m.x2);
    const b = Math.max(m.x1, m.x2);
    // One path for the dimension line and its two end ticks: a page of these diagrams is mostly margins.
    out.push(
      `<g class="rd-margin${short}"><path d="M${a} ${m.y}H${b}M${a} ${m.y - 4}V${m.y + 4}M${b} ${m.y - 4}V${m.y + 4}" fill="none" stroke="currentColor" />` +
        `<text x="${m.labelX}" y="${m.y + 15}" text-anchor="middle" fill="currentColor">${escapeHtml(m.label)}</text></g>`,
    );
  }
  return out.join("");
}

/** The key: filled bar, dashed box and dimension line, drawn from `x` along the baseline `y`. */
function legendMarks(x: number, y: number): string {
  return [
    `<g class="rd-legend">`,
    `<rect class="rd-reach" x="${x}" y="${y - 8}" width="22" height="9" fill="#9ab" />`,
    `<text x="${x + 28}" y="${y}" fill="currentColor">what the part reaches</text>`,
    `<rect class="rd-need" x="${x + 180}" y="${y - 9}" width="22" height="11" fill="none" stroke="currentColor" stroke-width="2" stroke-dasharray="5 3" />`,
    `<text x="${x + 208}" y="${y}" fill="currentColor">what the stage needs</text>`,
    `<text x="${x + 364}" y="${y}" fill="currentColor">|—| margin</text>`,
    `</g>`,
  ].join("");
}

/** The key on its own (id prefix `rd-key`), for a page that draws its diagrams with `legend: false`. */
export const RAIL_LEGEND =
  `<svg class="rail-diagram rail-legend" viewBox="0 0 ${WIDTH} ${LEGEND}" width="${WIDTH}" height="${LEGEND}" role="img" aria-labelledby="rd-key-t">` +
  `<title id="rd-key-t">Key to the rail diagrams: a filled bar is what the part reaches, a dashed box what the stage needs, and |—| the margin between them</title>` +
  legendMarks(GUTTER, LEGEND - 7) +
  `</svg>`;

/** The diagram as an SVG string, every piece of text escaped. */
export function renderRailDiagram(input: RailDiagramInput): string {
  const layout = layoutRailDiagram(input);
  const { width, plot, rails, rows } = layout;
  const legend = input.legend ?? true;
  const id = escapeHtml(input.id ?? `rd-${input.part.id}`);
  const name = escapeHtml(input.part.name);
  const stageName = escapeHtml(input.stage.label);
  const top = TOP - 8;
  const bottom = layout.height - LEGEND;
  // Without the key the picture ends just under the rails' lower ends.
  const height = legend ? layout.height : bottom + 4;
  const desc = [
    `Rails: V− ${formatVolts(rails.negative.volts, { signed: true })}, V+ ${formatVolts(rails.positive.volts, { signed: true })}.`,
    ...rows.map(describeRow),
  ].join(" ");

  const svg: string[] = [];
  svg.push(
    `<svg class="rail-diagram" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" role="img" aria-labelledby="${id}-t ${id}-d">`,
    `<title id="${id}-t">Rail diagram: ${name} as ${stageName}</title>`,
    `<desc id="${id}-d">${escapeHtml(desc)}</desc>`,
  );
  // Rails and 0 V.
  const zero = layout.x(0);
  svg.push(
    `<g class="rd-rails">`,
    `<line class="rd-rail" x1="${rails.negative.x}" y1="${top}" x2="${rails.negative.x}" y2="${bottom}" stroke="currentColor" stroke-width="2" />`,
    `<line class="rd-rail" x1="${rails.positive.x}" y1="${top}" x2="${rails.positive.x}" y2="${bottom}" stroke="currentColor" stroke-width="2" />`,
    `<text class="rd-rail-label" x="${rails.negative.x + 4}" y="${top - 6}" fill="currentColor">V− ${escapeHtml(formatVolts(rails.negative.volts, { signed: true }))}</text>`,
    `<text class="rd-rail-label" x="${rails.positive.x - 4}" y="${top - 6}" text-anchor="end" fill="currentColor">V+ ${escapeHtml(formatVolts(rails.positive.volts, { signed: true }))}</text>`,
  );
  if (Math.abs(zero - rails.negative.x) > 90 && Math.abs(rails.positive.x - zero) > 90) {
    svg.push(
      `<line class="rd-zero" x1="${zero}" y1="${top}" x2="${zero}" y2="${bottom}" stroke="currentColor" stroke-dasharray="2 4" />`,
      `<text class="rd-zero-label" x="${zero}" y="${top - 6}" text-anchor="middle" fill="currentColor">0 V</text>`,
    );
  }
  svg.push(`</g>`);
  for (const row of rows) svg.push(`<g class="rd-row rd-row-${row.name}">${bars(row, plot)}</g>`);
  if (legend) svg.push(legendMarks(plot.left, height - 7));
  svg.push(`</svg>`);
  return svg.join("");
}
