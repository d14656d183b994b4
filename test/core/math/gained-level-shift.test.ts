// The gained level shift: Millman's node (Proc. IRE 28(9), 1940) times a
// non-inverting gain 1 + Rf/Rg (textbook), out = Gs·(a·Vin + b).
import { describe, expect, it } from "vitest";
import {
  chooseGainedLevelShift,
  fillGain,
  gainedOf,
  gainedSourceError,
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

describe("gainedSourceError (SPEC §11.1: the source in series with R1)", () => {
  // Millman's node (Proc. IRE 28(9), 1940) with R1 + Rs in the signal branch, times Gs = 1 + Rf/Rg.
  const transfer = (rs: number) => {
    const [r1, r2, r3, rf, rg, vref] = [20e3, 30e3, 15e3, 10e3, 10e3, 3.3];
    const den = 1 / (r1 + rs) + 1 / r2 + 1 / r3;
    const gs = 1 + rf / rg;
    return { a: gs / (r1 + rs) / den, b: (gs * vref) / r2 / den };
  };
  it("matches the hand transfer at Rs = 1 kΩ ± 20 %: |ΔA|/A·peak and |Δb|/A at the worse end", () => {
    const x = gainedOf(20e3, 30e3, 15e3, 10e3, 10e3, 1e3, 3.3, 0.5);
    const nominal = transfer(1e3);
    const ends = [transfer(800), transfer(1200)];
    const gain = Math.max(...ends.map((e) => (Math.abs(e.a - nominal.a) / nominal.a) * 0.5));
    const offset = Math.max(...ends.map((e) => Math.abs(e.b - nominal.b) / nominal.a));
    const got = gainedSourceError(x, 0.2, 0.5, 3.3);
    expect(got.gain_v).toBeCloseTo(gain, 12);
    expect(got.offset_v).toBeCloseTo(offset, 12);
    expect(got.gain_v).toBeGreaterThan(0);
  });
});
