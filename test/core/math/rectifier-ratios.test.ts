// The two-op-amp full-wave rectifier's half-wave gains from its resistors (SPEC §11.2).
// Source: the circuit's textbook equations (S. Franco, Design with Operational Amplifiers and
// Analog Integrated Circuits, precision-rectifier section; Sedra & Smith, Microelectronic
// Circuits, precision rectifiers) [M for the sections]: stage 1 s1 = −x·Rf1/Ri1 (x > 0),
// stage 2 out = −Rf2·(x/Ra + s1/Rb).
import { describe, expect, it } from "vitest";
import { halfWaveGains, nominalResistors, ratioSpread } from "../../../src/core/math/rectifier-ratios.ts";

describe("halfWaveGains", () => {
  it("are both 1 with R, R, R, R/2, R: g+ = R·(R/(R·R/2) − 1/R) = 2 − 1, g− = R/R", () => {
    const g = halfWaveGains(nominalResistors(10e3));
    expect(g.positive).toBeCloseTo(1, 14);
    expect(g.negative).toBeCloseTo(1, 14);
  });

  it("follow the resistors by hand: Rb 1 % high gives g+ = 2/1.01 − 1 = 0.980198, g− unchanged", () => {
    const g = halfWaveGains({ ...nominalResistors(10e3), rb: 5050 });
    expect(g.positive).toBeCloseTo(2 / 1.01 - 1, 12);
    expect(g.negative).toBe(1);
  });
});

describe("ratioSpread over the 32 corners", () => {
  it("0.1 % resistors: the halves' gains differ from 1 by up to about 0.8 % (issue 15's hand check)", () => {
    const s = ratioSpread(10e3, 0.001);
    // Worst corner for g+: Rf2, Rf1, Ra high and Ri1, Rb low: 1.001·(2·1.001/0.999² − 1/1.001) − 1.
    const gPlus = 1.001 * ((2 * 1.001) / (0.999 * 0.999) - 1 / 1.001) - 1;
    expect(s.positive).toBeCloseTo(gPlus, 12);
    expect(s.positive * 100).toBeCloseTo(0.802, 2);
    // g− = Rf2/Ra: at worst 1.001/0.999 − 1.
    expect(s.negative).toBeCloseTo(1.001 / 0.999 - 1, 12);
  });

  it("1 % resistors: up to about 8 % (issue 15)", () => {
    // 1.01·(2·1.01/0.99² − 1/1.01) − 1 = 8.1624 %.
    expect(ratioSpread(10e3, 0.01).positive * 100).toBeCloseTo(8.1624, 4);
  });

  it("splits into a common part and the difference between the halves, each no larger than the sum of both", () => {
    const s = ratioSpread(10e3, 0.001);
    expect(s.common).toBeGreaterThan(0);
    expect(s.difference).toBeGreaterThan(0);
    // Common ≤ the larger half's error; the difference ≤ the two halves' errors together.
    expect(s.common).toBeLessThanOrEqual(Math.max(s.positive, s.negative) + 1e-15);
    expect(s.difference).toBeLessThanOrEqual(s.positive + s.negative + 1e-15);
  });

  it("is zero with exact resistors", () => {
    expect(ratioSpread(10e3, 0)).toEqual({ positive: 0, negative: 0, common: 0, difference: 0 });
  });
});
