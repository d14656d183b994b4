// A role's candidates in ranked order (SPEC §7), kept as typed arrays of
// severities and relative margins: a part becomes a result object only when a
// page or report reads the list it is in, and each list is sorted on first read.
import type { Part } from "../catalogue-index.ts";
import { VERDICTS } from "../rule-kit/types.ts";
import { severity } from "../rule-kit/verdict.ts";
import { idOrder, partResult, type Checks, type PartResult, type ScoredList } from "./evaluate-part.ts";

const LAST_FIT = severity("marginal");
/** majorKey's range: severity · 64 + status · 8 + cost band (each below 8). */
const MAJOR_KEYS = VERDICTS.length * 64;

// Each candidate list's parts in id order (the last ranking key), worked out
// once per list and kept while the list lives: ties on every other key then
// compare two integers, not two strings, however many designs read the list.
const idRanks = new WeakMap<readonly Part[], Uint32Array>();

function idRankOf(parts: readonly Part[]): Uint32Array {
  let ranks = idRanks.get(parts);
  if (ranks === undefined) {
    ranks = new Uint32Array(parts.length);
    const byId = Array.from(parts.keys()).sort((i, j) => idOrder(parts[i] as Part, parts[j] as Part));
    byId.forEach((place, rank) => ((ranks as Uint32Array)[place] = rank));
    idRanks.set(parts, ranks);
  }
  return ranks;
}

export class RoleRanking {
  /** What every result made from this list reads its verdict and key from. */
  readonly #list: ScoredList;
  readonly #parts: readonly Part[];
  readonly #severity: Uint8Array;
  readonly #majorKey: Uint16Array;
  readonly #relative: Float64Array;
  #fits: PartResult[] | undefined;
  /** Place in the list of ids looked up so far (−1: not a candidate). */
  readonly #placeOf = new Map<string, number>();
  /** Result objects made so far, by place in the list (sparse until a list is read). */
  readonly #made: (PartResult | undefined)[] = [];
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
    this.#list = { checks, severity: severities, relative, bom };
    this.#parts = parts;
    this.#severity = severities;
    this.#majorKey = majorKeys;
    this.#relative = relative;
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
    let made = this.#made[i];
    if (made === undefined) {
      made = partResult(this.#list, this.#parts[i] as Part, i);
      this.#made[i] = made;
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
    const major = this.#majorKey;
    const minor = this.#minorComparator();
    return (i, j) => (major[i] as number) - (major[j] as number) || minor(i, j);
  }

  /** The keys after the major one: relative margin (largest first), then id. */
  #minorComparator(): (i: number, j: number) => number {
    const relative = this.#relative;
    const rank = idRankOf(this.#parts);
    return (i, j) => (relative[j] as number) - (relative[i] as number) || (rank[i] as number) - (rank[j] as number);
  }

  /**
   * The list in ranked order. The major key (verdict, status, cost band) takes
   * few values, so places are first dealt into its buckets in one counting
   * pass; only each bucket is sorted by comparison. Same order as compareResults.
   */
  #ranked(fit: boolean): PartResult[] {
    const severity = this.#severity;
    const major = this.#majorKey;
    const n = severity.length;
    const counts = new Uint32Array(MAJOR_KEYS + 1);
    for (let i = 0; i < n; i++) if ((severity[i] as number) <= LAST_FIT === fit) counts[(major[i] as number) + 1]!++;
    for (let k = 1; k <= MAJOR_KEYS; k++) counts[k]! += counts[k - 1] as number;
    const total = counts[MAJOR_KEYS] as number;
    const order = new Uint32Array(total);
    const next = counts.slice(0, MAJOR_KEYS);
    for (let i = 0; i < n; i++) if ((severity[i] as number) <= LAST_FIT === fit) order[next[major[i] as number]!++] = i;
    const minor = this.#minorComparator();
    for (let k = 0; k < MAJOR_KEYS; k++) {
      const from = counts[k] as number;
      const to = counts[k + 1] as number;
      if (to - from > 1) order.subarray(from, to).sort(minor);
    }
    const out = new Array<PartResult>(total);
    for (let r = 0; r < total; r++) out[r] = this.#result(order[r] as number);
    return out;
  }
}
