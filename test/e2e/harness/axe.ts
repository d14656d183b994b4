// Runs axe-core in a page and returns its serious and critical violations, one
// line per offending element. axe is injected as a script tag, which the site's
// CSP forbids, so only a context opened with bypassCSP may call this; the CSP
// and security tests never use such a context.
import { createRequire } from "node:module";
import type { AxeResults } from "axe-core";
import type { Page } from "playwright-core";

const AXE_PATH = createRequire(import.meta.url).resolve("axe-core/axe.min.js");

/** WCAG 2.2 A and AA, plus axe's best practices (landmarks, one h1, headings in order). */
export const WCAG_AND_BEST_PRACTICE = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa", "best-practice"];

export type AxeScope = {
  /** CSS selector of the part of the page to check; the whole document when absent. */
  include?: string;
  /** Rule ids to run instead of every rule in WCAG_AND_BEST_PRACTICE. */
  rules?: string[];
};

export async function seriousViolations(page: Page, scope: AxeScope = {}): Promise<string[]> {
  if (!(await page.evaluate(() => "axe" in window))) await page.addScriptTag({ path: AXE_PATH });
  const results = await page.evaluate(
    ({ include, rules, tags }) =>
      (window as unknown as { axe: { run(c: unknown, o: object): Promise<AxeResults> } }).axe.run(
        include ? { include: [[include]] } : document,
        {
          runOnly: rules ? { type: "rule", values: rules } : { type: "tag", values: tags },
          // Collecting passes as well doubles the time on a large design page.
          resultTypes: ["violations"],
        },
      ),
    { include: scope.include, rules: scope.rules, tags: WCAG_AND_BEST_PRACTICE },
  );
  return results.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .flatMap((v) =>
      v.nodes.map(
        (n) =>
          `${v.id} (${v.impact}): ${v.help} — ${n.target.join(" ")}: ${n.failureSummary?.split("\n").slice(1).join(" ").trim() ?? ""}`,
      ),
    );
}
