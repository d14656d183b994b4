// The simulated reading in the browser (issue 19 item 3): on a design page as
// an accessible picture with its table, and on the try page on demand, where a
// part chosen for a role re-simulates; no CSP violation, no other host, and the
// simulator's code is fetched only when asked for.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { browserReady, openBrowser, openTracked, troubles, type Tracked } from "./harness/session.ts";
import { tryPageReady } from "./harness/steps.ts";

describe.skipIf(!browserReady)("the simulated reading", () => {
  let browser: Browser;
  let t: Tracked;
  let page: Page;

  beforeAll(async () => {
    browser = await openBrowser();
    t = await openTracked(browser, "demo");
    page = t.page;
  });
  afterAll(async () => browser?.close());

  it("is on the design page: two pictures with title, description and a table of the numbers", async () => {
    await page.goto(t.url("designs/bridge-10v-5v-adc/"));
    const section = page.locator("section.simulation").first();
    await expect(section.getByRole("heading", { name: /Simulated reading/ }).count()).resolves.toBe(1);
    const images = section.getByRole("img");
    expect(await images.count()).toBe(2);
    expect(await images.first().getAttribute("aria-labelledby")).toBe("sim-fast-title sim-fast-desc");
    expect(await section.locator("table").count()).toBe(2);
    expect(await section.locator(".sim-verdict").textContent()).toMatch(/static worst case of .* by /);
    expect(troubles(t)).toEqual([]);
  });

  it("draws its text at 11 px or more at a phone's 390 px, and nothing of it runs past the screen's edge", async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(t.url("designs/bridge-10v-5v-adc/"));
    const smallest = await page.$$eval(".sim-chart text", (ts) =>
      Math.min(
        ...ts.map((el) => {
          const svg = (el as SVGTextElement).ownerSVGElement as SVGSVGElement;
          const scale = svg.getBoundingClientRect().width / svg.viewBox.baseVal.width;
          return parseFloat(getComputedStyle(el).fontSize) * scale;
        }),
      ),
    );
    expect(smallest).toBeGreaterThanOrEqual(11);
    // The section's own parts (the rest of the page is the view layer's, tested there).
    const widest = await page.$$eval("section.simulation, section.simulation *", (els) =>
      Math.max(
        ...els
          .filter((e) => !e.closest("details:not([open])") || e.tagName === "SUMMARY" || e.tagName === "DETAILS")
          .map((e) => e.getBoundingClientRect().right),
      ),
    );
    expect(widest).toBeLessThanOrEqual(390);
    await page.setViewportSize({ width: 1280, height: 800 });
  });

  it("runs on the try page only when asked, and again when a part is chosen for a role", async () => {
    const chunks: string[] = [];
    page.on("request", (r) => {
      if (/\/simulation\.[^/]*\.js$/.test(r.url())) chunks.push(r.url());
    });
    await page.goto(t.url("try/"));
    await tryPageReady(page);
    expect(chunks).toEqual([]);
    expect(await page.locator("#try-simulation section.simulation").count()).toBe(0);
    await page.getByRole("button", { name: "Simulate the reading" }).click();
    const section = page.locator("#try-simulation section.simulation").first();
    await section.waitFor();
    expect(chunks).toHaveLength(1);
    const before = await section.locator(".sim-verdict").textContent();
    expect(await section.textContent()).toMatch(/with buffer [a-z0-9-]+/);
    // Choose another buffer in the form: the results and then the simulation follow.
    const buffer = page.locator("#bom\\.buffer");
    const options = await buffer.locator("option").evaluateAll((os) => os.map((o) => (o as HTMLOptionElement).value));
    const other = options.find((v) => v !== "" && !(before ?? "").includes(v) && v.startsWith("oa-bip"));
    expect(other).toBeDefined();
    await buffer.selectOption(other as string);
    await page
      .locator("#try-simulation section.simulation", { hasText: `buffer ${other}` })
      .first()
      .waitFor();
    expect(troubles(t)).toEqual([]);
  });
});
