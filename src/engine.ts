// The one place that hands the registries to the engine: the topologies (with
// the rules of their roles) from src/topologies/, the design schema built from
// their names. Everything that evaluates or reads a design imports it from here,
// except the try page, which loads each topology when named (src/client/try/engine.ts).
import { designReader } from "./core/designs.ts";
import { ALL_TOPOLOGIES, createEngine, roleApplies, topologyDesignChecks, valueAt } from "./core/engine/engine.ts";
import { designSchemaFor } from "./core/schemas/design.ts";
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
  check: topologyDesignChecks((d) =>
    engine.topologies.filter((t) => d.topology === t.id || d.topology === ALL_TOPOLOGIES),
  ),
});

export const { parseDesignText, parseDesignValue } = designReader(designSchema);

export { ALL_TOPOLOGIES, roleApplies, valueAt };
