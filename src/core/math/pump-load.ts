// The pumped rail carries the parts it powers (SPEC §11.5): every op amp and
// comparator channel between V+ and V− draws its supply current from V−, on top
// of the load the design states. Pump-diode drops are taken at the current they
// conduct and at the cold end of the range, where they are largest and the rail
// is shallowest.
import { pumpRail, type PumpInput, type PumpRail } from "./charge-pump.ts";
import type { RatedDiode } from "./diode.ts";
import { forwardVoltageAt, type TemperatureRange } from "./temperature.ts";

/** One part's draw on the rail. */
export type SupplyDraw = {
  role: string;
  part: string;
  /** Channels powered: whole packages, so a quad used for one amplifier draws four. */
  channels: number;
  per_channel_a: number;
  amps: number;
};

/** The channels a role needs, taken as whole packages of `perPackage` channels. */
export function supplyDraw(
  role: string,
  part: { id: string; channels: number; iq_ma: number },
  needed: number,
): SupplyDraw {
  const perPackage = Math.max(1, part.channels);
  const channels = Math.ceil(needed / perPackage) * perPackage;
  const per = part.iq_ma * 1e-3;
  return { role, part: part.id, channels, per_channel_a: per, amps: channels * per };
}

export type PumpLoad = { stated_a: number; draws: SupplyDraw[]; total_a: number };

export function pumpLoad(statedA: number, draws: readonly SupplyDraw[]): PumpLoad {
  let total = statedA;
  for (const d of draws) total += d.amps;
  return { stated_a: statedA, draws: [...draws], total_a: total };
}

/**
 * Each pump diode passes the charge I/f once a period during about half of it,
 * so it conducts about 2·I while on (charge balance; common practice [M]).
 */
export function conductionCurrent(loadA: number): number {
  return 2 * loadA;
}

export type LoadedPump = PumpRail & {
  load: PumpLoad;
  conduction_a: number;
  /** Vf of one pump diode at the conduction current and the cold end. */
  vf_v: number;
  vf_c: number;
  /** The same at 25 °C, for the reason. */
  vf_25_v: number;
  drive_ohm: number;
};

export function loadedPump(
  pump: PumpInput & { drive_ohm?: number | undefined },
  load: PumpLoad,
  diode: RatedDiode,
  range: TemperatureRange,
): LoadedPump {
  const conduction = conductionCurrent(load.total_a);
  const vf = forwardVoltageAt(diode, conduction, range.min_c);
  const driveOhm = pump.drive_ohm ?? 0;
  const rail = pumpRail({ ...pump, load_a: load.total_a }, vf, driveOhm);
  return {
    ...rail,
    load,
    conduction_a: conduction,
    vf_v: vf,
    vf_c: range.min_c,
    vf_25_v: forwardVoltageAt(diode, conduction, 25),
    drive_ohm: driveOhm,
  };
}
