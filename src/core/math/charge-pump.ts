// The diode/capacitor inverting charge pump of SPEC §6, driven by a square wave.
export type PumpInput = {
  drive_v: number;
  frequency_hz: number;
  flying_cap_f: number;
  reservoir_cap_f: number;
  load_a: number;
};

export type PumpRail = {
  /** Two diode drops at the load current. */
  diode_drop_v: number;
  /** −(V_d − 2V_F): the rail with no load. */
  no_load_v: number;
  /** I/(f·C_fly): loss through the pump's switched-capacitor resistance 1/(f·C). */
  droop_v: number;
  /** V−_dc = no-load + droop. */
  dc_v: number;
  /** I/(f·C_res) peak to peak. */
  ripple_v: number;
  /** The worst case every check uses: V−_dc + ripple/2 (least negative). */
  worst_v: number;
  /** (V_d − 2V_F)·f·C_fly: the load at which the rail collapses to 0 V. */
  collapse_a: number;
};

export function pumpRail(p: PumpInput, forwardV: number): PumpRail {
  const drop = 2 * forwardV;
  const noLoad = -(p.drive_v - drop);
  const droop = p.load_a / (p.frequency_hz * p.flying_cap_f);
  const ripple = p.load_a / (p.frequency_hz * p.reservoir_cap_f);
  const dc = noLoad + droop;
  return {
    diode_drop_v: drop,
    no_load_v: noLoad,
    droop_v: droop,
    dc_v: dc,
    ripple_v: ripple,
    worst_v: dc + ripple / 2,
    collapse_a: Math.max(0, (p.drive_v - drop) * p.frequency_hz * p.flying_cap_f),
  };
}

/** Noise gain of the stage: 1 for a follower, 1 + Rf/Rg otherwise. */
export function noiseGain(feedbackOhm: number, groundOhm: number | null): number {
  return groundOhm === null ? 1 : 1 + feedbackOhm / groundOhm;
}
