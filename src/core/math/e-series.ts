// IEC 60063:2015 preferred values. E12 and E24 are not a rounded geometric
// series (the standard keeps 2.7, 3.0, 3.3 …), so the tables are written out.
// Mantissas are in hundredths so every resistor value is an exact integer
// product before the one final division.

export type SeriesName = "E12" | "E24" | "E96";

const E12 = [100, 120, 150, 180, 220, 270, 330, 390, 470, 560, 680, 820];
const E24 = [
  100, 110, 120, 130, 150, 160, 180, 200, 220, 240, 270, 300, 330, 360, 390, 430, 470, 510, 560, 620, 680, 750, 820,
  910,
];
const E96 = [
  100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143, 147, 150, 154, 158, 162, 165, 169,
  174, 178, 182, 187, 191, 196, 200, 205, 210, 215, 221, 226, 232, 237, 243, 249, 255, 261, 267, 274, 280, 287, 294,
  301, 309, 316, 324, 332, 340, 348, 357, 365, 374, 383, 392, 402, 412, 422, 432, 442, 453, 464, 475, 487, 499, 511,
  523, 536, 549, 562, 576, 590, 604, 619, 634, 649, 665, 681, 698, 715, 732, 750, 768, 787, 806, 825, 845, 866, 887,
  909, 931, 953, 976,
];

const MANTISSAS: Record<SeriesName, readonly number[]> = { E12, E24, E96 };

/** The series' mantissas per decade, 1.0 ≤ m < 10 (as in the standard's tables). */
export function seriesMantissas(series: SeriesName): number[] {
  return MANTISSAS[series].map((m) => m / 100);
}

const cache = new Map<SeriesName, number[]>();

/** Every value of the series from 10 Ω to 10 MΩ inclusive, ascending. */
export function seriesValues(series: SeriesName): number[] {
  const hit = cache.get(series);
  if (hit) return hit;
  const values: number[] = [];
  for (let decade = 1; decade <= 6; decade++) {
    for (const m of MANTISSAS[series]) values.push((m * 10 ** decade) / 100);
  }
  values.push(10_000_000);
  cache.set(series, values);
  return values;
}

/** Nearest preferred value by logarithmic distance (319 Ω → 330 Ω in E24). */
export function nearestPreferred(value: number, series: SeriesName): number {
  let best = seriesValues(series)[0] ?? value;
  let bestDistance = Infinity;
  for (const v of seriesValues(series)) {
    const d = Math.abs(Math.log(v / value));
    if (d < bestDistance) {
      best = v;
      bestDistance = d;
    }
  }
  return best;
}
