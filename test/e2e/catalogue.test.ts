// The catalogue split by kind (issue 18: no page over 1 MB at 2,000 parts), in
// Chromium on the demo site: the front page's search still finds classes by kind
// and status words across every kind, and a kind's page sorts and filters its
// own table with every parameter. Expected sets come from the demo CSV files
// (data/*.csv) through the loader, never typed in.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadDataSet } from "../../src/node/load-data.ts";
import { browserReady, openBrowser, openTracked, site, troubles, type Tracked } from "./harness/session.ts";
import { visibleCatalogueRows } from "./harness/steps.ts";

describe.skipIf(!browserReady)("the catalogue, split by kind", () => {
  let browser: Browser;
  let t: Tracked;
  let page: Page;
  const data = () => loadDataSet(site("demo").dataDir).catalogue;

  beforeAll(async () => {
    browser = await openBrowser();
    t = await openTracked(browser, "demo");
    page = t.page;
  });
  afterAll(async () => browser?.close());

  const search = async (path: string, query: string) => {
    await page.goto(t.url(path));
    const box = page.getByRole("searchbox", { name: "Search" });
    await box.fill(query);
    await page.locator("#catalogue-status-line", { hasText: `matching “${query}”` }).waitFor();
    return visibleCatalogueRows(page);
  };

  it.each([
    ["comparator", (p: { kind: string }) => p.kind === "comparator"],
    ["diode", (p: { kind: string }) => p.kind === "diode"],
    ["stocked", (p: { status: string }) => p.status === "stocked"],
  ] as const)("finds every class %j names on the front page, of any kind, and nothing else", async (query, wanted) => {
    const expected = data()
      .parts.filter((p) => wanted(p as never))
      .map((p) => p.id);
    expect(expected.length).toBeGreaterThan(0);
    expect([...(await search("catalogue/", query))].sort()).toEqual([...expected].sort());
  });

  it("finds the stocked op amps on the op amps' page, and says how many of how many", async () => {
    const opAmps = data().parts.filter((p) => p.kind === "op-amp");
    const stocked = opAmps.filter((p) => p.status === "stocked").map((p) => p.id);
    expect([...(await search("catalogue/op-amps/", "stocked"))].sort()).toEqual([...stocked].sort());
    expect(await page.locator("#catalogue-status-line").textContent()).toBe(
      `Showing ${stocked.length} of ${opAmps.length} classes matching “stocked”, best matches first.`,
    );
  });

  it("sorts the op amps by gain-bandwidth, by value, the classes with none rated last", async () => {
    await page.goto(t.url("catalogue/op-amps/"));
    const opAmps = data().parts.filter((p) => p.kind === "op-amp");
    await page.getByRole("button", { name: "Gain-bandwidth (MHz)" }).click();
    const ascending = [...opAmps].sort((a, b) => a.gbw_mhz - b.gbw_mhz || opAmps.indexOf(a) - opAmps.indexOf(b));
    expect(await visibleCatalogueRows(page)).toEqual(ascending.map((p) => p.id));
    await page.getByRole("button", { name: "Gain-bandwidth (MHz)" }).click();
    const descending = [...opAmps].sort((a, b) => b.gbw_mhz - a.gbw_mhz || opAmps.indexOf(a) - opAmps.indexOf(b));
    expect(await visibleCatalogueRows(page)).toEqual(descending.map((p) => p.id));
    expect(await page.locator('th[aria-sort="descending"]').textContent()).toContain("Gain-bandwidth");
  });

  it("puts the op amps with no rated input current noise last in both directions", async () => {
    await page.goto(t.url("catalogue/op-amps/"));
    const opAmps = data().parts.filter((p) => p.kind === "op-amp");
    const unrated = opAmps.filter((p) => p.in_pa_rthz == null).map((p) => p.id);
    expect(unrated.length).toBeGreaterThan(0);
    const button = page.getByRole("button", { name: /^Current noise/ });
    for (const direction of ["ascending", "descending"]) {
      await button.click();
      const shown = await visibleCatalogueRows(page);
      expect(shown.slice(shown.length - unrated.length), direction).toEqual(unrated);
    }
    // The empty cells still say so to a screen reader.
    expect(await page.locator("td.nr .visually-hidden").first().textContent()).toBe("not rated");
  });

  it("links each kind's page from the front page, and back", async () => {
    await page.goto(t.url("catalogue/"));
    await page
      .getByRole("navigation", { name: "Parameters by kind" })
      .getByRole("link", { name: /^Diodes/ })
      .click();
    await page.waitForURL(t.url("catalogue/diodes/index.html"));
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Diodes");
    expect(await page.locator("table.catalogue-table tbody tr").count()).toBe(
      data().parts.filter((p) => p.kind === "diode").length,
    );
    await page.getByRole("link", { name: "Catalogue" }).last().click();
    await page.waitForURL((u) => u.pathname.endsWith("catalogue/index.html"));
  });

  it("met no console error, broken link or CSP violation", () => {
    expect(troubles(t)).toEqual([]);
  });
});
