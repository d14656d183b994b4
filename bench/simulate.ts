// The simulation target (issue 19): one simulation of one design and topology,
// at both frequencies, ≤ 10 ms in Node. Every demo design and topology is timed
// (median of rounds, each round long enough to be measured); the figure judged
// is the slowest of them.
import type { Catalogue } from "../src/core/catalogue-index.ts";
import type { DesignResult } from "../src/core/engine/result.ts";
import type { Design } from "../src/core/schemas/design.ts";
import { evaluateDesign } from "../src/engine.ts";
import { simulateDesign } from "../src/simulation.ts";
import { median, timePerCall } from "./stats.ts";

export type SimulationRow = { design: string; topology: string; ms: number };

export function measureSimulation(catalogue: Catalogue, designs: readonly Design[], rounds: number): SimulationRow[] {
  const subjects: { design: string; result: DesignResult }[] = [];
  for (const d of designs) {
    const e = evaluateDesign(d, catalogue);
    if (!e.ok) continue;
    for (const result of e.result.comparison ? e.result.comparison.results : [e.result]) {
      if (simulateDesign(result, catalogue).ran) subjects.push({ design: d.id, result });
    }
  }
  const samples = subjects.map(() => [] as number[]);
  for (let round = 0; round < rounds; round++) {
    subjects.forEach((s, i) => samples[i]?.push(timePerCall(() => void simulateDesign(s.result, catalogue), 50)));
  }
  return subjects.map((s, i) => ({ design: s.design, topology: s.result.topology, ms: median(samples[i] ?? []) }));
}
