// The divider sees every resistance in series with R1 (SPEC §11.1): the source's and a
// protection resistor's (front_end.protection_ohm, between the connector and the front
// end), so k = R2/(Rs + Rp + R1 + R2) (textbook loaded divider). The source tolerance
// moves only the source's own part.
import { describe, expect, it } from "vitest";
import { sourceRatioDeviation } from "../../src/core/math/divider.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { loadDataSet } from "../../src/node/load-data.ts";
import { design } from "../helpers/designs.ts";

const demo = loadDataSet("data");

describe("rectify-and-sign's divider with a protection resistor", () => {
  const held = (protection?: number, tolerance?: number) =>
    design({
      topology: "rectify-and-sign",
      signal: {
        peak_v: 10,
        max_frequency_hz: 100,
        source_ohm: 1000,
        ...(tolerance === undefined ? {} : { source_tolerance: tolerance }),
      },
      front_end: {
        window_v: 2.5,
        divider_total_ohm: 52e3,
        divider_r1_ohm: 39e3,
        divider_r2_ohm: 13e3,
        resistor_tolerance: 0.001,
        series: "E24",
        rectifier_load_ohm: 10e3,
        ...(protection === undefined ? {} : { protection_ohm: protection }),
      },
    });

  it("k = 13k/(1k + 2k + 39k + 13k) = 0.236364 with 2 kΩ of protection, 13/53 = 0.245283 without", () => {
    const k = (p?: number) => {
      const e = evaluateDesign(held(p), demo.catalogue);
      if (!e.ok) throw new Error(JSON.stringify(e.problems));
      return e.result.derived.ratio;
    };
    expect(k()).toBeCloseTo(13 / 53, 12);
    expect(k(2000)).toBeCloseTo(13 / 55, 12);
    expect(13 / 55).toBeCloseTo(0.236364, 6);
  });

  it("the source tolerance moves only the source: 1 kΩ ± 10 % behind 2 kΩ + 39k/13k is 55/54.9 − 1 = +0.1821 %", () => {
    const d = {
      top_ohm: 39e3,
      bottom_ohm: 13e3,
      ratio: 13 / 55,
      total_ohm: 52e3,
      source_ohm: 3000,
      chosen_by: "held" as const,
    };
    const dev = sourceRatioDeviation(d, 0.1, 1000);
    expect(dev.high).toBeCloseTo(55 / 54.9 - 1, 12);
    expect(dev.low).toBeCloseTo(55 / 55.1 - 1, 12);
    const e = evaluateDesign(held(2000, 0.1), demo.catalogue);
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    const term = e.result.budget.terms.find((t) => t.name === "source-resistance");
    expect(term?.v).toBeCloseTo((55 / 54.9 - 1) * 10, 9);
  });
});
