// A logic node pulled up through R into the capacitance C of the pin and its
// trace rises as v(t) = V_f − (V_f − V_0)·e^(−t/RC) (first-order RC step
// response, textbook). From 10 % to 90 % of the step that takes RC·ln 9 ≈ 2.2·RC,
// the usual rise time; the time to reach a threshold from where the edge
// starts is RC·ln((V_f − V_0)/(V_f − V_th)).

/** ln 9 = 2.1972…: the 10–90 % rise of a first-order RC step, quoted as 2.2·RC. */
export const RISE_1090_PER_RC = Math.log(9);

/** 10–90 % rise time of a first-order RC step, seconds. */
export function riseTime1090(ohm: number, farad: number): number {
  return RISE_1090_PER_RC * ohm * farad;
}

/**
 * Time for an RC edge from `startV` towards `finalV` to reach `thresholdV`:
 * 0 when it starts at or past the threshold, Infinity when the edge never gets there.
 */
export function timeToThreshold(
  ohm: number,
  farad: number,
  startV: number,
  finalV: number,
  thresholdV: number,
): number {
  const step = finalV - startV;
  const left = finalV - thresholdV;
  if (step === 0 || (thresholdV - startV) / step <= 0) return 0;
  if (left / step <= 0) return Infinity;
  return ohm * farad * Math.log(step / left);
}

export type PullUpEdge = {
  /** The time the edge adds to the sign: the larger of the two below. */
  seconds: number;
  rise_1090_s: number;
  threshold_s: number;
  tau_s: number;
};

/**
 * The delay a pulled-up edge adds: the 10–90 % rise time 2.2·RC, or the time to
 * reach V_IH when that is longer (a threshold near the supply, or an edge that
 * starts below ground).
 */
export function pullUpEdge(ohm: number, farad: number, startV: number, finalV: number, thresholdV: number): PullUpEdge {
  const rise = riseTime1090(ohm, farad);
  const threshold = timeToThreshold(ohm, farad, startV, finalV, thresholdV);
  return { seconds: Math.max(rise, threshold), rise_1090_s: rise, threshold_s: threshold, tau_s: ohm * farad };
}

/**
 * Capacitance of a logic input with its trace when the design gives none:
 * microcontroller inputs are about 5–10 pF and a short trace adds a few
 * (common practice [M]).
 */
export const DEFAULT_PIN_CAP_F = 10e-12;
