// `npm run bench`: engine speed and memory on the demo catalogue and on a
// generated 2,000-part catalogue. Targets (issue 6): re-evaluation well inside
// one frame (16 ms) for the demo data, within 50 ms for 2,000 parts, measured
// here for the engine alone; the browser adds the DOM update.
import { mkdirSync, writeFileSync } from "node:fs";
import { resolve } from "node:path";
import { evaluateDesign } from "../src/core/engine/evaluate.ts";
import type { Catalogue } from "../src/core/catalogue.ts";
import type { Design } from "../src/core/schemas/design.ts";
import { loadDataSet } from "../src/node/load-data.ts";
import { scaledCatalogue } from "./generate.ts";

const root = resolve(import.meta.dirname, "..");
const data = loadDataSet(resolve(root, "data"));
const designs = data.designs.flatMap((d) => (d.design ? [d.design] : []));

function time(catalogue: Catalogue, design: Design, runs: number): { median: number; p95: number } {
  for (let i = 0; i < 5; i++) evaluateDesign(design, catalogue);
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    // A new object each time, as the try page makes on every keystroke.
    const edited = { ...design, supply: { ...design.supply, positive_v: design.supply.positive_v + (i % 2) * 1e-9 } };
    const t0 = performance.now();
    const e = evaluateDesign(edited, catalogue);
    // Read what a page shows first: the top fits' reasons.
    if (e.ok)
      for (const r of e.result.roles) for (const p of r.fits.slice(0, 5)) for (const f of p.findings) void f.reason;
    samples.push(performance.now() - t0);
  }
  samples.sort((a, b) => a - b);
  return { median: samples[Math.floor(samples.length / 2)] ?? 0, p95: samples[Math.floor(samples.length * 0.95)] ?? 0 };
}

const rows: string[] = [];
const report = (label: string, size: number, budget: number, catalogue: Catalogue) => {
  let worst = { median: 0, p95: 0, id: "" };
  for (const d of designs) {
    const t = time(catalogue, d, 60);
    if (t.p95 > worst.p95) worst = { ...t, id: d.id };
  }
  const line = `${label.padEnd(28)} ${String(size).padStart(5)} parts  slowest design ${worst.id.padEnd(26)} median ${worst.median.toFixed(2)} ms  p95 ${worst.p95.toFixed(2)} ms  target ${budget} ms  (${(worst.p95 / budget).toFixed(2)} of target)`;
  rows.push(line);
  console.log(line);
};

report("demo catalogue", data.catalogue.parts.length, 16, data.catalogue);
const big = scaledCatalogue(data.catalogue, 2000);
report("generated catalogue", big.parts.length, 50, big);

// Run with --expose-gc so the heap is measured after a full collection.
const collect = (globalThis as { gc?: () => void }).gc ?? (() => undefined);
collect();
const before = process.memoryUsage().heapUsed;
const kept = designs.map((d) => evaluateDesign(d, big));
collect();
const after = process.memoryUsage().heapUsed;
const mem = `memory: evaluating all ${designs.length} designs against 2,000 parts holds ${((after - before) / 1024 / 1024).toFixed(1)} MB of results (heap ${(after / 1024 / 1024).toFixed(0)} MB); kept ${kept.length}`;
console.log(mem);
rows.push(mem);

const outDir = resolve(root, "bench/out");
mkdirSync(outDir, { recursive: true });
writeFileSync(
  resolve(outDir, "engine.txt"),
  `${new Date().toISOString()} node ${process.version}\n${rows.join("\n")}\n`,
);
