// Puts one evaluation on the page. Each piece of the results (pieces.ts: a
// role, a row, a cell …) keeps one element across edits, matched by key, and
// only pieces whose HTML changed are touched. A changed piece is parsed (one
// parse per table context) and morphed into the live element by morphdom, so
// the browser restyles and re-lays-out only the text and attributes that moved
// rather than every row of every table (style and layout of freshly parsed rows
// were most of an edit's cost). HTML comes from src/view/render-results.ts,
// where every piece of text is escaped.
import morphdom from "morphdom";
import type { DesignResult } from "../../core/engine/result.ts";
import { pieceHtml, type Piece } from "../../view/pieces.ts";
import { resultPieces, type ViewState } from "../../view/render-results.ts";

const NOTHING_EXPANDED: ViewState = { expanded: new Set() };

/** The piece an element was last drawn from: its key, and its HTML (leaf) or start tag (container). */
type Drawn = { key: string; source: string };
const drawn = new WeakMap<Element, Drawn>();

/** A piece to parse: to bring `el` up to date, or to fill `slot` with a new element. */
type Job = { piece: Piece; html: string } & ({ el: Element; slot?: never } | { slot: Comment; el?: never });

export function renderTry(container: HTMLElement, result: DesignResult, view: ViewState = NOTHING_EXPANDED): void {
  const doc = container.ownerDocument;
  // A focused element that moves in the DOM loses the focus; it gets it back below.
  const active = doc.activeElement;
  const jobs: Job[] = [];
  drawChildren(container, resultPieces(result, view), jobs);
  runJobs(jobs, doc.createElement("template"));
  if (active instanceof HTMLElement && active !== doc.activeElement && container.contains(active)) {
    active.focus({ preventScroll: true });
  }
}

const sourceOf = (piece: Piece): string => ("html" in piece ? piece.html : piece.open);
const tagOf = (html: string): string => /^<([a-zA-Z][a-zA-Z0-9-]*)/.exec(html)?.[1]?.toLowerCase() ?? "";

/**
 * Matches `parent`'s element children to `pieces` by key, moving kept elements
 * into order and queueing a job for every piece whose HTML changed or is new.
 */
function drawChildren(parent: Element, pieces: readonly Piece[], jobs: Job[]): void {
  let spare: Map<string, Element> | undefined;
  let cursor = parent.firstElementChild;
  for (const piece of pieces) {
    const source = sourceOf(piece);
    let el: Element | undefined;
    if (cursor !== null && drawn.get(cursor)?.key === piece.key) {
      el = cursor;
      cursor = cursor.nextElementSibling;
    } else {
      spare ??= keyedFrom(cursor);
      el = spare.get(piece.key);
      if (el !== undefined) parent.insertBefore(el, cursor);
    }
    spare?.delete(piece.key);
    const changed = el === undefined || drawn.get(el)?.source !== source;
    if (el !== undefined && changed && el.localName !== tagOf(source)) {
      el.remove();
      el = undefined;
    }
    if (el === undefined) {
      const slot = parent.ownerDocument.createComment("");
      parent.insertBefore(slot, cursor);
      jobs.push({ piece, html: pieceHtml(piece), slot });
      continue;
    }
    if (changed) jobs.push({ piece, html: "html" in piece ? piece.html : `${piece.open}${piece.close}`, el });
    if (!("html" in piece)) drawChildren(el, piece.children, jobs);
  }
  // Whatever is left was drawn from pieces this result no longer has (or by no piece at all).
  while (cursor !== null) {
    const next = cursor.nextElementSibling;
    cursor.remove();
    cursor = next;
  }
}

function keyedFrom(first: Element | null): Map<string, Element> {
  const map = new Map<string, Element>();
  for (let el = first; el !== null; el = el.nextElementSibling) {
    const key = drawn.get(el)?.key;
    if (key !== undefined && !map.has(key)) map.set(key, el);
  }
  return map;
}

// Rows, cells and table parts parse only inside a table; each group is parsed in the context it needs.
const CONTEXT: Readonly<Record<string, string>> = {
  tr: "row",
  td: "cell",
  th: "cell",
  caption: "table",
  colgroup: "table",
  thead: "table",
  tbody: "table",
  tfoot: "table",
};

/** Parses the jobs' HTML, one parse per context rather than one per piece (each parse has a fixed cost). */
function runJobs(jobs: readonly Job[], scratch: HTMLTemplateElement): void {
  const groups = new Map<string, Job[]>();
  for (const job of jobs) {
    const context = CONTEXT[tagOf(job.html)] ?? "flow";
    const group = groups.get(context);
    if (group) group.push(job);
    else groups.set(context, [job]);
  }
  for (const group of groups.values()) {
    scratch.innerHTML = group.map((job) => job.html).join("");
    let parsed = [...scratch.content.children];
    // Each piece is one element; if the markup says otherwise, parse piece by piece.
    if (parsed.length !== group.length) {
      parsed = group.map((job) => {
        scratch.innerHTML = job.html;
        return scratch.content.firstElementChild ?? scratch.ownerDocument.createElement("div");
      });
    }
    group.forEach((job, i) => apply(job, parsed[i]!));
  }
}

function apply(job: Job, fresh: Element): void {
  if (job.slot) {
    job.slot.replaceWith(fresh);
    remember(fresh, job.piece);
    return;
  }
  // A leaf takes the whole new element; a container only its own attributes (its children are pieces, drawn above).
  morphdom(job.el, fresh, { childrenOnly: false, onBeforeElChildrenUpdated: () => "html" in job.piece });
  drawn.set(job.el, { key: job.piece.key, source: sourceOf(job.piece) });
}

/** Records which piece each element of a freshly parsed tree came from. */
function remember(el: Element, piece: Piece): void {
  drawn.set(el, { key: piece.key, source: sourceOf(piece) });
  if ("html" in piece) return;
  let child = el.firstElementChild;
  for (const p of piece.children) {
    if (child === null) return;
    remember(child, p);
    child = child.nextElementSibling;
  }
}
