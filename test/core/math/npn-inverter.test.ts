// The NPN inverter's base with the sign output low. V_EBO 5–6 V for small-signal NPN classes,
// the 80 % derating and the storage time are common practice [M], not from a datasheet.
import { describe, expect, it } from "vitest";
import { forwardVoltage } from "../../../src/core/math/diode.ts";
import {
  baseDriveCurrent,
  baseReverse,
  npnTurnOff,
  NPN_STORAGE_DEFAULT_S,
  NPN_VEBO_DEFAULT_V,
  REVERSE_DERATING,
} from "../../../src/core/math/npn-inverter.ts";

// Ideal junction (Shockley, I_S = 10⁻¹⁴ A, n = 1, 300 K; REFERENCES.md).
const junction = { vf_1ma_v: 0.65479, vf_10ma_v: 0.71432 };
const BOLTZMANN = 1.380649e-23;
const CHARGE = 1.602176634e-19;
const VT = (BOLTZMANN * 300) / CHARGE;

describe("defaults (common practice [M])", () => {
  it("takes V_EBO at the low end of 5–6 V, derates to 80 %, stores 300 ns", () => {
    expect(NPN_VEBO_DEFAULT_V).toBe(5);
    expect(REVERSE_DERATING * NPN_VEBO_DEFAULT_V).toBe(4);
    expect(NPN_STORAGE_DEFAULT_S).toBe(300e-9);
  });
});

describe("baseReverse", () => {
  it("without a clamp the base sits at the output: −4.5 V low is 4.5 V reverse", () => {
    expect(baseReverse(-4.5)).toEqual({ reverse_v: 4.5, clamp_current_a: 0 });
  });

  it("with the output at or above ground there is no reverse voltage", () => {
    expect(baseReverse(0.02).reverse_v).toBe(0);
    expect(baseReverse(0, { diode: junction, base_ohm: 10e3 }).reverse_v).toBe(0);
  });

  it("a clamp through 10 kΩ from −4.5 V holds the base at one Shockley drop", () => {
    const r = baseReverse(-4.5, { diode: junction, base_ohm: 10e3 });
    // Independent check: Newton on I·R + V_T·ln(I/I_S) = 4.5 with the Shockley law itself.
    let i = 1e-4;
    for (let k = 0; k < 50; k++) {
      const f = i * 10e3 + VT * Math.log(i / 1e-14) - 4.5;
      i -= f / (10e3 + VT / i);
    }
    expect(r.clamp_current_a).toBeCloseTo(i, 8);
    expect(r.reverse_v).toBeCloseTo(VT * Math.log(i / 1e-14), 4);
    expect(r.reverse_v).toBeCloseTo(forwardVoltage(junction, r.clamp_current_a), 12);
    // about 388 µA and 0.630 V: far inside the 4 V derated limit
    expect(r.clamp_current_a).toBeCloseTo(387.0e-6, 6);
    expect(r.reverse_v).toBeCloseTo(0.6302, 3);
  });
});

describe("baseDriveCurrent", () => {
  it("(V_OH − 0.7 V)/R_B: 5 V through 10 kΩ gives 430 µA", () => {
    expect(baseDriveCurrent(5, 10e3)).toBeCloseTo(430e-6, 12);
    expect(baseDriveCurrent(0.5, 10e3)).toBe(0);
  });
});

describe("npnTurnOff", () => {
  it("storage plus the collector's 2.2·RC rise: 300 ns + 100 kΩ × 10 pF = 2.497 µs", () => {
    const t = npnTurnOff(300e-9, 100e3, 10e-12, 0.2, 5, 3.5);
    expect(t.edge.seconds).toBeCloseTo(2.19722e-6, 10);
    expect(t.seconds).toBeCloseTo(2.49722e-6, 10);
  });
});
