import { describe, expect, it } from "vitest";
import { opAmpColumns } from "../../../src/core/schemas/op-amp.ts";
import { rowProblems } from "../../helpers/catalogue.ts";
import { opAmp } from "../../helpers/parts.ts";

describe("opAmpRow", () => {
  it("reads a whole row into a typed part, values kept in the units the column names carry", () => {
    expect(opAmp({ vos_drift_uv_per_c: "7", phase_reversal: "" })).toEqual({
      kind: "op-amp",
      id: "oa-test",
      name: "Test op amp",
      status: "listed",
      cost_band: 1,
      tags: [],
      notes: "",
      channels: 1,
      supply_min_v: 3,
      supply_max_v: 32,
      icm_neg_headroom_v: -0.3,
      icm_pos_headroom_v: 1.5,
      out_neg_headroom_v: 0.02,
      out_pos_headroom_v: 1.5,
      out_load_ohm: 2000,
      vos_max_mv: 7,
      vos_drift_uv_per_c: 7,
      ib_max_na: 250,
      gbw_mhz: 1,
      slew_v_per_us: 0.5,
      iq_ma: 0.7,
      noise_nv_rthz: 40,
      unity_gain_stable: true,
      phase_reversal: undefined,
      vdiff_max_v: 32,
      overload_recovery_us: 10,
      iout_max_ma: 20,
    });
  });

  // SPEC §4: a negative headroom means "may go that far beyond the rail".
  it("accepts headroom beyond the rails and pairs that leave any room at all", () => {
    expect(
      rowProblems("op-amp", {
        icm_neg_headroom_v: "-0.1",
        icm_pos_headroom_v: "-0.1",
        out_neg_headroom_v: "0.005",
        out_pos_headroom_v: "0.005",
      }),
    ).toEqual([]);
    expect(rowProblems("op-amp", { supply_max_v: "5.5", icm_neg_headroom_v: "2", icm_pos_headroom_v: "3.49" })).toEqual(
      [],
    );
    expect(rowProblems("op-amp", { supply_min_v: "5", supply_max_v: "5" })).toEqual([]);
  });

  it("rejects supply_min_v > supply_max_v and headroom pairs that leave no room inside supply_max_v", () => {
    expect([
      ...rowProblems("op-amp", { supply_min_v: "36", supply_max_v: "10" }),
      ...rowProblems("op-amp", { supply_max_v: "5.5", icm_neg_headroom_v: "2", icm_pos_headroom_v: "3.5" }),
      ...rowProblems("op-amp", { supply_max_v: "5", out_neg_headroom_v: "3", out_pos_headroom_v: "2.5" }),
    ]).toMatchInlineSnapshot(`
      [
        "op-amps.csv:2: column 'supply_min_v': minimum supply is above the maximum (got 36 V > 10 V, expected supply_min_v ≤ supply_max_v)",
        "op-amps.csv:2: column 'icm_pos_headroom_v': input headroom leaves no room inside the supply (got 2 V + 3.5 V = 5.5 V, expected less than supply_max_v 5.5 V)",
        "op-amps.csv:2: column 'out_pos_headroom_v': output headroom leaves no room inside the supply (got 3 V + 2.5 V = 5.5 V, expected less than supply_max_v 5 V)",
      ]
    `);
  });

  it("reports every problem of a row at once", () => {
    expect(rowProblems("op-amp", { id: "Bad", gbw_mhz: "x", slew_v_per_us: "-1", unity_gain_stable: "maybe" }))
      .toMatchInlineSnapshot(`
      [
        "op-amps.csv:2: column 'id': not a valid id (got 'Bad', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)",
        "op-amps.csv:2: column 'gbw_mhz': not a number (got 'x', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "op-amps.csv:2: column 'slew_v_per_us': must not be negative (got '-1', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "op-amps.csv:2: column 'unity_gain_stable': not yes or no (got 'maybe', expected 'yes' or 'no')",
      ]
    `);
  });

  it("skips the cross-column checks while a column they need is itself wrong", () => {
    expect(rowProblems("op-amp", { supply_min_v: "x", supply_max_v: "1" })).toMatchInlineSnapshot(`
      [
        "op-amps.csv:2: column 'supply_min_v': not a number (got 'x', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
      ]
    `);
  });
});

describe("opAmpColumns", () => {
  it("lists the SPEC §4 columns first, in order, then the optional ones added since", () => {
    const spec =
      "id,name,status,cost_band,tags,notes,channels,supply_min_v,supply_max_v,icm_neg_headroom_v,icm_pos_headroom_v,out_neg_headroom_v,out_pos_headroom_v,out_load_ohm,vos_max_mv,vos_drift_uv_per_c,ib_max_na,gbw_mhz,slew_v_per_us,iq_ma,noise_nv_rthz,unity_gain_stable,phase_reversal,input_fet".split(
        ",",
      );
    expect(Object.keys(opAmpColumns).slice(0, spec.length)).toEqual(spec);
  });

  it("has the optional sign-path ratings of issue 21, empty meaning not rated", () => {
    for (const c of ["vdiff_max_v", "overload_recovery_us", "iout_max_ma"])
      expect(Object.keys(opAmpColumns)).toContain(c);
  });
});
