import { describe, expect, it } from "vitest";
import {
  checkClamp,
  CLAMP_CURRENT_MAX_A,
  CLAMP_SAFE_V,
  deadStageDifference,
  signDifference,
} from "../../../src/core/math/input-difference.ts";

describe("signDifference", () => {
  it("a ±2.5 V window against ground differs by 2.5 V", () => {
    expect(signDifference(-2.5, 2.5)).toBe(2.5);
    expect(signDifference(-1.2, 0.8)).toBe(1.2);
  });
});

describe("deadStageDifference (error β·S·t of the dead-time model, SPEC §11.3)", () => {
  it("issue 16's case: β = ½, S = 2π·1 kHz·2.5 V, 6.97 µs dead → 54.7 mV", () => {
    const s = 2 * Math.PI * 1000 * 2.5; // 15 707.96 V/s
    expect(deadStageDifference(0.5, s, 6.97e-6)).toBeCloseTo(0.054742, 6);
  });
});

describe("checkClamp", () => {
  it("the issue's acceptance case: 2.5 V of difference against a 0.7 V rating conducts, 1.8 V past it", () => {
    expect(checkClamp(2.5, 0.7, undefined)).toEqual({ case: "conducts", margin: -1.8 });
  });

  it("a 10 kΩ series resistor limits that to (2.5 − 0.7)/10 kΩ = 180 µA, against 10 mA", () => {
    const c = checkClamp(2.5, 0.7, 10e3);
    expect(c.case).toBe("limited");
    if (c.case !== "limited") return;
    expect(c.current_a).toBeCloseTo(180e-6, 12);
    expect(c.margin).toBeCloseTo(CLAMP_CURRENT_MAX_A - 180e-6, 12);
  });

  it("within a rating the margin is rating − difference", () => {
    expect(checkClamp(2.5, 32, undefined)).toEqual({ case: "within", margin: 29.5 });
  });

  it("unrated: a difference up to 0.3 V needs no rating (common practice [M]); more is unrated", () => {
    expect(CLAMP_SAFE_V).toBe(0.3);
    expect(checkClamp(0.25, undefined, undefined).case).toBe("below-floor");
    expect(checkClamp(0.5, undefined, 10e3).case).toBe("unrated");
  });
});
