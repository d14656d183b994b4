// Engine time per design against the bare loop (bench/bare-loop.ts) on seeded
// synthetic catalogues. Every round times every size, engine then bare loop,
// so drift in a shared machine's speed falls on all figures alike; each figure
// is the median over the rounds, and the ratio the median of the rounds' ratios.
import type { Catalogue } from "../src/core/catalogue.ts";
import { evaluateDesign } from "../src/engine.ts";
import type { Design } from "../src/core/schemas/design.ts";
import { bareLoop, bareLoopSorted, outputsFor, planOf } from "./bare-loop.ts";
import { syntheticCatalogue } from "./generate.ts";
import { median, timePerCall } from "./stats.ts";

export type EngineRow = {
  parts: number;
  ms_per_design: number;
  baseline_ms_per_design: number;
  ratio: number;
  /** Evaluation plus reading every role's ranked lists, as the CLI and the site do (the engine ranks on read). */
  ranked_ms_per_design: number;
  /** The bare loop that also ranks each role's fits (bareLoopSorted): what the ranked figure is judged against. */
  sorted_baseline_ms_per_design: number;
  /** ranked ÷ sorted baseline, the median of the rounds' ratios. */
  ranked_ratio: number;
};

type Subject = {
  parts: number;
  engine: () => void;
  bare: () => void;
  ranked: () => void;
  sorted: () => void;
  minMs: number;
};

function subject(base: Catalogue, designs: readonly Design[], parts: number): Subject {
  const catalogue = syntheticCatalogue(base, parts, 1);
  const plans = designs.map((d) => planOf(d, catalogue));
  const outputs = plans.map(outputsFor);
  return {
    parts: catalogue.parts.length,
    engine: () => {
      for (const d of designs) evaluateDesign(d, catalogue);
    },
    bare: () => plans.forEach((p, i) => bareLoop(p, outputs[i] ?? [])),
    sorted: () => plans.forEach((p, i) => void bareLoopSorted(p, outputs[i] ?? [])),
    ranked: () => {
      for (const d of designs) {
        const e = evaluateDesign(d, catalogue);
        if (e.ok) for (const r of e.result.roles) void (r.fits.length + r.rejected.length);
      }
    },
    minMs: Math.min(300, Math.max(40, parts / 200)),
  };
}

export function measureEngine(
  base: Catalogue,
  designs: readonly Design[],
  sizes: readonly number[],
  rounds: number,
): EngineRow[] {
  const subjects = sizes.map((n) => subject(base, designs, n));
  // Warm up on every size so the optimising compiler has seen them all.
  for (const s of subjects) {
    for (let i = 0; i < 3; i++) {
      s.engine();
      s.bare();
      s.ranked();
      s.sorted();
    }
  }
  const times = subjects.map(() => ({
    engine: [] as number[],
    bare: [] as number[],
    ratio: [] as number[],
    ranked: [] as number[],
    sorted: [] as number[],
    rankedRatio: [] as number[],
  }));
  for (let r = 0; r < rounds; r++) {
    subjects.forEach((s, k) => {
      const t = times[k]!;
      const x = timePerCall(s.engine, s.minMs) / designs.length;
      const y = timePerCall(s.bare, s.minMs) / designs.length;
      t.engine.push(x);
      t.bare.push(y);
      t.ratio.push(x / y);
      const z = timePerCall(s.ranked, s.minMs) / designs.length;
      const w = timePerCall(s.sorted, s.minMs) / designs.length;
      t.ranked.push(z);
      t.sorted.push(w);
      t.rankedRatio.push(z / w);
    });
  }
  return subjects.map((s, k) => ({
    parts: s.parts,
    ms_per_design: median(times[k]!.engine),
    baseline_ms_per_design: median(times[k]!.bare),
    ratio: median(times[k]!.ratio),
    ranked_ms_per_design: median(times[k]!.ranked),
    sorted_baseline_ms_per_design: median(times[k]!.sorted),
    ranked_ratio: median(times[k]!.rankedRatio),
  }));
}
