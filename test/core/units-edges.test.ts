// Numbers at the edges (issue 8 §3): the smallest and largest values a real
// catalogue holds must print as an engineer writes them, never as NaN,
// Infinity, a negative zero or an exponent.
//
// Prefixes: SI Brochure, 9th ed. (BIPM, 2019), table 7 (f = 10⁻¹⁵, p = 10⁻¹²,
// µ = 10⁻⁶, M = 10⁶, G = 10⁹). The magnitudes are common practice, from memory:
// CMOS and electrometer inputs draw single pA or less, decompensated high-speed
// op amps reach GHz gain-bandwidth, zero-drift parts offer single-µV offsets,
// and pH or electrochemical probes present 100 MΩ or more.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { formatQuantity, formatSI, formatVolts, parseSI } from "../../src/core/units.ts";
import { renderDesignText } from "../../src/cli/render-text.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

/** What a number in a sentence must never look like. */
const UNSENSIBLE = [/NaN/, /Infinity/, /∞/, /\d[eE][-+]?\d/, /(^|[^\w.])[-−]0(\.0+)?(?!\.?\d*[1-9])\b/, /undefined/];

function expectSensible(text: string): void {
  for (const pattern of UNSENSIBLE) expect(text, `${pattern} in ${JSON.stringify(text)}`).not.toMatch(pattern);
}

describe("the sense check itself", () => {
  it.each(["−0.00 V", "-0 V", "at −0 V", "NaN V", "Infinity Hz", "−∞ V", "1e-12 A", "2.5E+9 Hz", "undefined V"])(
    "rejects %j",
    (text) => {
      expect(UNSENSIBLE.some((p) => p.test(text))).toBe(true);
    },
  );
  it.each(["−0.01 V", "0.00 V", "−0.0000157 V/µs", "1.00 pA", "+2.50 V", "E24 series", "10-bit"])(
    "accepts %j",
    (text) => {
      expect(UNSENSIBLE.some((p) => p.test(text))).toBe(false);
    },
  );
});

describe("formatSI at the edges of a catalogue", () => {
  it.each([
    // [value, unit, expected] — the value in base SI units, as the engine holds it.
    [1e-12, "A", "1.00 pA"], // 1 pA bias, CMOS input (common practice)
    [3e-12, "A", "3.00 pA"],
    [20e-12, "A", "20.0 pA"],
    [500e-15, "A", "500 fA"], // electrometer class
    [1e-15, "A", "1.00 fA"],
    [1e9, "Hz", "1.00 GHz"], // decompensated high-speed GBW
    [1.5e9, "Hz", "1.50 GHz"],
    [999.95e6, "Hz", "1.00 GHz"], // rounds up into the next prefix, not "1000 MHz"
    [1e-6, "V", "1.00 µV"], // zero-drift offset
    [5e-6, "V", "5.00 µV"],
    [-5e-6, "V", "−5.00 µV"],
    [100e6, "Ω", "100 MΩ"], // probe source
    [10e6, "Ω", "10.0 MΩ"],
    [1e9, "Ω", "1.00 GΩ"],
    [0, "A", "0.00 A"],
    [-0, "V", "0.00 V"],
  ])("%d %s → %s", (value, unit, expected) => {
    expect(formatSI(value, unit)).toBe(expected);
  });

  it("gives every value from 1 fA to 1 TΩ a prefix and at most three significant digits, no exponent", () => {
    fc.assert(
      fc.property(fc.double({ min: -15, max: 12, noNaN: true }), fc.boolean(), (exponent, negative) => {
        const value = (negative ? -1 : 1) * 10 ** exponent;
        const text = formatSI(value, "A");
        expectSensible(text);
        expect(text).toMatch(/^−?\d{1,4}(\.\d{1,2})? [fpnµmkMG]?A$/);
      }),
      { numRuns: 300 },
    );
  });

  it("prints what parseSI reads back within the rounding of three digits", () => {
    fc.assert(
      fc.property(fc.double({ min: -12, max: 12, noNaN: true }), (exponent) => {
        const value = 10 ** exponent;
        const text = formatSI(value, "").replace(" ", "");
        const back = parseSI(text);
        expect(back.ok).toBe(true);
        if (back.ok) expect(Math.abs(back.value - value) / value).toBeLessThanOrEqual(0.005 + 1e-12);
      }),
      { numRuns: 300 },
    );
  });
});

describe("formatVolts never prints a negative zero", () => {
  it.each([
    [-0, {}, "0.00 V"],
    [-0, { signed: true }, "0.00 V"],
    [-1e-12, { signed: true }, "0.00 V"],
    [-0.004, { signed: true }, "0.00 V"], // rounds to zero: no sign at all
    [0.004, { signed: true }, "0.00 V"],
    [-0.005, {}, "−0.01 V"],
    [1e-12, {}, "0.00 V"],
    [2.5, { signed: true }, "+2.50 V"],
    [-150, {}, "−150 V"],
  ])("%d %o → %s", (value, options, expected) => {
    expect(formatVolts(value, options)).toBe(expected);
  });
});

