// With JavaScript off (issue 4 §2: "the full tables still show"): the catalogue
// lists every class, a part page and a design page read in full, and the try
// page says why it needs a script instead of sitting blank.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadDataSet } from "../../src/node/load-data.ts";
import { browserReady, openBrowser, openTracked, site, troubles, type Tracked } from "./harness/session.ts";

describe.skipIf(!browserReady)("the demo site with JavaScript off", () => {
  let browser: Browser;
  let t: Tracked;
  let page: Page;
  const url = (path: string) => t.url(path);

  beforeAll(async () => {
    browser = await openBrowser();
    t = await openTracked(browser, "demo", { javaScriptEnabled: false });
    page = t.page;
  });
  afterAll(async () => browser?.close());

  it("shows every class in the catalogue tables", async () => {
    const { catalogue } = loadDataSet(site("demo").dataDir);
    await page.goto(url("catalogue/"));
    const rows = page.locator("table.catalogue-table tbody tr");
    expect(await rows.count()).toBe(catalogue.parts.length);
    const visible = await rows.evaluateAll((trs) => trs.filter((tr) => (tr as HTMLElement).checkVisibility()).length);
    expect(visible).toBe(catalogue.parts.length);
  });

  it.each([
    ["op-amps", "op-amp"],
    ["comparators", "comparator"],
    ["diodes", "diode"],
  ])("shows every class of catalogue/%s/ with its parameters", async (path, kind) => {
    const { catalogue } = loadDataSet(site("demo").dataDir);
    await page.goto(url(`catalogue/${path}/`));
    const rows = page.locator("table.catalogue-table tbody tr");
    const expected = catalogue.parts.filter((p) => p.kind === kind).length;
    expect(await rows.count()).toBe(expected);
    const visible = await rows.evaluateAll((trs) => trs.filter((tr) => (tr as HTMLElement).checkVisibility()).length);
    expect(visible).toBe(expected);
    // The search form stays hidden: without its script it would do nothing.
    expect(await page.locator("#catalogue-filters").isHidden()).toBe(true);
  });

  it("shows a design's shortlist and rail diagrams, drawn at build time", async () => {
    await page.goto(url("designs/bridge-10v-5v-adc/"));
    expect(await page.locator("#role-buffer ol.results > li").count()).toBeGreaterThan(0);
    expect(await page.locator("#role-buffer svg.rail-diagram").count()).toBeGreaterThan(0);
  });

  it("explains on the try page that it needs JavaScript", async () => {
    await page.goto(url("try/"));
    expect(await page.locator("main").innerText()).toMatch(/needs JavaScript/);
  });

  it("fetched nothing from another host", () => {
    expect(troubles(t)).toEqual([]);
  });
});
