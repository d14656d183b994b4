// SI prefixes as defined by the SI Brochure, 9th ed. (BIPM, 2019), table 7:
// p = 10⁻¹², n = 10⁻⁹, µ = 10⁻⁶, m = 10⁻³, k = 10³, M = 10⁶, G = 10⁹.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatQuantity, formatSI, formatVolts, parseSI } from "../../src/core/units.ts";

describe("parseSI", () => {
  it.each([
    ["0", 0],
    ["0.5", 0.5],
    [".5", 0.5],
    ["5.", 5],
    ["42", 42],
    ["+5", 5],
    ["-0.3", -0.3],
    ["1p", 1e-12],
    ["3n", 3e-9],
    ["10u", 10e-6],
    ["10µ", 10e-6], // U+00B5 micro sign
    ["10μ", 10e-6], // U+03BC Greek small mu
    ["500m", 0.5],
    ["2.2k", 2200],
    ["1.5M", 1.5e6],
    ["2G", 2e9],
    ["-1.5k", -1500],
    ["1e-6", 1e-6],
    ["1E3", 1000],
    ["2.5e+2", 250],
    ["1e3k", 1e6],
    ["  2.2k  ", 2200], // cells are trimmed
  ])("reads %j as %d", (text, value) => {
    const parsed = parseSI(text);
    expect(parsed.ok).toBe(true);
    if (parsed.ok)
      expect(parsed.value).toBeCloseTo(value, 15 - Math.max(0, Math.round(Math.log10(Math.abs(value) || 1))));
  });

  // Prefixes must give the exact double a user would type, not 1 × 1e-6 rounding.
  it.each([
    ["1u", 1e-6],
    ["1µ", 1e-6],
    ["4.7n", 4.7e-9],
    ["1p", 1e-12],
    ["100k", 100000],
  ])("%j is exactly %d", (text, value) => {
    expect(parseSI(text)).toEqual({ ok: true, value });
  });

  it.each([
    [""],
    ["   "],
    ["abc"],
    ["k"],
    ["1.2.3"],
    ["1 k"], // no space inside a cell's number
    ["1k5"],
    ["1kk"],
    ["1x"],
    ["1 V"],
    ["1V"],
    ["NaN"],
    ["Infinity"],
    ["-Infinity"],
    ["1e400"], // overflows to Infinity
    ["0x10"],
    ["1,5"],
    ["--1"],
    ["e3"],
  ])("rejects %j", (text) => {
    expect(parseSI(text)).toEqual({ ok: false });
  });

  // parseSI reads without a regex for speed; this is the grammar it promises (SPEC §4).
  const GRAMMAR = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)([pnuµμmkKMGT])?$/;
  const EXPONENT: Record<string, number> = { p: -12, n: -9, u: -6, µ: -6, μ: -6, m: -3, k: 3, K: 3, M: 6, G: 9, T: 12 };

  function byGrammar(text: string): { ok: true; value: number } | { ok: false } {
    const match = GRAMMAR.exec(text.trim());
    if (!match) return { ok: false };
    const mantissa = Number(match[1]);
    const exponent = match[2] === undefined ? 0 : (EXPONENT[match[2]] ?? 0);
    const value = exponent < 0 ? mantissa / 10 ** -exponent : mantissa * 10 ** exponent;
    return Number.isFinite(value) ? { ok: true, value } : { ok: false };
  }

  it("reads exactly the texts the grammar accepts, as the grammar reads them", () => {
    const symbol = fc.constantFrom(..."0123456789+-.eE pnuµμmkKMGTxXbBoO_,I\t\u00a0");
    const numberish = fc.array(symbol, { maxLength: 10 }).map((cs) => cs.join(""));
    const written = fc
      .tuple(fc.double({ noNaN: true }), fc.constantFrom("", "p", "n", "u", "µ", "μ", "m", "k", "K", "M", "G", "T"))
      .map(([v, prefix]) => `${v}${prefix}`);
    fc.assert(
      fc.property(fc.oneof(numberish, written, fc.string()), (text) => {
        expect(parseSI(text)).toStrictEqual(byGrammar(text));
      }),
      { numRuns: 5000 },
    );
  });
});

