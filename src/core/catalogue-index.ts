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
 * Indexes parts whose ids are already unique (the loader checks that). Every
 * list keeps file order, which is also the order the parts were made in: the
 * engine walks these lists on every evaluation, and walking memory in order is
 * what keeps it fast on a large catalogue (a list sorted by id but not copied
 * weighed 1.5 times slower at 10,000 parts, and copying costs more than it wins
 * back for one check).
 */
export function indexCatalogue(parts: readonly Part[]): Catalogue {
  const list = [...parts];
  return {
    parts: list,
    byId: new Map(list.map((p) => [p.id, p])),
    opAmps: list.filter((p): p is OpAmp => p.kind === "op-amp"),
    comparators: list.filter((p): p is Comparator => p.kind === "comparator"),
    diodes: list.filter((p): p is Diode => p.kind === "diode"),
    amplifiers: list.filter((p): p is Comparator | OpAmp => p.kind !== "diode"),
  };
}
