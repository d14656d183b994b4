// Fault current into a pin's clamps: Ohm's law across the resistance in front of
// the pin once its Thévenin voltage passes the rail by the clamp onset (0.3 V,
// common practice: absolute-maximum tables allow 0.3 V beyond the rails).
import { describe, expect, it } from "vitest";
import { CLAMP_ONSET_V, clampCurrent, worstClampCurrent } from "../../../src/core/math/clamp-current.ts";

describe("clampCurrent", () => {
  it("24 V through 10 kΩ onto a 3.3 V rail: (24 − 3.6)/10k = 2.04 mA", () => {
    expect(clampCurrent({ gain: 1, offset_v: 0, ohm: 10e3 }, 24, 0, 3.3)).toBeCloseTo(2.04e-3, 9);
  });
  it("−24 V pulls 2.37 mA out of the ground clamp: (24 − 0.3)/10k", () => {
    expect(clampCurrent({ gain: 1, offset_v: 0, ohm: 10e3 }, -24, 0, 3.3)).toBeCloseTo(2.37e-3, 9);
    expect(worstClampCurrent({ gain: 1, offset_v: 0, ohm: 10e3 }, 24, 0, 3.3)).toBeCloseTo(2.37e-3, 9);
  });
  it("a divider's Thévenin source: 0.1·24 V + 1.65 V = 4.05 V behind 9.09 kΩ onto 3.3 V", () => {
    const i = clampCurrent({ gain: 0.1, offset_v: 1.65, ohm: 9.09e3 }, 24, 0, 3.3);
    expect(i).toBeCloseTo((4.05 - 3.3 - CLAMP_ONSET_V) / 9.09e3, 12);
  });
  it("inside the rails no current flows", () => {
    expect(clampCurrent({ gain: 1, offset_v: 0, ohm: 1e3 }, 3.5, 0, 3.3)).toBe(0);
  });
});
