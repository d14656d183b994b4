// The pumped rail a candidate would see if chosen (SPEC §11.5): the rest of the
// load fixed, its own supply current added, pump-diode drops at their conduction
// current and the cold end.
import { pumpRail, type PumpRail } from "./charge-pump.ts";
import { conductionCurrent } from "./pump-load.ts";
import { forwardVoltageAt } from "./temperature.ts";

/** The pumped rail as one role sees it: everything but its own parts' draw is fixed. */
export type PumpOnRail = {
  drive_v: number;
  frequency_hz: number;
  flying_cap_f: number;
  reservoir_cap_f: number;
  drive_ohm: number;
  /** Vf of one pump diode at the conduction current and the cold end (the largest drop). */
  diode: { vf_1ma_v: number; vf_10ma_v: number };
  cold_c: number;
  /** The stated load plus every other role's parts, amps. */
  other_a: number;
  /** Channels this role powers (whole packages of the candidate's channel count). */
  channels: number;
  /** This role's draw the rail in negative_v was worked out with, amps. */
  assumed_a: number;
};

/** Channels powered when `needed` amplifiers are built from packages of `perPackage`. */
export function poweredChannels(needed: number, perPackage: number): number {
  const per = Math.max(1, perPackage);
  return Math.ceil(needed / per) * per;
}

/** The rail with a total load of `loadA`. */
export function railAt(p: Omit<PumpOnRail, "other_a" | "channels" | "assumed_a">, loadA: number): PumpRail {
  const vf = forwardVoltageAt(p.diode, conductionCurrent(loadA), p.cold_c);
  return pumpRail(
    {
      drive_v: p.drive_v,
      frequency_hz: p.frequency_hz,
      flying_cap_f: p.flying_cap_f,
      reservoir_cap_f: p.reservoir_cap_f,
      load_a: loadA,
    },
    vf,
    p.drive_ohm,
  );
}
