// The engine as the try page runs it: the same createEngine and design schema
// as src/engine.ts, but each topology's module is fetched the first time a
// design names it (src/topologies/load.ts), so the page's first script carries
// no topology. Everything synchronous here (reading a draft, evaluating it)
// needs the design's topologies loaded first: `loadTopologies(topologiesFor(…))`.
// Asked to work without them, it throws rather than answer with a topology's
// checks left out.
import { designReader } from "../../core/designs.ts";
import { ALL_TOPOLOGIES, createEngine, topologyDesignChecks, type Engine } from "../../core/engine/engine.ts";
import type { Evaluation } from "../../core/engine/result.ts";
import type { TopologyDef } from "../../core/engine/topology.ts";
import type { Catalogue } from "../../core/catalogue-index.ts";
import { designSchemaFor, type Design } from "../../core/schemas/design.ts";
import { TOPOLOGY_LOADERS } from "../../topologies/load.ts";
import { rectifyAndSign } from "../../topologies/rectify-and-sign.ts";
import { ROLE_META, TOPOLOGY_META } from "../../topologies/meta.ts";

/** Topology ids a design may name, "all" last (as src/engine.ts has them). */
const ids: string[] = [...TOPOLOGY_META.map((t) => t.id), ALL_TOPOLOGIES];
export const TOPOLOGY_IDS = ids as [string, ...string[]];

/**
 * The default design's topology (defaults.ts) comes with the page's first
 * script: every visit without a link needs it at once, and one file
 * compresses better than three. The others are fetched when named.
 */
export const BUNDLED_TOPOLOGY: TopologyDef = rectifyAndSign;

const loaded = new Map<string, TopologyDef>([[BUNDLED_TOPOLOGY.id, BUNDLED_TOPOLOGY]]);
const loading = new Map<string, Promise<void>>();
const engines = new Map<string, Engine>();

/** The topologies a design naming `topology` is evaluated in: every one for "all", none for an unknown id (the schema says why). */
export function topologiesFor(topology: string | undefined): string[] {
  if (topology === ALL_TOPOLOGIES) return TOPOLOGY_META.map((t) => t.id);
  return TOPOLOGY_META.some((t) => t.id === topology) ? [topology as string] : [];
}

export function areLoaded(ids: readonly string[]): boolean {
  return ids.every((id) => loaded.has(id));
}

/** Fetches the modules of these topologies; a failed fetch rejects, and the next call tries again. */
export function loadTopologies(ids: readonly string[]): Promise<void> {
  return Promise.all(
    ids.map((id) => {
      if (loaded.has(id)) return undefined;
      let pending = loading.get(id);
      if (!pending) {
        const load = TOPOLOGY_LOADERS[id];
        if (!load) return Promise.reject(new Error(`unknown topology ${id}`));
        pending = load().then(
          (t) => {
            loaded.set(id, t);
            loading.delete(id);
          },
          (e: unknown) => {
            loading.delete(id);
            throw e;
          },
        );
        loading.set(id, pending);
      }
      return pending;
    }),
  ).then(() => undefined);
}

function loadedFor(topology: string): TopologyDef[] {
  const ids = topologiesFor(topology);
  const missing = ids.filter((id) => !loaded.has(id));
  if (missing.length > 0) throw new Error(`topology ${missing.join(", ")} is not loaded yet`);
  return ids.map((id) => loaded.get(id) as TopologyDef);
}

export const designSchema = designSchemaFor({
  topologies: TOPOLOGY_IDS,
  roles: ROLE_META.map((r) => r.id),
  check: topologyDesignChecks((d) => loadedFor(d.topology)),
});

export const { parseDesignValue } = designReader(designSchema);

/**
 * Evaluates a design as src/engine.ts's evaluateDesign does. An engine over
 * the design's own topology (or all of them for "all") answers exactly as the
 * engine over the whole registry: a named topology only ever reads its own roles.
 */
export function evaluateDesign(design: Design, catalogue: Catalogue): Evaluation {
  const topologies = loadedFor(design.topology);
  const key = topologies.map((t) => t.id).join(" ");
  let engine = engines.get(key);
  if (!engine) {
    engine = createEngine(topologies);
    engines.set(key, engine);
  }
  return engine.evaluateDesign(design, catalogue);
}

/** A loaded topology's module (its simulation chain, for one). */
export function loadedTopology(id: string): TopologyDef | undefined {
  return loaded.get(id);
}
