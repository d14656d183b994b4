// The gained level shift: Millman's node (Proc. IRE 28(9), 1940) times a
// non-inverting gain 1 + Rf/Rg (textbook), out = Gs·(a·Vin + b).
import { describe, expect, it } from "vitest";
import {
  chooseGainedLevelShift,
  fillGain,
  gainedOf,
  gainedToleranceError,
} from "../../../src/core/math/gained-level-shift.ts";

describe("gainedOf", () => {
  it("R1 = 10k, R2 = 100k, R3 = 20k, Rf = 47k, Rg = 10k: a = G/R1, b = V_ref·G/R2, out = 5.7·(a·Vin + b)", () => {
    const g = 1 / (1 / 10e3 + 1 / 100e3 + 1 / 20e3);
    const x = gainedOf(10e3, 100e3, 20e3, 47e3, 10e3, 0, 1.8, 0.2);
    expect(x.stage_gain).toBeCloseTo(5.7, 12);
    expect(x.gain).toBeCloseTo((5.7 * g) / 10e3, 12);
    expect(x.offset_v).toBeCloseTo((5.7 * 1.8 * g) / 100e3, 12);
  });
});

describe("chooseGainedLevelShift", () => {
  it("±0.2 V into 1.8 V with a 0.1 V margin: gain near (0.9 − 0.1)/0.2 = 4, ≥ 80 % of the codes, inside the margins", () => {
    expect(fillGain(0.2, 1.8, 0.1)).toBeCloseTo(4, 12);
    const x = chooseGainedLevelShift(0.2, 1.8, 0.1, 10e3, "E24");
    if (!x) throw new Error("no network");
    expect(x.output_low_v).toBeGreaterThanOrEqual(0.1 - 1e-12);
    expect(x.output_high_v).toBeLessThanOrEqual(1.7 + 1e-12);
    expect((x.output_high_v - x.output_low_v) / 1.8).toBeGreaterThanOrEqual(0.8);
    expect(x.gain).toBeGreaterThan(3.6);
  });
  it("tolerance errors vanish at t = 0 and grow with t", () => {
    const x = chooseGainedLevelShift(0.2, 1.8, 0.1, 10e3, "E24");
    if (!x) throw new Error("no network");
    expect(gainedToleranceError(x, 0, 0.2, 1.8)).toEqual({ gain_v: 0, offset_v: 0 });
    const e = gainedToleranceError(x, 0.01, 0.2, 1.8);
    expect(e.gain_v).toBeGreaterThan(0);
    expect(e.offset_v).toBeGreaterThan(0);
  });
});
