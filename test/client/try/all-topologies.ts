// The try page fetches a topology's module the first time a design names it
// (src/client/try/engine.ts); these tests read designs of every topology, so
// they load them all first. Imported for that effect, before the tests run.
import { loadTopologies } from "../../../src/client/try/engine.ts";
import { TOPOLOGY_META } from "../../../src/topologies/meta.ts";

await loadTopologies(TOPOLOGY_META.map((t) => t.id));
