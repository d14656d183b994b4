// A role's lists, as the design page and the try page both show them (SPEC §14):
// the fits one row each with their own ranking keys, and the rejections grouped
// by the rule that decides them (count, the range of shortfalls, an example),
// each part one line linking to its page. Built as keyed pieces (pieces.ts):
// the design page prints them as one string, the try page patches only the
// pieces an edit changed. Every piece of catalogue text goes through escapeHtml.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { RoleResult } from "../core/engine/result.ts";
import type { Finding } from "../core/engine/types.ts";
import { formatQuantity } from "../core/units.ts";
import { closestFinding, decidingFinding } from "./deciding.ts";
import { escapeHtml } from "./escape.ts";
import type { SiteLinks } from "./links.ts";
import type { Container, Leaf, Piece } from "./pieces.ts";
import { VERDICT_LOOK } from "./verdict.ts";

export type ListLinks = Pick<SiteLinks, "partUrl" | "rulesUrl">;

export type RoleListInput = {
  designId: string;
  role: RoleResult;
  links: ListLinks;
  /** Rows (and lines per rejection group) shown before a "show all" button; every one when absent. */
  first?: number;
  /** Lists the reader opened, by key "<role>:fits" / "<role>:rejected". */
  expanded?: ReadonlySet<string>;
  /** The try page marks each row with its part and verdict (data-part, data-verdict); the design page saves the bytes. */
  dataAttributes?: boolean;
  /**
   * Rejection groups as their heads only (count, shortfall range, an example): for a topology a design
   * page shows only for comparison, whose parts each have their line on their own page.
   */
  headsOnly?: boolean;
  /**
   * Grouping needs every rejection's deciding finding: with more rejections than this, a collapsed list
   * (the try page, at each keystroke) shows its first lines in the role's order, each with its rule, and
   * groups them when opened.
   */
  groupLimit?: number;
};

/** The ranking of SPEC §7, said once where the fits are listed; each fit shows its own keys. */
export const RANKING_KEYS =
  "Fits are ranked by verdict (pass before marginal), then status (stocked, approved, listed), then cost band (1 lowest; not given last), then the least margin relative to its limit (larger first), then id.";

/**
 * Marks a reader needs beside a part's name: BOM, used by the design, a kind
 * standing in for another. A rejection's line leaves the last out: the role
 * says which kinds it takes, and a role open to stand-ins rejects hundreds of
 * them at 2,000 parts, each line repeating it (issue 18).
 */
export function partMarks(result: PartResult, role: RoleResult, standIn = true): string {
  const marks: string[] = [];
  if (result.bom) marks.push(`<span class="mark mark-bom">in the BOM</span>`);
  else if (role.chosen === result.part.id) marks.push(`<span class="mark mark-chosen">used by the design</span>`);
  if (standIn && result.part.kind !== role.kind)
    marks.push(`<span class="mark">${escapeHtml(result.part.kind)} standing in</span>`);
  return marks.length === 0 ? "" : ` ${marks.join(" ")}`;
}

// A list row is the part's id linking to its page, where its name and every
// design it appears in are one line each: at 2,000 parts a design page lists
// thousands of rows, so each carries only what the decision needs.
function partLink(result: PartResult, { role, links }: RoleListInput, standIn = true): string {
  const { part } = result;
  return `<a href="${escapeHtml(links.partUrl(part.id))}">${escapeHtml(part.id)}</a>${partMarks(result, role, standIn)}`;
}

function rowAttributes(result: PartResult, input: RoleListInput): string {
  return input.dataAttributes ? ` data-part="${escapeHtml(result.part.id)}" data-verdict="${result.verdict}"` : "";
}

/** A fit's own ranking keys, as the row shows them. */
export function rankingKeys(result: PartResult): { status: string; cost: string; margin: string } {
  const { part } = result;
  return {
    status: part.status,
    cost: part.cost_band === undefined ? "not given" : `${part.cost_band} of 5`,
    margin: `${Math.round(result.relative * 100)} %`,
  };
}

