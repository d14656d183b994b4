// The current the sign stage's output must drive, per level shift. With the
// diode clamp it sources the pull-down's current through the diode; with a
// pull-up it sinks the pull-up's current when low; into an NPN it sources the
// base current when high and, with a base clamp, sinks the clamp's current
// when low.
import type { RatedDiode } from "./diode.ts";
import { diodeLoopCurrent } from "./diode-loop.ts";

/** Diode clamp, output high: I·R_pd + Vf(I) = V_OH. */
export function clampSourceCurrent(outputHighV: number, pullDownOhm: number, clamp: RatedDiode): number {
  return diodeLoopCurrent(outputHighV, pullDownOhm, clamp);
}

/** Pull-up, output low: (V_DD − V_OL)/R_pu, sunk by the output. */
export function pullUpSinkCurrent(vddV: number, outputLowV: number, pullUpOhm: number): number {
  return Math.max(0, vddV - outputLowV) / pullUpOhm;
}

/** Pull-up with a push-pull output driven above V_DD: (V_OH − V_DD)/R_pu, sourced by the output. */
export function pullUpSourceCurrent(vddV: number, outputHighV: number, pullUpOhm: number): number {
  return Math.max(0, outputHighV - vddV) / pullUpOhm;
}
