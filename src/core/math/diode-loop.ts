// A diode in series with a resistor across a voltage V: the current solves
// I·R + Vf(I) = V with Vf(I) from the diode's two rated points (SPEC §4). The
// left side rises with I, so bisection finds the one root.
import { forwardVoltage, type RatedDiode } from "./diode.ts";

/** Current through a diode and resistor in series across `volts` (0 when `volts` ≤ 0). */
export function diodeLoopCurrent(volts: number, ohm: number, diode: RatedDiode): number {
  if (!(volts > 0)) return 0;
  let low = 0;
  let high = volts / ohm;
  // 48 halvings take the interval below 2⁻⁴⁸ of V/R: far below any rated figure.
  for (let i = 0; i < 48; i++) {
    const mid = (low + high) / 2;
    if (mid * ohm + forwardVoltage(diode, mid) > volts) high = mid;
    else low = mid;
  }
  return (low + high) / 2;
}
