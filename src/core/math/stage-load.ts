// The load an op-amp stage's output drives (SPEC §11.8): its feedback network,
// the inputs of the next stages and the converter pin, all in parallel.

/** One resistance the output drives, with what it is. */
export type LoadBranch = { what: string; ohm: number };

/** Parallel combination; an empty list (or all infinite) is no load at all, Infinity. */
export function parallelOhm(branches: readonly LoadBranch[]): number {
  const g = loadSiemens(branches);
  return g === 0 ? Infinity : 1 / g;
}

/** The same load as a conductance, Σ 1/R: 0 for no load, and larger for a heavier one (finite either way). */
export function loadSiemens(branches: readonly LoadBranch[]): number {
  let g = 0;
  for (const b of branches) g += 1 / b.ohm;
  return g;
}

/**
 * A sampling converter's input as a resistor: each conversion takes up to C·V
 * of charge (the capacitor discharged between samples, the worst case), so the
 * average current is f_s·C·V, that of 1/(f_s·C) (the switched-capacitor
 * resistor; common practice, as converter input-impedance notes give it [M]).
 */
export function switchedCapOhm(sampleRateHz: number, sampleCapF: number): number {
  return 1 / (sampleRateHz * sampleCapF);
}
