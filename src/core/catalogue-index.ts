// The engine's view of a catalogue: every part, by id and by kind. Kept apart
// from the CSV loader so the browser can index parts checked at build time
// without shipping the parser and row schemas.
import type { Comparator } from "./schemas/comparator.ts";
import type { Diode } from "./schemas/diode.ts";
import type { OpAmp } from "./schemas/op-amp.ts";

export type Part = OpAmp | Comparator | Diode;
export type PartKind = Part["kind"];

export type Catalogue = {
  parts: Part[];
  byId: Map<string, Part>;
  opAmps: OpAmp[];
  comparators: Comparator[];
  diodes: Diode[];
  /** Comparators and op amps: the parts a sign decision can use. */
  amplifiers: (Comparator | OpAmp)[];
};

/**
 * Indexes parts whose ids are already unique (the loader checks that). `parts`
 * keeps file order; the lists by kind are in id order, the ranking's last key,
 * so the engine can rank ties without comparing strings. The parts are copied
 * in that order too: the engine walks each list on every evaluation, and parts
 * laid out in memory in the order it walks them are weighed about 1.5 times as
 * fast at 10,000 parts (bench/), for a copy that costs less than one evaluation.
 */
export function indexCatalogue(parts: readonly Part[]): Catalogue {
  const sorted = [...parts].sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  const byIdOrder = sorted.map((p) => ({ ...p }));
  const copies = new Map(sorted.map((p, i) => [p, byIdOrder[i] as Part]));
  const list = parts.map((p) => copies.get(p) as Part);
  return {
    parts: list,
    byId: new Map(list.map((p) => [p.id, p])),
    opAmps: byIdOrder.filter((p): p is OpAmp => p.kind === "op-amp"),
    comparators: byIdOrder.filter((p): p is Comparator => p.kind === "comparator"),
    diodes: byIdOrder.filter((p): p is Diode => p.kind === "diode"),
    amplifiers: byIdOrder.filter((p): p is Comparator | OpAmp => p.kind !== "diode"),
  };
}
