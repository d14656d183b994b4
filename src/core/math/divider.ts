// The attenuating divider of SPEC §6 and §11.1: top R1, bottom R2 from a
// preferred series, loaded by the source resistance Rs in series with R1.
import { seriesValues, type SeriesName } from "./e-series.ts";

export type Divider = {
  top_ohm: number;
  bottom_ohm: number;
  /** The loaded ratio k = R2/(Rs + R1 + R2) (SPEC §11.1). */
  ratio: number;
  /** R1 + R2, the divider's own total. */
  total_ohm: number;
  /** Rs, the source resistance the ratio includes. */
  source_ohm: number;
  /** "search": picked from the series by `chooseDivider`; "held": the design's own R1 and R2, used as given. */
  chosen_by: "search" | "held";
};

/** The loaded ratio R2/(Rs + R1 + R2). */
export function loadedRatio(topOhm: number, bottomOhm: number, sourceOhm: number): number {
  return bottomOhm / (sourceOhm + topOhm + bottomOhm);
}

// Ratios equal to within this are the same ratio (float noise from R2/(R1+R2)).
const RATIO_EPSILON = 1e-12;

/**
 * Largest loaded ratio k = R2/(Rs+R1+R2) not above `target`, with R1 + R2
 * within 0.5…2 × `total`; ties go to the total closest to `total` (by log
 * distance). Returns null when no divider is needed (target ≥ 1) and
 * undefined when no pair of the series fits.
 */
export function chooseDivider(
  target: number,
  total: number,
  series: SeriesName,
  sourceOhm = 0,
): Divider | null | undefined {
  if (target >= 1) return null;
  const key = `${target}|${total}|${series}|${sourceOhm}`;
  if (memo.has(key)) return memo.get(key);
  const values = seriesValues(series);
  let best: Divider | undefined;
  for (const r2 of values) {
    // k ≤ target ⇔ R1 ≥ R2·(1/target − 1) − Rs; larger R1 only lowers k, so the
    // first R1 from there whose total is in range is this R2's best.
    const r1Min = (r2 * (1 / target - 1) - sourceOhm) * (1 - RATIO_EPSILON);
    for (let i = lowerBound(values, r1Min); i < values.length; i++) {
      const r1 = values[i] ?? 0;
      const sum = r1 + r2;
      if (sum > 2 * total) break;
      if (sum < 0.5 * total) continue;
      const k = loadedRatio(r1, r2, sourceOhm);
      if (k > target * (1 + RATIO_EPSILON)) continue;
      const sameRatio = best !== undefined && Math.abs(k - best.ratio) <= best.ratio * RATIO_EPSILON;
      if (!best || (!sameRatio && k > best.ratio) || (sameRatio && closer(sum, best.total_ohm, total))) {
        best = { top_ohm: r1, bottom_ohm: r2, ratio: k, total_ohm: sum, source_ohm: sourceOhm, chosen_by: "search" };
      }
      break;
    }
  }
  if (memo.size > 256) memo.clear();
  memo.set(key, best);
  return best;
}

const memo = new Map<string, Divider | undefined>();

/** The divider a design holds (front_end.divider_r1_ohm and divider_r2_ohm): no search, the loaded ratio of SPEC §11.1. */
export function heldDivider(topOhm: number, bottomOhm: number, sourceOhm: number): Divider {
  return {
    top_ohm: topOhm,
    bottom_ohm: bottomOhm,
    ratio: loadedRatio(topOhm, bottomOhm, sourceOhm),
    total_ohm: topOhm + bottomOhm,
    source_ohm: sourceOhm,
    chosen_by: "held",
  };
}

function lowerBound(values: readonly number[], x: number): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if ((values[mid] ?? 0) < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function closer(a: number, b: number, target: number): boolean {
  return Math.abs(Math.log(a / target)) < Math.abs(Math.log(b / target));
}

/** Resistance seen looking back into the divider from the buffer: (Rs+R1)‖R2. */
export function theveninOhm(sourceOhm: number, divider: Divider | null): number {
  if (!divider) return sourceOhm;
  const top = sourceOhm + divider.top_ohm;
  return (top * divider.bottom_ohm) / (top + divider.bottom_ohm);
}

/**
 * Exact worst-case ratio deviation with both resistors off by ±t in the worst
 * directions: k_max/k − 1 = 2t(1−k)/(1 − t + 2kt), k_min/k − 1 = −2t(1−k)/(1 + t − 2kt).
 */
export function ratioDeviation(k: number, t: number): { high: number; low: number } {
  if (k >= 1) return { high: 0, low: 0 };
  return { high: (2 * t * (1 - k)) / (1 - t + 2 * k * t), low: (-2 * t * (1 - k)) / (1 + t - 2 * k * t) };
}

/**
 * Exact worst-case change of the loaded ratio R2/(Rs+R1+R2) with R1 and R2
 * each off by ±t in the worst directions and Rs at its nominal value (k rises
 * with R2 and falls with R1, so the corners are the extremes). With Rs = 0 it
 * is `ratioDeviation`.
 */
export function loadedRatioDeviation(d: Divider, t: number): { high: number; low: number } {
  const k = d.ratio;
  const high = loadedRatio(d.top_ohm * (1 - t), d.bottom_ohm * (1 + t), d.source_ohm) / k - 1;
  const low = loadedRatio(d.top_ohm * (1 + t), d.bottom_ohm * (1 - t), d.source_ohm) / k - 1;
  return { high, low };
}

/**
 * Worst-case change of the loaded ratio over Rs ± t with R1 and R2 nominal
 * (SPEC §11.1's source term). `varying` is the part of the series resistance
 * the tolerance applies to (the source's own, not a protection resistor's).
 */
export function sourceRatioDeviation(d: Divider, t: number, varying = d.source_ohm): { high: number; low: number } {
  const k = d.ratio;
  return {
    high: loadedRatio(d.top_ohm, d.bottom_ohm, d.source_ohm - varying * t) / k - 1,
    low: loadedRatio(d.top_ohm, d.bottom_ohm, d.source_ohm + varying * t) / k - 1,
  };
}
