// The NPN inverter level shift: sign output → base resistor R_B → base; emitter
// to ground; collector → pull-up R_C to V_DD → logic pin. An optional clamp
// diode across base and emitter (anode at the emitter) stops a negative output
// from reverse-biasing the base-emitter junction beyond one forward drop.
import type { RatedDiode } from "./diode.ts";
import { diodeLoopCurrent } from "./diode-loop.ts";
import { forwardVoltage } from "./diode.ts";
import { pullUpEdge, type PullUpEdge } from "./rc-edge.ts";

/**
 * Emitter-base reverse rating assumed when the design gives none: small-signal
 * NPN classes rate V_EBO at 5–6 V; the lower end is taken (common practice [M]).
 */
export const NPN_VEBO_DEFAULT_V = 5;

/**
 * Share of an absolute-maximum reverse rating a junction is kept within in
 * normal operation; beyond it the verdict is at best marginal (voltage derating,
 * common practice [M]).
 */
export const REVERSE_DERATING = 0.8;

/**
 * Storage time assumed when the design gives none: small-signal switching NPN
 * classes rate about 200–250 ns at I_C = 10 mA, I_B1 = I_B2 = 1 mA; rounded up
 * because a base driven harder saturates deeper (common practice [M]).
 */
export const NPN_STORAGE_DEFAULT_S = 300e-9;

/** Base-emitter drop of a small NPN that is on (common practice [M]). */
export const NPN_VBE_ON_V = 0.7;

export type BaseReverse = {
  /** Reverse voltage across the base-emitter junction with the sign output low, V (≥ 0). */
  reverse_v: number;
  /** Current the clamp diode carries (and the sign output sinks) through R_B, A. */
  clamp_current_a: number;
};

/**
 * Reverse base-emitter voltage when the sign output sits at `outputLowV`.
 * Without a clamp the junction only leaks, so R_B drops nothing and the base
 * sits at the output's level; with a clamp the base sits at −Vf of the clamp at
 * the current (|V_OL| − Vf)/R_B.
 */
export function baseReverse(outputLowV: number, clamp?: { diode: RatedDiode; base_ohm: number }): BaseReverse {
  const drive = -outputLowV;
  if (!(drive > 0)) return { reverse_v: 0, clamp_current_a: 0 };
  if (!clamp) return { reverse_v: drive, clamp_current_a: 0 };
  const current = diodeLoopCurrent(drive, clamp.base_ohm, clamp.diode);
  return { reverse_v: Math.min(drive, forwardVoltage(clamp.diode, current)), clamp_current_a: current };
}

/** Base current the sign output sources when high, (V_OH − V_BE)/R_B (0 when it cannot turn the NPN on). */
export function baseDriveCurrent(outputHighV: number, baseOhm: number): number {
  return Math.max(0, outputHighV - NPN_VBE_ON_V) / baseOhm;
}

export type NpnTurnOff = {
  /** Storage time plus the collector's rise: how late the logic pin goes high. */
  seconds: number;
  storage_s: number;
  edge: PullUpEdge;
};

/**
 * When the NPN turns off, its collector stays low for the storage time, then
 * rises through R_C into the pin's capacitance from V_CE(sat) towards V_DD.
 * (Turning on is the faster edge: the collector is pulled down by β·I_B.)
 */
export function npnTurnOff(
  storageS: number,
  pullUpOhm: number,
  pinCapF: number,
  vceSatV: number,
  vddV: number,
  vihV: number,
): NpnTurnOff {
  const edge = pullUpEdge(pullUpOhm, pinCapF, vceSatV, vddV, vihV);
  return { seconds: storageS + edge.seconds, storage_s: storageS, edge };
}
