// The optional held divider of issue 16 (front_end.divider_r1_ohm and divider_r2_ohm):
// both or neither, its loaded ratio k = R2/(Rs + R1 + R2) (SPEC §11.1, the voltage-divider
// formula with the source in series with R1) must keep the peak inside the window, and only
// rectify-and-sign has such a divider. A design without them validates as before.
import { describe, expect, it } from "vitest";
import { parseDesignValue } from "../../../src/engine.ts";
import { formatProblem } from "../../../src/core/problems.ts";
import { designInput, type DeepPartial } from "../../helpers/designs.ts";

const FILE = "designs/test-design.json";
const parse = (o: DeepPartial) => parseDesignValue(FILE, designInput(o));
const messages = (o: DeepPartial) => parse(o).problems.map(formatProblem);

// 10 V peak into the 2.5 V window behind 1 kΩ: 39k over 13k gives 13/53 = 0.24528 (SPEC §11.1), ±2.453 V.
const HELD = { signal: { peak_v: 10, source_ohm: 1000 }, front_end: { divider_r1_ohm: "39k", divider_r2_ohm: 13000 } };

describe("held divider design fields", () => {
  it("are optional: the base design leaves both undefined", () => {
    const { design, problems } = parse({});
    expect(problems).toEqual([]);
    expect(design?.front_end.divider_r1_ohm).toBeUndefined();
    expect(design?.front_end.divider_r2_ohm).toBeUndefined();
  });

  it("read SI strings and numbers when both are given and the peak fits the window", () => {
    const { design, problems } = parse(HELD);
    expect(problems).toEqual([]);
    expect(design?.front_end).toMatchObject({ divider_r1_ohm: 39000, divider_r2_ohm: 13000 });
  });

  it("are held by both or neither: one alone names the missing one", () => {
    expect([
      ...messages({ front_end: { divider_r1_ohm: 39000 } }),
      ...messages({ front_end: { divider_r2_ohm: 13000 } }),
    ]).toMatchInlineSnapshot(`
      [
        "designs/test-design.json: front_end.divider_r2_ohm: required value is missing (got nothing, expected the divider's bottom resistor in ohms: front_end.divider_r1_ohm holds the divider, so hold both of its resistors or neither)",
        "designs/test-design.json: front_end.divider_r1_ohm: required value is missing (got nothing, expected the divider's top resistor in ohms: front_end.divider_r2_ohm holds the divider, so hold both of its resistors or neither)",
      ]
    `);
  });

  it("refuse values that are no resistance", () => {
    expect(messages({ front_end: { divider_r1_ohm: 0, divider_r2_ohm: "lots" } })).toMatchInlineSnapshot(`
      [
        "designs/test-design.json: front_end.divider_r1_ohm: out of range (got 0, expected a number (or a string such as "100k"), greater than 0 and at most 1000000000)",
        "designs/test-design.json: front_end.divider_r2_ohm: not a number (got 'lots', expected a number (or a string such as "100k"), greater than 0 and at most 1000000000)",
      ]
    `);
  });

  it("refuse a held divider that puts the peak outside the window: 30k over 13k behind 1 kΩ is 13/44 = 0.2955, ±2.955 V > ±2.5 V", () => {
    // Voltage divider, Rs in series with R1 (SPEC §11.1): 13 / (1 + 30 + 13) = 0.29545…
    expect(
      messages({
        signal: { peak_v: 10, source_ohm: 1000 },
        front_end: { divider_r1_ohm: 30000, divider_r2_ohm: 13000 },
      }),
    ).toMatchInlineSnapshot(`
      [
        "designs/test-design.json: front_end.divider_r2_ohm: held divider puts the peak outside the window (got k = R2/(Rs + R1 + R2) = 13 kΩ/(1 kΩ + 30 kΩ + 13 kΩ) = 0.2955, ±2.955 V from the ±10 V peak, expected at most front_end.window_v ±2.5 V: a larger R1 or a smaller R2)",
      ]
    `);
  });

  it("with the source counted: 39k over 13k fits behind 1 kΩ (k 0.24528) but is 0.25 exactly behind none, also allowed", () => {
    expect(messages(HELD)).toEqual([]);
    expect(messages({ ...HELD, signal: { peak_v: 10, source_ohm: 0 } })).toEqual([]);
    // 39k over 15k behind none: 15/54 = 0.2778, ±2.778 V: too wide.
    expect(
      messages({ signal: { peak_v: 10, source_ohm: 0 }, front_end: { divider_r1_ohm: 39000, divider_r2_ohm: 15000 } }),
    ).toHaveLength(1);
  });

  it("are refused by a topology without an R1/R2 divider, and held for rectify-and-sign under 'all'", () => {
    expect(messages({ ...HELD, topology: "offset-to-mid-rail" })).toMatchInlineSnapshot(`
      [
        "designs/test-design.json: front_end.divider_r1_ohm: topology 'offset-to-mid-rail' has no R1/R2 divider to hold (got 39 kΩ, expected the field left out: only 'rectify-and-sign' has one; this topology's resistors come from front_end.divider_total_ohm)",
      ]
    `);
    expect(messages({ ...HELD, topology: "all" })).toEqual([]);
  });
});