const shown = (input: RoleListInput, key: string, total: number): number =>
  input.first === undefined || input.expanded?.has(key) ? total : Math.min(total, input.first);

function moreButton(input: RoleListInput, key: string, total: number, what: string): Leaf | undefined {
  if (input.first === undefined || total <= input.first) return undefined;
  const expanded = input.expanded?.has(key) ?? false;
  const text = expanded
    ? `Show the first ${input.first} ${what} only`
    : `Show all ${total} ${what} (${total - input.first} more)`;
  return {
    key: `${key}:more`,
    html: `<button type="button" class="more" data-toggle="${escapeHtml(key)}" aria-expanded="${expanded}">${escapeHtml(text)}</button>`,
  };
}

// A fits table runs to hundreds of rows at 2,000 parts (issue 18: no page over
// 1 MB), so a row carries no class it can do without: the rank and margin
// columns are set right by the table's CSS, and the verdict cell is the word,
// its glyph and colour drawn by the stylesheet (the glyph not read aloud, as the
// badge's aria-hidden glyph was not): a pass, most rows, by the column's own
// style, any other verdict by its class.
const VERDICT_CELL: Readonly<Record<PartResult["verdict"], string>> = {
  pass: `<td>${VERDICT_LOOK.pass.word}</td>`,
  marginal: `<td class="v-marginal">${VERDICT_LOOK.marginal.word}</td>`,
  unrated: `<td class="v-unrated">${escapeHtml(VERDICT_LOOK.unrated.word)}</td>`,
  fail: `<td class="v-fail">${VERDICT_LOOK.fail.word}</td>`,
};

const FIT_COLUMNS =
  `<thead><tr><th scope="col" class="num">Rank</th><th scope="col">Part</th><th scope="col">Verdict</th>` +
  `<th scope="col">Status</th><th scope="col">Cost</th><th scope="col" class="num">Least margin</th>` +
  `<th scope="col">Closest to its limit</th></tr></thead>`;

/**
 * The fits ranked `from` (1-based) on, one row each with its ranking keys and
 * the finding closest to its limit. A part keeps its row (key: its id) whatever its rank.
 */
export function fitsPiece(input: RoleListInput, from: number, caption: string, id?: string): Container {
  const key = `${input.role.role}:fits`;
  const all = input.role.fits.slice(from - 1);
  const rows: Piece[] = all.slice(0, shown(input, key, all.length)).map((r, i) => {
    const f = closestFinding(r);
    const k = rankingKeys(r);
    return {
      key: r.part.id,
      open: `<tr${rowAttributes(r, input)}>`,
      close: "</tr>",
      children: [
        { key: "rank", html: `<td>${from + i}</td>` },
        { key: "part", html: `<th scope="row">${partLink(r, input)}</th>` },
        { key: "verdict", html: VERDICT_CELL[r.verdict] },
        { key: "status", html: `<td>${escapeHtml(k.status)}</td>` },
        { key: "cost", html: `<td>${escapeHtml(k.cost)}</td>` },
        { key: "margin", html: `<td>${escapeHtml(k.margin)}</td>` },
        { key: "closest", html: `<td>${f ? `${escapeHtml(f.rule)}: ${escapeHtml(marginLine(f))}` : ""}</td>` },
      ],
    };
  });
  const more = moreButton(input, key, all.length, "fits");
  return {
    key: "fits",
    open: `<div class="fits-list">`,
    close: "</div>",
    children: [
      {
        key: "scroll",
        open: `<div class="table-scroll">`,
        close: "</div>",
        children: [
          {
            key: "table",
            open: `<table class="fits-summary"${id ? ` id="${escapeHtml(id)}"` : ""}>`,
            close: "</table>",
            children: [
              { key: "caption", html: `<caption>${escapeHtml(caption)}</caption>` },
              { key: "head", html: FIT_COLUMNS },
              { key: "body", open: "<tbody>", close: "</tbody>", children: rows },
            ],
          },
        ],
      },
      ...(more ? [more] : []),
    ],
  };
}

