// Every kind of catalogue cell (SPEC §4), read through the real row schemas; the
// whole message of each rejection is pinned.
import { describe, expect, it } from "vitest";
import type { PartKind } from "../../../src/core/catalogue.ts";
import { comparator, diode, opAmp, type Cells } from "../../helpers/parts.ts";
import { rowProblems } from "../../helpers/catalogue.ts";

/** One row per case; the snapshot lists each case's messages under its label. */
function messages(cases: [string, PartKind, Cells][]): string[] {
  return cases.flatMap(([label, kind, cells]) => [`# ${label}`, ...rowProblems(kind, cells)]);
}

describe("number cells", () => {
  it.each([
    ["gbw_mhz", "1", 1],
    ["gbw_mhz", "500m", 0.5],
    ["gbw_mhz", "2.2k", 2200],
    ["ib_max_na", "10p", 1e-11],
    ["ib_max_na", "1e-3", 0.001],
    ["slew_v_per_us", "10µ", 10e-6],
    ["icm_neg_headroom_v", "-0.3", -0.3],
    ["icm_neg_headroom_v", "-100m", -0.1],
    ["vos_max_mv", " 7 ", 7],
  ])("%s = %j reads as %d (in the column's own unit)", (column, raw, value) => {
    expect(opAmp({ [column]: raw })[column as "gbw_mhz"]).toBeCloseTo(value, 12);
  });

  it("an empty optional number is not rated (undefined), never 0", () => {
    const p = opAmp({ vos_drift_uv_per_c: "", out_load_ohm: "", noise_nv_rthz: " " });
    expect([p.vos_drift_uv_per_c, p.out_load_ohm, p.noise_nv_rthz]).toEqual([undefined, undefined, undefined]);
    expect(diode({ trr_ns: "", cj_pf: "" })).toMatchObject({ trr_ns: undefined, cj_pf: undefined });
  });

  it("rejects non-numbers, NaN, Infinity, negatives and out-of-range values with the column's bound", () => {
    expect(
      messages([
        ["not a number", "op-amp", { gbw_mhz: "fast" }],
        ["NaN", "op-amp", { gbw_mhz: "NaN" }],
        ["Infinity", "op-amp", { slew_v_per_us: "Infinity" }],
        ["overflow", "op-amp", { slew_v_per_us: "1e999" }],
        ["unit typed into the cell", "op-amp", { supply_max_v: "32V" }],
        ["space before the prefix", "op-amp", { out_load_ohm: "10 k" }],
        ["decimal comma", "op-amp", { vos_max_mv: "0,5" }],
        ["negative GBW", "op-amp", { gbw_mhz: "-1" }],
        ["zero GBW", "op-amp", { gbw_mhz: "0" }],
        ["negative slew", "op-amp", { slew_v_per_us: "-0.5" }],
        ["negative bias current", "op-amp", { ib_max_na: "-250" }],
        ["negative supply current", "op-amp", { iq_ma: "-1m" }],
        ["negative offset", "op-amp", { vos_max_mv: "-7" }],
        ["negative comparator delay", "comparator", { tpd_ns: "-5" }],
        ["negative leakage", "diode", { ir_na: "-1" }],
        ["negative forward current", "diode", { if_max_ma: "-200" }],
        ["forward voltage above 5 V", "diode", { vf_1ma_v: "6", vf_10ma_v: "7" }],
        ["zero supply", "op-amp", { supply_min_v: "0" }],
        ["optional number that is not one", "op-amp", { vos_drift_uv_per_c: "low" }],
      ]),
    ).toMatchInlineSnapshot(`
      [
        "# not a number",
        "op-amps.csv:2: column 'gbw_mhz': not a number (got 'fast', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# NaN",
        "op-amps.csv:2: column 'gbw_mhz': not a number (got 'NaN', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# Infinity",
        "op-amps.csv:2: column 'slew_v_per_us': not a number (got 'Infinity', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# overflow",
        "op-amps.csv:2: column 'slew_v_per_us': not a number (got '1e999', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# unit typed into the cell",
        "op-amps.csv:2: column 'supply_max_v': not a number (got '32V', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# space before the prefix",
        "op-amps.csv:2: column 'out_load_ohm': not a number (got '10 k', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# decimal comma",
        "op-amps.csv:2: column 'vos_max_mv': not a number (got '0,5', expected a number such as 0.5, 500m or 2.2k, at least 0)",
        "# negative GBW",
        "op-amps.csv:2: column 'gbw_mhz': must not be negative (got '-1', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# zero GBW",
        "op-amps.csv:2: column 'gbw_mhz': out of range (got '0', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# negative slew",
        "op-amps.csv:2: column 'slew_v_per_us': must not be negative (got '-0.5', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# negative bias current",
        "op-amps.csv:2: column 'ib_max_na': must not be negative (got '-250', expected a number such as 0.5, 500m or 2.2k, at least 0)",
        "# negative supply current",
        "op-amps.csv:2: column 'iq_ma': must not be negative (got '-1m', expected a number such as 0.5, 500m or 2.2k, at least 0)",
        "# negative offset",
        "op-amps.csv:2: column 'vos_max_mv': must not be negative (got '-7', expected a number such as 0.5, 500m or 2.2k, at least 0)",
        "# negative comparator delay",
        "comparators.csv:2: column 'tpd_ns': must not be negative (got '-5', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# negative leakage",
        "diodes.csv:2: column 'ir_na': must not be negative (got '-1', expected a number such as 0.5, 500m or 2.2k, at least 0)",
        "# negative forward current",
        "diodes.csv:2: column 'if_max_ma': must not be negative (got '-200', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# forward voltage above 5 V",
        "diodes.csv:2: column 'vf_1ma_v': out of range (got '6', expected a number such as 0.5, 500m or 2.2k, greater than 0 and at most 5)",
        "diodes.csv:2: column 'vf_10ma_v': out of range (got '7', expected a number such as 0.5, 500m or 2.2k, greater than 0 and at most 5)",
        "# zero supply",
        "op-amps.csv:2: column 'supply_min_v': out of range (got '0', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# optional number that is not one",
        "op-amps.csv:2: column 'vos_drift_uv_per_c': not a number (got 'low', expected a number such as 0.5, 500m or 2.2k, at least 0)",
      ]
    `);
  });

  it("rejects missing required numbers", () => {
    expect(
      messages([
        ["vos_max_mv", "op-amp", { vos_max_mv: "" }],
        ["gbw_mhz (blank)", "op-amp", { gbw_mhz: "   " }],
        ["tpd_ns", "comparator", { tpd_ns: undefined }],
        ["vr_max_v", "diode", { vr_max_v: "" }],
      ]),
    ).toMatchInlineSnapshot(`
      [
        "# vos_max_mv",
        "op-amps.csv:2: column 'vos_max_mv': required value is missing (got '', expected a number such as 0.5, 500m or 2.2k, at least 0)",
        "# gbw_mhz (blank)",
        "op-amps.csv:2: column 'gbw_mhz': required value is missing (got '   ', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# tpd_ns",
        "comparators.csv:2: column 'tpd_ns': required value is missing (got '', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "# vr_max_v",
        "diodes.csv:2: column 'vr_max_v': required value is missing (got '', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
      ]
    `);
  });
});

