// Part-page values in SI with a prefix (issue 4: "1.2 MHz", "250 nA", "−0.1 V
// beyond the rail"). Prefixes per the SI Brochure, 9th ed. (BIPM 2019), table 7.
import { describe, expect, it } from "vitest";
import { KINDS } from "../../src/core/catalogue.ts";
import {
  columnMeta,
  columnsOf,
  formatCell,
  formatHeadroom,
  formatParameter,
  headerText,
  plainNumber,
  sortKey,
  trimZeros,
  type Column,
} from "../../src/view/parameters.ts";

const column = (key: string) => {
  const c = columnsOf(
    key === "output" || key === "tpd_ns" || key === "hysteresis_mv"
      ? "comparator"
      : ["type", "cj_pf", "trr_ns", "vf_1ma_v", "if_max_ma"].includes(key)
        ? "diode"
        : "op-amp",
  ).find((x) => x.key === key);
  if (!c) throw new Error(`no column ${key}`);
  return c;
};

describe("formatParameter", () => {
  it.each<[string, unknown, string]>([
    ["gbw_mhz", 1.2, "1.2 MHz"],
    ["gbw_mhz", 0.01, "10 kHz"],
    ["ib_max_na", 250, "250 nA"],
    ["ib_max_na", 0.01, "10 pA"],
    ["ib_max_na", 25e-6, "25 fA"],
    ["icm_neg_headroom_v", -0.1, "−0.1 V beyond the rail"],
    ["icm_pos_headroom_v", 1.5, "1.5 V inside the rail"],
    ["out_neg_headroom_v", 0.02, "0.02 V inside the rail"],
    ["out_pos_headroom_v", 0, "0 V: reaches the rail"],
    ["supply_max_v", 5.5, "5.5 V"],
    ["supply_max_v", 32, "32 V"],
    ["vos_max_mv", 7, "7 mV"],
    ["vos_max_mv", 0.075, "75 µV"],
    ["vos_drift_uv_per_c", 0.6, "600 nV/°C"],
    ["slew_v_per_us", 0.5, "0.5 V/µs"],
    ["slew_v_per_us", 300, "300 V/µs"],
    ["iq_ma", 0.0006, "600 nA"],
    ["iq_ma", 1.7, "1.7 mA"],
    ["noise_nv_rthz", 4.5, "4.5 nV/√Hz"],
    ["out_load_ohm", 10_000, "10 kΩ"],
    ["out_load_ohm", 150, "150 Ω"],
    ["tpd_ns", 1300, "1.3 µs"],
    ["tpd_ns", 0.8, "800 ps"],
    ["cj_pf", 0.9, "900 fF"],
    ["vf_1ma_v", 0.7, "0.7 V"],
    ["if_max_ma", 200, "200 mA"],
    ["cost_band", 2, "2 of 5"],
    ["channels", 4, "4"],
    ["unity_gain_stable", true, "yes"],
    ["phase_reversal", false, "no"],
    ["phase_reversal", undefined, "not stated"],
    ["vos_drift_uv_per_c", undefined, "not rated"],
    ["cost_band", undefined, "not given"],
    ["output", "open-drain", "open-drain"],
  ])("%s = %j reads %j", (key, value, expected) => {
    expect(formatParameter(column(key), value)).toBe(expected);
  });
});

describe("trimZeros", () => {
  it.each([
    ["1.20 MHz", "1.2 MHz"],
    ["10.0 kΩ", "10 kΩ"],
    ["−0.100 V", "−0.1 V"],
    ["0.0200 V", "0.02 V"],
    ["100 kΩ", "100 kΩ"],
    ["250 nA", "250 nA"],
    ["1.05 V", "1.05 V"],
  ])("%s → %s", (input, expected) => expect(trimZeros(input)).toBe(expected));
});

describe("formatHeadroom", () => {
  it("says which way the part goes from the rail", () => {
    expect([formatHeadroom(-0.3), formatHeadroom(2), formatHeadroom(0)]).toEqual([
      "−0.3 V beyond the rail",
      "2 V inside the rail",
      "0 V: reaches the rail",
    ]);
  });
});

describe("catalogue cells", () => {
  it.each<[unknown, string, number | string | null]>([
    [0.01, "0.01", 0.01],
    [-0.3, "−0.3", -0.3],
    [25e-6, "0.000025", 25e-6],
    [1e-7, "0.0000001", 1e-7],
    [1300, "1300", 1300],
    [true, "yes", 1],
    [false, "no", 0],
    [["rail-to-rail", "cmos"], "rail-to-rail, cmos", "rail-to-rail cmos"],
    [[], "", null],
    [undefined, "", null],
    ["Open-Drain", "Open-Drain", "open-drain"],
  ])("%j shows %j and sorts by %j", (value, text, key) => {
    expect(formatCell(value)).toBe(text);
    expect(sortKey(value)).toEqual(key);
  });

  it("never prints an exponent or a hyphen-minus", () => {
    expect([plainNumber(-2.5e-8), plainNumber(123456789)]).toEqual(["−0.000000025", "123457000"]);
  });
});

describe("columns", () => {
  it.each(KINDS.map((k) => [k.kind, k] as const))(
    "%s lists every CSV column with its label and unit from .meta()",
    (kind, spec) => {
      const columns = columnsOf(kind);
      expect(columns.map((c) => c.key)).toEqual(Object.keys(spec.columns));
      for (const c of columns) expect(c.label).toMatch(/\S/);
    },
  );

  it("finds the label of a column whose .meta() sits under a later .transform()", () => {
    expect(columnMeta(KINDS[0]!.columns.status)).toEqual(expect.objectContaining({ label: "Status" }));
  });

  it.each<[Column, string]>([
    [{ key: "vos_max_mv", label: "Offset max", unit: "mV" }, "Offset max (mV)"],
    [{ key: "slew_v_per_us", label: "Slew rate", unit: "V/µs" }, "Slew rate (V/µs)"],
    [{ key: "name", label: "Name", unit: "" }, "Name"],
  ])("header of %j is %j", (c, text) => expect(headerText(c)).toBe(text));
});
