// The level-shift resistor network (a single-rail front end): the signal through R1,
// the ADC reference through R2 and R3 to ground meet at the op amp's
// non-inverting input. By Millman's theorem (J. Millman, "A useful network
// theorem", Proc. IRE 28(9), 1940) the node sits at the conductance-weighted
// mean of the source voltages:
//   V = (Vin/R1 + Vref/R2 + 0/R3) / (1/R1 + 1/R2 + 1/R3) = a·Vin + b,
//   a = G/R1, b = Vref·G/R2, G = R1‖R2‖R3.
// Without R3 the network cannot attenuate below a = 1/2 while centring on
// Vref/2, so a = 1/2 (R1 = R2, no R3) is the largest gain offered.
// The signal's own source resistance Rs sits in series with R1 (Thevenin): the
// node sees R1 + Rs in that branch, so a and b are those of R1 + Rs, not of R1.
import { seriesValues, type SeriesName } from "./e-series.ts";

export type LevelShiftNetwork = {
  /** The resistor on the board; the source (and any series resistor) adds to it. */
  r1_ohm: number;
  /** Resistance in series with R1 that is not on the board: the source and any protection resistor. */
  source_ohm: number;
  r2_ohm: number;
  /** null when the network needs no resistor to ground (a = 1/2). */
  r3_ohm: number | null;
  /** Signal gain a = G/R1. */
  gain: number;
  /** Output at zero signal, b = Vref·G/R2. */
  offset_v: number;
  /** G = (R1 + Rs)‖R2‖R3: the source resistance the op amp's bias current sees. */
  parallel_ohm: number;
};

export function millmanNode(sources: readonly { v: number; ohm: number }[]): number {
  let num = 0;
  let den = 0;
  for (const s of sources) {
    num += s.v / s.ohm;
    den += 1 / s.ohm;
  }
  return num / den;
}

export function networkOf(r1: number, r2: number, r3: number | null, vref: number, sourceOhm = 0): LevelShiftNetwork {
  const signalBranch = r1 + sourceOhm;
  const conductance = 1 / signalBranch + 1 / r2 + (r3 === null ? 0 : 1 / r3);
  const g = 1 / conductance;
  return {
    r1_ohm: r1,
    source_ohm: sourceOhm,
    r2_ohm: r2,
    r3_ohm: r3,
    gain: g / signalBranch,
    offset_v: (vref * g) / r2,
    parallel_ohm: g,
  };
}

/**
 * Picks R1, R2, R3 from the series so that −peak … +peak lands inside
 * [margin, vref − margin], with the largest gain and then the best centring.
 * `scaleOhm` sets R1's size (the design's divider_total_ohm); `sourceOhm` is
 * the resistance already in series with R1 (source and protection), which R2 and
 * R3 are sized against. Returns undefined when no combination of nearby values fits.
 */
export function chooseLevelShift(
  peak: number,
  vref: number,
  margin: number,
  scaleOhm: number,
  series: SeriesName,
  sourceOhm = 0,
): LevelShiftNetwork | undefined {
  const span = vref / 2 - margin;
  if (!(span > 0)) return undefined;
  const target = Math.min(0.5, span / peak);
  const fits = (n: LevelShiftNetwork) =>
    n.offset_v - n.gain * peak >= margin - 1e-12 && n.offset_v + n.gain * peak <= vref - margin + 1e-12;
  const better = (n: LevelShiftNetwork, best: LevelShiftNetwork | undefined) => {
    if (!best) return true;
    if (Math.abs(n.gain - best.gain) > 1e-9 * best.gain) return n.gain > best.gain;
    return Math.abs(n.offset_v - vref / 2) < Math.abs(best.offset_v - vref / 2);
  };
  const values = seriesValues(series);
  let best: LevelShiftNetwork | undefined;
  if (target >= 0.5) {
    // a = 1/2 needs R2 = R1 + Rs: the series value nearest to it (R2 = R1 when there is no source).
    for (const r of near(values, scaleOhm, 3)) {
      const n = networkOf(r, nearest(values, r + sourceOhm), null, vref, sourceOhm);
      if (fits(n) && better(n, best)) best = n;
    }
    if (best) return best;
  }
  // Ideal values for gain a and centre Vref/2: R1 + Rs = G/a, R2 = 2G, R3 = G/(1/2 − a).
  for (const shrink of [1, 0.98, 0.95, 0.9, 0.8]) {
    const a = Math.min(target, 0.499) * shrink;
    const g = a * (scaleOhm + sourceOhm);
    for (const r1 of near(values, scaleOhm, 3)) {
      for (const r2 of near(values, 2 * g, 3)) {
        for (const r3 of near(values, g / (0.5 - a), 3)) {
          const n = networkOf(r1, r2, r3, vref, sourceOhm);
          if (fits(n) && better(n, best)) best = n;
        }
      }
    }
    if (best) return best;
  }
  return undefined;
}

function nearest(values: readonly number[], ideal: number): number {
  let best = values[0] ?? ideal;
  for (const v of values) if (Math.abs(v - ideal) < Math.abs(best - ideal)) best = v;
  return best;
}

function near(values: readonly number[], ideal: number, each: number): number[] {
  let i = 0;
  while (i < values.length - 1 && (values[i] ?? 0) < ideal) i++;
  return values.slice(Math.max(0, i - each), Math.min(values.length, i + each));
}

/** An input-referred error split as a one-point gain calibration sees it. */
export type SplitError = {
  /** |Δa|/a · peak: a one-point gain calibration removes it. */
  gain_v: number;
  /** |Δb|/a: a shift of the zero, which only a two-point calibration removes. */
  offset_v: number;
};

/**
 * Worst input-referred error from resistor tolerance t over every corner of the
 * three resistors at ±t, against the nominal transfer (the firmware uses the
 * nominal a and b), split into its gain and offset parts.
 */
export function networkToleranceError(n: LevelShiftNetwork, t: number, peak: number, vref: number): SplitError {
  let gain = 0;
  let offset = 0;
  for (const s1 of [-1, 1]) {
    for (const s2 of [-1, 1]) {
      for (const s3 of n.r3_ohm === null ? [0] : [-1, 1]) {
        const m = networkOf(
          n.r1_ohm * (1 + s1 * t),
          n.r2_ohm * (1 + s2 * t),
          n.r3_ohm === null ? null : n.r3_ohm * (1 + s3 * t),
          vref,
          n.source_ohm,
        );
        gain = Math.max(gain, (Math.abs(m.gain - n.gain) / n.gain) * peak);
        offset = Math.max(offset, Math.abs(m.offset_v - n.offset_v) / n.gain);
      }
    }
  }
  return { gain_v: gain, offset_v: offset };
}

/** The same split for the source resistance at Rs·(1 ± t), the resistors nominal (SPEC §11.1). */
export function sourceToleranceError(n: LevelShiftNetwork, t: number, peak: number, vref: number): SplitError {
  let gain = 0;
  let offset = 0;
  for (const s of [-1, 1]) {
    const m = networkOf(n.r1_ohm, n.r2_ohm, n.r3_ohm, vref, n.source_ohm * (1 + s * t));
    gain = Math.max(gain, (Math.abs(m.gain - n.gain) / n.gain) * peak);
    offset = Math.max(offset, Math.abs(m.offset_v - n.offset_v) / n.gain);
  }
  return { gain_v: gain, offset_v: offset };
}
