// op-amps.csv (SPEC §4). Values stay in the units their column names carry;
// rules convert to SI where they compute.
import type { z } from "zod";
import { optionalNumber, optionalYesNo, requiredNumber, requiredYesNo } from "./cells.ts";
import { amplifierColumns, commonColumns } from "./common.ts";
import { checkSupplyAndHeadroom } from "./row-checks.ts";
import { partRow } from "./row.ts";

export const opAmpColumns = {
  ...commonColumns,
  ...amplifierColumns,
  out_neg_headroom_v: requiredNumber({ unit: "V", label: "Output headroom to V−" }),
  out_pos_headroom_v: requiredNumber({ unit: "V", label: "Output headroom to V+" }),
  out_load_ohm: optionalNumber({ unit: "Ω", label: "Swing rated at load" }, { above: 0 }),
  vos_max_mv: requiredNumber({ unit: "mV", label: "Offset max" }, { min: 0 }),
  vos_drift_uv_per_c: optionalNumber({ unit: "µV/°C", label: "Offset drift" }, { min: 0 }),
  ib_max_na: requiredNumber({ unit: "nA", label: "Bias current max" }, { min: 0 }),
  gbw_mhz: requiredNumber({ unit: "MHz", label: "Gain-bandwidth" }, { above: 0 }),
  slew_v_per_us: requiredNumber({ unit: "V/µs", label: "Slew rate" }, { above: 0 }),
  iq_ma: requiredNumber({ unit: "mA", label: "Supply current" }, { min: 0 }),
  noise_nv_rthz: optionalNumber({ unit: "nV/√Hz", label: "Noise at 1 kHz" }, { min: 0 }),
  unity_gain_stable: requiredYesNo({ unit: "", label: "Unity-gain stable" }),
  phase_reversal: optionalYesNo({ unit: "", label: "Phase reversal" }),
  // Optional (issue 16): a FET input's bias current doubles about every 10 °C.
  input_fet: optionalYesNo({ unit: "", label: "FET input" }),
  // Sign-path ratings (issue 21): empty means not rated, and a rule that needs one says unrated.
  vdiff_max_v: optionalNumber({ unit: "V", label: "Differential input max" }, { min: 0 }),
  overload_recovery_us: optionalNumber({ unit: "µs", label: "Overload recovery" }, { min: 0 }),
  iout_max_ma: optionalNumber({ unit: "mA", label: "Output current max" }, { above: 0 }),
  // Optional (SPEC §11.9): input current noise; where empty, the budget leaves it out and says so.
  in_pa_rthz: optionalNumber({ unit: "pA/√Hz", label: "Current noise" }, { min: 0 }),
};

export const opAmpRow = partRow("op-amp", opAmpColumns, checkSupplyAndHeadroom);

export type OpAmp = z.output<typeof opAmpRow>;
