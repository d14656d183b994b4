import { describe, expect, it } from "vitest";
import { comparatorColumns } from "../../../src/core/schemas/comparator.ts";
import { rowProblems } from "../../helpers/catalogue.ts";
import { comparator } from "../../helpers/parts.ts";

describe("comparatorRow", () => {
  it("reads a push-pull row with its output levels", () => {
    expect(comparator({ hysteresis_mv: "2" })).toMatchObject({
      kind: "comparator",
      output: "push-pull",
      out_neg_headroom_v: 0,
      out_pos_headroom_v: 0,
      tpd_ns: 1300,
      hysteresis_mv: 2,
    });
  });

  // SPEC §4: output levels are required for push-pull outputs only.
  it("an open-drain output needs no output levels", () => {
    expect(comparator({ output: "open-drain", out_neg_headroom_v: "", out_pos_headroom_v: "" })).toMatchObject({
      output: "open-drain",
      out_neg_headroom_v: undefined,
      out_pos_headroom_v: undefined,
    });
  });

  it("rejects a push-pull output without levels, inverted supply limits and headroom that leaves no room", () => {
    expect([
      ...rowProblems("comparator", { out_neg_headroom_v: "", out_pos_headroom_v: "" }),
      ...rowProblems("comparator", { supply_min_v: "6", supply_max_v: "5.5" }),
      ...rowProblems("comparator", { icm_neg_headroom_v: "3", icm_pos_headroom_v: "2.5" }),
      ...rowProblems("comparator", { out_neg_headroom_v: "2.75", out_pos_headroom_v: "2.75" }),
    ]).toMatchInlineSnapshot(`
      [
        "comparators.csv:2: column 'out_neg_headroom_v': required value is missing for a push-pull output (got '', expected a number such as 0.5, 500m or 2.2k)",
        "comparators.csv:2: column 'out_pos_headroom_v': required value is missing for a push-pull output (got '', expected a number such as 0.5, 500m or 2.2k)",
        "comparators.csv:2: column 'supply_min_v': minimum supply is above the maximum (got 6 V > 5.5 V, expected supply_min_v ≤ supply_max_v)",
        "comparators.csv:2: column 'icm_pos_headroom_v': input headroom leaves no room inside the supply (got 3 V + 2.5 V = 5.5 V, expected less than supply_max_v 5.5 V)",
        "comparators.csv:2: column 'out_pos_headroom_v': output headroom leaves no room inside the supply (got 2.75 V + 2.75 V = 5.5 V, expected less than supply_max_v 5.5 V)",
      ]
    `);
  });
});

describe("comparatorColumns", () => {
  it("lists the SPEC §4 columns first, in order, then the optional ones added since", () => {
    const spec =
      "id,name,status,cost_band,tags,notes,channels,supply_min_v,supply_max_v,icm_neg_headroom_v,icm_pos_headroom_v,output,out_neg_headroom_v,out_pos_headroom_v,vos_max_mv,tpd_ns,tpd_overdrive_mv,hysteresis_mv,iq_ma".split(
        ",",
      );
    expect(Object.keys(comparatorColumns).slice(0, spec.length)).toEqual(spec);
  });

  it("has the optional sign-path ratings of issue 21, empty meaning not rated", () => {
    for (const c of ["vdiff_max_v", "iout_max_ma"]) expect(Object.keys(comparatorColumns)).toContain(c);
  });
});