/**
 * The fits ranked `from` on as numbered lines, each with its ranking keys: a
 * topology a design page shows only for comparison (its rejections are group
 * heads), where a table with the closest finding per row would more than double
 * the page at 2,000 parts (issue 18). The numbers are the ranks (`start`).
 */
export function fitLinesPiece(input: RoleListInput, from: number): Container {
  const lines: Piece[] = input.role.fits.slice(from - 1).map((r) => {
    const k = rankingKeys(r);
    return {
      key: r.part.id,
      html: `<li>${partLink(r, input)} ${VERDICT_LOOK[r.verdict].word}, ${escapeHtml(k.status)}, cost ${escapeHtml(k.cost)}, least margin ${escapeHtml(k.margin)}</li>`,
    };
  });
  return { key: "fits", open: `<ol class="fit-lines" start="${from}">`, close: "</ol>", children: lines };
}

/** The rejections that one rule decides. */
export type RejectionGroup = {
  rule: string;
  verdict: "fail" | "unrated";
  /** Each part with the finding that decides it, in the role's order. */
  parts: { result: PartResult; finding: Finding }[];
  /** Smallest and largest shortfall (−margin) of the group, when its findings have numbers. */
  shortfall?: { low: number; high: number; unit: string };
};

/**
 * A role's rejections grouped by their deciding finding (deciding.ts: the first
 * in rule order as bad as the verdict), largest group first, then rule order.
 */
export function rejectionGroups(role: RoleResult): RejectionGroup[] {
  const groups = new Map<string, RejectionGroup & { first: number }>();
  const order = new Map(role.rules.map((r, i) => [r, i]));
  for (const result of role.rejected) {
    const finding = decidingFinding(result);
    if (!finding) continue;
    const verdict = finding.verdict === "unrated" ? "unrated" : "fail";
    const key = `${verdict}:${finding.rule}`;
    let group = groups.get(key);
    if (!group) {
      group = { rule: finding.rule, verdict, parts: [], first: order.get(finding.rule) ?? order.size };
      groups.set(key, group);
    }
    group.parts.push({ result, finding });
    if (finding.margin !== null && finding.margin < 0 && Number.isFinite(finding.margin)) {
      const short = -finding.margin;
      const s = group.shortfall;
      group.shortfall = s
        ? { low: Math.min(s.low, short), high: Math.max(s.high, short), unit: finding.unit }
        : { low: short, high: short, unit: finding.unit };
    }
  }
  return [...groups.values()]
    .sort((a, b) => b.parts.length - a.parts.length || a.first - b.first || a.verdict.localeCompare(b.verdict))
    .map(({ first: _first, ...group }) => group);
}

// Volts with an SI prefix: a 25 mV limit missed by 775 mV reads so, not "0.78 V".
const quantity = (v: number, unit: string) =>
  unit === "" ? String(Number(v.toPrecision(3))) : formatQuantity(v, unit === "V" ? "V-prefixed" : unit);

/** A fit's closest finding in a few words: its margin, spare or short. */
function marginLine(f: Finding): string {
  if (f.verdict === "unrated") return "not rated";
  if (f.margin === null || !Number.isFinite(f.margin)) return f.verdict;
  return f.margin < 0 ? `${quantity(-f.margin, f.unit)} short` : `${quantity(f.margin, f.unit)} to spare`;
}

/** What one line says of a part's deciding finding: its shortfall, or that the rule cannot be answered. */
function shortLine(f: Finding): string {
  if (f.verdict === "unrated") return "not rated";
  if (f.margin !== null && f.margin < 0 && Number.isFinite(f.margin)) return `${quantity(-f.margin, f.unit)} short`;
  return "fails";
}