describe("formatSI", () => {
  it.each([
    [1.2e6, "Hz", {}, "1.20 MHz"],
    [2.5e-7, "A", {}, "250 nA"],
    [1e-12, "A", {}, "1.00 pA"],
    [-0.1, "V", {}, "−100 mV"],
    [0.1, "V", { signed: true }, "+100 mV"],
    [-0.1, "V", { exponent: 0 }, "−0.100 V"],
    [4.7e-9, "F", {}, "4.70 nF"],
    [999.96, "Hz", {}, "1.00 kHz"], // rounding to 3 digits moves it to the next prefix
    [999.4, "Hz", {}, "999 Hz"],
    [1e-3, "V", {}, "1.00 mV"],
    [12.6e-3, "V", {}, "12.6 mV"],
    [0, "V", {}, "0.00 V"],
    [2.5, "V", { exponent: 0, decimals: 2, signed: true }, "+2.50 V"],
    [1.2566e6, "V/s", { digits: 5 }, "1.2566 MV/s"],
    [5e9, "Hz", {}, "5.00 GHz"],
    [5e12, "Hz", {}, "5000 GHz"], // largest prefix is G
    [3e-16, "A", {}, "0.300 fA"],
    [1e3, "", {}, "1.00 k"],
  ])("formats %d %s %j as %j", (value, unit, options, text) => {
    expect(formatSI(value, unit, options)).toBe(text);
  });

  it.each([
    [-0, "V", {}],
    [-1e-20, "V", { exponent: 0, decimals: 2 }],
    [-0.004, "V", { exponent: 0, decimals: 2, signed: true }],
    [-4e-18, "A", {}],
  ])("never prints a signed zero for %d", (value, unit, options) => {
    const text = formatSI(value, unit, options);
    expect(text).not.toMatch(/^[−+-]0(\.0*)? /);
    expect(text).not.toMatch(/[−+-]0\.0+ /);
  });

  it.each([1e-15, 3.3e-13, 1, 7.77e5, 1.23e10, -4.2e-7, 2 ** 52, Number.MIN_VALUE, -Number.MAX_VALUE])(
    "prints digits, never NaN or Infinity, for the finite value %d",
    (value) => {
      const text = formatSI(value, "V");
      expect(text).not.toMatch(/NaN|Infinity|∞|undefined/);
      expect(text).toMatch(/\d/);
    },
  );

  it("names values that are not numbers instead of printing NaN", () => {
    expect(formatSI(Number.NaN, "V")).toBe("not rated");
    expect(formatSI(Infinity, "Hz")).toBe("∞ Hz");
    expect(formatSI(-Infinity, "V")).toBe("−∞ V");
  });
});

describe("formatVolts", () => {
  it.each([
    [2.5, { signed: true }, "+2.50 V"],
    [-4.18, {}, "−4.18 V"],
    [0.004, { signed: true }, "0.00 V"],
    [-0.004, {}, "0.00 V"],
    [48, {}, "48.00 V"],
    [120, {}, "120 V"],
  ])("formats %d %j as %j", (value, options, text) => {
    expect(formatVolts(value, options)).toBe(text);
  });
});

describe("formatQuantity", () => {
  it.each([
    [1.2566e6, "V/s", "1.26 V/µs"],
    [5e5, "V/s", "0.500 V/µs"], // datasheets print 0.5 V/µs, never "500 mV/µs"
    [3e3, "V/s", "0.00300 V/µs"],
    [1.5e9, "V/s", "1500 V/µs"],
    [-2.5, "V", "−2.50 V"],
    [0.0126, "V-prefixed", "12.6 mV"],
    [5.102e-6, "s", "5.10 µs"],
    [2e-3, "A", "2.00 mA"],
  ])("formats %d %s as %j", (value, unit, text) => {
    expect(formatQuantity(value, unit)).toBe(text);
  });
});
