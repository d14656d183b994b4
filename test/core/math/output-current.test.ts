import { describe, expect, it } from "vitest";
import { clampSourceCurrent, pullUpSinkCurrent, pullUpSourceCurrent } from "../../../src/core/math/output-current.ts";

describe("output current (Ohm's law with the diode's Vf(I), SPEC §4)", () => {
  it("diode clamp: V_OH 3.3 V, a 0.65 V diode, 10 kΩ → 265 µA (REFERENCES, logic thresholds: node at 2.65 V)", () => {
    expect(clampSourceCurrent(3.3, 10e3, { vf_1ma_v: 0.65, vf_10ma_v: 0.65 })).toBeCloseTo(265e-6, 12);
  });

  it("pull-up: 5 V to an output low of 0.05 V through 10 kΩ sinks 495 µA", () => {
    expect(pullUpSinkCurrent(5, 0.05, 10e3)).toBeCloseTo(495e-6, 12);
  });

  it("pull-up: a push-pull high at 5 V into a 3.3 V pull-up of 10 kΩ sources 170 µA; at or below V_DD none", () => {
    expect(pullUpSourceCurrent(3.3, 5, 10e3)).toBeCloseTo(170e-6, 12);
    expect(pullUpSourceCurrent(3.3, 3.3, 10e3)).toBe(0);
  });
});
