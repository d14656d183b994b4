// Prints one line at the end of every run saying how many browser tests ran, so
// a CI log shows at a glance that they were not all skipped.
import type { Reporter, TestModule } from "vitest/node";

export const BROWSER_PROJECT = "browser";

export function countBrowserTests(modules: ReadonlyArray<TestModule>): {
  passed: number;
  failed: number;
  skipped: number;
} {
  const counts = { passed: 0, failed: 0, skipped: 0 };
  for (const m of modules) {
    if (m.project.name !== BROWSER_PROJECT) continue;
    for (const t of m.children.allTests()) {
      const state = t.result().state;
      if (state === "passed" || state === "failed" || state === "skipped") counts[state]++;
    }
  }
  return counts;
}

export default class BrowserCountReporter implements Reporter {
  onTestRunEnd(modules: ReadonlyArray<TestModule>): void {
    if (!modules.some((m) => m.project.name === BROWSER_PROJECT)) return;
    const { passed, failed, skipped } = countBrowserTests(modules);
    console.log(`browser tests: ${passed + failed} ran (${passed} passed, ${failed} failed), ${skipped} skipped`);
  }
}
