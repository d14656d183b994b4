// The try page redraws by patching what is already on the page (src/client/try/render.ts)
// instead of rebuilding it. These checks hold it to the plain way: after any run of edits
// the results read exactly as a fresh load of the same address draws them, rows that stay
// keep their elements, the keyboard focus survives a redraw, and the address (written
// after the frame) still gives each committed edit its own history entry.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { browserReady, openBrowser, openTracked, troubles, type Tracked } from "./harness/session.ts";
import { tryPageReady } from "./harness/steps.ts";

/** The results as markup with each element's attributes sorted, so attribute order cannot differ by accident. */
function resultsMarkup(page: Page): Promise<string> {
  return page.evaluate(() => {
    const write = (node: Node): string => {
      if (node instanceof Element) {
        const attrs = node
          .getAttributeNames()
          .sort()
          .map((n) => ` ${n}="${node.getAttribute(n) ?? ""}"`)
          .join("");
        return `<${node.localName}${attrs}>${[...node.childNodes].map(write).join("")}</${node.localName}>`;
      }
      return node.nodeType === Node.TEXT_NODE ? (node.nodeValue ?? "") : "";
    };
    const results = document.getElementById("try-results");
    return results ? [...results.childNodes].map(write).join("") : "";
  });
}

/** Where two long strings first differ, with a little context; "" when they are equal. */
function firstDifference(a: string, b: string): string {
  if (a === b) return "";
  let i = 0;
  while (i < a.length && a[i] === b[i]) i++;
  const at = (s: string) => s.slice(Math.max(0, i - 120), i + 120);
  return `at ${i}:\n  patched: …${at(a)}…\n  fresh:   …${at(b)}…`;
}

describe.skipIf(!browserReady)("the try page's redraw", () => {
  let browser: Browser;
  let t: Tracked;
  let fresh: Tracked;
  let page: Page;

  beforeAll(async () => {
    browser = await openBrowser();
    t = await openTracked(browser, "demo");
    fresh = await openTracked(browser, "demo");
    page = t.page;
    await page.goto(t.url("try/"));
    await tryPageReady(page);
  });
  afterAll(async () => browser?.close());

  const field = (label: string) => page.getByLabel(label, { exact: true });
  const addressHas = (path: string, value: string) => page.waitForURL((url) => url.searchParams.get(path) === value);
  const sameAsFreshLoad = async () => {
    await fresh.page.goto(page.url());
    await tryPageReady(fresh.page);
    expect(firstDifference(await resultsMarkup(page), await resultsMarkup(fresh.page))).toBe("");
  };

  it("reads as a fresh load after edits that move parts between lists, switch topology and load a demo", async () => {
    await field("Positive rail V+").fill("12");
    await addressHas("supply.positive_v", "12");
    await sameAsFreshLoad();
    await field("Positive rail V+").fill("5.1");
    await addressHas("supply.positive_v", "5.1");
    await sameAsFreshLoad();
    await field("Topology").selectOption("all");
    await addressHas("topology", "all");
    await sameAsFreshLoad();
    await field("Topology").selectOption("offset-to-mid-rail");
    await addressHas("topology", "offset-to-mid-rail");
    await sameAsFreshLoad();
    await page.locator("#try-start").selectOption("bus-48v");
    await page.getByRole("button", { name: "Load", exact: true }).click();
    await addressHas("id", "bus-48v");
    await sameAsFreshLoad();
  });

  it("keeps the elements of rows that stay, and patches the numbers in them", async () => {
    await page.goto(t.url("try/"));
    await tryPageReady(page);
    // Parts short of the supply the rails ask for: an edit of V+ changes each one's shortfall.
    const group = page.locator('#try-role-buffer section.reject-group[data-rule="supply-range"]');
    const row = group.locator("li[data-part]").first();
    const part = await row.getAttribute("data-part");
    await row.evaluate((li) => ((li as HTMLElement & { marked?: boolean }).marked = true));
    const before = await row.textContent();
    const head = await group.locator("p.reject-head").textContent();
    await field("Positive rail V+").fill("5.2");
    await addressHas("supply.positive_v", "5.2");
    const same = page.locator(`#try-role-buffer li[data-part="${part}"]`);
    expect(await same.evaluate((li) => (li as HTMLElement & { marked?: boolean }).marked)).toBe(true);
    expect(await same.textContent()).not.toBe(before);
    // The group's example quotes the rails it was worked out for.
    expect(head).toContain("V+ 5.00 V");
    expect(await group.locator("p.reject-head").textContent()).toContain("V+ 5.20 V");
    await sameAsFreshLoad();
  });

  it("keeps the focus on a list's button when the keyboard opens and closes it", async () => {
    const more = page.locator('#try-role-buffer button.more[data-toggle="buffer:rejected"]');
    const lines = page.locator("#try-role-buffer .rejections li");
    const firstLines = await lines.count();
    await more.focus();
    await page.keyboard.press("Enter");
    expect(await more.getAttribute("aria-expanded")).toBe("true");
    expect(await more.evaluate((b) => b === document.activeElement)).toBe(true);
    expect(await lines.count()).toBeGreaterThan(firstLines);
    await page.keyboard.press("Enter");
    expect(await more.getAttribute("aria-expanded")).toBe("false");
    expect(await more.evaluate((b) => b === document.activeElement)).toBe(true);
    expect(await lines.count()).toBe(firstLines);
  });

  it("gives each committed edit one history entry, with the value typed last", async () => {
    await page.goto(t.url("try/"));
    await tryPageReady(page);
    const rail = field("Positive rail V+");
    // Typed one key at a time, then committed with Tab: one entry for "6.5", none for "6" or "6.".
    await rail.fill("");
    await rail.pressSequentially("6.5", { delay: 5 });
    await page.keyboard.press("Tab");
    await addressHas("supply.positive_v", "6.5");
    await rail.fill("7");
    await addressHas("supply.positive_v", "7");
    await page.goBack();
    await addressHas("supply.positive_v", "6.5");
    expect(await rail.inputValue()).toBe("6.5");
    await page.goBack();
    await page.waitForURL((url) => !url.searchParams.has("supply.positive_v"));
    expect(await rail.inputValue()).toBe("5");
  });

  it("stayed clean: no request to another host, no console error, no CSP violation", () => {
    expect([...troubles(t), ...troubles(fresh)]).toEqual([]);
  });
});