describe("formatQuantity at the edges", () => {
  it.each([
    [1e-12, "A", "1.00 pA"],
    [5e-6, "V-prefixed", "5.00 µV"],
    [-1e-7, "V-prefixed", "−100 nV"],
    [-0, "V-prefixed", "0.00 V"],
    [1.5e9, "Hz", "1.50 GHz"],
    [100e6, "Ω", "100 MΩ"],
    [3e9, "V/s", "3000 V/µs"], // very fast current-feedback class
    [2 * Math.PI * 5 * 0.5, "V/s", "0.0000157 V/µs"], // a 5 Hz, 0.5 V probe signal: kept in V/µs, no exponent
    [-0, "V", "0.00 V"],
  ])("%d %s → %s", (value, unit, expected) => {
    expect(formatQuantity(value, unit)).toBe(expected);
  });
});

describe("a whole evaluation with edge values", () => {
  // An electrometer-grade, very fast, zero-offset class: every edge at once.
  const edge = opAmp({
    id: "oa-edge",
    supply_min_v: 2.7,
    supply_max_v: 12,
    icm_neg_headroom_v: -0.1,
    icm_pos_headroom_v: -0.1,
    out_neg_headroom_v: 0.01,
    out_pos_headroom_v: 0.01,
    vos_max_mv: "5m", // the column is in mV: 5 m·mV = 5 µV
    vos_drift_uv_per_c: "10m", // in µV/°C: 10 nV/°C
    ib_max_na: "1m", // 1 pA
    gbw_mhz: "1.5k", // 1.5 GHz
    slew_v_per_us: 3000,
    iq_ma: 10,
  });
  const catalogue = catalogueFromParts([
    edge,
    opAmp({ id: "oa-plain" }),
    comparator(),
    diode({ id: "d-low-leak", ir_na: "1m" }),
  ]);
  const probe = design({
    id: "edge-probe",
    supply: { positive_v: 5, negative: { kind: "fixed", v: -5 } },
    signal: { peak_v: 0.5, max_frequency_hz: 5, source_ohm: "100M" },
    front_end: {
      window_v: 1,
      divider_total_ohm: "1M",
      resistor_tolerance: 0.001,
      series: "E96",
      rectifier_load_ohm: "100k",
    },
    accuracy: { required_v: "1m" },
    temperature: { min_c: 15, max_c: 35 },
  });
  const evaluation = evaluateDesign(probe, catalogue);
  if (!evaluation.ok) throw new Error(JSON.stringify(evaluation.problems));
  const result = evaluation.result;
  const findings = result.roles.flatMap((r) => [...r.fits, ...r.rejected].flatMap((p) => p.findings));

  it("writes every reason and step without NaN, Infinity, exponents or negative zero", () => {
    expect(findings.length).toBeGreaterThan(20);
    for (const f of findings) {
      expectSensible(f.reason);
      for (const s of f.steps) expect(Number.isFinite(s.value), `${f.rule}: ${s.label}`).toBe(true);
    }
    for (const note of result.notes) expectSensible(note);
  });

  it("writes the text report without them either", () => {
    expectSensible(renderDesignText(result, { color: false }));
  });

  it("states the pA × 100 MΩ offset and the GHz bandwidth in plain prefixes", () => {
    const buffer = result.roles.find((r) => r.role === "buffer");
    const part = [...(buffer?.fits ?? []), ...(buffer?.rejected ?? [])].find((p) => p.part.id === "oa-edge");
    const reason = (rule: string) => part?.findings.find((f) => f.rule === rule)?.reason;
    // 5 µV + 10 nV/°C × 10 °C = 5.10 µV, plus 1 pA × 100 MΩ = 100 µV: 105 µV (no divider, k = 1),
    // against offset_share 0.25 × 1 mV = 250 µV.
    expect(reason("offset")).toMatchInlineSnapshot(
      `"adds 105 µV at the input (5.10 µV offset incl. 100 nV drift + 1.00 pA × 100 MΩ); the limit is 250 µV: 145 µV to spare"`,
    );
    expect(reason("bandwidth")).toMatchInlineSnapshot(
      `"at 5.00 Hz with fc = 1.50 GHz (GBW 1.50 GHz ÷ noise gain 1) the gain falls short by 0.00278 fV of the 500 mV peak; the limit is 250 µV: 250 µV to spare"`,
    );
    expect(reason("slew-rate")).toMatchInlineSnapshot(
      `"needs 0.0000157 V/µs (2π × 5.00 Hz × 500 mV); slews 3000 V/µs: 3000 V/µs to spare"`,
    );
  });
});
