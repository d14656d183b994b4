// Makes a built page's links and assets relative to the page itself, so the
// guide opens from a folder (file://) as well as from any path on a server.
// Pages are written with site-absolute URLs ("/base/catalogue/"); here each
// becomes "../catalogue/index.html" as seen from the page's own folder. A
// folder link gets its index.html, because a browser shows a folder opened
// from disk as a file listing. Only the attribute values change: the rest of
// the page is kept byte for byte (parse5 gives each attribute's position).
import { parse } from "parse5";
import type { DefaultTreeAdapterTypes } from "parse5";

type Node = DefaultTreeAdapterTypes.Node;
type Element = DefaultTreeAdapterTypes.Element;

/** Attributes that hold a URL the browser loads or follows; data-root names the site's root for scripts. */
const URL_ATTRIBUTES = new Set(["href", "src", "action", "poster", "data-root"]);

/** Whether a site path (no leading slash, no query) names a folder of the built site. */
export type IsFolder = (sitePath: string) => boolean;

/** `from` and `to` are site paths of files; the result leads from the first file's folder to the second. */
export function relativePath(from: string, to: string): string {
  const fromDirs = from.split("/").slice(0, -1);
  const toParts = to.split("/");
  let common = 0;
  while (common < fromDirs.length && common < toParts.length - 1 && fromDirs[common] === toParts[common]) common++;
  return [...fromDirs.slice(common).map(() => ".."), ...toParts.slice(common)].join("/");
}

/**
 * The relative form of one URL as written in `page` (a site path such as
 * "designs/x/index.html"), or undefined when it is not a site-absolute URL
 * under `base` (a fragment, a relative path, another host, data:).
 */
export function relativeUrl(value: string, page: string, base: string, isFolder: IsFolder): string | undefined {
  const b = base.endsWith("/") ? base : `${base}/`;
  if (value.startsWith("//")) return undefined;
  let rest: string;
  if (value.startsWith(b)) rest = value.slice(b.length);
  else if (`${value}/` === b) rest = "";
  else return undefined;
  const cut = rest.search(/[?#]/);
  let path = cut < 0 ? rest : rest.slice(0, cut);
  const tail = cut < 0 ? "" : rest.slice(cut);
  if (path === "" || path.endsWith("/")) path += "index.html";
  else if (isFolder(decodeURIComponent(path))) path += "/index.html";
  return relativePath(page, path) + tail;
}

function* elements(node: Node): Generator<Element> {
  if ("tagName" in node) yield node;
  if ("childNodes" in node) for (const child of node.childNodes) yield* elements(child);
  if (node.nodeName === "template" && "content" in node) yield* elements(node.content);
}

const escapeAttr = (v: string) => v.replace(/&/g, "&amp;").replace(/"/g, "&quot;");

/** The page with every site-absolute URL made relative to it. */
export function relativizeHtml(html: string, page: string, base: string, isFolder: IsFolder): string {
  const doc = parse(html, { sourceCodeLocationInfo: true });
  const edits: { start: number; end: number; text: string }[] = [];
  for (const el of elements(doc)) {
    const where = el.sourceCodeLocation?.attrs;
    if (!where) continue;
    for (const attr of el.attrs) {
      if (!URL_ATTRIBUTES.has(attr.name)) continue;
      let relative = relativeUrl(attr.value.trim(), page, base, isFolder);
      const loc = where[attr.name];
      if (relative === undefined || !loc) continue;
      // The root a script resolves against is a folder, written with its slash.
      if (attr.name === "data-root") relative = relative.replace(/index\.html$/, "") || "./";
      edits.push({ start: loc.startOffset, end: loc.endOffset, text: `${attr.name}="${escapeAttr(relative)}"` });
    }
  }
  edits.sort((a, b) => b.start - a.start);
  let out = html;
  for (const e of edits) out = out.slice(0, e.start) + e.text + out.slice(e.end);
  return out;
}

/** Site-absolute URLs left in a page (for the build to refuse): each attribute=value. */
export function absoluteUrls(html: string): string[] {
  const found: string[] = [];
  for (const el of elements(parse(html))) {
    for (const attr of el.attrs) {
      const v = attr.value.trim();
      if (URL_ATTRIBUTES.has(attr.name) && v.startsWith("/") && !v.startsWith("//")) found.push(`${attr.name}="${v}"`);
    }
  }
  return found;
}
