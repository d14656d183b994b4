import { describe, expect, it } from "vitest";
import {
  chooseDivider,
  heldDivider,
  loadedRatio,
  loadedRatioDeviation,
  ratioDeviation,
  sourceRatioDeviation,
  theveninOhm,
  type Divider,
} from "../../../src/core/math/divider.ts";
import { seriesValues, type SeriesName } from "../../../src/core/math/e-series.ts";

// Brute force over every pair, written straight from SPEC §6 and §11.1 (k loaded by Rs), to check the search.
function bruteForce(target: number, total: number, series: SeriesName, rs = 0) {
  let best: Divider | undefined;
  const values = seriesValues(series);
  for (const r1 of values) {
    for (const r2 of values) {
      const sum = r1 + r2;
      if (sum < 0.5 * total || sum > 2 * total) continue;
      const k = r2 / (rs + sum);
      if (k > target * (1 + 1e-12)) continue;
      const dist = Math.abs(Math.log(sum / total));
      if (
        !best ||
        k > best.ratio * (1 + 1e-12) ||
        (Math.abs(k - best.ratio) <= best.ratio * 1e-12 && dist < Math.abs(Math.log(best.total_ohm / total)))
      ) {
        best = { top_ohm: r1, bottom_ohm: r2, ratio: k, total_ohm: sum, source_ohm: rs, chosen_by: "search" };
      }
    }
  }
  return best;
}

describe("chooseDivider (SPEC §6, IEC 60063 values)", () => {
  // Issue 3 acceptance: 10 V peak into a 2.5 V window, E24, 100 kΩ target total.
  it("10 V into 2.5 V from E24 with a 100 kΩ target is 39 kΩ over 13 kΩ, k = 0.25", () => {
    expect(chooseDivider(2.5 / 10, 100e3, "E24")).toEqual({
      top_ohm: 39000,
      bottom_ohm: 13000,
      ratio: 0.25,
      total_ohm: 52000,
      source_ohm: 0,
      chosen_by: "search",
    });
  });

  it("needs no divider when the window already holds the peak", () => {
    expect(chooseDivider(1, 100e3, "E24")).toBeNull();
    expect(chooseDivider(1.5, 100e3, "E96")).toBeNull();
  });

  it("returns undefined when no pair lies between half and twice the total", () => {
    expect(chooseDivider(0.25, 4, "E24")).toBeUndefined(); // 2 Ω … 8 Ω: below the 10 Ω table
    expect(chooseDivider(0.25, 1e9, "E24")).toBeUndefined();
  });

  it.each([
    [0.25, 100e3, "E24"],
    [0.2, 100e3, "E24"],
    [1 / 3, 10e3, "E12"],
    [2 / 3, 100e3, "E96"],
    [0.1, 1e6, "E96"],
    [0.05, 20e3, "E24"],
    [0.7, 47e3, "E12"],
    [2.5 / 48, 1e6, "E24"],
    [1 / 15, 220e3, "E96"],
  ] as const)("k_t = %d, total %d Ω, %s: same as a brute-force search, k ≤ target", (target, total, series) => {
    const chosen = chooseDivider(target, total, series);
    expect(chosen).toEqual(bruteForce(target, total, series));
    expect(chosen?.ratio).toBeLessThanOrEqual(target * (1 + 1e-12));
  });

  it.each([
    [0.25, 100e3, "E24", 1000],
    [0.25, 100e3, "E96", 600],
    [2.5 / 48, 1e6, "E24", 50e3],
    [0.5, 10e3, "E12", 4700],
  ] as const)(
    "k_t = %d, total %d Ω, %s, Rs = %d Ω: the loaded search matches brute force",
    (target, total, series, rs) => {
      const chosen = chooseDivider(target, total, series, rs);
      expect(chosen).toEqual(bruteForce(target, total, series, rs));
      expect(chosen?.ratio).toBeLessThanOrEqual(target * (1 + 1e-12));
    },
  );

  it("with a 1 kΩ source, 10 V into 2.5 V from E24 picks 47 kΩ over 16 kΩ: 16k/(1k + 47k + 16k) = 0.25 exactly", () => {
    // SPEC §11.1: the source is in series with R1, so 39k/13k (k = 13/53 = 0.24528) is no longer the best.
    expect(chooseDivider(0.25, 100e3, "E24", 1000)).toEqual({
      top_ohm: 47000,
      bottom_ohm: 16000,
      ratio: 0.25,
      total_ohm: 63000,
      source_ohm: 1000,
      chosen_by: "search",
    });
  });
});

describe("loadedRatio (SPEC §11.1, k = R2/(Rs + R1 + R2); issue 15's hand check)", () => {
  it("39 kΩ over 13 kΩ behind a 1 kΩ source is 13/53 = 0.24528, a −1.887 % gain error against 0.25", () => {
    // Divider arithmetic (REFERENCES.md, Divider, with Rs in series with R1): 13/53 = 0.245283…
    const k = loadedRatio(39000, 13000, 1000);
    expect(k).toBeCloseTo(0.24528, 5);
    expect((k / 0.25 - 1) * 100).toBeCloseTo(-1.887, 3);
    // 189 mV at 10 V: the error the unloaded ratio left out of the budget and the firmware constant.
    expect(10 * (1 - k / 0.25)).toBeCloseTo(0.1887, 4);
  });
});

