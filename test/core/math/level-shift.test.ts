// The offset-to-mid-rail network, checked by superposition against Millman's theorem.
import { describe, expect, it } from "vitest";
import {
  chooseLevelShift,
  millmanNode,
  networkOf,
  networkToleranceError,
  sourceToleranceError,
} from "../../../src/core/math/level-shift.ts";
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
  it("is zero at zero tolerance and grows in proportion to it, in both its gain and its offset part", () => {
    const n = networkOf(82e3, 39e3, 75e3, 5);
    expect(networkToleranceError(n, 0, 10, 5)).toEqual({ gain_v: 0, offset_v: 0 });
    const e1 = networkToleranceError(n, 0.001, 10, 5);
    const e2 = networkToleranceError(n, 0.01, 10, 5);
    for (const part of ["gain_v", "offset_v"] as const) {
      expect(e1[part]).toBeGreaterThan(0);
      expect(e2[part] / e1[part]).toBeGreaterThan(9);
      expect(e2[part] / e1[part]).toBeLessThan(11);
    }
  });

  it("splits R1 = R2 = 10 kΩ at ±1 % into a gain part and a zero shift (two-resistor divider, superposition)", () => {
    // a = R2/(R1 + R2), b = V_ref·R1/(R1 + R2) (textbook divider by superposition).
    // Worst gain: R1 high, R2 low: a = 9.9/20.0 = 0.495, |Δa|/a = 1 %, × 3 V = 30 mV.
    // Worst zero: R1 high, R2 low: b = 2.5·10.1/20 = 1.2625 V, Δb = 12.5 mV, /a = 25.0 mV.
    const e = networkToleranceError(networkOf(10e3, 10e3, null, 2.5), 0.01, 3, 2.5);
    expect(e.gain_v).toBeCloseTo(0.03, 6);
    expect(e.offset_v).toBeCloseTo(0.025, 6);
  });
});

describe("the source in series with R1 (Thevenin: Rs adds to the signal branch)", () => {
  // Two-resistor divider with the source in the top leg (textbook superposition):
  // a = R2/(R1 + Rs + R2), b = V_ref·(R1 + Rs)/(R1 + Rs + R2).
  const divider = (r1: number, rs: number, r2: number, vref: number) => ({
    a: r2 / (r1 + rs + r2),
    b: (vref * (r1 + rs)) / (r1 + rs + r2),
  });

  it("R1 = R2 = 10 kΩ with a 600 Ω source: a = 10/20.6 = 0.48544, b = 2.5 V × 10.6/20.6 = 1.28641 V", () => {
    const n = networkOf(10e3, 10e3, null, 2.5, 600);
    expect(n.r1_ohm).toBe(10e3);
    expect(n.source_ohm).toBe(600);
    expect(n.gain).toBeCloseTo(0.48544, 5);
    expect(n.offset_v).toBeCloseTo(1.28641, 5);
    // The op amp's bias current sees (R1 + Rs) ‖ R2 = 10.6k·10k/20.6k = 5.1456 kΩ.
    expect(n.parallel_ohm).toBeCloseTo(5145.63, 1);
  });

  it("sizes R2 and R3 against R1 + Rs, so ±peak still lands inside the window with a large source", () => {
    for (const rs of [0, 600, 10e3, 10e6]) {
      const n = chooseLevelShift(1.5, 2.5, 0.1, 10e3, "E24", rs);
      expect(n, `Rs = ${rs}`).toBeDefined();
      if (!n) continue;
      expect(n.source_ohm).toBe(rs);
      expect(n.offset_v - n.gain * 1.5).toBeGreaterThanOrEqual(0.1 - 1e-12);
      expect(n.offset_v + n.gain * 1.5).toBeLessThanOrEqual(2.4 + 1e-12);
      // The chosen gain is that of R1 + Rs: a = G/(R1 + Rs).
      expect(n.gain).toBeCloseTo(n.parallel_ohm / (n.r1_ohm + rs), 12);
    }
  });

  it("Rs = 600 Ω ± 10 % through R1 = R2 = 10 kΩ: the worst gain and zero changes at Rs = 540 Ω", () => {
    const nominal = divider(10e3, 600, 10e3, 2.5);
    const low = divider(10e3, 540, 10e3, 2.5);
    const high = divider(10e3, 660, 10e3, 2.5);
    const e = sourceToleranceError(networkOf(10e3, 10e3, null, 2.5, 600), 0.1, 1.5, 2.5);
    const gain = Math.max(Math.abs(low.a - nominal.a), Math.abs(high.a - nominal.a)) / nominal.a;
    const zero = Math.max(Math.abs(low.b - nominal.b), Math.abs(high.b - nominal.b)) / nominal.a;
    expect(e.gain_v).toBeCloseTo(gain * 1.5, 9);
    expect(e.offset_v).toBeCloseTo(zero, 9);
    // By hand: a(540) = 10/20.54 = 0.486855 against 0.485437: 0.292 % of 1.5 V = 4.38 mV;
    // b(540) = 2.5·10.54/20.54 = 1.282863 V against 1.286408 V: 3.545 mV / 0.485437 = 7.30 mV.
    expect(e.gain_v * 1e3).toBeCloseTo(4.38, 2);
    expect(e.offset_v * 1e3).toBeCloseTo(7.3, 1);
  });
});
