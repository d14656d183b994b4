// A role's candidates in ranked order (SPEC §7), kept as typed arrays of
// severities and relative margins: a part becomes a result object only when a
// page or report reads the list it is in, and each list is sorted on first read.
import type { Part } from "../catalogue.ts";
import { idOrder, partResult, type PartResult } from "./evaluate-part.ts";
import type { RoleContext, Rule } from "./types.ts";
import { severity } from "./verdict.ts";

const LAST_FIT = severity("marginal");

// Candidate lists keep file order. Many catalogues keep their files in id order
// (the last ranking key): then ties on every other key fall back to list
// position, and no ids are compared. Checked once per list.
const inIdOrder = new WeakMap<readonly Part[], boolean>();

function isInIdOrder(parts: readonly Part[]): boolean {
  let known = inIdOrder.get(parts);
  if (known === undefined) {
    known = parts.every((p, i) => i === 0 || (parts[i - 1] as Part).id < p.id);
    inIdOrder.set(parts, known);
  }
  return known;
}

export class RoleRanking {
  readonly #rules: readonly Rule[];
  readonly #ctx: RoleContext;
  readonly #parts: readonly Part[];
  readonly #severity: Uint8Array;
  readonly #majorKey: Uint16Array;
  readonly #relative: Float64Array;
  readonly #bom: string | undefined;
  #fits: PartResult[] | undefined;
  #rejected: PartResult[] | undefined;

  constructor(
    rules: readonly Rule[],
    ctx: RoleContext,
    parts: readonly Part[],
    severities: Uint8Array,
    /** majorKey of each part, worked out while the engine had the part at hand. */
    majorKeys: Uint16Array,
    relative: Float64Array,
    bom: string | undefined,
  ) {
    this.#rules = rules;
    this.#ctx = ctx;
    this.#parts = parts;
    this.#severity = severities;
    this.#majorKey = majorKeys;
    this.#relative = relative;
    this.#bom = bom;
  }

  get fits(): PartResult[] {
    this.#fits ??= this.#ranked(true);
    return this.#fits;
  }

  get rejected(): PartResult[] {
    this.#rejected ??= this.#ranked(false);
    return this.#rejected;
  }

  /** How many parts fit, without ranking them. */
  get fitCount(): number {
    let count = 0;
    for (let i = 0; i < this.#severity.length; i++) if ((this.#severity[i] as number) <= LAST_FIT) count++;
    return count;
  }

  /** One part's result without ranking the rest (the lists' own object once they are made). */
  resultOf(id: string): PartResult | undefined {
    const listed =
      (this.#fits ?? []).find((p) => p.part.id === id) ?? (this.#rejected ?? []).find((p) => p.part.id === id);
    if (listed) return listed;
    const i = this.#parts.findIndex((p) => p.id === id);
    return i < 0 ? undefined : this.#result(i);
  }

  #result(i: number): PartResult {
    const part = this.#parts[i] as Part;
    return partResult(
      this.#rules,
      this.#ctx,
      part,
      part.id === this.#bom,
      this.#severity[i] as number,
      this.#relative[i] as number,
    );
  }

  /** Id of the best-ranked fit, found in one pass rather than by sorting. */
  bestFit(): string | undefined {
    const parts = this.#parts;
    let best = -1;
    let bestMajor = Infinity;
    let bestRelative = 0;
    for (let i = 0; i < parts.length; i++) {
      if ((this.#severity[i] as number) > LAST_FIT) continue;
      const major = this.#major(i);
      if (major > bestMajor) continue;
      const relative = this.#relative[i] as number;
      const better =
        major < bestMajor ||
        relative > bestRelative ||
        (relative === bestRelative && idOrder(parts[i] as Part, parts[best] as Part) < 0);
      if (better) {
        best = i;
        bestMajor = major;
        bestRelative = relative;
      }
    }
    return best < 0 ? undefined : (parts[best] as Part).id;
  }

  #major(i: number): number {
    return this.#majorKey[i] as number;
  }

  #ranked(fit: boolean): PartResult[] {
    const parts = this.#parts;
    const severities = this.#severity;
    const relative = this.#relative;
    const chosen: number[] = [];
    for (let i = 0; i < parts.length; i++) if ((severities[i] as number) <= LAST_FIT === fit) chosen.push(i);
    const major = this.#majorKey;
    const byPosition = isInIdOrder(parts);
    chosen.sort(
      (i, j) =>
        (major[i] as number) - (major[j] as number) ||
        (relative[j] as number) - (relative[i] as number) ||
        (byPosition ? i - j : idOrder(parts[i] as Part, parts[j] as Part)),
    );
    return chosen.map((i) => this.#result(i));
  }
}
