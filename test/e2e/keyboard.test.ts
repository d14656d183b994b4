// The search journey with the keyboard alone (issue 7 §2): Tab, typing and
// Enter only, from the home page to the best match's part page, with the focus
// visible at every stop.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadDataSet } from "../../src/node/load-data.ts";
import { buildSearchIndex } from "../../src/view/search-index.ts";
import { browserReady, openBrowser, openTracked, site, troubles, type Tracked } from "./harness/session.ts";
import { focused, tabUntil, type Focused } from "./harness/steps.ts";

const TYPO = "rial to rial";

describe.skipIf(!browserReady)("searching the catalogue with the keyboard alone", () => {
  let browser: Browser;
  let t: Tracked;
  let page: Page;
  const stops: Focused[] = [];

  beforeAll(async () => {
    browser = await openBrowser();
    t = await openTracked(browser, "demo");
    page = t.page;
  });
  afterAll(async () => browser?.close());

  it("reaches the skip link first, and it moves the focus to the main content", async () => {
    await page.goto(t.url());
    const first = await tabUntil(page, () => true, 1);
    expect(first.at).toMatchObject({ tag: "a", text: "Skip to content", focusVisible: true });
    stops.push(first.at);
    await page.keyboard.press("Enter");
    expect(await page.evaluate(() => document.activeElement?.id)).toBe("main");
  });

  it("opens the catalogue from the main navigation", async () => {
    const nav = await tabUntil(page, (f) => f.tag === "a" && f.text === "Catalogue");
    stops.push(nav.at);
    await Promise.all([page.waitForURL(t.url("catalogue/index.html")), page.keyboard.press("Enter")]);
  });

  it(`types "${TYPO}" into the search box and tabs to the best match`, async () => {
    const box = await tabUntil(page, (f) => f.tag === "input" && f.label.trim() === "Search", 40);
    stops.push(box.at);
    await page.keyboard.type(TYPO, { delay: 15 });
    await page.locator("#catalogue-status-line", { hasText: `matching “${TYPO}”` }).waitFor();

    const { catalogue } = loadDataSet(site("demo").dataDir);
    const best = buildSearchIndex(catalogue.parts).search(TYPO)[0]!.id;
    const result = await tabUntil(page, (f) => f.tag === "a" && f.inResults);
    stops.push(result.at);
    expect(result.at.href).toMatch(new RegExp(`/parts/${best}/index\\.html$`));
    await Promise.all([page.waitForURL(t.url(`parts/${best}/index.html`)), page.keyboard.press("Enter")]);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe(catalogue.byId.get(best)!.name);
    // The focus starts again from the top of the new page.
    expect((await focused(page)).tag).toBe("body");
  });

  it("showed where the focus was at every stop, and the page stayed clean", () => {
    expect(
      stops.map((s) => `${s.tag} '${s.text || s.label}': ${s.focusVisible && s.indicator ? "visible" : "NOT visible"}`),
    ).toEqual(stops.map((s) => `${s.tag} '${s.text || s.label}': visible`));
    expect(stops).toHaveLength(4);
    expect(troubles(t)).toEqual([]);
  });
});
