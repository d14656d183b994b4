// Engine time per design against the bare loop (bench/bare-loop.ts) on seeded
// synthetic catalogues. Both run in turn, round after round, so a noisy
// neighbour slows both alike; the ratio is the median of the rounds' ratios.
import type { Catalogue } from "../src/core/catalogue.ts";
import { evaluateDesign } from "../src/core/engine/evaluate.ts";
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

export function measureEngine(base: Catalogue, designs: readonly Design[], parts: number, rounds: number): EngineRow {
  const catalogue = syntheticCatalogue(base, parts, 1);
  const plans = designs.map((d) => planOf(d, catalogue));
  const outputs = plans.map(outputsFor);
  const engine = () => {
    for (const d of designs) evaluateDesign(d, catalogue);
  };
  const ranked = () => {
    for (const d of designs) {
      const e = evaluateDesign(d, catalogue);
      if (e.ok) for (const r of e.result.roles) void (r.fits.length + r.rejected.length);
    }
  };
  const bare = () => plans.forEach((p, i) => bareLoop(p, outputs[i] ?? []));
  const minMs = Math.min(200, Math.max(30, parts / 100));
  // Warm both up so the optimising compiler has seen them.
  for (let i = 0; i < 3; i++) {
    engine();
    bare();
  }
  const e: number[] = [];
  const b: number[] = [];
  const ratios: number[] = [];
  const withRanking: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const x = timePerCall(engine, minMs) / designs.length;
    const y = timePerCall(bare, minMs) / designs.length;
    e.push(x);
    b.push(y);
    ratios.push(x / y);
    if (r < Math.ceil(rounds / 2)) withRanking.push(timePerCall(ranked, minMs) / designs.length);
  }
  return {
    parts: catalogue.parts.length,
    ms_per_design: median(e),
    baseline_ms_per_design: median(b),
    ratio: median(ratios),
    ranked_ms_per_design: median(withRanking),
  };
}
