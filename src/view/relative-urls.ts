// Makes a built page's links and assets relative to the page itself, so the
// guide opens from a folder (file://) as well as from any path on a server.
// Pages are written with site-absolute URLs ("/base/catalogue/"); here each
// becomes "../catalogue/index.html" as seen from the page's own folder. A
// folder link gets its index.html, because a browser shows a folder opened
// from disk as a file listing. Only the attribute values change: the rest of
// the page is kept byte for byte.
import { Parser } from "htmlparser2";

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

const escapeAttr = (v: string) => v.replace(/&/g, "&amp;").replace(/"/g, "&quot;");

export type Relativized = {
  html: string;
  /** URL attributes still site-absolute (attribute="value"). */ left: string[];
};

/**
 * Candidates for a URL attribute in the page's text: a name, then "=" and a value
 * in any quoting. In a page as Astro writes it every attribute is lower-case and
 * double-quoted, and text never holds a bare double quote (Astro and escape.ts
 * write it as an entity), so each ` name="value"` is an attribute.
 */
const CANDIDATE = /\s(href|src|action|poster|data-root)(\s*=\s*)("[^"]*"|'[^']*'|[^\s>]*)/gi;

/**
 * The quick way for a page as Astro writes it: each URL attribute found by
 * CANDIDATE and rewritten in place. Undefined, and the page goes through the
 * full tokenizer, when anything could make that wrong: an inline script or
 * style (raw text), a double quote in text, or a candidate not written exactly ` name="value"` with no
 * entity in its value. A build has thousands of pages: this is several times
 * faster than tokenizing each (issue 18).
 */
function quickRelativize(html: string, page: string, base: string, isFolder: IsFolder): Relativized | undefined {
  // Raw text (inline script or style), or a bare quote in text (">…\"" before the next tag).
  if (/<style\b|<script\b(?![^>]*\ssrc=)|>[^<>]*"/i.test(html)) return undefined;
  const pieces: string[] = [];
  const left: string[] = [];
  let at = 0;
  for (const m of html.matchAll(CANDIDATE)) {
    const [whole, name = "", equals, quoted = ""] = m;
    if (equals !== "=" || name !== name.toLowerCase() || !quoted.startsWith('"') || quoted.includes("&")) {
      return undefined;
    }
    const value = quoted.slice(1, -1).trim();
    let relative = relativeUrl(value, page, base, isFolder);
    if (relative === undefined) {
      if (value.startsWith("/") && !value.startsWith("//")) left.push(`${name}="${value}"`);
      continue;
    }
    if (name === "data-root") relative = relative.replace(/index\.html$/, "") || "./";
    const start = (m.index ?? 0) + 1;
    pieces.push(html.slice(at, start), `${name}="${escapeAttr(relative)}"`);
    at = start + whole.length - 1;
  }
  pieces.push(html.slice(at));
  return { html: pieces.join(""), left };
}

/** The page with every site-absolute URL under the base made relative to it. */
export function relativizePage(html: string, page: string, base: string, isFolder: IsFolder): Relativized {
  return quickRelativize(html, page, base, isFolder) ?? tokenizedRelativize(html, page, base, isFolder);
}

/**
 * The page with every site-absolute URL under the base made relative to it.
 * htmlparser2 tokenizes (script and style contents stay text) and reports each
 * attribute with its span (startIndex … endIndex); attributes arrive in
 * document order, so the pieces are joined once (a page has thousands of
 * links, and a build has thousands of pages: this runs in tens of ms a page).
 */
export function tokenizedRelativize(html: string, page: string, base: string, isFolder: IsFolder): Relativized {
  const pieces: string[] = [];
  const left: string[] = [];
  let at = 0;
  const parser = new Parser(
    {
      onattribute(name, raw) {
        if (!URL_ATTRIBUTES.has(name)) return;
        const value = raw.trim();
        let relative = relativeUrl(value, page, base, isFolder);
        if (relative === undefined) {
          if (value.startsWith("/") && !value.startsWith("//")) left.push(`${name}="${value}"`);
          return;
        }
        // The root a script resolves against is a folder, written with its slash.
        if (name === "data-root") relative = relative.replace(/index\.html$/, "") || "./";
        pieces.push(html.slice(at, parser.startIndex), `${name}="${escapeAttr(relative)}"`);
        at = parser.endIndex;
      },
    },
    { decodeEntities: true, lowerCaseAttributeNames: true },
  );
  parser.end(html);
  pieces.push(html.slice(at));
  return { html: pieces.join(""), left };
}

/** The page with every site-absolute URL made relative to it. */
export function relativizeHtml(html: string, page: string, base: string, isFolder: IsFolder): string {
  return relativizePage(html, page, base, isFolder).html;
}

/** Site-absolute URLs in a page (for the build to refuse): each attribute="value". */
export function absoluteUrls(html: string): string[] {
  // Under a base no URL can start with, every site-absolute URL is left as it is.
  return relativizePage(html, "index.html", "/\u0000/", () => false).left;
}
