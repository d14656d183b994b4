import { readdirSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { displayPath, loadDesignFiles } from "../../src/node/load-data.ts";
import { checkDesignSet } from "../../src/core/designs.ts";
import { parseDesignText, parseDesignValue } from "../../src/engine.ts";
import { formatProblem } from "../../src/core/problems.ts";
import { POLICY_DEFAULTS } from "../../src/core/schemas/design.ts";
import { designInput, type DeepPartial } from "../helpers/designs.ts";

const FILE = "designs/test-design.json";

function problems(overrides: DeepPartial): string[] {
  return parseDesignValue(FILE, designInput(overrides)).problems.map(formatProblem);
}

/** Every case's messages under its label, for one snapshot per kind of error. */
function table(cases: Record<string, DeepPartial>): Record<string, string[]> {
  return Object.fromEntries(Object.entries(cases).map(([label, o]) => [label, problems(o)]));
}

describe("parseDesignValue", () => {
  it("accepts the base design and fills in the policy defaults (SPEC §5) and an empty BOM", () => {
    const { design, problems: p } = parseDesignValue(FILE, designInput());
    expect(p).toEqual([]);
    expect(design?.policy).toEqual(POLICY_DEFAULTS);
    expect(design?.bom).toEqual({});
    expect(POLICY_DEFAULTS).toEqual({
      headroom_margin_v: 0.1,
      marginal_fraction: 0.2,
      offset_share: 0.25,
      speed_share: 0.25,
      sign_share: 0.5,
      timing_fraction: 0.01,
      timing_share: 0.25, // issue 16: a stage's timing error (dead time, late sign) against required_v
      allow_unrated: false,
    });
  });

  it("overrides single policy keys and keeps the other defaults", () => {
    const { design } = parseDesignValue(
      FILE,
      designInput({ policy: { headroom_margin_v: "200m", allow_unrated: true } }),
    );
    expect(design?.policy).toEqual({ ...POLICY_DEFAULTS, headroom_margin_v: 0.2, allow_unrated: true });
  });

  it("accepts an SI-prefixed string wherever a number goes", () => {
    const { design, problems: p } = parseDesignValue(
      FILE,
      designInput({
        supply: {
          positive_v: "5",
          negative: {
            kind: "charge-pump",
            drive_v: "5",
            frequency_hz: "980",
            flying_cap_f: "1u",
            reservoir_cap_f: "10µ",
            load_a: "500u",
          },
        },
        signal: { peak_v: "10", max_frequency_hz: "1.5k", source_ohm: "1k" },
        front_end: { divider_total_ohm: "100k", resistor_tolerance: "10m" },
        adc: { bits: "12" },
        temperature: { min_c: "-40", max_c: "85" },
      }),
    );
    expect(p).toEqual([]);
    expect(design?.supply.negative).toEqual({
      kind: "charge-pump",
      drive_v: 5,
      frequency_hz: 980,
      flying_cap_f: 1e-6,
      reservoir_cap_f: 10e-6,
      load_a: 500e-6,
    });
    expect(design?.signal).toEqual({ peak_v: 10, max_frequency_hz: 1500, source_ohm: 1000 });
    expect([design?.front_end.divider_total_ohm, design?.front_end.resistor_tolerance, design?.adc.bits]).toEqual([
      100000, 0.01, 12,
    ]);
    expect(design?.temperature).toEqual({ min_c: -40, max_c: 85 });
  });

  it("reads each negative supply kind", () => {
    const kinds = [{ kind: "ground" }, { kind: "fixed", v: -5 }, { kind: "fixed", v: "-12" }].map(
      (negative) => parseDesignValue(FILE, designInput({ supply: { negative } })).design?.supply.negative,
    );
    expect(kinds).toEqual([{ kind: "ground" }, { kind: "fixed", v: -5 }, { kind: "fixed", v: -12 }]);
  });

  it("names wrong types and missing values by their JSON path", () => {
    expect(
      table({
        "number as boolean": { signal: { peak_v: true } },
        "number as object": { signal: { max_frequency_hz: { value: 200 } } },
        "number as text": { signal: { source_ohm: "1 kilohm" } },
        "NaN text": { accuracy: { required_v: "NaN" } },
        "object as text": { adc: "10 bit" },
        "object as array": { logic: [] },
        "missing value": { signal: { peak_v: undefined } },
        "missing object": { accuracy: undefined },
        "title as number": { title: 42 },
        "title empty": { title: " " },
        "id with capitals": { id: "Test-Design" },
        "allow_unrated as text": { policy: { allow_unrated: "yes" } },
        "bom as array": { bom: ["oa-x"] },
      }),
    ).toMatchInlineSnapshot(`
      {
        "NaN text": [
          "designs/test-design.json: accuracy.required_v: not a number (got 'NaN', expected a number (or a string such as "100k"), greater than 0)",
        ],
        "allow_unrated as text": [
          "designs/test-design.json: policy.allow_unrated: wrong type (got 'yes', expected true or false)",
        ],
        "bom as array": [
          "designs/test-design.json: bom: wrong type (got ["oa-x"], expected an object of role: part id)",
        ],
        "id with capitals": [
          "designs/test-design.json: id: not a valid id (got 'Test-Design', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)",
        ],
        "missing object": [
          "designs/test-design.json: accuracy: required value is missing (got nothing, expected an object { … })",
        ],
        "missing value": [
          "designs/test-design.json: signal.peak_v: required value is missing (got nothing, expected a number (or a string such as "100k"), greater than 0 and at most 100000)",
        ],
        "number as boolean": [
          "designs/test-design.json: signal.peak_v: not a number (got true, expected a number (or a string such as "100k"), greater than 0 and at most 100000)",
        ],
        "number as object": [
          "designs/test-design.json: signal.max_frequency_hz: not a number (got {"value":200}, expected a number (or a string such as "100k"), greater than 0)",
        ],
        "number as text": [
          "designs/test-design.json: signal.source_ohm: not a number (got '1 kilohm', expected a number (or a string such as "100k"), at least 0)",
        ],
        "object as array": [
          "designs/test-design.json: logic: wrong type (got [], expected an object { … })",
        ],
        "object as text": [
          "designs/test-design.json: adc: wrong type (got '10 bit', expected an object { … })",
        ],
        "title as number": [
          "designs/test-design.json: title: not a valid title (got 42, expected text of 1 to 200 characters)",
        ],
        "title empty": [
          "designs/test-design.json: title: not a valid title (got ' ', expected text of 1 to 200 characters)",
        ],
      }
    `);
  });

  it("names unknown keys and suggests the closest known one", () => {
    expect(
      table({
        "top level": { polcy: {} },
        nested: { signal: { peak: 10 } },
        "inside a negative supply": { supply: { negative: { kind: "fixed", v: -5, volts: -5 } } },
        "policy key": { policy: { headroom_margin: 0.2 } },
        "far from any": { front_end: { colour: "red" } },
        "inside a charge pump": {
          supply: {
            negative: {
              kind: "charge-pump",
              drive_v: 5,
              frequency_hz: 980,
              flying_cap: 1e-6,
              reservoir_cap_f: 1e-5,
              load_a: 0,
            },
          },
        },
      }),
    ).toMatchInlineSnapshot(`
      {
        "far from any": [
          "designs/test-design.json: front_end.colour: unknown key (got 'colour', expected one of 'window_v', 'divider_total_ohm', 'resistor_tolerance', 'series', 'rectifier_load_ohm', 'rectifier_tolerance', 'sign_series_ohm', 'protection_ohm', 'divider_r1_ohm', 'divider_r2_ohm')",
        ],
        "inside a charge pump": [
          "designs/test-design.json: supply.negative.flying_cap_f: required value is missing (got nothing, expected a number (or a string such as "100k"), greater than 0)",
          "designs/test-design.json: supply.negative.flying_cap: unknown key (got 'flying_cap', expected 'flying_cap_f')",
        ],
        "inside a negative supply": [
          "designs/test-design.json: supply.negative.volts: unknown key (got 'volts', expected one of 'kind', 'v')",
        ],
        "nested": [
          "designs/test-design.json: signal.peak: unknown key (got 'peak', expected 'peak_v')",
        ],
        "policy key": [
          "designs/test-design.json: policy.headroom_margin: unknown key (got 'headroom_margin', expected 'headroom_margin_v')",
        ],
        "top level": [
          "designs/test-design.json: polcy: unknown key (got 'polcy', expected 'policy')",
        ],
      }
    `);
  });

  it("rejects values outside each list", () => {
    expect(
      table({
        topology: { topology: "rectify" },
        series: { front_end: { series: "E48" } },
        "series lower case": { front_end: { series: "e24" } },
        level_shift: { logic: { level_shift: "transistor" } },
        "negative kind": { supply: { negative: { kind: "battery", v: -9 } } },
        "negative without kind": { supply: { negative: { v: -9 } } },
        "bom role typo": { bom: { bufer: "oa-x" } },
        "bom role far from any": { bom: { "op-amp": "oa-x" } },
        "bom id": { bom: { buffer: "OA X" } },
      }),
    ).toMatchInlineSnapshot(`
      {
        "bom id": [
          "designs/test-design.json: bom.buffer: not a valid id (got 'OA X', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)",
        ],
        "bom role far from any": [
          "designs/test-design.json: bom.op-amp: unknown role (got 'op-amp', expected one of buffer, rectifier, sign, pump-diode, rectifier-diode, clamp-diode, base-clamp-diode, level-shift, reference-buffer, gain-stage, difference)",
        ],
        "bom role typo": [
          "designs/test-design.json: bom.bufer: unknown role (got 'bufer', expected 'buffer')",
        ],
        "level_shift": [
          "designs/test-design.json: logic.level_shift: unknown value (got 'transistor', expected 'diode-clamp' or 'npn-inverter' or 'pull-up')",
        ],
        "negative kind": [
          "designs/test-design.json: supply.negative.kind: unknown negative supply (got kind 'battery', expected 'ground', 'fixed' or 'charge-pump')",
        ],
        "negative without kind": [
          "designs/test-design.json: supply.negative.kind: unknown negative supply (got kind nothing, expected 'ground', 'fixed' or 'charge-pump')",
        ],
        "series": [
          "designs/test-design.json: front_end.series: unknown value (got 'E48', expected 'E12' or 'E24' or 'E96')",
        ],
        "series lower case": [
          "designs/test-design.json: front_end.series: unknown value (got 'e24', expected 'E12' or 'E24' or 'E96')",
        ],
        "topology": [
          "designs/test-design.json: topology: unknown value (got 'rectify', expected 'rectify-and-sign' or 'offset-to-mid-rail' or 'gained-level-shift' or 'difference-to-mid' or 'all')",
        ],
      }
    `);
  });

  it("rejects numbers out of range", () => {
    expect(
      table({
        "negative peak": { signal: { peak_v: -10 } },
        "zero frequency": { signal: { max_frequency_hz: 0 } },
        "fractional bits": { adc: { bits: 10.5 } },
        "zero bits": { adc: { bits: 0 } },
        "tolerance 50 %": { front_end: { resistor_tolerance: 0.5 } },
        "positive fixed negative rail": { supply: { negative: { kind: "fixed", v: 5 } } },
        "negative load": {
          supply: {
            negative: {
              kind: "charge-pump",
              drive_v: 5,
              frequency_hz: 980,
              flying_cap_f: 1e-6,
              reservoir_cap_f: 1e-5,
              load_a: -1e-3,
            },
          },
        },
        "share above 1": { policy: { offset_share: 2 } },
      }),
    ).toMatchInlineSnapshot(`
      {
        "fractional bits": [
          "designs/test-design.json: adc.bits: out of range (got 10.5, expected a whole number, at least 1 and at most 32)",
        ],
        "negative load": [
          "designs/test-design.json: supply.negative.load_a: out of range (got -0.001, expected a number (or a string such as "100k"), at least 0)",
        ],
        "negative peak": [
          "designs/test-design.json: signal.peak_v: out of range (got -10, expected a number (or a string such as "100k"), greater than 0 and at most 100000)",
        ],
        "positive fixed negative rail": [
          "designs/test-design.json: supply.negative.v: out of range (got 5, expected a number (or a string such as "100k"), at least -100 and less than 0)",
        ],
        "share above 1": [
          "designs/test-design.json: policy.offset_share: out of range (got 2, expected a number (or a string such as "100k"), greater than 0 and at most 1)",
        ],
        "tolerance 50 %": [
          "designs/test-design.json: front_end.resistor_tolerance: out of range (got 0.5, expected a number (or a string such as "100k"), at least 0 and at most 0.2)",
        ],
        "zero bits": [
          "designs/test-design.json: adc.bits: out of range (got 0, expected a whole number, at least 1 and at most 32)",
        ],
        "zero frequency": [
          "designs/test-design.json: signal.max_frequency_hz: out of range (got 0, expected a number (or a string such as "100k"), greater than 0)",
        ],
      }
    `);
  });

  it("rejects values that contradict each other, naming both", () => {
    expect(
      table({
        "window not below V+": { front_end: { window_v: 5 } },
        "window wider than the ADC": { front_end: { window_v: 3 }, adc: { reference_v: 2.5 } },
        "V_IL not below V_IH": { logic: { vil_v: 3.5 } },
        "V_IH above V_DD": { logic: { vih_v: 3.5, vdd_v: 3.3 } },
        // The converter runs from the positive rail; its reference cannot sit above it.
        "ADC reference above V+": {
          supply: { positive_v: 3.3 },
          front_end: { window_v: 2.5 },
          adc: { reference_v: 5 },
        },
        "temperature upside down": { temperature: { min_c: 85, max_c: -40 } },
        "pump drive above V+": {
          adc: { reference_v: 3.3 },
          supply: {
            positive_v: 3.3,
            negative: {
              kind: "charge-pump",
              drive_v: 5,
              frequency_hz: 980,
              flying_cap_f: 1e-6,
              reservoir_cap_f: 1e-5,
              load_a: 1e-3,
            },
          },
        },
      }),
    ).toMatchInlineSnapshot(`
      {
        "ADC reference above V+": [
          "designs/test-design.json: adc.reference_v: ADC reference is above the positive rail (got 5 V, expected at most supply.positive_v 3.3 V)",
        ],
        "V_IH above V_DD": [
          "designs/test-design.json: logic.vih_v: logic-high threshold is above the logic supply (got 3.5 V, expected at most logic.vdd_v 3.3 V)",
        ],
        "V_IL not below V_IH": [
          "designs/test-design.json: logic.vil_v: logic-low threshold is not below logic-high (got 3.5 V, expected less than logic.vih_v 3.5 V)",
        ],
        "pump drive above V+": [
          "designs/test-design.json: supply.negative.drive_v: pump drive is above the positive rail it is made from (got 5 V, expected at most supply.positive_v 3.3 V)",
        ],
        "temperature upside down": [
          "designs/test-design.json: temperature.min_c: range is upside down (got 85 °C, expected at most temperature.max_c -40 °C)",
        ],
        "window not below V+": [
          "designs/test-design.json: front_end.window_v: window can never fit inside the positive rail (got 5 V, expected less than supply.positive_v 5 V)",
        ],
        "window wider than the ADC": [
          "designs/test-design.json: front_end.window_v: window is wider than the ADC range (got 3 V, expected at most adc.reference_v 2.5 V)",
        ],
      }
    `);
  });

  it("reports every problem of a file at once", () => {
    expect(
      problems({ signal: { peak_v: "x", max_frequency_hz: -1 }, front_end: { series: "E7" }, extra: 1 }),
    ).toHaveLength(4);
  });
});

describe("parseDesignText", () => {
  it("accepts a UTF-8 byte-order mark", () => {
    const text = `\uFEFF${JSON.stringify(designInput())}`;
    expect(parseDesignText(FILE, text).problems).toEqual([]);
  });

  it("names the line of a JSON syntax error", () => {
    const text = JSON.stringify(designInput(), null, 2).replace('"peak_v": 2.5,', '"peak_v": 2.5,,');
    const expectedLine = text.split("\n").findIndex((l) => l.includes("2.5,,")) + 1;
    const p = parseDesignText(FILE, text).problems;
    expect(p).toHaveLength(1);
    expect(p[0]?.line).toBe(expectedLine);
    expect(formatProblem(p[0] ?? { file: "", message: "" })).toMatchInlineSnapshot(
      `"designs/test-design.json:13: not valid JSON: Expected double-quoted property name (expected a design object as in SPEC §5)"`,
    );
  });

  it.each([
    ["", "empty file"],
    ["[]", "an array"],
    ["null", "null"],
    ['"design"', "a string"],
  ])("rejects %j (%s) with one clear message", (text) => {
    const p = parseDesignText(FILE, text).problems;
    expect(p.length).toBeGreaterThan(0);
    expect(p.map(formatProblem).join("\n")).toMatch(/^designs\/test-design\.json/);
  });

  it("says what an empty file, an array and null are", () => {
    expect(["", "[]", "null"].map((t) => parseDesignText(FILE, t).problems.map(formatProblem))).toMatchInlineSnapshot(`
      [
        [
          "designs/test-design.json: not valid JSON: Unexpected end of JSON input (expected a design object as in SPEC §5)",
        ],
        [
          "designs/test-design.json: wrong type (got [], expected an object { … })",
        ],
        [
          "designs/test-design.json: wrong type (got null, expected an object { … })",
        ],
      ]
    `);
  });
});

describe("checkDesignSet", () => {
  it("reports a design id used twice, naming the first file", () => {
    const a = parseDesignValue("designs/a.json", designInput({ id: "same" }));
    const b = parseDesignValue("designs/b.json", designInput({ id: "other" }));
    const c = parseDesignValue("designs/c.json", designInput({ id: "same" }));
    expect(checkDesignSet([a, b, c]).map(formatProblem)).toMatchInlineSnapshot(`
      [
        "designs/c.json: id: duplicate design id (got 'same', expected an id not already used in designs/a.json)",
      ]
    `);
  });

  it("ignores files that did not parse", () => {
    expect(checkDesignSet([{ file: "x.json", problems: [{ file: "x.json", message: "bad" }] }])).toEqual([]);
  });
});

describe("fixture folders (one defect each, test/fixtures/designs/)", () => {
  const root = join(import.meta.dirname, "../fixtures/designs");
  const folders = readdirSync(root).sort();
  const load = (folder: string) => {
    const dir = join(root, folder);
    const paths = readdirSync(dir)
      .sort()
      .map((f) => join(dir, f));
    const prefix = `${displayPath(dir)}/`;
    const loaded = loadDesignFiles(paths);
    return { ...loaded, messages: loaded.problems.map((p) => formatProblem(p).replaceAll(prefix, "")) };
  };

  it.each(["valid", "si-strings"])("%s loads clean", (folder) => {
    const { designs, messages } = load(folder);
    expect(messages).toEqual([]);
    expect(designs[0]?.design?.supply.negative).toMatchObject({
      flying_cap_f: 1e-6,
      reservoir_cap_f: 10e-6,
      load_a: 500e-6,
    });
  });

  it("each defect gives exactly these messages", () => {
    const all = Object.fromEntries(
      folders.filter((f) => f !== "valid" && f !== "si-strings").map((f) => [f, load(f).messages]),
    );
    expect(all).toMatchInlineSnapshot(`
      {
        "bad-enum": [
          "bench-10v.json: front_end.series: unknown value (got 'E48', expected 'E12' or 'E24' or 'E96')",
        ],
        "contradiction": [
          "bench-10v.json: logic.vil_v: logic-low threshold is not below logic-high (got 3.5 V, expected less than logic.vih_v 3 V)",
        ],
        "duplicate-id": [
          "bench-10v.json: id: duplicate design id (got 'bench-10v', expected an id not already used in bench-10v-copy.json)",
        ],
        "missing-value": [
          "bench-10v.json: accuracy.required_v: required value is missing (got nothing, expected a number (or a string such as "100k"), greater than 0)",
        ],
        "not-json": [
          "bench-10v.json:18: not valid JSON: Expected double-quoted property name (expected a design object as in SPEC §5)",
        ],
        "unknown-key": [
          "bench-10v.json: signal.max_frequency_hz: required value is missing (got nothing, expected a number (or a string such as "100k"), greater than 0)",
          "bench-10v.json: signal.max_freq_hz: unknown key (got 'max_freq_hz', expected 'max_frequency_hz')",
        ],
        "wrong-type": [
          "bench-10v.json: signal.peak_v: not a number (got true, expected a number (or a string such as "100k"), greater than 0 and at most 100000)",
        ],
      }
    `);
  });
});
