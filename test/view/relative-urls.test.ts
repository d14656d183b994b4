// Relative links for a guide that opens from a folder. The oracle is URL
// resolution itself (RFC 3986 §5.2, as the WHATWG URL parser does it): each
// relative link, resolved against its page, must name the same file as the
// site-absolute link it replaces, with the folder's index.html.
import { describe, expect, it } from "vitest";
import {
  absoluteUrls,
  relativePath,
  relativeUrl,
  relativizeHtml,
  relativizePage,
  tokenizedRelativize,
} from "../../src/view/relative-urls.ts";

const folders = new Set(["designs/x", "parts/p-1", "catalogue"]);
const isFolder = (p: string) => folders.has(p);

describe("relativeUrl", () => {
  it.each([
    // page, base, written, expected
    ["index.html", "/", "/", "index.html"],
    ["index.html", "/", "/catalogue/", "catalogue/index.html"],
    ["designs/x/index.html", "/", "/", "../../index.html"],
    ["designs/x/index.html", "/", "/styles/site.css", "../../styles/site.css"],
    ["designs/x/index.html", "/", "/parts/p-1/#in-x--buffer", "../../parts/p-1/index.html#in-x--buffer"],
    ["designs/x/index.html", "/", "/designs/x/report.html", "report.html"],
    ["designs/x/index.html", "/", "/designs/x/", "index.html"],
    ["designs/x/index.html", "/", "/catalogue", "../../catalogue/index.html"],
    ["catalogue/index.html", "/", "/catalogue/?q=rail", "index.html?q=rail"],
    ["catalogue/index.html", "/team/rs/", "/team/rs/rules/#rule-offset", "../rules/index.html#rule-offset"],
    ["catalogue/index.html", "/team/rs/", "/team/rs", "../index.html"],
  ])("%s (base %s): %s → %s", (page, base, written, expected) => {
    const relative = relativeUrl(written, page, base, isFolder);
    expect(relative).toBe(expected);
    const site = `https://host${base}`;
    const resolved = new URL(relative ?? "", new URL(page, site)).href;
    const target = new URL(written, "https://host");
    const path =
      target.pathname.endsWith("/") ||
      target.pathname === base.replace(/\/$/, "") ||
      folders.has(target.pathname.slice(base.length))
        ? `${target.pathname.replace(/\/?$/, "/")}index.html`
        : target.pathname;
    expect(resolved).toBe(`https://host${path}${target.search}${target.hash}`);
  });

  it.each([
    "#main",
    "report.html",
    "https://example.invalid/x",
    "//other.host/x",
    "data:image/svg+xml,<svg/>",
    "/elsewhere/x",
  ])("leaves %s alone (not under the base, or already relative)", (written) => {
    expect(
      relativeUrl(written, "designs/x/index.html", written === "/elsewhere/x" ? "/team/" : "/", isFolder),
    ).toBeUndefined();
  });
});

describe("relativePath", () => {
  it("climbs only as far as the two paths differ", () => {
    expect(relativePath("a/b/c.html", "a/d/e.html")).toBe("../d/e.html");
    expect(relativePath("a/b/c.html", "a/b/e.html")).toBe("e.html");
    expect(relativePath("x.html", "a/b.html")).toBe("a/b.html");
  });
});

describe("relativizeHtml", () => {
  it("changes only the URL attributes, byte for byte elsewhere, and leaves none absolute", () => {
    const html = `<!doctype html><html data-root="/"><head><link rel=stylesheet href="/styles/site.css"><script defer src='/scripts/catalogue.js'></script></head>
<body><a class="x" href="/catalogue/">Catalogue &amp; more</a> <a href="#main">skip</a> <form action="/try/"></form>
<p>Text mentioning href="/not-an-attribute/"</p><template><a href="/rules/">r</a></template></body></html>`;
    const out = relativizeHtml(html, "designs/x/index.html", "/", isFolder);
    expect(out)
      .toBe(`<!doctype html><html data-root="../../"><head><link rel=stylesheet href="../../styles/site.css"><script defer src="../../scripts/catalogue.js"></script></head>
<body><a class="x" href="../../catalogue/index.html">Catalogue &amp; more</a> <a href="#main">skip</a> <form action="../../try/index.html"></form>
<p>Text mentioning href="/not-an-attribute/"</p><template><a href="../../rules/index.html">r</a></template></body></html>`);
    expect(absoluteUrls(out)).toEqual([]);
    expect(absoluteUrls(html)).toEqual([
      'data-root="/"',
      'href="/styles/site.css"',
      'src="/scripts/catalogue.js"',
      'href="/catalogue/"',
      'action="/try/"',
      'href="/rules/"',
    ]);
  });

  it("keeps an ampersand in a query escaped", () => {
    const out = relativizeHtml(`<a href="/catalogue/?q=a&amp;kind=op-amp">x</a>`, "index.html", "/", isFolder);
    expect(out).toBe(`<a href="catalogue/index.html?q=a&amp;kind=op-amp">x</a>`);
  });
});

describe("relativizePage's quick way and the tokenizer", () => {
  // The quick way only runs on pages as Astro writes them; everything else must fall back and still agree.
  it.each([
    [
      "a page as Astro writes it",
      `<html data-root="/"><body><a href="/parts/p-1/">p</a><img src="/x.svg" alt=""></body></html>`,
    ],
    ["a single-quoted attribute", `<a href='/catalogue/'>c</a> <a href="/rules/">r</a>`],
    ["an entity in a URL", `<a href="/catalogue/?q=a&amp;kind=x">c</a>`],
    ["an upper-case name", `<a HREF="/catalogue/">c</a>`],
    ["a bare quote in text", `<p>say href="/x/"</p><a href="/rules/">r</a>`],
    ["an inline script", `<script>var s = ' src="/x/"';</script><a href="/rules/">r</a>`],
    ["spaces around =", `<a href = "/rules/">r</a>`],
    ["an attribute that only starts like one", `<img srcset="/a.png 2x" data-href="/b/" src="/c.png">`],
  ])("agree on %s", (_, html) => {
    for (const page of ["index.html", "designs/x/index.html"]) {
      expect(relativizePage(html, page, "/", isFolder)).toEqual(tokenizedRelativize(html, page, "/", isFolder));
    }
  });
});
