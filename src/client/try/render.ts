// Puts one evaluation on the page. Each piece of the results (pieces.ts: a
// role, a row, a cell …) keeps one element across edits, matched by key, and
// only pieces whose HTML changed are touched. A changed piece is parsed (one
// parse per table context) and merged node by node into the live element
// (patchChildren: a keyed patch on the DOM, never on the HTML text), so the
// browser restyles and re-lays-out only the text and attributes that moved
// rather than every row of every table (style and layout of freshly parsed rows
// were most of an edit's cost). A maintained morphing library would do the
// same merge for about 3 KB more of the try page's script, over its budget.
// HTML comes from src/view/render-results.ts, where every piece is escaped.
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
  patchAttributes(job.el, fresh);
  if ("html" in job.piece) patchChildren(job.el, fresh);
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

function patchAttributes(live: Element, next: Element): void {
  if (!live.hasAttributes() && !next.hasAttributes()) return;
  for (const name of live.getAttributeNames()) if (!next.hasAttribute(name)) live.removeAttribute(name);
  for (const name of next.getAttributeNames()) {
    const value = next.getAttribute(name) ?? "";
    if (live.getAttribute(name) !== value) live.setAttribute(name, value);
  }
}

/**
 * Makes `live`'s children equal to `next`'s (a parsed copy of the new HTML),
 * keeping live nodes of the same tag in place and changing only text and
 * attributes that differ; anything else is taken over from `next`.
 */
function patchChildren(live: Node, next: Node): void {
  let cursor = live.firstChild;
  for (let incoming = next.firstChild; incoming !== null;) {
    const following = incoming.nextSibling;
    if (cursor !== null && cursor.nodeName === incoming.nodeName) {
      if (cursor.nodeType === Node.ELEMENT_NODE) {
        patchAttributes(cursor as Element, incoming as Element);
        patchChildren(cursor, incoming);
      } else if (cursor.nodeValue !== incoming.nodeValue) {
        cursor.nodeValue = incoming.nodeValue;
      }
      cursor = cursor.nextSibling;
    } else {
      live.insertBefore(incoming, cursor);
    }
    incoming = following;
  }
  while (cursor !== null) {
    const following = cursor.nextSibling;
    live.removeChild(cursor);
    cursor = following;
  }
}
