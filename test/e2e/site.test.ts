// Every page of each built site, reached by following links from the home page:
// nothing is fetched from another host (issue 7 §4), every page declares the
// Content-Security-Policy (§5) and none reports a violation, every local link
// and asset answers, and every part and design has its page.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadDataSet } from "../../src/node/load-data.ts";
import { crawl, type CrawledPage } from "./harness/crawl.ts";
import { policyProblems } from "./harness/csp.ts";
import type { SiteName } from "./harness/context.ts";
import { browserReady, openBrowser, openTracked, troubles, type Tracked } from "./harness/session.ts";

describe.skipIf(!browserReady).each<SiteName>(["demo", "hostile"])("every page of the %s site", (name) => {
  let browser: Browser;
  let t: Tracked;
  let pages: CrawledPage[];
  let files: { url: string; status: number }[];

  beforeAll(async () => {
    browser = await openBrowser();
    t = await openTracked(browser, name);
    ({ pages, files } = await crawl(t));
  });
  afterAll(async () => browser?.close());

  it("asks nothing of any host but the local server and breaks no link", () => {
    expect(t.requests.length).toBeGreaterThan(pages.length - 1);
    expect(troubles(t)).toEqual([]);
    expect(files.filter((f) => f.status !== 200)).toEqual([]);
    expect(pages.filter((p) => p.status !== 200).map((p) => `${p.url} HTTP ${p.status}`)).toEqual([]);
  });

  it("declares a Content-Security-Policy that allows only the site itself on every page", () => {
    const wrong = pages.flatMap((p) => policyProblems(p.csp).map((problem) => `${p.url}: ${problem}`));
    expect(wrong).toEqual([]);
  });

  it("has a title and a language on every page and no link that runs script", () => {
    const wrong = pages.flatMap((p) => [
      ...(p.title.trim() === "" ? [`${p.url}: empty <title>`] : []),
      ...(p.lang ? [] : [`${p.url}: <html> has no lang`]),
      ...p.badLinks.map((l) => `${p.url}: link ${l}`),
    ]);
    expect(wrong).toEqual([]);
  });

  it("links to a page for every part class and every design", () => {
    const data = loadDataSet(t.site.dataDir);
    // Links name a folder's index.html, so the guide also opens from a folder.
    const paths = new Set(pages.map((p) => new URL(p.url).pathname.replace(/index\.html$/, "")));
    const expected = [
      ...data.catalogue.parts.map((p) => `${t.site.base}parts/${p.id}/`),
      ...data.designs.flatMap((d) => (d.design ? [`${t.site.base}designs/${d.design.id}/`] : [])),
      ...["", "catalogue/", "catalogue/op-amps/", "catalogue/comparators/", "catalogue/diodes/", "rules/", "try/"].map(
        (p) => `${t.site.base}${p}`,
      ),
    ];
    expect(expected.filter((p) => !paths.has(p))).toEqual([]);
  });
});
