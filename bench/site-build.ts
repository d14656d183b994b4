// `node bench/site-build.ts`: wall time of the real site build (scripts/build.ts,
// validation and the Astro build) on the demo data and on a generated
// 2,000-part catalogue with 10 designs. Target (issue 18): 8 s for the large one
// on this 2-core machine, no page over 1 MB and the whole site within 60 MB.
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, relative, resolve } from "node:path";
import { isDeepStrictEqual } from "node:util";
import type { Catalogue } from "../src/core/catalogue.ts";
import { parseDesignText } from "../src/engine.ts";
import type { Design } from "../src/core/schemas/design.ts";
import { loadDataSet } from "../src/node/load-data.ts";
import { buildSite } from "../test/e2e/harness/build-site.ts";
import { catalogueCsv, syntheticCatalogue, syntheticDesigns } from "./generate.ts";

const root = resolve(import.meta.dirname, "..");

/** A data folder laid out as `--data` expects: the three CSV files and designs/<id>.json. */
export function writeDataFolder(dir: string, catalogue: Catalogue, designs: Design[]): void {
  mkdirSync(join(dir, "designs"), { recursive: true });
  for (const [name, text] of Object.entries(catalogueCsv(catalogue))) writeFileSync(join(dir, name), text);
  for (const design of designs) {
    const file = join(dir, "designs", `${design.id}.json`);
    const text = `${JSON.stringify(design, null, 2)}\n`;
    // A cleaned Design is also valid input (defaults written out); prove it, so a
    // benchmark never times a data set that differs from the one it meant to.
    const parsed = parseDesignText(file, text);
    if (!isDeepStrictEqual(parsed.design, design)) {
      const why = parsed.problems.map((p) => `${p.path ?? ""}: ${p.message}`).join("; ") || "it parses to other values";
      throw new Error(`bench: design ${design.id} does not read back as written (${why})`);
    }
    writeFileSync(file, text);
  }
}

/** Every file under `dir` whose name ends in `.html`, with its size in bytes. */
export function htmlPages(dir: string): { path: string; bytes: number }[] {
  const pages: { path: string; bytes: number }[] = [];
  for (const entry of readdirSync(dir, { withFileTypes: true, recursive: true })) {
    if (!entry.isFile() || !entry.name.endsWith(".html")) continue;
    const path = join(entry.parentPath, entry.name);
    pages.push({ path: relative(dir, path), bytes: statSync(path).size });
  }
  return pages;
}

/** Builds the site from `dataDir` into `outDir` the way `npm run build` does, and times it. */
export async function timeBuild(dataDir: string, outDir: string): Promise<{ seconds: number; pages: number }> {
  const started = performance.now();
  await buildSite({ dataDir, outDir, base: "/" });
  const seconds = (performance.now() - started) / 1000;
  return { seconds, pages: htmlPages(outDir).length };
}

/** The generated data set the targets are stated for: 2,000 parts (or `parts`), 10 designs, seed 1. */
export function largeDataSet(demoDir: string, parts = 2000): { catalogue: Catalogue; designs: Design[] } {
  const demo = loadDataSet(demoDir);
  const designs = demo.designs.flatMap((d) => (d.design ? [d.design] : []));
  return { catalogue: syntheticCatalogue(demo.catalogue, parts, 1), designs: syntheticDesigns(designs, 10, 1) };
}

const TARGET_S = 8;

/**
 * CPU seconds used by this process's finished children (Linux: /proc/self/stat
 * cutime + cstime, in USER_HZ = 100 ticks a second); undefined elsewhere. On a
 * shared machine this moves less with other load than the wall time does.
 */
function childCpuSeconds(): number | undefined {
  try {
    const fields = readFileSync("/proc/self/stat", "utf8").split(") ")[1]?.split(" ");
    return (Number(fields?.[13]) + Number(fields?.[14])) / 100;
  } catch {
    return undefined;
  }
}

async function main(): Promise<void> {
  const work = mkdtempSync(join(tmpdir(), "railsieve-site-bench-"));
  try {
    const demoDir = resolve(root, "data");
    const largeDir = join(work, "data-2000");
    const { catalogue, designs } = largeDataSet(demoDir);
    writeDataFolder(largeDir, catalogue, designs);
    const lines: string[] = [];
    for (const [label, dataDir, target] of [
      ["demo data", demoDir, undefined],
      [`${catalogue.parts.length} parts, ${designs.length} designs`, largeDir, TARGET_S],
    ] as const) {
      const outDir = join(work, `site-${lines.length}`);
      const cpuBefore = childCpuSeconds();
      const { seconds, pages } = await timeBuild(dataDir, outDir);
      const cpuAfter = childCpuSeconds();
      const cpu =
        cpuBefore === undefined || cpuAfter === undefined ? "" : ` (${(cpuAfter - cpuBefore).toFixed(1)} s CPU)`;
      const sizes = htmlPages(outDir).sort((a, b) => b.bytes - a.bytes);
      const total = sizes.reduce((sum, p) => sum + p.bytes, 0);
      const largest = sizes[0];
      const line =
        `${label.padEnd(26)} ${seconds.toFixed(1).padStart(6)} s${cpu}  ${String(pages).padStart(5)} pages  ` +
        `${(total / 1e6).toFixed(1)} MB in all, largest ${largest ? `${(largest.bytes / 1e3).toFixed(0)} kB (${largest.path})` : "none"}` +
        (target === undefined ? "" : `  target ${target} s (${(seconds / target).toFixed(2)} of target)`);
      console.log(line);
      lines.push(line);
    }
    const outDir = resolve(root, "bench/out");
    mkdirSync(outDir, { recursive: true });
    writeFileSync(
      resolve(outDir, "site-build.txt"),
      `${new Date().toISOString()} node ${process.version}\n${lines.join("\n")}\n`,
    );
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

if (import.meta.main) await main();
