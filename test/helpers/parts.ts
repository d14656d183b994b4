// Part factories for tests. Every part is parsed from CSV cells through the real
// row schema, so a test can only build a part the catalogue itself would accept.
import { comparatorRow, type Comparator } from "../../src/core/schemas/comparator.ts";
import { diodeRow, type Diode } from "../../src/core/schemas/diode.ts";
import { opAmpRow, type OpAmp } from "../../src/core/schemas/op-amp.ts";

/** Cell overrides: numbers and booleans are written as a CSV cell would be; undefined empties the cell. */
export type Cells = Record<string, string | number | boolean | undefined>;

function toCells(base: Record<string, string>, overrides: Cells): Record<string, string> {
  const cells = { ...base };
  for (const [column, value] of Object.entries(overrides)) {
    cells[column] = value === undefined ? "" : typeof value === "boolean" ? (value ? "yes" : "no") : String(value);
  }
  return cells;
}

/** A ground-sensing bipolar class (REFERENCES.md, common practice [M]): 3–32 V, output to V+ − 1.5 V. */
export const OP_AMP_CELLS: Record<string, string> = {
  id: "oa-test",
  name: "Test op amp",
  status: "listed",
  cost_band: "1",
  tags: "",
  notes: "",
  channels: "1",
  supply_min_v: "3",
  supply_max_v: "32",
  icm_neg_headroom_v: "-0.3",
  icm_pos_headroom_v: "1.5",
  out_neg_headroom_v: "0.02",
  out_pos_headroom_v: "1.5",
  // The class's swing is commonly also given at 2 kΩ (common practice [M]); at 2 kΩ the default
  // rectify-and-sign stages (R = 10 kΩ: buffer R/2, stage 1 R/3) are within it.
  out_load_ohm: "2k",
  vos_max_mv: "7",
  vos_drift_uv_per_c: "",
  ib_max_na: "250",
  gbw_mhz: "1",
  slew_v_per_us: "0.5",
  iq_ma: "0.7",
  noise_nv_rthz: "40",
  unity_gain_stable: "yes",
  phase_reversal: "no",
  // Sign-path ratings (issue 21), typical of the class (common practice [M]): no input clamps.
  vdiff_max_v: "32",
  overload_recovery_us: "10",
  iout_max_ma: "20",
};

/** A push-pull CMOS comparator class, 1.8–5.5 V, rail-to-rail output. */
export const COMPARATOR_CELLS: Record<string, string> = {
  id: "cmp-test",
  name: "Test comparator",
  status: "listed",
  cost_band: "1",
  tags: "",
  notes: "",
  channels: "1",
  supply_min_v: "1.8",
  supply_max_v: "5.5",
  icm_neg_headroom_v: "-0.2",
  icm_pos_headroom_v: "-0.2",
  output: "push-pull",
  out_neg_headroom_v: "0",
  out_pos_headroom_v: "0",
  vos_max_mv: "5",
  tpd_ns: "1300",
  tpd_overdrive_mv: "5",
  hysteresis_mv: "",
  iq_ma: "0.05",
  // Sign-path ratings (issue 21), typical of the class (common practice [M]).
  vdiff_max_v: "5.5",
  iout_max_ma: "10",
};

/** A silicon switching class (REFERENCES.md, common practice [M]). */
export const DIODE_CELLS: Record<string, string> = {
  id: "d-test",
  name: "Test diode",
  status: "listed",
  cost_band: "1",
  tags: "",
  notes: "",
  type: "silicon",
  vf_1ma_v: "0.65",
  vf_10ma_v: "0.75",
  ir_na: "25",
  vr_max_v: "100",
  trr_ns: "4",
  cj_pf: "2",
  if_max_ma: "200",
};

export function opAmp(overrides: Cells = {}): OpAmp {
  return opAmpRow.parse(toCells(OP_AMP_CELLS, overrides));
}

export function comparator(overrides: Cells = {}): Comparator {
  return comparatorRow.parse(toCells(COMPARATOR_CELLS, overrides));
}

export function diode(overrides: Cells = {}): Diode {
  return diodeRow.parse(toCells(DIODE_CELLS, overrides));
}

/** One CSV line in the column order of `base`, quoting cells that need it. */
export function csvLine(values: readonly string[]): string {
  return values.map((v) => (/[",\n\r]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v)).join(",");
}

/** A whole CSV file (header + rows) from base cells and per-row overrides. */
export function csvText(base: Record<string, string>, rows: Cells[], eol = "\n"): string {
  const columns = Object.keys(base);
  const lines = [csvLine(columns), ...rows.map((r) => csvLine(columns.map((c) => toCells(base, r)[c] ?? "")))];
  return lines.join(eol) + eol;
}
