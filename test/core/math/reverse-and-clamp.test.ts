// Reverse voltages (SPEC §11.12) and the clamp diode's polarity (SPEC §11.6).
// Pump: the flying node swings from +Vf to −(V_d − Vf) (diode charge-pump inverter,
// no load −(V_d − 2V_F), REFERENCES.md / Winder ch. 14), so each diode blocks
// V_d − Vf. Logic inputs: −0.3 V lower limit, common practice [M] (REFERENCES.md).
import { describe, expect, it } from "vitest";
import { clampLowLevel, PIN_MIN_DEFAULT_V } from "../../../src/core/math/clamp-leakage.ts";
import { pumpDiodeReverse, rectifierDiodeReverse } from "../../../src/core/math/reverse-voltage.ts";

describe("pumpDiodeReverse (two-diode inverting pump)", () => {
  it.each([
    [5, 0.7, 4.3],
    [3.3, 0.3, 3.0],
    [0.5, 0.7, 0],
  ])("drive %d V, Vf %d V → %d V, not the 2 × drive the old rule asked", (drive, vf, vr) => {
    expect(pumpDiodeReverse(drive, vf)).toBeCloseTo(vr, 12);
  });

  it("matches the node swing: from +Vf down to the no-load rail minus one drop", () => {
    const drive = 5;
    const vf = 0.7;
    const rail = -(drive - 2 * vf);
    const nodeLow = rail - vf;
    expect(pumpDiodeReverse(drive, vf)).toBeCloseTo(0 - nodeLow, 12); // first diode, to ground
    expect(pumpDiodeReverse(drive, vf)).toBeCloseTo(vf - rail, 12); // second diode, to the rail
  });
});

describe("rectifierDiodeReverse (inverting half-wave stage: W + Vf)", () => {
  it("2.5 V window, 0.7 V drop: 3.2 V", () => {
    expect(rectifierDiodeReverse(2.5, 0.7)).toBeCloseTo(3.2, 12);
  });
});

describe("clampLowLevel (the reverse-biased clamp's leakage pulls the pin below ground)", () => {
  it("4 µA × 100 kΩ puts the pin at −0.40 V, below −0.30 V (issue 16)", () => {
    const low = clampLowLevel(-2.5, 4e-6, 100e3);
    expect(low.reverse_biased).toBe(true);
    expect(low.level_v.toFixed(2)).toBe("-0.40");
    expect(low.level_v).toBeLessThan(PIN_MIN_DEFAULT_V);
  });

  it("500 µA × 10 kΩ would be −5.00 V, but the node stops at the −2.50 V low level (a diode carries nothing at zero bias)", () => {
    // Shockley diode equation (Sedra & Smith ch. 4): I = Is·(e^(V/nV_T) − 1) is 0 at V = 0, so the
    // leakage cannot pull the node past the level at the diode's other end.
    expect(clampLowLevel(-2.5, 500e-6, 10e3)).toEqual({
      level_v: -2.5,
      reverse_biased: true,
      pulled_v: -5,
      floor_v: -2.5,
      clipped: true,
    });
  });

  it("clips at the deepest low level given (a pumped rail's trough), never at one above the low level", () => {
    expect(clampLowLevel(-2.42, 500e-6, 10e3, -2.63).level_v).toBe(-2.63);
    expect(clampLowLevel(-2.5, 500e-6, 10e3, -1).level_v).toBe(-2.5);
    expect(clampLowLevel(-2.5, 4e-6, 100e3, -2.63)).toMatchObject({ clipped: false, floor_v: -2.63 });
  });

  it("a comparator low at or above ground does not reverse-bias the diode: the node is at most that level", () => {
    expect(clampLowLevel(0.05, 4e-6, 100e3)).toEqual({ level_v: 0.05, reverse_biased: false });
  });
});
