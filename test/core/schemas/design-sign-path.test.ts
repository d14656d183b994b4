// The optional sign-path fields of issue 21: a design without them validates as before.
import { describe, expect, it } from "vitest";
import { parseDesignValue } from "../../../src/engine.ts";
import { formatProblem } from "../../../src/core/problems.ts";
import { designInput, type DeepPartial } from "../../helpers/designs.ts";

const FILE = "designs/test-design.json";
const parse = (o: DeepPartial) => parseDesignValue(FILE, designInput(o));

describe("sign-path design fields", () => {
  it("are all optional: the base design leaves them undefined", () => {
    const { design, problems } = parse({});
    expect(problems).toEqual([]);
    expect(design?.logic.pin_cap_f).toBeUndefined();
    expect(design?.logic.npn_base_clamp).toBeUndefined();
    expect(design?.front_end.sign_series_ohm).toBeUndefined();
  });

  it("read SI strings and booleans", () => {
    const { design, problems } = parse({
      front_end: { sign_series_ohm: "10k" },
      logic: {
        level_shift: "npn-inverter",
        pin_cap_f: "10p",
        pull_up_ohm: "100k",
        npn_base_ohm: "22k",
        npn_base_clamp: true,
        npn_vebo_v: 6,
        npn_storage_s: "250n",
      },
    });
    expect(problems).toEqual([]);
    expect(design?.front_end.sign_series_ohm).toBe(10e3);
    expect(design?.logic).toMatchObject({
      pin_cap_f: 10e-12,
      pull_up_ohm: 100e3,
      npn_base_ohm: 22e3,
      npn_base_clamp: true,
      npn_vebo_v: 6,
      npn_storage_s: 250e-9,
    });
  });

  it("name a bad value by its path", () => {
    const messages = parse({
      logic: { pin_cap_f: 0, pull_up_ohm: "lots", npn_base_clamp: "yes", npn_storage_s: -1 },
    }).problems.map(formatProblem);
    expect(messages).toMatchInlineSnapshot(`
      [
        "designs/test-design.json: logic.pin_cap_f: out of range (got 0, expected a number (or a string such as "100k"), greater than 0)",
        "designs/test-design.json: logic.pull_up_ohm: not a number (got 'lots', expected a number (or a string such as "100k"), greater than 0)",
        "designs/test-design.json: logic.npn_base_clamp: wrong type (got 'yes', expected true or false)",
        "designs/test-design.json: logic.npn_storage_s: out of range (got -1, expected a number (or a string such as "100k"), at least 0 and at most 1)",
      ]
    `);
  });
});
