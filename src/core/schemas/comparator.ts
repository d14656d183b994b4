// comparators.csv (SPEC §4).
import type { z } from "zod";
import { optionalNumber, requiredEnum, requiredNumber } from "./cells.ts";
import { amplifierColumns, commonColumns } from "./common.ts";
import { checkPushPullLevels, checkSupplyAndHeadroom } from "./row-checks.ts";
import { partRow } from "./row.ts";

export const OUTPUT_TYPES = ["push-pull", "open-drain"] as const;

export const comparatorColumns = {
  ...commonColumns,
  ...amplifierColumns,
  output: requiredEnum(OUTPUT_TYPES, { unit: "", label: "Output" }),
  out_neg_headroom_v: optionalNumber({ unit: "V", label: "Output low, inward from V−" }),
  out_pos_headroom_v: optionalNumber({ unit: "V", label: "Output high, inward from V+" }),
  vos_max_mv: requiredNumber({ unit: "mV", label: "Offset max" }, { min: 0 }),
  tpd_ns: requiredNumber({ unit: "ns", label: "Propagation delay" }, { above: 0 }),
  // Optional (issue 16): the overdrive tpd is rated at; the input needs V_od/slope to reach it.
  tpd_overdrive_mv: optionalNumber({ unit: "mV", label: "Delay rated at overdrive" }, { above: 0 }),
  hysteresis_mv: optionalNumber({ unit: "mV", label: "Hysteresis" }, { min: 0 }),
  iq_ma: requiredNumber({ unit: "mA", label: "Supply current" }, { min: 0 }),
  // Sign-path ratings (issue 21): empty means not rated, and a rule that needs one says unrated.
  vdiff_max_v: optionalNumber({ unit: "V", label: "Differential input max" }, { min: 0 }),
  iout_max_ma: optionalNumber({ unit: "mA", label: "Output current max" }, { above: 0 }),
};

export const comparatorRow = partRow("comparator", comparatorColumns, checkSupplyAndHeadroom, checkPushPullLevels);

export type Comparator = z.output<typeof comparatorRow>;