function groupSummary(g: RejectionGroup, link: (rule: string) => string): string {
  const n = g.parts.length;
  const what = g.verdict === "unrated" ? "cannot be checked (not rated)" : n === 1 ? "fails" : "fail";
  const range = g.shortfall
    ? g.shortfall.low === g.shortfall.high
      ? `, short by ${quantity(g.shortfall.low, g.shortfall.unit)}`
      : `, short by ${quantity(g.shortfall.low, g.shortfall.unit)} to ${quantity(g.shortfall.high, g.shortfall.unit)}`
    : "";
  const example = g.parts[0];
  const eg = example ? ` For example ${escapeHtml(example.result.part.id)}: ${escapeHtml(example.finding.reason)}` : "";
  return (
    `<p class="reject-head"><a href="${escapeHtml(link(g.rule))}">${escapeHtml(g.rule)}</a>: ` +
    `<strong>${n}</strong> part${n === 1 ? "" : "s"} ${what}${escapeHtml(range)}.${eg}</p>`
  );
}

/** The rejections grouped by deciding rule, each part one line linking to its page. */
export function rejectionsPiece(input: RoleListInput): Container {
  const key = `${input.role.role}:rejected`;
  const total = input.role.rejected.length;
  if (input.groupLimit !== undefined && total > input.groupLimit && !input.expanded?.has(key)) {
    return firstRejections(input, key);
  }
  const groups = rejectionGroups(input.role);
  const largest = Math.max(0, ...groups.map((g) => g.parts.length));
  const children: Piece[] = groups.map((g) => {
    const count = input.headsOnly ? 0 : shown(input, key, g.parts.length);
    const lines: Piece[] = g.parts.slice(0, count).map(({ result, finding }) => ({
      key: result.part.id,
      html: `<li${rowAttributes(result, input)}>${partLink(result, input, false)} ${escapeHtml(shortLine(finding))}</li>`,
    }));
    return {
      key: `${g.verdict}:${g.rule}`,
      open: `<section class="reject-group" data-rule="${escapeHtml(g.rule)}">`,
      close: "</section>",
      children: [
        { key: "head", html: groupSummary(g, input.links.rulesUrl) },
        ...(lines.length > 0
          ? [{ key: "parts", open: `<ul class="part-lines">`, close: "</ul>", children: lines }]
          : []),
      ],
    };
  });
  const more = moreButton(input, key, largest, "rejected parts of each rule");
  return {
    key: "rejected",
    open: `<div class="rejections">`,
    close: "</div>",
    children: [...children, ...(more ? [more] : [])],
  };
}

/** A long role's first rejections in its order, each with the rule that decides it, before the list is opened. */
function firstRejections(input: RoleListInput, key: string): Container {
  const total = input.role.rejected.length;
  const first = input.role.rejected.slice(0, input.first ?? total);
  const lines: Piece[] = first.map((result) => {
    const f = decidingFinding(result);
    const why = f ? `${escapeHtml(f.rule)}: ${escapeHtml(shortLine(f))}` : "";
    return {
      key: result.part.id,
      html: `<li${rowAttributes(result, input)}>${partLink(result, input, false)} ${why}</li>`,
    };
  });
  const button = {
    key: `${key}:more`,
    html: `<button type="button" class="more" data-toggle="${escapeHtml(key)}" aria-expanded="false">${escapeHtml(`Show all ${total} rejected parts, grouped by the rule that decides them`)}</button>`,
  };
  return {
    key: "rejected-first",
    open: `<div class="rejections">`,
    close: "</div>",
    children: [
      {
        key: "head",
        html: `<p class="reject-head"><strong>${total}</strong> parts rejected; the first ${first.length}, each with the rule that decides it:</p>`,
      },
      { key: "parts", open: `<ul class="part-lines">`, close: "</ul>", children: lines },
      button,
    ],
  };
}
