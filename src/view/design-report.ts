// One design page as a single self-contained HTML file for a design review:
// the stylesheets go inside, diagrams are inline SVG already, and nothing is
// left that would make a request (scripts, icons, external images, links to
// other pages, which become plain text). Its policy allows no source at all
// but that one style block, by its hash (CSP3 §8.3 hash-source), so the file
// stays as strict as the site while carrying its own styles.
import { parse, parseFragment, serialize } from "parse5";
import type { DefaultTreeAdapterTypes } from "parse5";

type Node = DefaultTreeAdapterTypes.Node;
type Element = DefaultTreeAdapterTypes.Element;
type ParentNode = DefaultTreeAdapterTypes.ParentNode;
type TextNode = DefaultTreeAdapterTypes.TextNode;

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

function children(node: Node): Node[] {
  return "childNodes" in node ? [...node.childNodes] : [];
}

function* elements(node: Node): Generator<Element> {
  if ("tagName" in node) yield node;
  for (const c of children(node)) yield* elements(c);
}

const attr = (el: Element, name: string) => el.attrs.find((a) => a.name === name)?.value;

function remove(node: Node): void {
  const parent = (node as { parentNode?: ParentNode | null }).parentNode;
  if (parent) parent.childNodes = parent.childNodes.filter((c) => c !== node);
}

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

function isFragmentLink(el: Element): boolean {
  return el.tagName === "a" && (attr(el, "href") ?? "").startsWith("#");
}

export function standaloneReport(html: string, inputs: ReportInputs): string {
  const doc = parse(html);
  const all = [...elements(doc)];
  const head = all.find((e) => e.tagName === "head");
  const main = all.find((e) => e.tagName === "main");
  if (!head || !main) throw new ReportError(`${inputs.page}: expected a page with <head> and <main>`);

  const css: string[] = [];
  let styleAt: Element | undefined;
  for (const el of all) {
    const rel = (attr(el, "rel") ?? "").toLowerCase().split(/\s+/);
    if (el.tagName === "link" && rel.includes("stylesheet")) {
      const href = attr(el, "href") ?? "";
      const path = resolveSitePath(inputs.page, href);
      const text = path === undefined ? undefined : inputs.read(path);
      if (text === undefined) throw new ReportError(`${inputs.page}: stylesheet ${href} is not in the built site`);
      if (/url\(\s*['"]?(?!data:)/i.test(text))
        throw new ReportError(
          `${inputs.page}: stylesheet ${href} loads a file with url(); the one-file report cannot carry it`,
        );
      if (/<\/style/i.test(text)) throw new ReportError(`${inputs.page}: stylesheet ${href} contains </style`);
      css.push(text);
      styleAt ??= el;
      if (el !== styleAt) remove(el);
    } else if (
      el.tagName === "link" ||
      LOADS.has(el.tagName) ||
      (el.tagName === "a" && attr(el, "download") !== undefined)
    ) {
      remove(el);
    } else if (el.tagName === "nav" && ![...elements(el)].some(isFragmentLink)) {
      // Site navigation leads to other pages; a nav of in-page anchors stays.
      remove(el);
    } else if (el.tagName === "a" && !isFragmentLink(el)) {
      el.tagName = "span";
      el.nodeName = "span";
      el.attrs = el.attrs.filter(
        (a) => !["href", "target", "rel", "download", "hreflang", "ping", "referrerpolicy", "type"].includes(a.name),
      );
    } else if (el.tagName === "use" || el.tagName === "image") {
      // SVG references to other files; an in-document #id reference is kept.
      const ref = attr(el, "href") ?? attr(el, "xlink:href") ?? "";
      if (!ref.startsWith("#")) remove(el);
    }
    el.attrs = el.attrs.filter((a) => a.name !== "data-root");
  }

  const styleText = css.join("\n");
  if (styleAt) {
    const style = parseFragment(`<style></style>`).childNodes[0] as Element;
    const text: TextNode = { nodeName: "#text", value: styleText, parentNode: style };
    style.childNodes = [text];
    style.parentNode = styleAt.parentNode;
    const siblings = styleAt.parentNode?.childNodes ?? [];
    siblings.splice(siblings.indexOf(styleAt), 1, style);
  }

  const policy = [
    "default-src 'none'",
    ...(styleAt ? [`style-src 'sha256-${inputs.sha256(styleText)}'`] : []),
    "img-src data:",
    "base-uri 'none'",
    "form-action 'none'",
  ].join("; ");
  const csp = all.find(
    (e) => e.tagName === "meta" && (attr(e, "http-equiv") ?? "").toLowerCase() === "content-security-policy",
  );
  if (csp) csp.attrs = csp.attrs.map((a) => (a.name === "content" ? { ...a, value: policy } : a));
  else {
    const meta = parseFragment(`<meta http-equiv="Content-Security-Policy">`).childNodes[0] as Element;
    meta.attrs.push({ name: "content", value: policy });
    meta.parentNode = head;
    head.childNodes.unshift(meta);
  }

  const note = parseFragment(`<p class="report-note"></p>`).childNodes[0] as Element;
  note.childNodes = [{ nodeName: "#text", value: REPORT_NOTE, parentNode: note } as TextNode];
  note.parentNode = main;
  main.childNodes.unshift(note);
  return serialize(doc);
}

/** Where a design page's one-file report lives, next to the page. */
export function reportPathOf(page: string): string {
  return page.replace(/index\.html$/, "report.html");
}
