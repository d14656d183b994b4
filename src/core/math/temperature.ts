// How ratings taken at 25 °C move over the design's temperature range (SPEC §11.7),
// and which end of the range is the worst for a given check.
import { forwardVoltage, type RatedDiode } from "./diode.ts";

/** Rating temperature of the catalogue's diode and bias-current columns. */
export const RATED_C = 25;

/**
 * A silicon junction's forward voltage falls about 2 mV per °C at constant
 * current (Sedra & Smith, Microelectronic Circuits, diode chapter; REFERENCES.md).
 * Used for Schottky junctions too, as the usual first estimate (common practice [M]).
 */
export const VF_TEMPCO_V_PER_C = -2e-3;

export type TemperatureRange = { min_c: number; max_c: number };
export type End = "cold" | "hot";

/** Vf at `current` and `tempC`: the Shockley law between the rated points, shifted −2 mV/°C from 25 °C. */
export function forwardVoltageAt(d: RatedDiode, current: number, tempC: number): number {
  const at25 = forwardVoltage(d, current);
  if (at25 === 0) return 0;
  return Math.max(0, at25 + VF_TEMPCO_V_PER_C * (tempC - RATED_C));
}

export type VfAtEnds = { cold_v: number; hot_v: number; cold_c: number; hot_c: number; at25_v: number };

/** Vf at both ends of the range; the cold end gives the larger drop. */
export function forwardVoltageRange(d: RatedDiode, current: number, range: TemperatureRange): VfAtEnds {
  return {
    cold_v: forwardVoltageAt(d, current, range.min_c),
    hot_v: forwardVoltageAt(d, current, range.max_c),
    cold_c: range.min_c,
    hot_c: range.max_c,
    at25_v: forwardVoltage(d, current),
  };
}

/** The end, its temperature and the drop there, for a check that a larger (or smaller) drop hurts. */
export function worstDrop(v: VfAtEnds, hurts: "larger" | "smaller"): { end: End; c: number; vf_v: number } {
  return hurts === "larger" ? { end: "cold", c: v.cold_c, vf_v: v.cold_v } : { end: "hot", c: v.hot_c, vf_v: v.hot_v };
}

/**
 * Input bias current of a FET-input stage is gate leakage and doubles about
 * every 10 °C (common practice [M], REFERENCES.md "JFET input"); a bipolar
 * input's rated maximum is kept as is. Never scaled below the 25 °C rating,
 * so a range entirely below 25 °C keeps the rated value.
 */
export function biasCurrentAt(ratedA: number, fetInput: boolean, maxC: number): number {
  if (!fetInput) return ratedA;
  return ratedA * 2 ** (Math.max(0, maxC - RATED_C) / 10);
}

/**
 * Diode reverse leakage at `tempC` from its 25 °C rating: silicon and
 * low-leakage junctions double every 10 °C, Schottky leakage grows ten-fold
 * every 25 °C (both common practice [M]). Never scaled down below the rating.
 */
export function leakageAt(d: { type: string; ir_na: number }, tempC: number): number {
  const ir = d.ir_na * 1e-9;
  const rise = Math.max(0, tempC - RATED_C);
  return d.type === "schottky" ? ir * 10 ** (rise / 25) : ir * 2 ** (rise / 10);
}

/** "at −20 °C (the cold end)": how reasons name the end that decided them. */
export function endPhrase(end: End, c: number): string {
  const t = c < 0 ? `−${-c}` : `${c}`;
  return `at ${t} °C (the ${end} end)`;
}