describe("whole-number cells", () => {
  it.each([
    ["channels", "1", 1],
    ["channels", "4", 4],
    ["cost_band", "5", 5],
    ["cost_band", "", undefined],
  ])("%s = %j reads as %j", (column, raw, value) => {
    expect(opAmp({ [column]: raw })[column as "channels"]).toBe(value);
  });

  it("rejects fractions and values outside the range", () => {
    expect(
      messages([
        ["channels 1.5", "op-amp", { channels: "1.5" }],
        ["channels 0", "op-amp", { channels: "0" }],
        ["channels 9", "comparator", { channels: "9" }],
        ["cost_band 0", "diode", { cost_band: "0" }],
        ["cost_band 6", "op-amp", { cost_band: "6" }],
        ["cost_band 2.5", "op-amp", { cost_band: "2.5" }],
        ["cost_band 1k", "op-amp", { cost_band: "1k" }],
      ]),
    ).toMatchInlineSnapshot(`
      [
        "# channels 1.5",
        "op-amps.csv:2: column 'channels': not a whole number (got '1.5', expected a whole number, at least 1 and at most 8)",
        "# channels 0",
        "op-amps.csv:2: column 'channels': out of range (got '0', expected a whole number, at least 1 and at most 8)",
        "# channels 9",
        "comparators.csv:2: column 'channels': out of range (got '9', expected a whole number, at least 1 and at most 8)",
        "# cost_band 0",
        "diodes.csv:2: column 'cost_band': out of range (got '0', expected a whole number, at least 1 and at most 5)",
        "# cost_band 6",
        "op-amps.csv:2: column 'cost_band': out of range (got '6', expected a whole number, at least 1 and at most 5)",
        "# cost_band 2.5",
        "op-amps.csv:2: column 'cost_band': not a whole number (got '2.5', expected a whole number, at least 1 and at most 5)",
        "# cost_band 1k",
        "op-amps.csv:2: column 'cost_band': out of range (got '1k', expected a whole number, at least 1 and at most 5)",
      ]
    `);
  });
});

