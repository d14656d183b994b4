// A diode in series with a resistor across a voltage V: the current solves
// I·R + Vf(I) = V with Vf(I) from the diode's two rated points (SPEC §4).
// The rules run this for every candidate on every evaluation, so it tries a
// few fixed-point steps first (I = (V − Vf(I))/R contracts fast wherever the
// diode's small-signal resistance is well below R, the usual case) and falls
// back to bisection (the left side rises with I, so there is one root).
import { forwardVoltage, type RatedDiode } from "./diode.ts";

// Three rules (output current, rise time, late sign) ask for the same loop of one
// candidate in a row: the last answer is kept and given again for the same inputs.
let last = { volts: NaN, ohm: NaN, vf1: NaN, vf10: NaN, current: 0 };

/** Current through a diode and resistor in series across `volts` (0 when `volts` ≤ 0). */
export function diodeLoopCurrent(volts: number, ohm: number, diode: RatedDiode): number {
  if (!(volts > 0)) return 0;
  if (volts === last.volts && ohm === last.ohm && diode.vf_1ma_v === last.vf1 && diode.vf_10ma_v === last.vf10)
    return last.current;
  const current = solveLoop(volts, ohm, diode);
  last = { volts, ohm, vf1: diode.vf_1ma_v, vf10: diode.vf_10ma_v, current };
  return current;
}

function solveLoop(volts: number, ohm: number, diode: RatedDiode): number {
  const tolerance = 1e-12 * volts;
  let i = volts / ohm;
  for (let k = 0; k < 6; k++) {
    i = (volts - forwardVoltage(diode, i)) / ohm;
    if (!(i > 0)) break;
    if (Math.abs(i * ohm + forwardVoltage(diode, i) - volts) <= tolerance) return i;
  }
  let low = 0;
  let high = volts / ohm;
  // 48 halvings take the interval below 2⁻⁴⁸ of V/R: far below any rated figure.
  for (let k = 0; k < 48; k++) {
    const mid = (low + high) / 2;
    if (mid * ohm + forwardVoltage(diode, mid) > volts) high = mid;
    else low = mid;
  }
  return (low + high) / 2;
}
