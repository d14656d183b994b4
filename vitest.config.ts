import { defineConfig } from "vitest/config";
import BrowserCountReporter from "./test/e2e/harness/count-reporter.ts";

export default defineConfig({
  test: {
    environment: "node",
    testTimeout: 20_000,
    reporters: ["default", new BrowserCountReporter()],
    projects: [
      // The browser tests' own helpers (test/e2e/harness/) are plain unit tests.
      {
        extends: true,
        test: {
          name: "unit",
          include: ["test/**/*.test.ts"],
          exclude: ["test/e2e/*.test.ts"],
          // Lays each bad-input case (its own files over test/fixtures/base) out as a whole folder.
          globalSetup: ["test/helpers/fixtures.ts"],
        },
      },
      {
        // Real Chromium against the built site (issue 7). The global setup builds
        // the sites once per run, and only when a browser test is selected.
        extends: true,
        test: {
          name: "browser",
          include: ["test/e2e/*.test.ts"],
          globalSetup: ["test/e2e/harness/global-setup.ts"],
          testTimeout: 60_000,
          hookTimeout: 120_000,
          // Each file starts its own Chromium (several processes each); two at a time suit a small CI box.
          maxWorkers: 2,
        },
      },
    ],
  },
});
