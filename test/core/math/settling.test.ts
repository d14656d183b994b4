// Settling arithmetic for driving a sampling converter (SPEC §12.3).
import { describe, expect, it } from "vitest";
import {
  amplifierTau,
  chargeShareStep,
  halfLsbTimeConstants,
  rcAttenuation,
  samplingTau,
  timeConstantsFor,
  twoPoleStepError,
} from "../../../src/core/math/settling.ts";

describe("halfLsbTimeConstants: e^(−t/τ) = 2^−(N+1) ⇒ t = (N+1)·ln2·τ (first-order step response, textbook)", () => {
  it.each([
    // bits, time constants: the figures, (N+1)·0.693147
    [12, 9.011],
    [10, 7.625],
    [16, 11.784],
    [8, 6.238],
  ])("%d bits need %d τ", (bits, n) => {
    expect(halfLsbTimeConstants(bits)).toBeCloseTo(n, 3);
  });

  it("the exponential really is down to ½ LSB there (pure arithmetic)", () => {
    expect(Math.exp(-halfLsbTimeConstants(12))).toBeCloseTo(1 / 8192, 12);
  });
});

describe("timeConstantsFor = ln(step / error)", () => {
  it("a 1 V step to 1 mV takes ln 1000 = 6.908 τ", () => {
    expect(timeConstantsFor(1, 1e-3)).toBeCloseTo(6.9078, 4);
  });
  it("a step already inside the error needs none", () => {
    expect(timeConstantsFor(1e-4, 1e-3)).toBe(0);
  });
});

describe("amplifierTau: closed-loop pole GBW/noise gain (single-pole op amp, textbook)", () => {
  it("1 MHz at unity gain is 159.15 ns; at a noise gain of 5 it is 795.8 ns", () => {
    expect(amplifierTau(1e6, 1)).toBeCloseTo(159.155e-9, 12);
    expect(amplifierTau(1e6, 5)).toBeCloseTo(795.775e-9, 11);
  });
});

describe("samplingTau: Elmore delay of the pin RC and the switch (Elmore 1948)", () => {
  it("switch alone: 1 kΩ × 10 pF = 10 ns", () => {
    expect(samplingTau({ pin_r_ohm: 0, pin_c_f: 0, switch_ohm: 1e3, sample_cap_f: 10e-12 })).toBeCloseTo(10e-9, 18);
  });
  it("100 Ω, 1 nF at the pin, then 1 kΩ, 10 pF: 100·1.01 n + 1k·10 p = 111 ns", () => {
    expect(samplingTau({ pin_r_ohm: 100, pin_c_f: 1e-9, switch_ohm: 1e3, sample_cap_f: 10e-12 })).toBeCloseTo(
      111e-9,
      15,
    );
  });
  it("the sum of time constants is not optimistic: the exact two-pole error is already below ½ LSB there", () => {
    // Two real poles in cascade, step error (τ1·e^(−t/τ1) − τ2·e^(−t/τ2))/(τ1 − τ2) (Laplace, textbook).
    for (const [t1, t2] of [
      [1, 1],
      [1, 0.1],
      [1, 3],
      [2, 0.5],
    ] as const) {
      const t = halfLsbTimeConstants(12) * (t1 + t2);
      expect(twoPoleStepError(t, t1, t2)).toBeLessThan(1 / 8192);
    }
  });
});

describe("chargeShareStep: charge conservation Q = C·V", () => {
  it.each([
    // V, Cs, Cpin, step: 1.8 V × 10 p/(10 p + 1 n) = 17.82 mV; Cpin = 0 drops the whole V
    [1.8, 10e-12, 1e-9, 0.0178218],
    [3.3, 20e-12, 20e-12, 1.65],
    [1, 10e-12, 0, 1],
  ])("%d V, %d F into %d F steps %d V", (v, cs, cp, step) => {
    expect(chargeShareStep(v, cs, cp)).toBeCloseTo(step, 6);
  });
});

describe("rcAttenuation: |H| = 1/√(1 + (f/fc)²) (first-order low pass, textbook)", () => {
  it("is 1/√2 at the corner and 0.0995 a decade above", () => {
    const r = 1e3;
    const c = 1 / (2 * Math.PI * r * 1e3); // fc = 1 kHz
    expect(rcAttenuation(1e3, r, c)).toBeCloseTo(Math.SQRT1_2, 12);
    expect(rcAttenuation(10e3, r, c)).toBeCloseTo(0.0995037, 6);
  });
  it("no RC passes everything", () => {
    expect(rcAttenuation(1e6, 0, 0)).toBe(1);
  });
});
