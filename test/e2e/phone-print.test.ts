// Issue 18 item 3 in Chromium: at a phone's 390 px no page scrolls sideways
// and diagram and chart text is at least 11 px; the try page keeps its verdict
// in view after an edit; a design page prints on at most 10 A4 pages with
// nothing cut at the sheet's edge.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { browserReady, openBrowser, openTracked, troubles, type Tracked } from "./harness/session.ts";
import { tryPageReady } from "./harness/steps.ts";

const PHONE = { width: 390, height: 844 };
// The demo's design pages (the largest is the topology "all" comparison), and one of each other page.
const DESIGNS = ["audio-1v5-20k", "bridge-10v-5v-adc", "bus-48v", "wave-flume-6v-npn"];
// Every demo design prints: the longest is the topology "all" comparison.
const ALL_DESIGNS = [
  ...DESIGNS,
  "hub-generator-15v",
  "probe-0v5-10meg",
  "thermoelectric-3v-on-3v3",
  "vibration-2v-split-2v5",
];
const PAGES = [
  "",
  "catalogue/",
  "catalogue/op-amps/",
  "catalogue/comparators/",
  "catalogue/diodes/",
  "rules/",
  "try/",
  "parts/oa-cmos-rrio-3m/",
  ...DESIGNS.map((d) => `designs/${d}/`),
];

/** How far the page reaches past the viewport's right edge, in CSS px (0 when it does not scroll sideways). */
const sideways = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);

/** The smallest rendered size of any text in the page's drawings, in CSS px. */
const smallestDrawnText = (page: Page) =>
  page.$$eval(".rail-diagram text, .budget-chart text, .sim-chart text", (texts) =>
    Math.min(
      ...texts
        .filter((t) => (t as SVGTextElement).getClientRects().length > 0)
        .map((t) => {
          const svg = (t as SVGTextElement).ownerSVGElement as SVGSVGElement;
          const scale = svg.getBoundingClientRect().width / svg.viewBox.baseVal.width;
          return parseFloat(getComputedStyle(t).fontSize) * scale;
        }),
    ),
  );

/** Pages in a PDF: one `/Type /Page` object each (the tree's root is `/Type /Pages`). */
const pdfPages = (pdf: Buffer) => pdf.toString("latin1").match(/\/Type\s*\/Page(?![s\w])/g)?.length ?? 0;

describe.skipIf(!browserReady)("on a phone and on paper", () => {
  let browser: Browser;
  let demo: Tracked;
  let hostile: Tracked;

  beforeAll(async () => {
    browser = await openBrowser();
    demo = await openTracked(browser, "demo");
    hostile = await openTracked(browser, "hostile");
    await demo.page.setViewportSize(PHONE);
    await hostile.page.setViewportSize(PHONE);
  });
  afterAll(async () => browser?.close());

  it.each(PAGES)("/%s does not scroll sideways at 390 px", async (path) => {
    await demo.page.goto(demo.url(path));
    if (path === "try/") await tryPageReady(demo.page);
    expect(await sideways(demo.page)).toBe(0);
  });

  it("keeps the hostile catalogue's long unbroken text and the catalogue's hidden words inside 390 px", async () => {
    for (const path of [
      "catalogue/",
      "catalogue/op-amps/",
      "catalogue/comparators/",
      "catalogue/diodes/",
      ...(await partPages(hostile)),
    ]) {
      await hostile.page.goto(hostile.url(path));
      expect(await sideways(hostile.page), path).toBe(0);
    }
  });

  it.each(DESIGNS)("draws the diagram and chart text of %s at 11 px or more on a phone", async (id) => {
    await demo.page.goto(demo.url(`designs/${id}/`));
    expect(await demo.page.locator(".rail-diagram text").count()).toBeGreaterThan(0);
    expect(await smallestDrawnText(demo.page)).toBeGreaterThanOrEqual(11);
  });

  it("draws the try page's diagram and chart text at 11 px or more on a phone", async () => {
    await demo.page.goto(demo.url("try/"));
    await tryPageReady(demo.page);
    expect(await demo.page.locator(".budget-chart text").count()).toBeGreaterThan(0);
    expect(await smallestDrawnText(demo.page)).toBeGreaterThanOrEqual(11);
  });

  it("keeps the try page's verdict in view after an edit, at the field that made it", async () => {
    const page = demo.page;
    await page.goto(demo.url("try/"));
    await tryPageReady(page);
    const field = page.getByLabel("Positive rail V+");
    await field.scrollIntoViewIfNeeded();
    const before = await page.locator("#try-status").textContent();
    // 12 V rails let more op amps fit the buffer (the journey's edit): the verdict line changes.
    await field.fill("12");
    await page.waitForURL((url) => url.searchParams.get("supply.positive_v") === "12");
    const status = page.locator("#try-status");
    expect(await status.textContent()).not.toBe(before);
    const box = await status.boundingBox();
    expect(box).not.toBeNull();
    expect(box!.y).toBeGreaterThanOrEqual(0);
    expect(box!.y + box!.height).toBeLessThanOrEqual(PHONE.height + 0.5);
    // The edited field is in view too, not hidden under the pinned line.
    const fieldBox = (await field.boundingBox())!;
    expect(fieldBox.y + fieldBox.height).toBeLessThanOrEqual(box!.y + 0.5);
  });

  it.each(ALL_DESIGNS)("prints %s on at most 10 A4 pages, nothing wider than the sheet", async (id) => {
    const page = demo.page;
    await page.setViewportSize({ width: 1280, height: 800 });
    await page.goto(demo.url(`designs/${id}/`));
    await page.emulateMedia({ media: "print" });
    // A4 (210 mm) less Chromium's default 1 cm margins: 190 mm = 718 CSS px.
    await page.setViewportSize({ width: 718, height: 1000 });
    expect(await sideways(page)).toBe(0);
    const pdf = await page.pdf({ format: "A4", printBackground: false });
    const pages = pdfPages(pdf);
    expect(pages).toBeGreaterThan(0);
    expect(pages).toBeLessThanOrEqual(10);
    await page.emulateMedia({ media: "screen" });
    await page.setViewportSize(PHONE);
  });

  it("met no console error, broken link or CSP violation", () => {
    expect(troubles(demo)).toEqual([]);
  });
});

/** Part pages of the hostile site, where the long free-text payloads live. */
async function partPages(t: Tracked): Promise<string[]> {
  await t.page.goto(t.url("catalogue/"));
  const hrefs = await t.page.$$eval("table a[href*='parts/']", (as) => as.map((a) => (a as HTMLAnchorElement).href));
  return [...new Set(hrefs)].slice(0, 12).map((h) => new URL(h).pathname.replace(/^.*?(parts\/)/, "$1"));
}
