// Issue 16 acceptance, through the engine: the charge pump carries the parts it
// powers (SPEC §11.5). Switched-capacitor droop I/(f·C) with the summed load
// (S. Winder, Analog and Digital Filter Design, 2nd ed., ch. 14): naming a
// rectifier with a larger supply current moves the rail by the extra current
// through 1/(f·C) (and the diodes' and ripple's share), and the rail's load is
// shown as a sum.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import type { DesignResult } from "../../src/core/engine/result.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

const RRIO = {
  supply_max_v: 12,
  icm_neg_headroom_v: -0.1,
  icm_pos_headroom_v: -0.1,
  out_neg_headroom_v: 0.05,
  out_pos_headroom_v: 0.05,
  vos_max_mv: 0.5,
  ib_max_na: 0.01,
  gbw_mhz: 50,
  slew_v_per_us: 20,
};
const catalogue = catalogueFromParts([
  opAmp({ id: "oa-light", iq_ma: 0.1, ...RRIO }),
  opAmp({ id: "oa-heavy", iq_ma: 1.9, ...RRIO }),
  comparator({ supply_max_v: 12, iq_ma: 0.2 }),
  diode({ id: "d-pump", vf_1ma_v: 0.3, vf_10ma_v: 0.4, ir_na: 1 }),
]);
const pumped = (rectifier: string) =>
  design({
    supply: {
      negative: {
        kind: "charge-pump",
        drive_v: 5,
        frequency_hz: 20000,
        flying_cap_f: 10e-6,
        reservoir_cap_f: 22e-6,
        load_a: 1e-3,
      },
    },
    bom: { buffer: "oa-light", rectifier, sign: "cmp-test" },
  });

function run(rectifier: string): DesignResult {
  const e = evaluateDesign(pumped(rectifier), catalogue, "rectify-and-sign");
  if (!e.ok) throw new Error(JSON.stringify(e.problems));
  return e.result;
}
const loadRow = (r: DesignResult) =>
  r.display.flatMap((g) => g.rows).find((x) => x.label.startsWith("Load on V−"))?.value;

describe("rectify-and-sign: the pump carries the parts (issue 16)", () => {
  it("moves the rail when a rectifier with a larger supply current is named, and shows the load as a sum", () => {
    const light = run("oa-light");
    const heavy = run("oa-heavy");
    expect(loadRow(light)).toBe(
      "1 mA stated + 1 × 100 µA (oa-light, buffer) + 2 × 100 µA (oa-light, rectifier) + 1 × 200 µA (cmp-test, sign) = 1.5 mA",
    );
    expect(loadRow(heavy)).toBe(
      "1 mA stated + 1 × 100 µA (oa-light, buffer) + 2 × 1.9 mA (oa-heavy, rectifier) + 1 × 200 µA (cmp-test, sign) = 5.1 mA",
    );
    // 3.6 mA more through 1/(f·C_fly) = 5 Ω and half the ripple I/(f·C_res) = 2.27 Ω: at least 26 mV shallower
    // (the diodes' drops grow with their current too, so the shift is larger still).
    const shift = heavy.derived.rails.negative_v - light.derived.rails.negative_v;
    expect(shift).toBeGreaterThan(3.6e-3 * (1 / (20000 * 10e-6) + 1 / (2 * 20000 * 22e-6)));
    expect(shift).toBeLessThan(0.2);
  });

  it("judges another candidate on the rail it would see, naming the sum in its reason", () => {
    const light = run("oa-light");
    const f = light.roles
      .find((r) => r.role === "rectifier")
      ?.resultOf("oa-heavy")
      ?.findings.find((x) => x.rule === "pump-load");
    expect(f?.verdict).toBe("marginal");
    expect(f?.reason).toContain("+ 2 × 1.90 mA = 5.10 mA");
    expect(f?.reason).toContain("shallower than the");
  });
});

describe("the clamp diode's reverse stress on a pumped rail (SPEC §11.12)", () => {
  it("is |V−| at the rail's deepest point (the no-load rail −(V_d − 2V_F) or the ripple's trough), not its loaded level", () => {
    const r = run("oa-light");
    const neg = r.derived.negative;
    if (neg.kind !== "charge-pump") throw new Error("expected a pumped rail");
    const deepest = Math.min(neg.no_load_v, neg.dc_v - neg.ripple_v / 2);
    const f = r.roles
      .find((x) => x.role === "clamp-diode")
      ?.resultOf("d-pump")
      ?.findings.find((x) => x.rule === "reverse-voltage");
    expect(f?.needed).toBeCloseTo(-deepest, 12);
    // Deeper than the loaded worst level the other checks use, by the droop plus half the ripple at least.
    expect(-deepest).toBeGreaterThan(-neg.worst_v);
  });
});
