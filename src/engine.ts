// The one place that hands the registries to the engine: the topologies (with
// the rules of their roles) from src/topologies/, the design schema built from
// their names. Everything that evaluates or reads a design imports it from here.
import type { Catalogue } from "./core/catalogue-index.ts";
import { designReader } from "./core/designs.ts";
import type { DesignResult } from "./core/engine/result.ts";
import type { SimulationOutcome } from "./core/sim/report.ts";
import { simulateResult, type DesignSimulation } from "./core/sim/run-design.ts";
import { ALL_TOPOLOGIES, createEngine, roleApplies, valueAt } from "./core/engine/engine.ts";
import { designSchemaFor, type Design } from "./core/schemas/design.ts";
import { TOPOLOGIES } from "./topologies/index.ts";

export const engine = createEngine(TOPOLOGIES);

export const { evaluateDesign, checkBom, rolesOf } = engine;

/** Topology ids a design may name, "all" last. */
export const TOPOLOGY_IDS = engine.topologyIds as readonly [string, ...string[]];
/** Every role id of every topology. */
export const ROLE_IDS: readonly string[] = engine.roles.map((r) => r.id);

export const designSchema = designSchemaFor({
  topologies: TOPOLOGY_IDS,
  roles: ROLE_IDS,
  // Each topology's own checks, for the designs that name it or "all".
  check: (d) =>
    engine.topologies
      .filter((t) => d.topology === t.id || d.topology === ALL_TOPOLOGIES)
      .flatMap((t) => t.checkDesign?.(d as Design) ?? [])
      .map((p) => ({ path: p.path.split("."), message: p.message })),
});

export const { parseDesignText, parseDesignValue } = designReader(designSchema);

export { ALL_TOPOLOGIES, roleApplies, valueAt };

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
