// The gained level shift (SPEC §12.1): the Millman network of level-shift.ts
// feeds a non-inverting stage of gain Gs = 1 + Rf/Rg (Rg to ground), so
//   out = Gs·(a·Vin + b),
// and the overall gain A = Gs·a may exceed the plain network's ½. The network
// must centre its node on V_ref/(2·Gs), so a + b/V_ref = 1 − G/R3 < 1 bounds
// the stage gain from below: Gs > A + ½.
import { seriesValues, type SeriesName } from "./e-series.ts";
import { networkOf, type LevelShiftNetwork } from "./level-shift.ts";

export type GainedLevelShift = {
  /** The network; its R1 is the resistor on the board (the source and any series resistor add to it). */
  network: LevelShiftNetwork;
  /** Resistance in series with R1 that is not on the board: source and protection resistor. */
  source_ohm: number;
  rf_ohm: number;
  rg_ohm: number;
  /** Gs = 1 + Rf/Rg, also the stage's noise gain. */
  stage_gain: number;
  /** A = Gs·a: volts at the converter per volt of signal. */
  gain: number;
  /** Gs·b: the converter's input at zero signal. */
  offset_v: number;
  output_low_v: number;
  output_high_v: number;
};

/** The whole chain for resistor values (nominal or at a tolerance corner). */
export function gainedOf(
  r1: number,
  r2: number,
  r3: number,
  rf: number,
  rg: number,
  sourceOhm: number,
  vref: number,
  peak: number,
): GainedLevelShift {
  const network = networkOf(r1, r2, r3, vref, sourceOhm);
  const full = network;
  const stage = 1 + rf / rg;
  const gain = stage * full.gain;
  const offset = stage * full.offset_v;
  return {
    network,
    source_ohm: sourceOhm,
    rf_ohm: rf,
    rg_ohm: rg,
    stage_gain: stage,
    gain,
    offset_v: offset,
    output_low_v: offset - gain * peak,
    output_high_v: offset + gain * peak,
  };
}

/** The overall gain that fills [margin, V_ref − margin] with ±peak: (V_ref/2 − m)/peak. */
export function fillGain(peak: number, vref: number, margin: number): number {
  return (vref / 2 - margin) / peak;
}

/**
 * Picks R1, R2, R3, Rf, Rg from the series: the largest overall gain whose
 * output stays inside [margin, V_ref − margin], then the best centring.
 * `scaleOhm` sets the size of R1 and Rg (the design's divider_total_ohm).
 * Returns undefined when no nearby values fit.
 */
export function chooseGainedLevelShift(
  peak: number,
  vref: number,
  margin: number,
  scaleOhm: number,
  series: SeriesName,
  sourceOhm = 0,
): GainedLevelShift | undefined {
  const target = fillGain(peak, vref, margin);
  if (!(target > 0)) return undefined;
  const values = seriesValues(series);
  const fits = (x: GainedLevelShift) => x.output_low_v >= margin - 1e-12 && x.output_high_v <= vref - margin + 1e-12;
  const better = (x: GainedLevelShift, best: GainedLevelShift | undefined) => {
    if (!best) return true;
    if (Math.abs(x.gain - best.gain) > 1e-9 * best.gain) return x.gain > best.gain;
    return Math.abs(x.offset_v - vref / 2) < Math.abs(best.offset_v - vref / 2);
  };
  // A stage gain that leaves a + b/V_ref near 0.8 keeps R3 a moderate value.
  const idealStage = Math.max(1.5, (target + 0.5) / 0.8);
  for (const shrink of [1, 0.98, 0.95, 0.9, 0.8]) {
    const wanted = target * shrink;
    let best: GainedLevelShift | undefined;
    for (const rg of near(values, scaleOhm, 2)) {
      for (const rf of near(values, rg * (idealStage - 1), 3)) {
        const stage = 1 + rf / rg;
        const a = wanted / stage;
        const bn = 1 / (2 * stage);
        if (!(a + bn < 0.97)) continue;
        const g = a * scaleOhm;
        for (const r1 of near(values, g / a - sourceOhm, 3)) {
          for (const r2 of near(values, g / bn, 3)) {
            for (const r3 of near(values, g / (1 - a - bn), 3)) {
              const x = gainedOf(r1, r2, r3, rf, rg, sourceOhm, vref, peak);
              if (fits(x) && better(x, best)) best = x;
            }
          }
        }
      }
    }
    if (best) return best;
  }
  return undefined;
}

function near(values: readonly number[], ideal: number, each: number): number[] {
  let i = 0;
  while (i < values.length - 1 && (values[i] ?? 0) < ideal) i++;
  return values.slice(Math.max(0, i - each), Math.min(values.length, i + each));
}

/**
 * Worst input-referred error from resistor tolerance t over every corner of
 * the five resistors at ±t, split into the gain part (|ΔA|/A · peak, which a
 * one-point gain calibration removes) and the offset part (|Δ(Gs·b)|/A, which it
 * does not); the firmware uses the nominal A and Gs·b.
 */
export function gainedToleranceError(x: GainedLevelShift, t: number, peak: number, vref: number) {
  const n = x.network;
  const r3 = n.r3_ohm ?? Infinity;
  let gain = 0;
  let offset = 0;
  for (let corner = 0; corner < 32; corner++) {
    const s = (bit: number) => (corner & (1 << bit) ? 1 + t : 1 - t);
    const c = gainedOf(
      n.r1_ohm * s(0),
      n.r2_ohm * s(1),
      r3 * s(2),
      x.rf_ohm * s(3),
      x.rg_ohm * s(4),
      x.source_ohm,
      vref,
      peak,
    );
    gain = Math.max(gain, (Math.abs(c.gain - x.gain) / x.gain) * peak);
    offset = Math.max(offset, Math.abs(c.offset_v - x.offset_v) / x.gain);
  }
  return { gain_v: gain, offset_v: offset };
}

/** The same split for the source resistance at Rs·(1 ± t), the five resistors nominal (SPEC §11.1). */
export function gainedSourceError(x: GainedLevelShift, t: number, peak: number, vref: number) {
  const n = x.network;
  let gain = 0;
  let offset = 0;
  for (const s of [1 - t, 1 + t]) {
    const c = gainedOf(n.r1_ohm, n.r2_ohm, n.r3_ohm ?? Infinity, x.rf_ohm, x.rg_ohm, x.source_ohm * s, vref, peak);
    gain = Math.max(gain, (Math.abs(c.gain - x.gain) / x.gain) * peak);
    offset = Math.max(offset, Math.abs(c.offset_v - x.offset_v) / x.gain);
  }
  return { gain_v: gain, offset_v: offset };
}
