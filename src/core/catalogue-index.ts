// The engine's view of a catalogue: every part, by id, by kind and by what it
// can do. Kept apart from the CSV loader so the browser can index parts
// checked at build time without shipping the parser and row schemas.
import {
  CAPABILITIES,
  isRailedKind,
  KINDS,
  kindsThatCan,
  type Capability,
  type PartKind,
  type RailedKind,
} from "./kinds.ts";
import type { Part, PartOf } from "./kind-rows.ts";

export type { Capability, Part, PartKind, PartOf };

export type Catalogue = {
  parts: Part[];
  byId: Map<string, Part>;
  /** Every kind of the registry has a list, empty when the data folder has none. */
  byKind: { readonly [K in PartKind]: PartOf<K>[] };
  /** The parts a role asking for this capability weighs, in file order. */
  byCapability: Readonly<Record<Capability, Part[]>>;
  opAmps: PartOf<"op-amp">[];
  comparators: PartOf<"comparator">[];
  diodes: PartOf<"diode">[];
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
  const byKind = Object.fromEntries(KINDS.map((k) => [k.kind, list.filter((p) => p.kind === k.kind)])) as {
    [K in PartKind]: PartOf<K>[];
  };
  const byCapability = Object.fromEntries(
    CAPABILITIES.map((c) => {
      const kinds: readonly string[] = kindsThatCan(c);
      return [c, list.filter((p) => kinds.includes(p.kind))];
    }),
  ) as Record<Capability, Part[]>;
  return {
    parts: list,
    byId: new Map(list.map((p) => [p.id, p])),
    byKind,
    byCapability,
    opAmps: byKind["op-amp"],
    comparators: byKind.comparator,
    diodes: byKind.diode,
  };
}

/** A part that runs from the rails (its kind says so in the registry): it has headroom columns. */
export function isRailedPart(part: Part): part is PartOf<RailedKind> {
  return isRailedKind(part.kind);
}
