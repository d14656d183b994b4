// A role's candidates in ranked order (SPEC §7), kept as typed arrays of
// severities and relative margins: a part becomes a result object only when a
// page or report reads the list it is in, and each list is sorted on first read.
import type { Part } from "../catalogue-index.ts";
import { severity } from "../rule-kit/verdict.ts";
import { idOrder, partResult, type Checks, type PartResult } from "./evaluate-part.ts";

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
  readonly #checks: Checks;
  readonly #parts: readonly Part[];
  readonly #severity: Uint8Array;
  readonly #majorKey: Uint16Array;
  readonly #relative: Float64Array;
  readonly #bom: string | undefined;
  #fits: PartResult[] | undefined;
  /** Place in the list of ids looked up so far (−1: not a candidate). */
  readonly #placeOf = new Map<string, number>();
  readonly #made = new Map<number, PartResult>();
  #rejected: PartResult[] | undefined;

  constructor(
    checks: Checks,
    parts: readonly Part[],
    severities: Uint8Array,
    /** majorKey of each part, worked out while the engine had the part at hand. */
    majorKeys: Uint16Array,
    relative: Float64Array,
    bom: string | undefined,
    /** Place of the BOM part among `parts`, found while scoring (−1: not a candidate). */
    bomPlace = -1,
  ) {
    this.#checks = checks;
    this.#parts = parts;
    this.#severity = severities;
    this.#majorKey = majorKeys;
    this.#relative = relative;
    this.#bom = bom;
    if (bom !== undefined && bomPlace >= 0) this.#placeOf.set(bom, bomPlace);
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

  /**
   * One part's result without ranking the rest. The engine asks for the BOM part
   * and the best fit, whose places it already knows; any other id costs one scan.
   */
  resultOf(id: string): PartResult | undefined {
    let i = this.#placeOf.get(id);
    if (i === undefined) {
      i = this.#parts.findIndex((p) => p.id === id);
      this.#placeOf.set(id, i);
    }
    return i < 0 ? undefined : this.#result(i);
  }

  /** The result object of the part at place i; the lists and resultOf share it. */
  #result(i: number): PartResult {
    let made = this.#made.get(i);
    if (made === undefined) {
      const part = this.#parts[i] as Part;
      made = partResult(
        this.#checks,
        part,
        part.id === this.#bom,
        this.#severity[i] as number,
        this.#relative[i] as number,
      );
      this.#made.set(i, made);
    }
    return made;
  }

  /** Id of the best-ranked fit, found in one pass rather than by sorting. */
  bestFit(): string | undefined {
    const compare = this.#comparator();
    let best = -1;
    for (let i = 0; i < this.#parts.length; i++) {
      if ((this.#severity[i] as number) <= LAST_FIT && (best < 0 || compare(i, best) < 0)) best = i;
    }
    if (best < 0) return undefined;
    const id = (this.#parts[best] as Part).id;
    this.#placeOf.set(id, best);
    return id;
  }

  /** compareResults on places in the list: major key, relative margin (largest first), id. */
  #comparator(): (i: number, j: number) => number {
    const parts = this.#parts;
    const major = this.#majorKey;
    const relative = this.#relative;
    const byPosition = isInIdOrder(parts);
    return (i, j) =>
      (major[i] as number) - (major[j] as number) ||
      (relative[j] as number) - (relative[i] as number) ||
      (byPosition ? i - j : idOrder(parts[i] as Part, parts[j] as Part));
  }

  #ranked(fit: boolean): PartResult[] {
    const chosen: number[] = [];
    for (let i = 0; i < this.#parts.length; i++) if ((this.#severity[i] as number) <= LAST_FIT === fit) chosen.push(i);
    return chosen.sort(this.#comparator()).map((i) => this.#result(i));
  }
}
