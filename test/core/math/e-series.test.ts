// IEC 60063:2015, Preferred number series for resistors and capacitors: the E12,
// E24 and E96 tables as printed in the standard (copied in ../shared/REFERENCES.md).
import { describe, expect, it } from "vitest";
import { nearestPreferred, seriesMantissas, seriesValues, type SeriesName } from "../../../src/core/math/e-series.ts";

const IEC_60063 = {
  E12: "1.0 1.2 1.5 1.8 2.2 2.7 3.3 3.9 4.7 5.6 6.8 8.2",
  E24: "1.0 1.1 1.2 1.3 1.5 1.6 1.8 2.0 2.2 2.4 2.7 3.0 3.3 3.6 3.9 4.3 4.7 5.1 5.6 6.2 6.8 7.5 8.2 9.1",
  E96:
    "1.00 1.02 1.05 1.07 1.10 1.13 1.15 1.18 1.21 1.24 1.27 1.30 1.33 1.37 1.40 1.43 1.47 1.50 1.54 1.58 1.62 1.65 1.69 1.74 " +
    "1.78 1.82 1.87 1.91 1.96 2.00 2.05 2.10 2.15 2.21 2.26 2.32 2.37 2.43 2.49 2.55 2.61 2.67 2.74 2.80 2.87 2.94 3.01 3.09 " +
    "3.16 3.24 3.32 3.40 3.48 3.57 3.65 3.74 3.83 3.92 4.02 4.12 4.22 4.32 4.42 4.53 4.64 4.75 4.87 4.99 5.11 5.23 5.36 5.49 " +
    "5.62 5.76 5.90 6.04 6.19 6.34 6.49 6.65 6.81 6.98 7.15 7.32 7.50 7.68 7.87 8.06 8.25 8.45 8.66 8.87 9.09 9.31 9.53 9.76",
} satisfies Record<SeriesName, string>;

describe("seriesMantissas (IEC 60063:2015 tables)", () => {
  it.each(Object.entries(IEC_60063) as [SeriesName, string][])(
    "%s is the standard's table, value for value",
    (series, table) => {
      expect(seriesMantissas(series)).toEqual(table.split(" ").map(Number));
    },
  );

  it.each([
    ["E12", 12],
    ["E24", 24],
    ["E96", 96],
  ] as const)("%s has %i values per decade", (series, n) => {
    expect(seriesMantissas(series)).toHaveLength(n);
  });

  // IEC 60063: every E96 value is 10^(i/96) rounded to three significant figures.
  it("E96 is 10^(i/96) rounded to 3 significant figures, for every i", () => {
    const computed = Array.from({ length: 96 }, (_, i) => Number((10 ** (i / 96)).toPrecision(3)));
    expect(seriesMantissas("E96")).toEqual(computed);
  });

  // IEC 60063 keeps the historical E12/E24 values: the formula gives 2.6, 2.9, 3.2 … where the standard has 2.7, 3.0, 3.3 ….
  it("E24 is not the rounded geometric series (the standard departs from it at 2.7 … 8.3)", () => {
    const formula = Array.from({ length: 24 }, (_, i) => Number((10 ** (i / 24)).toPrecision(2)));
    const differs = seriesMantissas("E24").filter((m, i) => m !== formula[i]);
    expect(differs).toEqual([2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2]);
  });

  it("E12 is every other E24 value", () => {
    expect(seriesMantissas("E24").filter((_, i) => i % 2 === 0)).toEqual(seriesMantissas("E12"));
  });
});

describe("seriesValues (IEC 60063 decades from 10 Ω to 10 MΩ)", () => {
  it.each(["E12", "E24", "E96"] as const)("%s runs from 10 Ω to 10 MΩ inclusive, ascending, six decades", (series) => {
    const values = seriesValues(series);
    const n = seriesMantissas(series).length;
    expect(values).toHaveLength(6 * n + 1);
    expect(values[0]).toBe(10);
    expect(values.at(-1)).toBe(10_000_000);
    for (let i = 1; i < values.length; i++) expect(values[i]).toBeGreaterThan(values[i - 1] ?? Infinity);
  });

  // Values must be the exact doubles a user types, or ratio ties such as 39k/13k = 0.25 are lost.
  it.each([
    ["E24", 13000],
    ["E24", 39000],
    ["E12", 4.7e6],
    ["E96", 10.2],
    ["E96", 16900],
    ["E96", 97.6],
    ["E96", 3.01e6],
  ] as const)("%s contains exactly %d", (series, value) => {
    expect(seriesValues(series)).toContain(value);
  });

  it("every value is the mantissa times a power of ten, exactly as written", () => {
    for (const series of ["E12", "E24", "E96"] as const) {
      const mantissas = seriesMantissas(series);
      for (const v of seriesValues(series).slice(0, -1)) {
        const decade = Math.floor(Math.log10(v) + 1e-9);
        expect(mantissas).toContain(Number((v / 10 ** decade).toPrecision(3)));
        expect(v).toBe(Number(`${(v / 10 ** decade).toPrecision(3)}e${decade}`));
      }
    }
  });
});

describe("nearestPreferred (IEC 60063 values, by logarithmic distance; worked values from REFERENCES.md)", () => {
  it.each([
    // REFERENCES.md worked values
    [319, "E24", 330],
    [16834.2, "E96", 16900],
    // Boundaries: the geometric midpoint of 300 and 330 is 314.6 Ω.
    [314, "E24", 300],
    [315, "E24", 330],
    [1000, "E12", 1000],
    [5, "E24", 10], // below the table's first value
    [2e7, "E96", 10_000_000], // above its last
    [4.7e6, "E12", 4.7e6],
    [9.5e4, "E12", 100000], // √(82k·100k) = 90.6k
  ] as const)("%d Ω in %s → %d Ω", (value, series, expected) => {
    expect(nearestPreferred(value, series)).toBe(expected);
  });
});
