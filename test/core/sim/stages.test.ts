// The stage models one by one, at a held input (a DC operating point).
import { describe, expect, it } from "vitest";
import { runChain } from "../../../src/core/sim/simulate.ts";
import type { Chain } from "../../../src/core/sim/chain.ts";
import { quantize, reading } from "../../../src/core/sim/converter.ts";
import { ComparatorRunner } from "../../../src/core/sim/comparator.ts";
import { clippedIntegral } from "../../../src/core/sim/half-wave.ts";
import { IDEAL_AMP, SILICON } from "./chains.ts";

/** The last recorded value of each column with the source held at `v`. */
function heldAt(chain: Chain, v: number): Record<string, number> {
  const tr = runChain(chain, { frequency_hz: 1, waveform: () => v });
  const out: Record<string, number> = {};
  tr.columns.forEach((c, i) => (out[c] = tr.values[i]?.at(-1) ?? NaN));
  return out;
}

const halfWave = (vos = 0): Chain => ({
  source: { peak_v: 5, source_ohm: 0 },
  front: { gain: 1, offset_v: 0 },
  stages: [
    {
      kind: "half-wave",
      id: "hw",
      from: "front",
      r_in_ohm: 10e3,
      r_feedback_ohm: 10e3,
      load_ohm: 5e3,
      amp: { ...IDEAL_AMP, gbw_hz: 1e6, vos_v: vos },
      diode: SILICON,
    },
  ],
  sign: null,
  adc: { from: "hw", bits: 12, reference_v: 5, sample_rate_hz: null },
  reading: { volts_per_code: 5 / 4096, offset_v: 0, signed: false },
});

describe("half-wave stage (Sedra & Smith, precision rectifiers [M for the section])", () => {
  it("passes a positive input inverted, −(Rf/Rin)·x, its op amp one diode drop below", () => {
    // With 10 kΩ feedback and a 5 kΩ load, the diode carries |v|·(1/10k + 1/5k) = 1 mA at |v| = 3.3333 V,
    // where the law gives exactly vf_1ma (SPEC §4: Vf(I) = Vf(1 mA) + step·log10(I/1 mA)).
    const at = heldAt(halfWave(), 10 / 3);
    expect(at["hw"]).toBeCloseTo(-10 / 3, 6);
    expect(at["hw.amp"]).toBeCloseTo(-10 / 3 - 0.65, 6);
  });

  it("at ten times the current the drop is vf_10ma", () => {
    const at = heldAt(halfWave(), 100 / 3);
    expect(at["hw.amp"]! - at["hw"]!).toBeCloseTo(-0.71, 6);
  });

  it("rests at zero for a negative input, its op amp one drop above the inverting node", () => {
    // D1 carries |x|/Rin = 1 mA at x = −10 V.
    const at = heldAt(halfWave(), -10);
    expect(at["hw"]).toBeCloseTo(0, 9);
    expect(at["hw.amp"]).toBeCloseTo(0.65, 6);
  });

  it("below the take-over current the drop stays at Vf(I_on), I_on = step/(ln10·Rf) (this model's choice, not a published value)", () => {
    const iOn = 0.06 / (Math.LN10 * 10e3);
    expect(iOn).toBeCloseTo(2.6058e-6, 9);
    const at = heldAt(halfWave(), -1e-4);
    expect(at["hw.amp"]).toBeCloseTo(0.65 + 0.06 * Math.log10(iOn / 1e-3), 6);
  });

  it("carries its offset at noise gain 2 on the passed half: −x + 2·Vos", () => {
    const at = heldAt(halfWave(2e-3), 1);
    expect(at["hw"]).toBeCloseTo(-1 + 4e-3, 6);
  });
});

describe("clippedIntegral", () => {
  it.each([
    { a: 0, b: 2, limit: 10, mean: 1 },
    { a: 0, b: 2, limit: 1, mean: 0.75 }, // ½·½ ramp + ½ at the limit
    { a: -4, b: 4, limit: 2, mean: 0 },
    { a: 3, b: 3, limit: 2, mean: 2 },
    { a: 4, b: 0, limit: 2, mean: 1.5 }, // ½ at 2, then a ramp 2 → 0 averaging 1
  ])("mean of a line $a → $b clipped at ±$limit is $mean", ({ a, b, limit, mean }) => {
    expect(clippedIntegral(a, b, limit)).toBeCloseTo(mean, 12);
  });
});

describe("converter (IEEE Std 1241-2010: Q = V_FS/2^N)", () => {
  const adc = { from: "x", bits: 10, reference_v: 5, sample_rate_hz: null };
  it.each([
    { v: 0, code: 0 },
    { v: 4.8828125e-3, code: 1 }, // exactly Q = 5/1024 V
    { v: 4.88e-3, code: 0 },
    { v: 2.5, code: 512 },
    { v: 4.999, code: 1023 },
    { v: 7, code: 1023 }, // clamps at the top
    { v: -1, code: 0 }, // and at the bottom
  ])("$v V → code $code", ({ v, code }) => {
    expect(quantize(v, adc)).toBe(code);
  });

  it("reads sign·(code + 0.5)·volts_per_code − offset (SPEC §8)", () => {
    const r = { volts_per_code: 0.019907, offset_v: 0, signed: true };
    expect(reading(100, -1, r)).toBeCloseTo(-100.5 * 0.019907, 12);
    expect(reading(100, -1, { ...r, signed: false, offset_v: 1 })).toBeCloseTo(100.5 * 0.019907 - 1, 12);
  });
});

describe("comparator", () => {
  it("switches at offset ± hysteresis/2 (+ rated overdrive) and moves its output delay_s later", () => {
    const c = new ComparatorRunner({
      from: "x",
      offset_v: 1e-3,
      hysteresis_v: 10e-3,
      overdrive_v: 5e-3,
      delay_s: 1e-6,
    });
    c.init(1);
    // Falling: the edge is 1 mV − 5 mV − 5 mV = −9 mV, crossed at t = 0.9 of a step from +1 mV/... to −11 mV.
    c.advance(0, 1e-6, 1e-3, -11e-3);
    const crossing = ((1e-3 - -9e-3) / (1e-3 - -11e-3)) * 1e-6;
    expect(c.at(crossing + 1e-6 - 1e-12)).toBe(1);
    expect(c.at(crossing + 1e-6 + 1e-12)).toBe(-1);
    expect(c.changedAt).toBeCloseTo(crossing + 1e-6, 15);
    // Rising again needs 1 + 5 + 5 = +11 mV.
    c.advance(3e-6, 1e-6, -11e-3, 10e-3);
    expect(c.at(10e-6)).toBe(-1);
    c.advance(4e-6, 1e-6, 10e-3, 12e-3);
    expect(c.at(10e-6)).toBe(1);
  });
});