describe("enum cells", () => {
  it.each([
    ["stocked", "stocked"],
    ["approved", "approved"],
    ["listed", "listed"],
    ["", "listed"], // SPEC §4: default listed
  ])("status %j is %j", (raw, status) => {
    expect(opAmp({ status: raw }).status).toBe(status);
  });

  it("reads comparator outputs and diode types", () => {
    expect(comparator({ output: "open-drain", out_neg_headroom_v: "", out_pos_headroom_v: "" }).output).toBe(
      "open-drain",
    );
    expect(comparator({ output: "push-pull" }).output).toBe("push-pull");
    expect(["silicon", "schottky", "low-leakage"].map((type) => diode({ type }).type)).toEqual([
      "silicon",
      "schottky",
      "low-leakage",
    ]);
  });

  it("rejects values outside the list, naming every allowed value", () => {
    expect(
      messages([
        ["status", "op-amp", { status: "in stock" }],
        ["status case", "op-amp", { status: "Stocked" }],
        ["output", "comparator", { output: "totem-pole" }],
        ["output missing", "comparator", { output: "" }],
        ["type", "diode", { type: "germanium" }],
        ["type missing", "diode", { type: "" }],
      ]),
    ).toMatchInlineSnapshot(`
      [
        "# status",
        "op-amps.csv:2: column 'status': unknown value (got 'in stock', expected 'stocked' or 'approved' or 'listed')",
        "# status case",
        "op-amps.csv:2: column 'status': unknown value (got 'Stocked', expected 'stocked' or 'approved' or 'listed')",
        "# output",
        "comparators.csv:2: column 'output': unknown value (got 'totem-pole', expected 'push-pull' or 'open-drain')",
        "# output missing",
        "comparators.csv:2: column 'output': required value is missing (got '', expected 'push-pull' or 'open-drain')",
        "# type",
        "diodes.csv:2: column 'type': unknown value (got 'germanium', expected 'silicon' or 'schottky' or 'low-leakage')",
        "# type missing",
        "diodes.csv:2: column 'type': required value is missing (got '', expected 'silicon' or 'schottky' or 'low-leakage')",
      ]
    `);
  });
});

