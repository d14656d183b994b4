// The one-file design report (issue 20): everything the page needs inside,
// nothing that loads, and a policy whose style hash matches the style block
// byte for byte (CSP3 §8.3: the hash of the element's text, base64 SHA-256;
// FIPS 180-4 for SHA-256 itself, here Node's implementation).
import { createHash } from "node:crypto";
import { parse } from "parse5";
import type { DefaultTreeAdapterTypes } from "parse5";
import { describe, expect, it } from "vitest";
import { REPORT_NOTE, ReportError, resolveSitePath, standaloneReport } from "../../src/view/design-report.ts";

type Element = DefaultTreeAdapterTypes.Element;
function* elements(node: DefaultTreeAdapterTypes.Node): Generator<Element> {
  if ("tagName" in node) yield node;
  if ("childNodes" in node) for (const c of node.childNodes) yield* elements(c);
}

const sha256 = (t: string) => createHash("sha256").update(t, "utf8").digest("base64");
const files: Record<string, string> = {
  "styles/site.css": "body { color: #123; }\n/* ±µΩ */",
  "styles/extra.css": ".x { margin: 0 }",
};
const read = (p: string) => files[p];

const PAGE = `<!doctype html><html lang="en" data-root="../../"><head><meta charset="utf-8">
<link rel="icon" href="../../favicon.svg"><meta http-equiv="Content-Security-Policy" content="default-src 'self'">
<title>Design · railsieve</title><link rel="stylesheet" href="../../styles/site.css"><link rel="stylesheet" href="../../styles/extra.css">
<script type="module" src="../../_astro/x.js"></script></head><body>
<header><nav aria-label="Main"><a href="../../index.html">Home</a></nav></header>
<main id="main"><h1>Design</h1><p><a href="report.html" download="x.html">Download</a></p>
<nav aria-label="Roles"><a href="#role-buffer">Buffer</a></nav>
<p>Part <a href="../../parts/p-1/index.html" class="part">p-1</a>, rule <a href="../../rules/index.html#rule-offset">offset</a>.</p>
<svg class="rail-diagram"><use href="#m"/><use href="../../sprite.svg#m"/><text>V+ 5.00 V</text></svg>
<img src="../../chart.png" alt="chart"><iframe src="x.html"></iframe></main></body></html>`;

describe("standaloneReport", () => {
  const out = standaloneReport(PAGE, { page: "designs/x/index.html", read, sha256 });
  const doc = parse(out);
  const all = [...elements(doc)];
  const attr = (el: Element | undefined, name: string) => el?.attrs.find((a) => a.name === name)?.value;

  it("puts the stylesheets inside, in order, and allows that one style block by its hash", () => {
    const styles = all.filter((e) => e.tagName === "style");
    expect(styles).toHaveLength(1);
    const text = (styles[0]?.childNodes[0] as DefaultTreeAdapterTypes.TextNode).value;
    expect(text).toBe(`${files["styles/site.css"]}\n${files["styles/extra.css"]}`);
    const csp = attr(
      all.find((e) => attr(e, "http-equiv") === "Content-Security-Policy"),
      "content",
    );
    expect(csp).toBe(
      `default-src 'none'; style-src 'sha256-${sha256(text)}'; img-src data:; base-uri 'none'; form-action 'none'`,
    );
  });

  it("keeps nothing that loads: no script, link, image, frame or outside SVG reference", () => {
    expect(all.filter((e) => ["script", "link", "img", "iframe"].includes(e.tagName))).toEqual([]);
    expect(all.filter((e) => e.tagName === "use").map((e) => attr(e, "href"))).toEqual(["#m"]);
    expect(all.some((e) => attr(e, "data-root") !== undefined)).toBe(false);
  });

  it("turns links to other pages into text and keeps in-page anchors and the diagram", () => {
    const links = all.filter((e) => e.tagName === "a").map((e) => attr(e, "href"));
    expect(links).toEqual(["#role-buffer"]);
    expect(out).toContain(`<span class="part">p-1</span>`);
    expect(out).toContain("<text>V+ 5.00 V</text>");
    expect(out).not.toContain("Download");
    expect(out).not.toContain(">Home<");
    expect(out).toContain(REPORT_NOTE);
  });

  it("refuses a stylesheet it cannot carry", () => {
    const withUrl = (p: string) => (p === "styles/site.css" ? "body { background: url(../bg.png) }" : read(p));
    expect(() => standaloneReport(PAGE, { page: "designs/x/index.html", read: withUrl, sha256 })).toThrow(ReportError);
    const missing = () => undefined;
    expect(() => standaloneReport(PAGE, { page: "designs/x/index.html", read: missing, sha256 })).toThrow(
      "designs/x/index.html: stylesheet ../../styles/site.css is not in the built site",
    );
  });
});

describe("resolveSitePath", () => {
  it.each([
    ["designs/x/index.html", "../../styles/site.css", "styles/site.css"],
    ["designs/x/index.html", "report.html?x#y", "designs/x/report.html"],
    ["index.html", "./styles/site.css", "styles/site.css"],
    ["index.html", "https://host/x.css", undefined],
    ["index.html", "/styles/site.css", undefined],
  ])("%s + %s → %s", (page, url, expected) => {
    expect(resolveSitePath(page, url)).toBe(expected);
  });
});
