// difference-to-mid (SPEC §12.2, issue 17 acceptance): out = G·(V+in − V−in) + REF,
// pins at (V+in·R4 + REF·R3)/(R3 + R4), worst-case CMRR ≈ (1 + G)/(4t) (Franco, Design
// with Operational Amplifiers and Analog Integrated Circuits, ch. 2 [M]): G = 1,
// t = 0.1 % → 500, 54.0 dB.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";

const zeroDrift = {
  supply_min_v: 1.8,
  supply_max_v: 5.5,
  icm_neg_headroom_v: -0.1,
  icm_pos_headroom_v: -0.1,
  out_neg_headroom_v: 0.005,
  out_pos_headroom_v: 0.005,
  vos_max_mv: 0.01,
  ib_max_na: 0.1,
  gbw_mhz: 2,
  slew_v_per_us: 1,
};
const CATALOGUE = catalogueFromParts([
  opAmp({ id: "oa-rrio-zd", ...zeroDrift }),
  // The same, but its inputs stop 2 V below V+: on 3.3 V they reach only 1.3 V.
  opAmp({ id: "oa-low-cm", ...zeroDrift, icm_pos_headroom_v: 2 }),
]);

const bridge = (o: { gainTarget?: number; tol?: number } = {}) =>
  design({
    topology: "difference-to-mid",
    supply: { positive_v: 3.3, negative: { kind: "ground" } },
    signal: {
      peak_v: o.gainTarget === undefined ? 0.02 : (1.25 - 0.1) / o.gainTarget,
      max_frequency_hz: 50,
      source_ohm: 0,
      kind: "differential",
      common_mode_min_v: 1.6,
      common_mode_max_v: 1.7,
    },
    front_end: { window_v: 1, divider_total_ohm: 10e3, resistor_tolerance: o.tol ?? 0.001, series: "E24" },
    adc: { bits: 12, reference_v: 2.5, reference_tolerance: 0.001 },
    accuracy: { required_v: 0.0005 },
  });

describe("difference-to-mid", () => {
  it("acceptance: G = 1, t = 0.1 % gives the textbook 500 (54.0 dB) and the term |Vcm|/CMRR", () => {
    const e = evaluateDesign(bridge({ gainTarget: 1 }), CATALOGUE);
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    expect(e.result.derived.ratio).toBe(1);
    const term = e.result.budget.terms.find((t) => t.name === "common-mode");
    expect(term?.label).toContain("= 500 (54.0 dB)");
    expect(term?.removed_by).toBe("none");
    // 1.70 V / 500 = 3.40 mV.
    expect(term?.v).toBeCloseTo(1.7 / 500, 12);
    expect(term?.calibrates_out).toBe(false);
  });

  it("acceptance: rejects an op amp whose inputs cannot reach the bridge's common mode on 3.3 V", () => {
    const e = evaluateDesign(bridge(), CATALOGUE);
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    const role = e.result.roles.find((r) => r.role === "difference");
    expect(role?.fits.map((p) => p.part.id)).toEqual(["oa-rrio-zd"]);
    const cm = role?.resultOf("oa-low-cm")?.findings.find((f) => f.rule === "input-common-mode");
    expect(cm?.verdict).toBe("fail");
    // Pins at G/(1+G)·(1.70 + 0.01) + REF/(1+G) for G = R2/R1; it accepts up to 3.3 − 2 = 1.3 V.
    expect(cm?.reason).toMatch(/accepts −0\.10 V to \+1\.30 V: 0\.\d\d V short/);
  });

  it("the gain fills the range: the largest E24 ratio not above (1.25 − 0.1)/0.02 = 57.5", () => {
    const e = evaluateDesign(bridge(), CATALOGUE);
    if (!e.ok) throw new Error("no result");
    expect(e.result.derived.ratio).toBeLessThanOrEqual(57.5);
    expect(e.result.derived.ratio).toBeGreaterThan(50);
  });

  it("single-ended front ends are left out of all for a differential design, with the reason", () => {
    const e = evaluateDesign({ ...bridge(), topology: "all" }, CATALOGUE);
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    expect(e.result.topology).toBe("difference-to-mid");
    expect(e.result.comparison?.skipped?.map((s) => s.topology)).toEqual([
      "rectify-and-sign",
      "offset-to-mid-rail",
      "gained-level-shift",
    ]);
    expect(e.result.comparison?.reason).toBe("it is the only topology evaluated");
  });

  it("a fault on either input is checked at the pin it reaches", () => {
    const d = design({
      ...JSON.parse(JSON.stringify(bridge())),
      signal: { ...bridge().signal, fault_v: 24 },
      front_end: { ...bridge().front_end, protection_ohm: 10e3 },
    });
    const e = evaluateDesign(d, CATALOGUE);
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    const f = e.result.roles[0]?.resultOf("oa-rrio-zd")?.findings.find((x) => x.rule === "input-fault");
    expect(f?.available).toBeGreaterThan(0);
    expect(f?.reason).toMatch(/into the clamp/);
  });
});
