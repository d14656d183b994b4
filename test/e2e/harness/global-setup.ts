// Runs once per `vitest run` when browser tests are selected: finds Chromium,
// builds the demo site and the hostile-fixture site into a temp folder, and
// serves each from 127.0.0.1. Without Chromium the tests skip locally with one
// loud line, and fail under CI.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import type { TestProject } from "vitest/node";
import { buildSite, ROOT } from "./build-site.ts";
import { findChromium, INSTALL_HINT } from "./chromium.ts";
import type { Site, SiteName } from "./context.ts";
import { serveFolder, type StaticServer } from "./static-server.ts";

// The hostile site also exercises a non-root base path (SPEC §9: served from any folder).
const DATA_SETS: { name: SiteName; dataDir: string; base: string }[] = [
  { name: "demo", dataDir: resolve(ROOT, "data"), base: "/" },
  { name: "hostile", dataDir: resolve(ROOT, "test/fixtures/hostile"), base: "/team/railsieve/" },
];

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const chromium = findChromium();
  if (!chromium) {
    const message = `Chromium not found (looked for ${process.env.RAILSIEVE_CHROMIUM ?? "/usr/bin/chromium"}); install it with: ${INSTALL_HINT}`;
    if (process.env.CI) throw new Error(`browser tests must run under CI: ${message}`);
    console.warn(`\n!!! BROWSER TESTS SKIPPED: ${message}\n`);
    project.provide("e2e", { ready: false, reason: message });
    return async () => {};
  }

  const tmp = mkdtempSync(join(tmpdir(), "railsieve-e2e-"));
  const servers: StaticServer[] = [];
  const teardown = async () => {
    await Promise.all(servers.map((s) => s.close()));
    rmSync(tmp, { recursive: true, force: true });
  };
  try {
    const started = performance.now();
    const sites = {} as Record<SiteName, Site>;
    // One after the other: concurrent Astro builds share .astro/ and the Vite cache.
    for (const set of DATA_SETS) {
      const dir = join(tmp, set.name);
      await buildSite({ dataDir: set.dataDir, outDir: dir, base: set.base });
      const server = await serveFolder(dir, set.base);
      servers.push(server);
      sites[set.name] = { ...set, dir, origin: server.origin, home: server.home };
    }
    const seconds = ((performance.now() - started) / 1000).toFixed(1);
    console.log(
      `browser tests: built the ${DATA_SETS.map((d) => d.name).join(" and ")} sites in ${seconds} s; Chromium at ${chromium}`,
    );
    project.provide("e2e", { ready: true, chromium, sites });
  } catch (e) {
    await teardown();
    throw e;
  }
  return teardown;
}
