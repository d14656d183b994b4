// Forward voltage falls about 2 mV/°C at constant current (Sedra & Smith,
// Microelectronic Circuits, diode chapter; REFERENCES.md [V for the figure]).
// FET-input bias current doubling per 10 °C and diode leakage growth are common
// practice [M] (REFERENCES.md, "Common practice").
import { describe, expect, it } from "vitest";
import {
  biasCurrentAt,
  endPhrase,
  forwardVoltageAt,
  forwardVoltageRange,
  leakageAt,
  worstDrop,
} from "../../../src/core/math/temperature.ts";

const silicon = { vf_1ma_v: 0.7, vf_10ma_v: 0.86 };

describe("forwardVoltageAt (−2 mV/°C, Sedra & Smith)", () => {
  it.each([
    // current, °C, V: 0.70 V at 1 mA and 25 °C; 45 °C colder +90 mV, 25 °C hotter −50 mV
    [1e-3, 25, 0.7],
    [1e-3, -20, 0.79],
    [1e-3, 50, 0.65],
    [10e-3, 85, 0.74],
  ])("at %d A and %d °C: %d V", (current, c, v) => {
    expect(forwardVoltageAt(silicon, current, c)).toBeCloseTo(v, 12);
  });

  it("moves exactly −2 mV per °C at any current", () => {
    for (const i of [1e-5, 3e-4, 2e-2]) {
      expect(forwardVoltageAt(silicon, i, 26) - forwardVoltageAt(silicon, i, 25)).toBeCloseTo(-2e-3, 12);
    }
  });

  it("never goes below zero and is zero without current", () => {
    expect(forwardVoltageAt(silicon, 1e-3, 500)).toBe(0);
    expect(forwardVoltageAt(silicon, 0, -40)).toBe(0);
  });

  it("names the cold end for a larger drop and the hot end for a smaller one", () => {
    const r = forwardVoltageRange(silicon, 1e-3, { min_c: -20, max_c: 60 });
    expect(worstDrop(r, "larger")).toEqual({ end: "cold", c: -20, vf_v: expect.closeTo(0.79, 12) });
    expect(worstDrop(r, "smaller")).toEqual({ end: "hot", c: 60, vf_v: expect.closeTo(0.63, 12) });
    expect(r.at25_v).toBeCloseTo(0.7, 12);
    expect(endPhrase("cold", -20)).toBe("at −20 °C (the cold end)");
    expect(endPhrase("hot", 60)).toBe("at 60 °C (the hot end)");
  });
});

describe("biasCurrentAt (FET input doubles per 10 °C, common practice [M])", () => {
  it.each([
    [20e-12, true, 25, 20e-12],
    [20e-12, true, 55, 160e-12], // three doublings
    [20e-12, true, 85, 1.28e-9], // six doublings
    [20e-12, true, 0, 20e-12], // never below the rating
    [250e-9, false, 85, 250e-9], // bipolar: the rated maximum stands
  ])("%d A, FET %s, at %d °C: %d A", (rated, fet, c, amps) => {
    expect(biasCurrentAt(rated, fet, c)).toBeCloseTo(amps, 20);
  });
});

describe("leakageAt (silicon ×2 per 10 °C, Schottky ×10 per 25 °C, common practice [M])", () => {
  it.each([
    [{ type: "silicon", ir_na: 25 }, 45, 100e-9],
    [{ type: "schottky", ir_na: 2000 }, 50, 20e-6],
    [{ type: "low-leakage", ir_na: 0.1 }, 15, 0.1e-9],
  ])("%o at %d °C: %d A", (d, c, amps) => {
    expect(Math.abs(leakageAt(d, c) - amps)).toBeLessThanOrEqual(amps * 1e-12);
  });
});
