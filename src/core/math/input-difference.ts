// How far apart an amplifier's two inputs are pulled, and what that does to
// input clamps. Many op amps (bipolar precision and some CMOS classes) carry
// back-to-back diodes between their inputs that conduct above about 0.7 V of
// difference; used open loop they load the signal and may be damaged.

/**
 * Below this difference no silicon input clamp conducts measurably, even at a
 * hot end of 100 °C (0.6 V at 25 °C less 2 mV/°C); a part needs no rating to
 * pass (common practice [M], drift from Sedra & Smith).
 */
export const CLAMP_SAFE_V = 0.3;

/**
 * Current into input clamps that amplifier datasheets commonly allow as an
 * absolute maximum when a series resistor limits it (common practice [M]).
 */
export const CLAMP_CURRENT_MAX_A = 10e-3;

/** The sign stage compares its input (−W … +W) with ground: the inputs differ by up to the larger end. */
export function signDifference(low: number, high: number): number {
  return Math.max(Math.abs(low), Math.abs(high));
}

/**
 * A stage open loop during its dead time: the error at its inputs grows as
 * β·S·t (the same model as the dead time itself, SPEC §11.3), so the largest
 * difference is β·S·t_dead.
 */
export function deadStageDifference(beta: number, inputSlopeVPerS: number, deadS: number): number {
  return beta * inputSlopeVPerS * deadS;
}

export type ClampCheck =
  /** Small enough that no clamp conducts: no rating needed. */
  | { case: "below-floor"; margin: number }
  /** Rated and within the rating. */
  | { case: "within"; margin: number }
  /** Not rated and large enough to matter. */
  | { case: "unrated"; margin: number }
  /** Past the rating with nothing to limit the current. */
  | { case: "conducts"; margin: number }
  /** Past the rating; a series resistor limits the clamp current. */
  | { case: "limited"; margin: number; current_a: number };

/**
 * Checks a difference against `vdiff_max_v` (undefined when not rated) and,
 * past it, the current a series resistor lets into the clamps: (D − V_max)/R.
 * `margin` is volts (rating − difference) except for "limited", where it is
 * amps (CLAMP_CURRENT_MAX_A − current).
 */
export function checkClamp(
  differenceV: number,
  vdiffMaxV: number | undefined,
  seriesOhm: number | undefined,
): ClampCheck {
  if (vdiffMaxV === undefined) {
    return differenceV <= CLAMP_SAFE_V
      ? { case: "below-floor", margin: CLAMP_SAFE_V - differenceV }
      : { case: "unrated", margin: CLAMP_SAFE_V - differenceV };
  }
  const margin = vdiffMaxV - differenceV;
  if (margin >= 0) return { case: "within", margin };
  if (seriesOhm === undefined) return { case: "conducts", margin };
  const current = -margin / seriesOhm;
  return { case: "limited", margin: CLAMP_CURRENT_MAX_A - current, current_a: current };
}
