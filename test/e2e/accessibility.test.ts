// axe-core on every page type of the demo site (issue 7 §3): no serious or
// critical violation. Every rule runs in the light colour scheme; the dark
// scheme changes only colours, so there only colour contrast is checked. axe
// is injected as a script, so this file alone opens its contexts with bypassCSP.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadDataSet } from "../../src/node/load-data.ts";
import { seriousViolations, type AxeScope } from "./harness/axe.ts";
import { browserReady, openBrowser, openTracked, site, troubles, type Tracked } from "./harness/session.ts";
import { tryPageReady } from "./harness/steps.ts";

type PageType = { type: string; path: string; scope?: AxeScope; ready?: (page: Page) => Promise<void> };

// One page of each type. The >30 V design adds only its caution to the design page type, the long
// shortlist only its table of further fits.
function pageTypes(): PageType[] {
  const { catalogue } = loadDataSet(site("demo").dataDir);
  const first = (kind: string) => catalogue.parts.find((p) => p.kind === kind)?.id;
  return [
    { type: "home", path: "" },
    { type: "catalogue", path: "catalogue/" },
    { type: "catalogue kind", path: "catalogue/op-amps/" },
    { type: "op-amp part", path: `parts/${first("op-amp")}/` },
    { type: "comparator part", path: `parts/${first("comparator")}/` },
    { type: "diode part", path: `parts/${first("diode")}/` },
    { type: "design", path: "designs/bridge-10v-5v-adc/" },
    { type: "design caution", path: "designs/bus-48v/", scope: { include: ".caution" } },
    // A buffer with more fits than the page draws in full lists the rest one row each.
    {
      type: "design fits beyond the first",
      path: "designs/vibration-2v-split-2v5/",
      scope: { include: ".fits-summary" },
    },
    { type: "rules", path: "rules/" },
    { type: "try", path: "try/", ready: tryPageReady },
    { type: "not found", path: "no-such-page/" },
  ];
}

const SCHEMES = [
  { colorScheme: "light", rules: undefined },
  { colorScheme: "dark", rules: ["color-contrast"] },
] as const;

describe.skipIf(!browserReady)("the accessibility harness", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => browser?.close());

  it("reports an image without alt text and an unnamed button (both critical in axe 4)", async () => {
    const t = await openTracked(browser, "demo", { bypassCSP: true });
    await t.page.goto(t.url());
    await t.page.evaluate(() =>
      document.querySelector("main")?.insertAdjacentHTML("beforeend", '<img src="favicon.svg"><button></button>'),
    );
    const found = await seriousViolations(t.page);
    expect(found.map((v) => v.split(":")[0])).toEqual(["button-name (critical)", "image-alt (critical)"]);
  });
});

describe.skipIf(!browserReady).each(SCHEMES)(
  "accessibility in the $colorScheme colour scheme",
  ({ colorScheme, rules }) => {
    let browser: Browser;
    let t: Tracked;

    beforeAll(async () => {
      browser = await openBrowser();
      t = await openTracked(browser, "demo", { bypassCSP: true, colorScheme });
    });
    afterAll(async () => browser?.close());

    it.each(browserReady ? pageTypes() : [])("$type page (/$path)", async ({ path, scope, ready }) => {
      await t.page.goto(t.url(path));
      await ready?.(t.page);
      if (scope?.include) await t.page.locator(scope.include).first().waitFor();
      expect(await seriousViolations(t.page, { ...scope, ...(rules ? { rules: [...rules] } : {}) })).toEqual([]);
    });

    it("fetched nothing from another host", () => {
      // The not-found page answers 404 on purpose; everything else must load.
      expect(troubles(t).filter((line) => !line.includes("/no-such-page/"))).toEqual([]);
    });
  },
);
