import { describe, expect, it } from "vitest";
import { diodeColumns } from "../../../src/core/schemas/diode.ts";
import { rowProblems } from "../../helpers/catalogue.ts";
import { diode } from "../../helpers/parts.ts";

describe("diodeRow", () => {
  it("reads a row, SI prefixes included", () => {
    expect(diode({ cj_pf: "900m", ir_na: "5p" })).toMatchObject({
      kind: "diode",
      type: "silicon",
      cj_pf: 0.9,
      ir_na: 5e-12,
    });
  });

  it("accepts equal forward voltages (a flat diode), rejects one that falls as current rises", () => {
    expect(rowProblems("diode", { vf_1ma_v: "0.65", vf_10ma_v: "0.65" })).toEqual([]);
    expect(rowProblems("diode", { vf_1ma_v: "0.75", vf_10ma_v: "0.65" })).toMatchInlineSnapshot(`
      [
        "diodes.csv:2: column 'vf_10ma_v': forward voltage falls as current rises (got 0.65 V at 10 mA below 0.75 V at 1 mA, expected vf_10ma_v ≥ vf_1ma_v)",
      ]
    `);
  });
});

describe("diodeColumns", () => {
  it("lists the SPEC §4 columns in order", () => {
    expect(Object.keys(diodeColumns)).toEqual(
      "id,name,status,cost_band,tags,notes,type,vf_1ma_v,vf_10ma_v,ir_na,vr_max_v,trr_ns,cj_pf,if_max_ma".split(","),
    );
  });
});
