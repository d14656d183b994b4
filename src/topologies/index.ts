// The topology registry: every front end the engine can weigh a design in, in
// the order pages and comparisons list them. Adding a topology: write its
// module (defineTopology) and list it here.
import type { TopologyDef } from "../core/engine/topology.ts";
import { differenceToMid } from "./difference-to-mid.ts";
import { gainedLevelShift } from "./gained-level-shift.ts";
import { offsetToMidRail } from "./offset-to-mid-rail.ts";
import { rectifyAndSign } from "./rectify-and-sign.ts";

export const TOPOLOGIES: readonly TopologyDef[] = [rectifyAndSign, offsetToMidRail, gainedLevelShift, differenceToMid];
