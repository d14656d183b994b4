// One design page as a single self-contained HTML file for a design review:
// the stylesheets go inside, diagrams are inline SVG already, and nothing is
// left that would make a request (scripts, icons, external images, links to
// other pages, which become plain text). Its policy allows no source at all
// but that one style block, by its hash (CSP3 §8.3 hash-source), so the file
// stays as strict as the site while carrying its own styles.
import { Parser } from "htmlparser2";

export type ReportInputs = {
  /** The page's site path ("designs/x/index.html"): its relative links resolve from here. */
  page: string;
  /** Reads a text file of the built site by its site path; undefined when missing. */
  read: (sitePath: string) => string | undefined;
  /** Base64 SHA-256 of a text (UTF-8), for the CSP hash-source. */
  sha256: (text: string) => string;
};

export class ReportError extends Error {}

/** Elements that load something by themselves. */
const LOADS = new Set([
  "script",
  "iframe",
  "object",
  "embed",
  "video",
  "audio",
  "source",
  "track",
  "img",
  "picture",
  "noscript",
]);

export const REPORT_NOTE =
  "A one-file copy of this design's page from the railsieve guide, for a design review. It makes no request; links to other pages of the guide are plain text here.";

/** Resolves a relative URL written in `page` to a site path; undefined for anything else. */
export function resolveSitePath(page: string, url: string): string | undefined {
  if (/^[a-z][a-z0-9+.-]*:|^\/|^#/i.test(url)) return undefined;
  const parts = page.split("/").slice(0, -1);
  for (const piece of url.replace(/[?#].*$/, "").split("/")) {
    if (piece === "..") parts.pop();
    else if (piece !== "." && piece !== "") parts.push(piece);
  }
  return parts.join("/");
}

const escapeAttr = (v: string) =>
  v
    .replace(/&/g, "&amp;")
    .replace(/"/g, "&quot;")
    .replace(/\u00a0/g, "&nbsp;");
const escapeText = (v: string) =>
  v
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/\u00a0/g, "&nbsp;");

function startTag(name: string, attribs: Record<string, string>): string {
  const attrs = Object.entries(attribs).map(([k, v]) => ` ${k}="${escapeAttr(v)}"`);
  return `<${name}${attrs.join("")}>`;
}

const A_DROPPED = new Set(["href", "target", "rel", "download", "hreflang", "ping", "referrerpolicy", "type"]);

/** One change to the page's text: [start, end) becomes `text()` (read when the page is joined). */
type Edit = { start: number; end: number; text: () => string };

type Open = {
  name: string;
  /** Where its start tag begins. */
  start: number;
  /** Removed with everything in it, decided at its end (a nav, by whether it holds an in-page link). */
  drop?: boolean;
  /** A nav: whether it holds an in-page link. */
  fragment?: boolean;
  /** A link to another page, written as a span. */
  span?: boolean;
};

/**
 * The page as one file. htmlparser2 reports each tag with its span in the text
 * (startIndex … endIndex), so the page is kept byte for byte but for the tags
 * that change, and the edits are joined once: a design page at 2,000 parts is
 * near 1 MB, and a DOM round trip (parse5) cost 2.5 times as long (issue 18).
 */
export function standaloneReport(html: string, inputs: ReportInputs): string {
  const edits: Edit[] = [];
  const stack: Open[] = [];
  const css: string[] = [];
  let styleAt: Edit | undefined;
  let cspAt: Edit | undefined;
  let headEnd: number | undefined;
  let mainEnd: number | undefined;
  const policy = () =>
    [
      "default-src 'none'",
      ...(styleAt ? [`style-src 'sha256-${inputs.sha256(css.join("\n"))}'`] : []),
      "img-src data:",
      "base-uri 'none'",
      "form-action 'none'",
    ].join("; ");
  const replaceTag = (text: () => string) => edits.push({ start: parser.startIndex, end: parser.endIndex + 1, text });
  const inDropped = () => stack.some((o) => o.drop);

  const parser = new Parser(
    {
      onopentag(name, attribs) {
        const open: Open = { name, start: parser.startIndex };
        stack.push(open);
        if (inDropped()) return;
        const rel = (attribs.rel ?? "").toLowerCase().split(/\s+/);
        if (name === "link" && rel.includes("stylesheet")) {
          const href = attribs.href ?? "";
          const path = resolveSitePath(inputs.page, href);
          const text = path === undefined ? undefined : inputs.read(path);
          if (text === undefined) throw new ReportError(`${inputs.page}: stylesheet ${href} is not in the built site`);
          if (/url\(\s*['"]?(?!data:)/i.test(text))
            throw new ReportError(
              `${inputs.page}: stylesheet ${href} loads a file with url(); the one-file report cannot carry it`,
            );
          if (/<\/style/i.test(text)) throw new ReportError(`${inputs.page}: stylesheet ${href} contains </style`);
          css.push(text);
          open.drop = true;
          // The first stylesheet's place takes the style block; the others go.
          styleAt ??= {
            start: parser.startIndex,
            end: parser.endIndex + 1,
            text: () => `<style>${css.join("\n")}</style>`,
          };
          return;
        }
        if (name === "link" || LOADS.has(name) || (name === "a" && attribs.download !== undefined)) {
          open.drop = true;
          return;
        }
        if ((name === "use" || name === "image") && !(attribs.href ?? attribs["xlink:href"] ?? "").startsWith("#")) {
          // SVG references to other files; an in-document #id reference is kept.
          open.drop = true;
          return;
        }
        if (name === "nav") {
          open.fragment = false;
          return;
        }
        if (name === "a" && (attribs.href ?? "").startsWith("#")) {
          for (const o of stack) if (o.name === "nav") o.fragment = true;
        }
        const kept = { ...attribs };
        delete kept["data-root"];
        if (name === "a" && !(attribs.href ?? "").startsWith("#")) {
          open.span = true;
          for (const k of A_DROPPED) delete kept[k];
          replaceTag(() => startTag("span", kept));
        } else if (name === "meta" && (attribs["http-equiv"] ?? "").toLowerCase() === "content-security-policy") {
          cspAt = {
            start: parser.startIndex,
            end: parser.endIndex + 1,
            text: () => startTag("meta", { ...kept, content: policy() }),
          };
          edits.push(cspAt);
        } else if (attribs["data-root"] !== undefined) {
          replaceTag(() => startTag(name, kept));
        }
        if (name === "head") headEnd = parser.endIndex + 1;
        if (name === "main") mainEnd = parser.endIndex + 1;
      },
      onclosetag(name, implied) {
        const open = stack.pop();
        if (!open || open.name !== name) throw new ReportError(`${inputs.page}: </${name}> closes no open <${name}>`);
        if (inDropped()) return; // an ancestor goes whole
        // A void or self-closed element ends with its own tag; one closed by another tag ends where that tag begins.
        const own = parser.startIndex === open.start || !implied;
        const end = own ? parser.endIndex + 1 : parser.startIndex;
        if (open.drop || (open.name === "nav" && open.fragment === false)) {
          if (styleAt && styleAt.start === open.start) edits.push({ ...styleAt, end });
          else edits.push({ start: open.start, end, text: () => "" });
          return;
        }
        if (open.span && !implied)
          edits.push({ start: parser.startIndex, end: parser.endIndex + 1, text: () => "</span>" });
      },
    },
    { decodeEntities: true, lowerCaseTags: true, lowerCaseAttributeNames: true, recognizeSelfClosing: true },
  );
  parser.end(html);
  if (headEnd === undefined || mainEnd === undefined)
    throw new ReportError(`${inputs.page}: expected a page with <head> and <main>`);
  if (!cspAt)
    edits.push({
      start: headEnd,
      end: headEnd,
      text: () => `<meta http-equiv="Content-Security-Policy" content="${escapeAttr(policy())}">`,
    });
  edits.push({ start: mainEnd, end: mainEnd, text: () => `<p class="report-note">${escapeText(REPORT_NOTE)}</p>` });

  // In text order, an insertion before a change at the same place; a change inside a removed element is gone with it.
  edits.sort((a, b) => a.start - b.start || a.end - a.start - (b.end - b.start));
  const pieces: string[] = [];
  let at = 0;
  for (const e of edits) {
    if (e.start < at) continue;
    pieces.push(html.slice(at, e.start), e.text());
    at = e.end;
  }
  pieces.push(html.slice(at));
  return pieces.join("");
}

/** Where a design page's one-file report lives, next to the page. */
export function reportPathOf(page: string): string {
  return page.replace(/index\.html$/, "report.html");
}
