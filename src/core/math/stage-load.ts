// The load an op-amp stage's output drives (SPEC §11.8): its feedback network,
// the inputs of the next stages and the converter pin, all in parallel.

/** A voltage span, volts (the same shape as the rule kit's Range, kept here so this module stands alone). */
export type VoltSpan = { low: number; high: number };

/**
 * One resistance the output drives, with what it is and the voltage of the node
 * it returns to (a virtual ground at 0 V, an input held by feedback, a sampling
 * capacitor's charge): a span when that node moves, the worst end taken. Absent,
 * the return is unknown and the current is taken to the farther rail.
 */
export type LoadBranch = { what: string; ohm: number; return_v?: VoltSpan };

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

/** One branch's part of the output current: the return voltage taken and its signed current (+ flows out). */
export type BranchShare = { branch: LoadBranch; return_v: number; amps: number };

/** The largest current an output delivers into its branches, where and which way. */
export type PeakCurrent = {
  /** |I|, amps; 0 when the output drives nothing. */
  amps: number;
  /** The output level it is reached at, volts. */
  at_v: number;
  /** True when the output sources it (current flows out of the pin), false when it sinks. */
  sources: boolean;
  /** Each branch at that level, in the order given. */
  shares: BranchShare[];
  /** Branches whose return node is unknown, taken at the farther rail. */
  assumed: string[];
};

/**
 * Kirchhoff's current law at the output: I = Σ (V_out − V_return,i) / R_i,
 * signed, at each extreme of the output, so currents into branches that return
 * to different nodes cancel where they oppose. A return that moves (a span) is
 * taken at whichever end makes the sum larger in each direction, branch by
 * branch: that ignores any tie between the branches' nodes, so it can only
 * overstate. An unknown return is taken at the rail farther from the output.
 */
export function peakOutputCurrent(branches: readonly LoadBranch[], output: VoltSpan, rails: VoltSpan): PeakCurrent {
  const assumed = branches.filter((b) => b.return_v === undefined).map((b) => b.what);
  let best: PeakCurrent | undefined;
  for (const v of [output.low, output.high]) {
    for (const sources of [true, false]) {
      // Sourcing is largest with each return at its lowest; sinking, at its highest.
      const shares = branches.map((branch) => {
        const r = branch.return_v ?? rails;
        const ret = sources ? Math.min(r.low, r.high) : Math.max(r.low, r.high);
        return { branch, return_v: ret, amps: branch.ohm < Infinity ? (v - ret) / branch.ohm : 0 };
      });
      const sum = shares.reduce((a, x) => a + x.amps, 0);
      const amps = sources ? sum : -sum;
      if (best === undefined || amps > best.amps) best = { amps, at_v: v, sources, shares, assumed };
    }
  }
  // Both directions at both ends were tried, and one of each pair is ≥ 0: best is set and not negative.
  return best ?? { amps: 0, at_v: output.high, sources: true, shares: [], assumed };
}

/** peakOutputCurrent's |I| alone, allocating nothing: what a rule measures once per part of the catalogue. */
export function peakOutputAmps(
  branches: readonly LoadBranch[],
  output: VoltSpan,
  railLow: number,
  railHigh: number,
): number {
  let peak = 0;
  for (let end = 0; end < 2; end++) {
    const v = end === 0 ? output.low : output.high;
    let out = 0;
    let into = 0;
    for (const b of branches) {
      if (!(b.ohm < Infinity)) continue;
      const r = b.return_v;
      out += (v - (r === undefined ? railLow : Math.min(r.low, r.high))) / b.ohm;
      into += (v - (r === undefined ? railHigh : Math.max(r.low, r.high))) / b.ohm;
    }
    peak = Math.max(peak, out, -into);
  }
  return peak;
}
