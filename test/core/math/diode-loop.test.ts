// A diode and a resistor in series: I·R + Vf(I) = V, with Vf(I) from the two rated points
// (SPEC §4) of an ideal junction (Shockley, I_S = 10⁻¹⁴ A, n = 1, 300 K; REFERENCES.md).
import { describe, expect, it } from "vitest";
import { forwardVoltage } from "../../../src/core/math/diode.ts";
import { diodeLoopCurrent } from "../../../src/core/math/diode-loop.ts";

const junction = { vf_1ma_v: 0.65479, vf_10ma_v: 0.71432 };

describe("diodeLoopCurrent", () => {
  it("5.65479 V across 5 kΩ and the junction carries exactly 1 mA (V(1 mA) = 0.65479 V)", () => {
    expect(diodeLoopCurrent(5.65479, 5e3, junction)).toBeCloseTo(1e-3, 12);
  });

  it("REFERENCES (logic thresholds): V_OH 3.3 V, a 0.65 V diode, 10 kΩ → the node sits at 2.65 V", () => {
    const flat = { vf_1ma_v: 0.65, vf_10ma_v: 0.65 };
    const i = diodeLoopCurrent(3.3, 10e3, flat);
    expect(i * 10e3).toBeCloseTo(2.65, 10);
  });

  it.each([0.5, 3.3, 4.5, 12])("the root satisfies I·R + Vf(I) = %d V through 10 kΩ", (v) => {
    const i = diodeLoopCurrent(v, 10e3, junction);
    expect(i * 10e3 + forwardVoltage(junction, i)).toBeCloseTo(v, 9);
  });

  it("carries nothing with no voltage across it", () => {
    expect(diodeLoopCurrent(0, 10e3, junction)).toBe(0);
    expect(diodeLoopCurrent(-1, 10e3, junction)).toBe(0);
  });
});
