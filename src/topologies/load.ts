// Each topology's module behind a dynamic import, so a bundle splits every
// topology (with the rules and simulation only it uses) into a chunk fetched
// when a design names it. The try page loads them through this table; the CLI
// and the build use the static registry (index.ts). Same ids, same order as
// TOPOLOGY_META (test/topologies/meta.test.ts).
import type { TopologyDef } from "../core/engine/topology.ts";

export const TOPOLOGY_LOADERS: Readonly<Record<string, () => Promise<TopologyDef>>> = {
  "rectify-and-sign": () => import("./rectify-and-sign.ts").then((m) => m.rectifyAndSign),
  "offset-to-mid-rail": () => import("./offset-to-mid-rail.ts").then((m) => m.offsetToMidRail),
  "gained-level-shift": () => import("./gained-level-shift.ts").then((m) => m.gainedLevelShift),
  "difference-to-mid": () => import("./difference-to-mid.ts").then((m) => m.differenceToMid),
};
