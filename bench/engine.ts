// Engine time per design against the bare loop (bench/bare-loop.ts) on seeded
// synthetic catalogues. Every round times every size, engine then bare loop,
// so drift in a shared machine's speed falls on all figures alike; each figure
// is the median over the rounds, and the ratio the median of the rounds' ratios.
import type { Catalogue } from "../src/core/catalogue.ts";
import { evaluateDesign } from "../src/engine.ts";
import type { Design } from "../src/core/schemas/design.ts";
import { bareLoop, outputsFor, planOf } from "./bare-loop.ts";
import { syntheticCatalogue } from "./generate.ts";
import { median, timePerCall } from "./stats.ts";

export type EngineRow = {
  parts: number;
  ms_per_design: number;
  baseline_ms_per_design: number;
  ratio: number;
  /** Evaluation plus reading every role's ranked lists, as the CLI and the site do (the engine ranks on read). */
  ranked_ms_per_design: number;
};

type Subject = { parts: number; engine: () => void; bare: () => void; ranked: () => void; minMs: number };

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
    }
  }
  const times = subjects.map(() => ({
    engine: [] as number[],
    bare: [] as number[],
    ratio: [] as number[],
    ranked: [] as number[],
  }));
  for (let r = 0; r < rounds; r++) {
    subjects.forEach((s, k) => {
      const t = times[k]!;
      const x = timePerCall(s.engine, s.minMs) / designs.length;
      const y = timePerCall(s.bare, s.minMs) / designs.length;
      t.engine.push(x);
      t.bare.push(y);
      t.ratio.push(x / y);
      if (r % 2 === 0) t.ranked.push(timePerCall(s.ranked, s.minMs) / designs.length);
    });
  }
  return subjects.map((s, k) => ({
    parts: s.parts,
    ms_per_design: median(times[k]!.engine),
    baseline_ms_per_design: median(times[k]!.bare),
    ratio: median(times[k]!.ratio),
    ranked_ms_per_design: median(times[k]!.ranked),
  }));
}
