// The part-kind registry: what each kind of part is called, which catalogue
// file holds it and what it can do in a circuit. Roles ask for a capability
// (`amplify`, `compare`, `rectify`, `clamp`), never for a kind by name, so a
// new kind joins every role its capabilities allow and no other. No zod here:
// the browser reads this without the row schemas (those are in kind-rows.ts).

/** What a part can do in a circuit. */
export const CAPABILITIES = ["amplify", "compare", "rectify", "clamp"] as const;
export type Capability = (typeof CAPABILITIES)[number];

/**
 * `native`: the kind is made for it. `stand-in`: it can do the job, and rules
 * may hold that against it (an op amp as a comparator has no rated overload
 * recovery). A role lists native kinds first.
 */
export type Fitness = "native" | "stand-in";

export type KindWords = {
  /** With its article, for sentences: "an op amp". */
  a: string;
  one: string;
  many: string;
  heading: string;
  /** Other words a search may use for the kind ("opamp"). */
  also?: readonly string[];
};

export type KindSpec = {
  kind: string;
  /** The catalogue file in a data folder; a folder may leave it out (an empty kind). */
  file: string;
  words: KindWords;
  can: Partial<Record<Capability, Fitness>>;
  /**
   * Runs from the supply rails, with input and output ranges rated inward from
   * them (headroom columns): such a part has a rail diagram.
   */
  railed: boolean;
};

export const KINDS = [
  {
    kind: "op-amp",
    file: "op-amps.csv",
    words: { a: "an op amp", one: "op amp", many: "op amps", heading: "Op amps", also: ["opamp", "opamps"] },
    can: { amplify: "native", compare: "stand-in" },
    railed: true,
  },
  {
    kind: "comparator",
    file: "comparators.csv",
    words: { a: "a comparator", one: "comparator", many: "comparators", heading: "Comparators" },
    can: { compare: "native" },
    railed: true,
  },
  {
    kind: "diode",
    file: "diodes.csv",
    words: { a: "a diode", one: "diode", many: "diodes", heading: "Diodes" },
    can: { rectify: "native", clamp: "native" },
    railed: false,
  },
] as const satisfies readonly KindSpec[];

export type PartKind = (typeof KINDS)[number]["kind"];

export const KIND_IDS: readonly PartKind[] = KINDS.map((k) => k.kind);

/** Kinds that run from the rails (op amps, comparators): the ones a rail diagram can draw. */
export type RailedKind = Extract<(typeof KINDS)[number], { railed: true }>["kind"];

export function isRailedKind(kind: PartKind): kind is RailedKind {
  return kindSpec(kind).railed;
}

const BY_KIND = new Map<string, KindSpec>(KINDS.map((k) => [k.kind, k]));

export function kindSpec(kind: PartKind): KindSpec {
  const spec = BY_KIND.get(kind);
  if (!spec) throw new Error(`unknown part kind ${kind}`);
  return spec;
}

export function kindWords(kind: PartKind): KindWords {
  return kindSpec(kind).words;
}

export function isPartKind(kind: string): kind is PartKind {
  return BY_KIND.has(kind);
}

/** Kinds that can do this, the ones made for it first (registry order within each). */
export function kindsThatCan(capability: Capability): PartKind[] {
  const native = KINDS.filter((k) => (k.can as KindSpec["can"])[capability] === "native");
  const standIn = KINDS.filter((k) => (k.can as KindSpec["can"])[capability] === "stand-in");
  return [...native, ...standIn].map((k) => k.kind);
}

export function canDo(kind: PartKind, capability: Capability): boolean {
  return kindSpec(kind).can[capability] !== undefined;
}

/** Every kind's words by kind, for pages that look them up. */
export const KIND_WORDS: Readonly<Record<PartKind, KindWords>> = Object.fromEntries(
  KINDS.map((k) => [k.kind, k.words]),
) as Record<PartKind, KindWords>;