describe("yes/no cells", () => {
  it.each([
    ["yes", true],
    ["no", false],
    ["YES", true],
    [" No ", false],
  ])("unity_gain_stable %j is %j", (raw, value) => {
    expect(opAmp({ unity_gain_stable: raw }).unity_gain_stable).toBe(value);
  });

  it("an empty optional yes/no is not rated", () => {
    expect(opAmp({ phase_reversal: "" }).phase_reversal).toBeUndefined();
  });

  it("rejects anything but yes or no", () => {
    expect(
      messages([
        ["y", "op-amp", { unity_gain_stable: "y" }],
        ["true", "op-amp", { unity_gain_stable: "true" }],
        ["1", "op-amp", { phase_reversal: "1" }],
        ["missing", "op-amp", { unity_gain_stable: "" }],
      ]),
    ).toMatchInlineSnapshot(`
      [
        "# y",
        "op-amps.csv:2: column 'unity_gain_stable': not yes or no (got 'y', expected 'yes' or 'no')",
        "# true",
        "op-amps.csv:2: column 'unity_gain_stable': not yes or no (got 'true', expected 'yes' or 'no')",
        "# 1",
        "op-amps.csv:2: column 'phase_reversal': not yes or no (got '1', expected 'yes' or 'no')",
        "# missing",
        "op-amps.csv:2: column 'unity_gain_stable': required value is missing (got '', expected 'yes' or 'no')",
      ]
    `);
  });
});

describe("text, id and tag cells", () => {
  it("trims text, splits tags on ';' and drops blank tags", () => {
    const p = opAmp({ name: "  CMOS rail-to-rail I/O, 3 MHz ", tags: "cmos; rrio;;low-power ;", notes: "" });
    expect([p.name, p.tags, p.notes]).toEqual(["CMOS rail-to-rail I/O, 3 MHz", ["cmos", "rrio", "low-power"], ""]);
  });

  it.each(["oa-cmos-rrio-3m", "0a", "d-1n-class"])("accepts the id %j", (id) => {
    expect(opAmp({ id }).id).toBe(id);
  });

  it("rejects bad ids, missing names and over-long text", () => {
    expect(
      messages([
        ["upper case", "op-amp", { id: "OA-Test" }],
        ["underscore", "op-amp", { id: "oa_test" }],
        ["leading dash", "diode", { id: "-d" }],
        ["space", "comparator", { id: "cmp test" }],
        ["81 characters", "op-amp", { id: "a".repeat(81) }],
        ["missing id", "op-amp", { id: "" }],
        ["missing name", "op-amp", { name: " " }],
        ["name of 2001 characters", "op-amp", { name: "n".repeat(2001) }],
        ["notes of 2001 characters", "diode", { notes: "n".repeat(2001) }],
        ["tags of 2001 characters", "diode", { tags: "t".repeat(2001) }],
      ]),
    ).toMatchInlineSnapshot(`
      [
        "# upper case",
        "op-amps.csv:2: column 'id': not a valid id (got 'OA-Test', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)",
        "# underscore",
        "op-amps.csv:2: column 'id': not a valid id (got 'oa_test', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)",
        "# leading dash",
        "diodes.csv:2: column 'id': not a valid id (got '-d', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)",
        "# space",
        "comparators.csv:2: column 'id': not a valid id (got 'cmp test', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)",
        "# 81 characters",
        "op-amps.csv:2: column 'id': not a valid id (got 'aaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaa…', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)",
        "# missing id",
        "op-amps.csv:2: column 'id': required value is missing (got '', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)",
        "# missing name",
        "op-amps.csv:2: column 'name': required value is missing (got ' ', expected some text)",
        "# name of 2001 characters",
        "op-amps.csv:2: column 'name': text is 2001 characters long (expected at most 2000)",
        "# notes of 2001 characters",
        "diodes.csv:2: column 'notes': text is 2001 characters long (expected at most 2000)",
        "# tags of 2001 characters",
        "diodes.csv:2: column 'tags': text is 2001 characters long (expected at most 2000)",
      ]
    `);
  });
});
