// Nearest-rank quantiles (no interpolation), so a reported p95 is a sample that happened.
import { describe, expect, it } from "vitest";
import { median, quantile } from "../../bench/stats.ts";

describe("quantile", () => {
  it.each([
    // samples, q, expected: the smallest sample with at least q of them at or below it
    [[1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 0.95, 10],
    [[1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 0.9, 9],
    [[1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 0.5, 5],
    [[5, 1, 4, 2, 3], 0.5, 3],
    [Array.from({ length: 50 }, (_, i) => 50 - i), 0.95, 48],
    [[7], 0.95, 7],
  ])("of %j at %d is %d", (samples, q, expected) => {
    expect(quantile(samples, q)).toBe(expected);
  });

  it("is NaN for no samples, and leaves the samples in their order", () => {
    expect(quantile([], 0.5)).toBeNaN();
    const samples = [3, 1, 2];
    expect(median(samples)).toBe(2);
    expect(samples).toEqual([3, 1, 2]);
  });
});
