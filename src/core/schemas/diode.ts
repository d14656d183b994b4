// diodes.csv (SPEC §4).
import type { z } from "zod";
import { optionalNumber, requiredEnum, requiredNumber } from "./cells.ts";
import { commonColumns } from "./common.ts";
import { partRow } from "./row.ts";

export const DIODE_TYPES = ["silicon", "schottky", "low-leakage"] as const;

export const diodeColumns = {
  ...commonColumns,
  type: requiredEnum(DIODE_TYPES, { unit: "", label: "Type" }),
  vf_1ma_v: requiredNumber({ unit: "V", label: "Forward voltage at 1 mA" }, { above: 0, max: 5 }),
  vf_10ma_v: requiredNumber({ unit: "V", label: "Forward voltage at 10 mA" }, { above: 0, max: 5 }),
  ir_na: requiredNumber({ unit: "nA", label: "Reverse leakage" }, { min: 0 }),
  vr_max_v: requiredNumber({ unit: "V", label: "Reverse voltage max" }, { above: 0 }),
  trr_ns: optionalNumber({ unit: "ns", label: "Reverse recovery" }, { min: 0 }),
  cj_pf: optionalNumber({ unit: "pF", label: "Junction capacitance" }, { min: 0 }),
  if_max_ma: requiredNumber({ unit: "mA", label: "Forward current max" }, { above: 0 }),
};

export const diodeRow = partRow("diode", diodeColumns, (row, ctx) => {
  if (row.vf_10ma_v < row.vf_1ma_v) {
    ctx.addIssue({
      code: "custom",
      path: ["vf_10ma_v"],
      message: `forward voltage falls as current rises (got ${row.vf_10ma_v} V at 10 mA below ${row.vf_1ma_v} V at 1 mA, expected vf_10ma_v ≥ vf_1ma_v)`,
    });
  }
});

export type Diode = z.output<typeof diodeRow>;
