// The load an op-amp stage's output drives (SPEC §11.8): its feedback network,
// the inputs of the next stages and the converter pin, all in parallel.

/** One resistance the output drives, with what it is. */
export type LoadBranch = { what: string; ohm: number };

/** Parallel combination; an empty list (or all infinite) is no load at all, Infinity. */
export function parallelOhm(branches: readonly LoadBranch[]): number {
  let g = 0;
  for (const b of branches) g += 1 / b.ohm;
  return g === 0 ? Infinity : 1 / g;
}
