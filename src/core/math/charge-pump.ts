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
  /** (V_d − 2V_F)/(1/(f·C_fly) + 4·R_drive): the load at which the rail collapses to 0 V. */
  collapse_a: number;
  /** 4·I·R_drive: the drop in the drive pin's output resistance (0 when not stated). */
  drive_drop_v: number;
};

/**
 * The pumped rail at `p.load_a` with diode drop `forwardV` each. `driveOhm` is the
 * drive pin's output resistance: the pin carries the charge I/f each half period,
 * so about 2·I while it conducts, through R in both half periods: 4·I·R in all
 * (charge balance; the fast-switching limit of a two-phase switched-capacitor
 * converter has the same Σ R/duty form, Seeman & Sanders, IEEE Trans. Power
 * Electron. 23(2), 2008 [M]). Added to the 1/(f·C) loss, which over-states the
 * sum of the two limits and so keeps the rail on the shallow side.
 */
export function pumpRail(p: PumpInput, forwardV: number, driveOhm = 0): PumpRail {
  const drop = 2 * forwardV;
  const noLoad = -(p.drive_v - drop);
  const droop = p.load_a / (p.frequency_hz * p.flying_cap_f);
  const driveDrop = 4 * p.load_a * driveOhm;
  const ripple = p.load_a / (p.frequency_hz * p.reservoir_cap_f);
  const dc = noLoad + droop + driveDrop;
  return {
    diode_drop_v: drop,
    no_load_v: noLoad,
    droop_v: droop,
    dc_v: dc,
    ripple_v: ripple,
    worst_v: dc + ripple / 2,
    collapse_a: Math.max(0, (p.drive_v - drop) / (1 / (p.frequency_hz * p.flying_cap_f) + 4 * driveOhm)),
    drive_drop_v: driveDrop,
  };
}

/** Noise gain of the stage: 1 for a follower, 1 + Rf/Rg otherwise. */
export function noiseGain(feedbackOhm: number, groundOhm: number | null): number {
  return groundOhm === null ? 1 : 1 + feedbackOhm / groundOhm;
}
