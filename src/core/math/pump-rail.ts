// The pumped rail a candidate would see if chosen (SPEC §11.5): the rest of the
// load fixed, its own supply current added, pump-diode drops at their conduction
// current and the cold end.
import { pumpRail, type PumpRail } from "./charge-pump.ts";
import { conductionCurrent } from "./pump-load.ts";
import { forwardVoltageAt } from "./temperature.ts";
import type { PumpOnRail } from "../rule-kit/types.ts";

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