describe("heldDivider (front_end.divider_r1_ohm and divider_r2_ohm, SPEC §11.1)", () => {
  it("uses the resistors as given: 39k over 13k behind 1 kΩ is 13/53 = 0.24528, total 52 kΩ, marked held", () => {
    // Voltage divider with Rs in series with R1: k = R2/(Rs + R1 + R2) = 13/53.
    expect(heldDivider(39000, 13000, 1000)).toEqual({
      top_ohm: 39000,
      bottom_ohm: 13000,
      ratio: 13 / 53,
      total_ohm: 52000,
      source_ohm: 1000,
      chosen_by: "held",
    });
  });

  it("keeps values off every series: 40.2k over 12.7k behind none is 12.7/52.9 = 0.24008", () => {
    expect(heldDivider(40200, 12700, 0).ratio).toBeCloseTo(0.240076, 6);
  });
});

describe("theveninOhm ((Rs + R1) ‖ R2; REFERENCES.md, Divider)", () => {
  it.each([
    // REFERENCES.md, Divider: 30k/10k gives R_th = 7.5 kΩ.
    [0, { top_ohm: 30000, bottom_ohm: 10000, ratio: 0.25, total_ohm: 40000, source_ohm: 0, chosen_by: "search" }, 7500],
    // (Rs + R1) ‖ R2 = 40k · 13k / 53k
    [
      1000,
      { top_ohm: 39000, bottom_ohm: 13000, ratio: 13 / 53, total_ohm: 52000, source_ohm: 1000, chosen_by: "held" },
      (40000 * 13000) / 53000,
    ],
    [600, null, 600],
  ] as const)("Rs = %d Ω, divider %j → %d Ω", (rs, divider, expected) => {
    expect(theveninOhm(rs, divider)).toBeCloseTo(expected, 9);
  });
});

describe("ratioDeviation (exact worst case, both resistors ±t; REFERENCES.md, Divider)", () => {
  it.each([
    [30000, 10000, 0.01, 1.5075, -1.4925],
    [20000, 10000, 0.05, 6.7797, -6.5574],
  ])("%d/%d at ±%d: %d % / %d %", (r1, r2, t, high, low) => {
    const k = r2 / (r1 + r2);
    const d = ratioDeviation(k, t);
    expect(d.high * 100).toBeCloseTo(high, 4);
    expect(d.low * 100).toBeCloseTo(low, 4);
    // The same numbers from the worst corners of the resistors themselves.
    const kMax = (r2 * (1 + t)) / (r1 * (1 - t) + r2 * (1 + t));
    const kMin = (r2 * (1 - t)) / (r1 * (1 + t) + r2 * (1 - t));
    expect(d.high).toBeCloseTo(kMax / k - 1, 12);
    expect(d.low).toBeCloseTo(kMin / k - 1, 12);
  });

  it("is zero without a divider", () => {
    expect(ratioDeviation(1, 0.05)).toEqual({ high: 0, low: 0 });
  });
});

describe("loadedRatioDeviation and sourceRatioDeviation (SPEC §11.1)", () => {
  const divider = (r1: number, r2: number, rs: number) => ({
    top_ohm: r1,
    bottom_ohm: r2,
    ratio: loadedRatio(r1, r2, rs),
    total_ohm: r1 + r2,
    source_ohm: rs,
    chosen_by: "held" as const,
  });

  it("with Rs = 0 it is the exact two-resistor worst case (30k/10k at 1 %: +1.5075 % / −1.4925 %, REFERENCES.md)", () => {
    const d = loadedRatioDeviation(divider(30000, 10000, 0), 0.01);
    expect(d.high * 100).toBeCloseTo(1.5075, 4);
    expect(d.low * 100).toBeCloseTo(-1.4925, 4);
  });

  it("with Rs the worst corners are R2 high, R1 low and the reverse (arithmetic of k = R2/(Rs+R1+R2))", () => {
    const d = loadedRatioDeviation(divider(39000, 13000, 1000), 0.001);
    // k_max = 13.013k / (1k + 38.961k + 13.013k) = 0.2456625…; k = 13/53.
    expect(d.high).toBeCloseTo(13013 / 52974 / (13 / 53) - 1, 12);
    expect(d.low).toBeCloseTo(12987 / 53026 / (13 / 53) - 1, 12);
  });

  it("the source's tolerance moves k by the source's share of the resistance (1 kΩ ± 10 % behind 39k/13k)", () => {
    const d = sourceRatioDeviation(divider(39000, 13000, 1000), 0.1);
    expect(d.high).toBeCloseTo(53 / 52.9 - 1, 12);
    expect(d.low).toBeCloseTo(53 / 53.1 - 1, 12);
  });
});
