// The rule kit: everything a rule module (rules/*.ts) needs from src/core.
// Rules import from here and from src/core's pure helpers (units, math,
// schemas), never from the engine.
export * from "./define.ts";
export * from "./types.ts";
export * from "./verdict.ts";
export type { Part, PartKind, PartOf } from "../catalogue-index.ts";
