// Noise, SINAD and ENOB (SPEC §11.9), against the published values in shared/REFERENCES.md.
import { describe, expect, it } from "vitest";
import { enobOf, johnsonDensity, noiseBandwidth, sinadDb, stageNoise } from "../../../src/core/math/noise.ts";

describe("johnsonDensity √(4kTR) (Johnson; Nyquist, Phys. Rev. 32, 1928; k exact, SI Brochure 9th ed.)", () => {
  it.each([
    // REFERENCES.md, thermal noise at 300 K [V].
    [1e3, 4.0704],
    [10e3, 12.872],
    [100e3, 40.704],
  ])("%d Ω at 300 K: %d nV/√Hz", (ohm, nv) => {
    expect(johnsonDensity(ohm, 300) * 1e9).toBeCloseTo(nv, 3);
  });
});

describe("noiseBandwidth (single pole: (π/2)·fc, textbook)", () => {
  it("1 kHz pole: 1570.8 Hz", () => {
    expect(noiseBandwidth(1000)).toBeCloseTo(1570.796, 3);
  });
});

describe("stageNoise", () => {
  it("a follower with 40 nV/√Hz, 1 MHz GBW and no resistance: 40 nV × √(π/2 · 1 MHz) = 50.13 µV rms", () => {
    const n = stageNoise({ en: 40e-9, in: 0, gbw_hz: 1e6, noise_gain: 1, r_ohm: 0, kelvin: 300 });
    expect(n.output_rms_v).toBeCloseTo(40e-9 * Math.sqrt((Math.PI / 2) * 1e6), 12);
    expect(n.output_rms_v * 1e6).toBeCloseTo(50.13, 2);
  });

  it("the summer at noise gain 4 (REFERENCES.md: 1 + R/(R ‖ R/2) = 4): fc = GBW/4, density × 4", () => {
    const n = stageNoise({ en: 10e-9, in: 0, gbw_hz: 4e6, noise_gain: 4, r_ohm: 2500, kelvin: 300 });
    expect(n.fc_hz).toBe(1e6);
    const density = Math.sqrt(10e-9 ** 2 + johnsonDensity(2500, 300) ** 2);
    expect(n.output_rms_v).toBeCloseTo(density * 4 * Math.sqrt((Math.PI / 2) * 1e6), 12);
  });

  it("current noise adds in·R in quadrature: 1 pA/√Hz through 1 MΩ is 1 µV/√Hz", () => {
    const n = stageNoise({ en: 0, in: 1e-12, gbw_hz: 1e6, noise_gain: 1, r_ohm: 1e6, kelvin: 300 });
    expect(n.density).toBeCloseTo(Math.hypot(1e-6, johnsonDensity(1e6, 300)), 15);
  });
});

describe("SINAD and ENOB (IEEE Std 1241-2010)", () => {
  it.each([
    // REFERENCES.md, ideal ADC: SNR = 6.0206N + 1.7609 dB → 61.967 dB (10 bit), 74.008 dB (12 bit).
    [10, 5, 61.967],
    [12, 3.3, 74.008],
  ])("an ideal %d-bit converter (%d V): %d dB", (bits, fs, db) => {
    expect(sinadDb(bits, fs, 0)).toBeCloseTo(db, 3);
  });

  it("ENOB = (SINAD − 1.76)/6.02: an ideal 10-bit converter has 10.0 bits", () => {
    expect(enobOf(sinadDb(10, 5, 0))).toBeCloseTo(10.0, 2);
  });

  it("noise equal to the quantization noise Q/√12 costs half a bit (3.01 dB)", () => {
    const q = 5 / 1024;
    const lost = sinadDb(10, 5, 0) - sinadDb(10, 5, q / Math.sqrt(12));
    expect(lost).toBeCloseTo(10 * Math.log10(2), 9);
    expect(enobOf(sinadDb(10, 5, 0)) - enobOf(sinadDb(10, 5, q / Math.sqrt(12)))).toBeCloseTo(0.5, 2);
  });
});
