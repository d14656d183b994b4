// Diode forward voltage at any current from the two rated points (SPEC §4):
// the Shockley law makes Vf rise by a fixed step per decade of current.
export type RatedDiode = { vf_1ma_v: number; vf_10ma_v: number };

/** Vf(I) = Vf(1 mA) + (Vf(10 mA) − Vf(1 mA))·log10(I / 1 mA), never below 0. */
export function forwardVoltage(d: RatedDiode, currentA: number): number {
  if (!(currentA > 0)) return 0;
  return Math.max(0, d.vf_1ma_v + (d.vf_10ma_v - d.vf_1ma_v) * Math.log10(currentA / 1e-3));
}
