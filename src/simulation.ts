// The simulator composed with the topology registry (SPEC §13): a result through
// its topology's chain. Kept out of engine.ts so what evaluates need not load
// the simulator. (The try page composes its own: src/client/try/simulation.ts.)
import type { Catalogue } from "./core/catalogue-index.ts";
import type { DesignResult } from "./core/engine/result.ts";
import type { SimulationOutcome } from "./core/sim/report.ts";
import { simulateResult, type DesignSimulation } from "./core/engine/simulate-result.ts";
import { engine } from "./engine.ts";

/** Simulates a result (and each topology of a comparison) and keeps the report on it; returns the same result. */
export function withSimulation(result: DesignResult, catalogue: Catalogue): DesignResult {
  const outcome = (r: DesignResult): SimulationOutcome => {
    const s = simulateDesign(r, catalogue);
    return s.ran
      ? { ran: true, topology: s.topology, parts: s.parts, report: s.report }
      : { ran: false, topology: s.topology, reason: s.reason };
  };
  if (result.comparison) {
    for (const r of result.comparison.results) r.simulation ??= outcome(r);
    const same = result.comparison.results.find((r) => r.topology === result.topology);
    result.simulation = same?.simulation ?? outcome(result);
  } else result.simulation = outcome(result);
  return result;
}

/** One topology's result through the simulator, with that topology's chain (SPEC §13). */
export function simulateDesign(result: DesignResult, catalogue: Catalogue): DesignSimulation {
  const topology = engine.topologies.find((t) => t.id === result.topology);
  return simulateResult(result, catalogue, topology?.simulation);
}
