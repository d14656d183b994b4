// The reverse voltage each diode of the chain must block (SPEC §11.12).

/**
 * Two-diode inverting charge pump, driven 0 … V_d: the flying node swings from
 * +Vf (first diode on) to −(V_d − Vf) (second diode on, rail at −(V_d − 2Vf)),
 * so the first diode blocks 0 − (−(V_d − Vf)) and the second Vf − (−(V_d − 2Vf)):
 * both V_d − Vf. The no-load rail is the deepest, so this is the worst case;
 * the smallest Vf (the hot end) makes it largest.
 */
export function pumpDiodeReverse(driveV: number, vfV: number): number {
  return Math.max(0, driveV - vfV);
}

/**
 * Inverting half-wave precision rectifier: on the half where the stage's output
 * sits at the window plus one drop, the off diode sits between that output and
 * the virtual ground: W + Vf. The largest Vf (the cold end) makes it largest.
 */
export function rectifierDiodeReverse(windowV: number, vfV: number): number {
  return windowV + vfV;
}
