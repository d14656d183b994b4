// Smaller defects of issue 18, each seen as a reader sees it in Chromium: a
// hand-written short link is a valid start (no alert), a tolerance echoes as a
// plain percentage, and the home page's sentence keeps its spaces.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { browserReady, openBrowser, openTracked, troubles, type Tracked } from "./harness/session.ts";
import { tryPageReady } from "./harness/steps.ts";

describe.skipIf(!browserReady)("issue 18's smaller defects, in the demo site", () => {
  let browser: Browser;
  let t: Tracked;

  beforeAll(async () => {
    browser = await openBrowser();
    t = await openTracked(browser, "demo");
  });
  afterAll(async () => browser?.close());

  it("reads 'or read the rules' on the home page, with its spaces", async () => {
    await t.page.goto(t.url("/"));
    const text = (await t.page.locator("main").textContent())?.replace(/\s+/g, " ") ?? "";
    expect(text).toContain("or read the rules every part is checked against");
  });

  it("takes the short link ?signal.peak_v=3 with no alert, the other fields at their defaults", async () => {
    await t.page.goto(t.url("/try/?signal.peak_v=3"));
    await tryPageReady(t.page);
    expect(await t.page.locator("#try-link-problems").isHidden()).toBe(true);
    expect(await t.page.getByLabel("Positive rail V+").inputValue()).toBe("5");
  });

  it("echoes a 0.1 % tolerance as '= 0.1 %', never with an SI prefix on the percent", async () => {
    await t.page.locator('[id="front_end.resistor_tolerance"]').fill("0.001");
    const echo = t.page.locator('[id="front_end.resistor_tolerance--parsed"]');
    await expect.poll(async () => (await echo.textContent())?.trim()).toBe("= 0.1 %");
  });

  it("met no console error, broken link or CSP violation", () => {
    expect(troubles(t)).toEqual([]);
  });
});
