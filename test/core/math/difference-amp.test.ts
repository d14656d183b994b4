// The four-resistor difference amplifier (textbook superposition; worst-case
// CMRR ≈ (1 + G)/(4t), Franco, Design with Operational Amplifiers and Analog
// Integrated Circuits, ch. 2, from memory).
import { describe, expect, it } from "vitest";
import {
  chooseDifferenceAmp,
  differenceOut,
  differenceSourceError,
  differenceToleranceError,
  pinCommonMode,
  toDecibels,
  worstCaseCmrr,
  worstCommonModeGain,
} from "../../../src/core/math/difference-amp.ts";

describe("worstCaseCmrr (1 + G)/(4t)", () => {
  it("G = 1, t = 0.1 % gives 500, 54.0 dB (the issue's figure)", () => {
    expect(worstCaseCmrr(1, 0.001)).toBeCloseTo(500, 9);
    expect(toDecibels(worstCaseCmrr(1, 0.001))).toBeCloseTo(53.98, 2);
  });
  it("G = 10, t = 1 % gives 275, 48.8 dB", () => {
    expect(worstCaseCmrr(10, 0.01)).toBeCloseTo(275, 9);
    expect(toDecibels(275)).toBeCloseTo(48.79, 2);
  });
  it("agrees with the exact worst corner to first order in t", () => {
    const amp = { r_in_ohm: 10e3, r_fb_ohm: 10e3, source_ohm: 0, gain: 1 };
    const exact = 1 / worstCommonModeGain(amp, 0.001);
    // Exact over the 16 corners: the first-order figure is within 0.2 % of it.
    expect(Math.abs(exact / 500 - 1)).toBeLessThan(0.002);
  });
});

describe("differenceOut", () => {
  it("matched resistors: G·(V+ − V−) + REF, whatever the common mode", () => {
    expect(differenceOut(10e3, 47e3, 10e3, 47e3, 2.55, 2.45, 0.9)).toBeCloseTo(4.7 * 0.1 + 0.9, 12);
  });
});

describe("chooseDifferenceAmp", () => {
  it("takes the largest E24 ratio not above the target among R1 near the scale: 4 → 36k/9.1k = 3.956", () => {
    const amp = chooseDifferenceAmp(4, 10e3, "E24");
    expect(amp).toMatchObject({ r_in_ohm: 9.1e3, r_fb_ohm: 36e3 });
    expect(amp?.gain).toBeCloseTo(36 / 9.1, 12);
  });
  it("counts the source in series with R1", () => {
    const amp = chooseDifferenceAmp(1, 10e3, "E24", 1e3);
    expect(amp?.gain ?? 2).toBeLessThanOrEqual(1);
  });
});

describe("pinCommonMode (R4·V+ + R3·REF)/(R3 + R4)", () => {
  it("G = 4: 0.8·2.5 V + 0.2·0.9 V = 2.18 V", () => {
    expect(pinCommonMode({ r_in_ohm: 10e3, r_fb_ohm: 40e3, source_ohm: 0, gain: 4 }, 2.5, 0.9)).toBeCloseTo(2.18, 12);
  });
});

describe("differenceToleranceError", () => {
  it("is zero for perfect resistors and about 2t·peak for t", () => {
    const amp = { r_in_ohm: 10e3, r_fb_ohm: 10e3, source_ohm: 0, gain: 1 };
    expect(differenceToleranceError(amp, 0, 0.1, 1.65)).toBe(0);
    // Gain error of R2/R1 at opposite corners ≈ 2t, plus the REF path: bounded by 4t·(peak + REF).
    const e = differenceToleranceError(amp, 0.001, 0.1, 1.65);
    expect(e).toBeGreaterThan(2 * 0.001 * 0.1 * 0.99);
    expect(e).toBeLessThan(4 * 0.001 * (0.1 + 1.65));
  });
});

describe("differenceSourceError (SPEC §11.1: the source's tolerance, each leg on its own)", () => {
  // R1 = R3 = 10 kΩ, R2 = R4 = 10 kΩ, 1 kΩ ± 10 % in each leg, ±1 V, common mode ±2 V, REF 1.25 V.
  // Nominal G = R2/(R1 + Rs) = 10/11. The expected value is the worst of the 16 corners of
  // Franco's superposition (ch. 2), out = V+·R4/(R3+R4)·(1 + R2/R1) + REF·R3/(R3+R4)·(1 + R2/R1) − V−·R2/R1,
  // worked out separately (a short script re-implementing that formula): 35.480 mV.
  const amp = { r_in_ohm: 10e3, r_fb_ohm: 10e3, source_ohm: 1e3, gain: 10 / 11 };
  it("is 35.480 mV at the worst corner, and zero without a source tolerance", () => {
    expect(differenceSourceError(amp, 0.1, 1, 1.25, 2) * 1e3).toBeCloseTo(35.48, 2);
    expect(differenceSourceError(amp, 0, 1, 1.25, 2)).toBeCloseTo(0, 12);
  });
  it("grows with the common mode: unequal legs let it through", () => {
    expect(differenceSourceError(amp, 0.1, 1, 1.25, 4)).toBeGreaterThan(differenceSourceError(amp, 0.1, 1, 1.25, 2));
  });
});
