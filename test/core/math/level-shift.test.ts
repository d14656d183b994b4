// The offset-to-mid-rail network, checked by superposition against Millman's theorem.
import { describe, expect, it } from "vitest";
import { chooseLevelShift, millmanNode, networkOf, networkToleranceError } from "../../../src/core/math/level-shift.ts";
import { seriesValues } from "../../../src/core/math/e-series.ts";

const parallel = (...r: number[]) => 1 / r.reduce((s, x) => s + 1 / x, 0);

describe("millmanNode", () => {
  // Millman, "A useful network theorem", Proc. IRE 28(9), 1940: V = Σ(Vᵢ/Rᵢ) / Σ(1/Rᵢ).
  // Three equal 10 kΩ branches from 10 V, 5 V and 0 V meet at (10 + 5 + 0)/3 = 5 V.
  it("averages equal branches", () => {
    expect(
      millmanNode([
        { v: 10, ohm: 10e3 },
        { v: 5, ohm: 10e3 },
        { v: 0, ohm: 10e3 },
      ]),
    ).toBeCloseTo(5, 12);
  });
});

describe("networkOf", () => {
  // Independent check by superposition (each source alone, the others shorted to
  // ground), a textbook method: with R1 = 82 kΩ, R2 = 39 kΩ, R3 = 75 kΩ and V_ref = 5 V,
  // gain a = (R2‖R3)/(R1 + R2‖R3) and offset b = V_ref·(R1‖R3)/(R2 + R1‖R3).
  it("matches superposition for 82k / 39k / 75k from a 5 V reference", () => {
    const n = networkOf(82e3, 39e3, 75e3, 5);
    const a = parallel(39e3, 75e3) / (82e3 + parallel(39e3, 75e3));
    const b = (5 * parallel(82e3, 75e3)) / (39e3 + parallel(82e3, 75e3));
    expect(n.gain).toBeCloseTo(a, 12);
    expect(n.offset_v).toBeCloseTo(b, 12);
    expect(n.parallel_ohm).toBeCloseTo(parallel(82e3, 39e3, 75e3), 6);
    // a = 0.23833, b = 2.5055 V (hand-computed)
    expect(n.gain).toBeCloseTo(0.23833, 5);
    expect(n.offset_v).toBeCloseTo(2.5055, 4);
  });

  it("with R1 = R2 and no R3 centres on V_ref/2 at gain 1/2", () => {
    const n = networkOf(10e3, 10e3, null, 3.3);
    expect(n.gain).toBeCloseTo(0.5, 12);
    expect(n.offset_v).toBeCloseTo(1.65, 12);
  });
});

describe("chooseLevelShift", () => {
  it.each([
    // [peak, vref, margin, scale, series]
    [10, 5, 0.1, 100e3, "E24"],
    [48, 5, 0.1, 1e6, "E96"],
    [15, 3.3, 0.1, 100e3, "E96"],
    [0.5, 2.5, 0.1, 1e6, "E24"],
  ] as const)("maps ±%s V into a %s V ADC with %s V margin, from the series", (peak, vref, margin, scale, series) => {
    const n = chooseLevelShift(peak, vref, margin, scale, series);
    expect(n).toBeDefined();
    if (!n) return;
    expect(n.offset_v - n.gain * peak).toBeGreaterThanOrEqual(margin - 1e-9);
    expect(n.offset_v + n.gain * peak).toBeLessThanOrEqual(vref - margin + 1e-9);
    const values = seriesValues(series);
    for (const r of [n.r1_ohm, n.r2_ohm, ...(n.r3_ohm === null ? [] : [n.r3_ohm])]) expect(values).toContain(r);
  });

  it("is undefined when the reference is narrower than twice the margin", () => {
    expect(chooseLevelShift(10, 0.2, 0.1, 100e3, "E24")).toBeUndefined();
  });
});

describe("networkToleranceError", () => {
  it("is zero at zero tolerance and grows with it", () => {
    const n = networkOf(82e3, 39e3, 75e3, 5);
    expect(networkToleranceError(n, 0, 10, 5)).toBe(0);
    const e1 = networkToleranceError(n, 0.001, 10, 5);
    const e2 = networkToleranceError(n, 0.01, 10, 5);
    expect(e1).toBeGreaterThan(0);
    expect(e2 / e1).toBeGreaterThan(9);
    expect(e2 / e1).toBeLessThan(11);
  });
});
