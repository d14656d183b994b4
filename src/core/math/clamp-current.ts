// Input protection (SPEC §12.4): the current a fault pushes into a pin's rail
// clamps through the resistance in front of it. The pin is a Thévenin source
// V_th behind R_th; once V_th passes a rail by the clamp's turn-on voltage the
// clamp holds the pin there and the rest of the voltage drops across R_th.

/**
 * How far past a rail a pin's internal clamp starts to conduct. Common
 * practice: absolute-maximum tables allow inputs 0.3 V beyond the rails, and a
 * smaller onset only makes the current larger, so 0.3 V is not optimistic
 * about the clamp but is optimistic only where a real clamp starts later.
 */
export const CLAMP_ONSET_V = 0.3;

/**
 * Injection current a pin's clamp may carry when the part does not rate it:
 * 5 mA, common practice for logic and converter inputs (op-amp inputs are
 * usually rated 10 mA, so 5 mA is the lower of the two usual figures).
 */
export const DEFAULT_INJECTION_A = 5e-3;

/** The Thévenin source at a pin for an input voltage: V_th = gain·V_in + offset_v behind ohm. */
export type PinSource = { gain: number; offset_v: number; ohm: number };

/** Clamp current (A, ≥ 0) at a pin for input v, on rails lo … hi. */
export function clampCurrent(source: PinSource, vIn: number, low: number, high: number, onset = CLAMP_ONSET_V): number {
  const vth = source.gain * vIn + source.offset_v;
  const over = vth - (high + onset);
  const under = low - onset - vth;
  const excess = Math.max(over, under, 0);
  return source.ohm > 0 ? excess / source.ohm : excess > 0 ? Infinity : 0;
}

/** The larger clamp current of a fault of either sign, ±fault_v. */
export function worstClampCurrent(source: PinSource, faultV: number, low: number, high: number): number {
  return Math.max(clampCurrent(source, faultV, low, high), clampCurrent(source, -faultV, low, high));
}
