// Thermal voltage from the exact SI constants (SI Brochure, 9th ed., BIPM 2019)
// and the Shockley diode law V₂ − V₁ = n·V_T·ln(I₂/I₁).
import { describe, expect, it } from "vitest";
import { forwardVoltage } from "../../../src/core/math/diode.ts";

const BOLTZMANN = 1.380649e-23; // J/K, exact since 2019
const ELEMENTARY_CHARGE = 1.602176634e-19; // C, exact since 2019
const thermalVoltage = (kelvin: number) => (BOLTZMANN * kelvin) / ELEMENTARY_CHARGE;
/** Shockley: V = n·V_T·ln(I/I_S). */
const shockley = (current: number, is = 1e-14, n = 1, kelvin = 300) =>
  n * thermalVoltage(kelvin) * Math.log(current / is);

describe("thermal voltage and the Shockley law (SI Brochure 9th ed.; Shockley)", () => {
  it.each([
    [300, 25.852],
    [298.15, 25.6926],
  ])("V_T at %d K is %d mV", (kelvin, mv) => {
    expect(thermalVoltage(kelvin) * 1e3).toBeCloseTo(mv, 4);
  });

  it("a decade of current is 59.526 mV at 300 K, n = 1, and 118.32 mV at 298.15 K, n = 2", () => {
    expect(thermalVoltage(300) * Math.log(10) * 1e3).toBeCloseTo(59.526, 3);
    expect(2 * thermalVoltage(298.15) * Math.log(10) * 1e3).toBeCloseTo(118.32, 2);
  });

  it("with I_S = 10⁻¹⁴ A at 300 K: V(1 mA) = 0.65479 V, V(10 mA) = 0.71432 V", () => {
    expect(shockley(1e-3)).toBeCloseTo(0.65479, 5);
    expect(shockley(10e-3)).toBeCloseTo(0.71432, 5);
  });
});

describe("forwardVoltage (SPEC §4: Vf(I) = Vf(1 mA) + (Vf(10 mA) − Vf(1 mA))·log10(I / 1 mA))", () => {
  // The two rated points of an ideal junction (I_S = 10⁻¹⁴ A, n = 1, 300 K), to 5 decimals.
  const junction = { vf_1ma_v: 0.65479, vf_10ma_v: 0.71432 };

  it.each([1e-6, 100e-6, 1e-3, 3e-3, 10e-3, 30e-3, 1])(
    "reproduces the Shockley law at %d A (to the 10 µV the points carry)",
    (current) => {
      expect(Math.abs(forwardVoltage(junction, current) - shockley(current))).toBeLessThan(2e-5);
    },
  );

  it.each([
    [1e-3, 0.65479],
    [10e-3, 0.71432],
    [100e-6, 0.59526],
    [100e-3, 0.77385],
  ])("at %d A it is %d V", (current, vf) => {
    expect(forwardVoltage(junction, current)).toBeCloseTo(vf, 9);
  });

  it("rises by the points' difference per decade: 59.53 mV, the Shockley 59.526 mV/decade at 300 K", () => {
    const perDecade = forwardVoltage(junction, 1) - forwardVoltage(junction, 0.1);
    expect(perDecade).toBeCloseTo(junction.vf_10ma_v - junction.vf_1ma_v, 12);
    expect(Math.abs(perDecade - thermalVoltage(300) * Math.log(10))).toBeLessThan(1e-5);
  });

  it("never goes below zero, and is zero with no current", () => {
    expect(forwardVoltage(junction, 0)).toBe(0);
    expect(forwardVoltage(junction, -1e-3)).toBe(0);
    expect(forwardVoltage(junction, 1e-30)).toBe(0);
  });
});
