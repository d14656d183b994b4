// Small page actions shared by the journeys.
import { mkdirSync } from "node:fs";
import { resolve } from "node:path";
import type { Locator, Page } from "playwright-core";
import { ROOT } from "./build-site.ts";

/** Screenshots for review, git-ignored. */
export const SCREENSHOTS = resolve(ROOT, "test/screenshots");

export async function screenshot(target: Page | Locator, name: string): Promise<string> {
  mkdirSync(SCREENSHOTS, { recursive: true });
  const path = resolve(SCREENSHOTS, `${name}.png`);
  await target.screenshot({ path });
  return path;
}

/** The try page is ready once its script has fetched the catalogue and drawn the first results. */
export async function tryPageReady(page: Page): Promise<void> {
  await page.locator("#try:not([aria-busy])").waitFor();
  await page.locator("#try-results .try-role").first().waitFor();
}

/** Ids of the catalogue rows a reader can see, table by table, top to bottom (a row's id is its first cell). */
export function visibleCatalogueRows(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    [...document.querySelectorAll<HTMLTableRowElement>("table.catalogue-table tbody tr")]
      .filter((tr) => tr.checkVisibility())
      .map((tr) => tr.cells[0]?.textContent?.trim() ?? ""),
  );
}

/** The catalogue row of one class: the row whose first cell is its id. */
export function catalogueRow(page: Page, id: string): Locator {
  return page.locator("table.catalogue-table tbody tr").filter({
    has: page.locator("td:first-child > code", {
      hasText: new RegExp(`^${id.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}$`),
    }),
  });
}

export type Focused = {
  tag: string;
  text: string;
  /** aria-label, or the text of the <label for> the element. */
  label: string;
  href: string | null;
  /** Inside a catalogue table's body (a search result). */
  inResults: boolean;
  focusVisible: boolean;
  /** An outline or a box shadow is drawn around it. */
  indicator: boolean;
};

/** What has the keyboard focus, and whether the reader can see where it is. */
export function focused(page: Page): Promise<Focused> {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) {
      return { tag: "body", text: "", label: "", href: null, inResults: false, focusVisible: false, indicator: false };
    }
    const style = getComputedStyle(el);
    const indicator =
      (style.outlineStyle !== "none" && parseFloat(style.outlineWidth) > 0) || style.boxShadow !== "none";
    return {
      tag: el.tagName.toLowerCase(),
      text: (el.textContent ?? "").trim().slice(0, 80),
      label:
        el.getAttribute("aria-label") ??
        (el.id ? (document.querySelector(`label[for="${el.id}"]`)?.textContent ?? "") : ""),
      href: el.getAttribute("href"),
      inResults: el.closest("table.catalogue-table tbody") !== null,
      focusVisible: el.matches(":focus-visible"),
      indicator,
    };
  });
}

/** Presses Tab until `wanted` holds for the focused element; the keys pressed are returned for the report. */
export async function tabUntil(
  page: Page,
  wanted: (f: Focused) => boolean,
  max = 120,
): Promise<{ presses: number; at: Focused }> {
  for (let presses = 1; presses <= max; presses++) {
    await page.keyboard.press("Tab");
    const at = await focused(page);
    if (wanted(at)) return { presses, at };
  }
  throw new Error(
    `focus never reached the wanted element in ${max} presses of Tab (last: ${JSON.stringify(await focused(page))})`,
  );
}
