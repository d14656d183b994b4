// Diode charge-pump inverter: no load −(V_d − 2V_F); loaded V_out ≈ −(V_d − 2V_F − I/(f·C₁)),
// R_out ≈ 1/(f·C₁) (switched-capacitor equivalent resistance, S. Winder, Analog and Digital
// Filter Design, 2nd ed., ch. 14); collapses at I_max = (V_d − 2V_F)·f·C₁. Worked values in
// ../shared/REFERENCES.md.
import { describe, expect, it } from "vitest";
import { noiseGain, pumpRail } from "../../../src/core/math/charge-pump.ts";

describe("pumpRail (Winder, Analog and Digital Filter Design, ch. 14; worked values from REFERENCES.md)", () => {
  it.each([
    // drive, f, C_fly, C_res, load, Vf → V−_dc, collapse
    [5, 980, 1e-6, 10e-6, 1e-3, 0.7, -2.58, 3.528e-3],
    [5, 980, 10e-6, 10e-6, 5e-3, 0.35, -3.79, 42.14e-3],
    [5, 490, 10e-6, 10e-6, 1e-3, 0.7, -3.396, 17.64e-3],
  ])(
    "%d V drive at %d Hz, %d F, %d A, Vf %d V → %d V (collapse %d A)",
    (drive, f, cfly, cres, load, vf, dc, collapse) => {
      const rail = pumpRail(
        { drive_v: drive, frequency_hz: f, flying_cap_f: cfly, reservoir_cap_f: cres, load_a: load },
        vf,
      );
      expect(rail.dc_v).toBeCloseTo(dc, 3);
      expect(rail.collapse_a).toBeCloseTo(collapse, 9);
      expect(rail.no_load_v).toBeCloseTo(-(drive - 2 * vf), 12);
      expect(rail.droop_v).toBeCloseTo(load / (f * cfly), 12);
      expect(rail.diode_drop_v).toBeCloseTo(2 * vf, 12);
    },
  );

  it("5 V, 980 Hz, 1 µF, 0.7 V, 1 mA: −2.580 V, collapse 3.53 mA, ripple I/(f·C_res), worst case dc + ripple/2", () => {
    const rail = pumpRail(
      { drive_v: 5, frequency_hz: 980, flying_cap_f: 1e-6, reservoir_cap_f: 10e-6, load_a: 1e-3 },
      0.7,
    );
    expect(Number(rail.dc_v.toFixed(3))).toBe(-2.58);
    expect(Number((rail.collapse_a * 1e3).toFixed(2))).toBe(3.53);
    expect(rail.ripple_v).toBeCloseTo(1e-3 / (980 * 10e-6), 12); // 102.04 mV
    expect(rail.worst_v).toBeCloseTo(-2.579592 + 0.102041 / 2, 6);
    expect(rail.worst_v).toBeGreaterThan(rail.dc_v); // the worst case is the least negative
  });

  it("with no load the rail is the no-load value and nothing droops", () => {
    const rail = pumpRail(
      { drive_v: 3.3, frequency_hz: 2000, flying_cap_f: 10e-6, reservoir_cap_f: 47e-6, load_a: 0 },
      0.3,
    );
    expect(rail).toEqual({
      diode_drop_v: 0.6,
      no_load_v: expect.closeTo(-2.7, 12),
      droop_v: 0,
      dc_v: rail.no_load_v,
      ripple_v: 0,
      worst_v: rail.no_load_v,
      collapse_a: expect.closeTo(0.054, 12),
      drive_drop_v: 0,
    });
  });

  it("at the collapse current the loaded rail reaches 0 V", () => {
    const p = { drive_v: 5, frequency_hz: 980, flying_cap_f: 1e-6, reservoir_cap_f: 10e-6, load_a: 0 };
    const collapse = pumpRail(p, 0.7).collapse_a;
    expect(pumpRail({ ...p, load_a: collapse }, 0.7).dc_v).toBeCloseTo(0, 12);
  });

  it("a drive that cannot overcome two diode drops collapses at 0 A", () => {
    expect(
      pumpRail({ drive_v: 1.2, frequency_hz: 1000, flying_cap_f: 1e-6, reservoir_cap_f: 1e-6, load_a: 0 }, 0.7)
        .collapse_a,
    ).toBe(0);
  });
});

describe("noiseGain (1 + Rf/Rg, a follower 1; common practice)", () => {
  it.each([
    [10e3, null, 1],
    [10e3, 10e3, 2],
    [90e3, 10e3, 10],
  ])("Rf %d Ω, Rg %d Ω → %d", (rf, rg, g) => {
    expect(noiseGain(rf, rg)).toBe(g);
  });
});
