// clamp-leakage (SPEC §11.6): with the comparator low (below ground) the series
// clamp diode is reverse-biased; its leakage flows out of the logic node, so the
// pull-down holds the pin at −ir·R_pd, below ground (polarity of a reverse-biased
// diode into a resistor, Ohm's law). Checked against logic.pin_min_v, −0.3 V
// when not given (common practice [M], REFERENCES "Logic thresholds"). Leakage
// doubles per 10 °C for silicon (common practice [M]).
import { describe, expect, it } from "vitest";
import type { Diode } from "../../src/core/schemas/diode.ts";
import { design } from "../helpers/designs.ts";
import { diode } from "../helpers/parts.ts";
import { check, clampDiodeStage, expectFinding, reasons, type RuleCase } from "../helpers/rules.ts";

const pull = (ohm: number, logic = {}, max_c = 25) =>
  design({ logic: { pull_down_ohm: ohm, ...logic }, temperature: { min_c: 25, max_c } });
const leaking = (na: number | string) => diode({ ir_na: na });
const low = clampDiodeStage({ negative: -5 }); // comparator low near −5 V: the diode blocks

const cases: RuleCase[] = [
  {
    label: "25 nA × 100 kΩ: the pin at −2.5 mV",
    run: { part: leaking(25), stage: low, design: pull(100e3), role: "clamp-diode" },
    expected: { verdict: "pass", needed: 0.3, available: 0.0025, margin: 0.2975 },
  },
  {
    label: "2.5 µA × 100 kΩ: −0.25 V, 50 mV inside −0.30 V",
    run: { part: leaking("2.5k"), stage: low, design: pull(100e3), role: "clamp-diode" },
    expected: { verdict: "marginal", needed: 0.3, available: 0.25, margin: 0.05 },
  },
  {
    label: "acceptance: 4 µA × 100 kΩ pulls the pin to −0.40 V, below −0.30 V",
    run: { part: leaking("4k"), stage: low, design: pull(100e3), role: "clamp-diode" },
    expected: { verdict: "fail", needed: 0.3, available: 0.4, margin: -0.1 },
  },
  {
    label: "1 µA at 25 °C is 4 µA at the 45 °C hot end: −0.40 V against a −0.6 V pin",
    run: { part: leaking("1k"), stage: low, design: pull(100e3, { pin_min_v: -0.6 }, 45), role: "clamp-diode" },
    expected: { verdict: "pass", needed: 0.6, available: 0.4, margin: 0.2 },
  },
  {
    label: "no negative rail: the diode does not block",
    run: { part: leaking("4k"), stage: clampDiodeStage({ negative: 0 }), design: pull(100e3), role: "clamp-diode" },
    expected: { verdict: "pass", needed: 0.3, available: 0, margin: 0.3 },
  },
  {
    label: "leakage empty (as a part object; the schema requires it)",
    run: {
      part: { ...leaking(25), ir_na: undefined } as unknown as Diode,
      stage: low,
      design: pull(100e3),
      role: "clamp-diode",
    },
    expected: { verdict: "unrated", needed: null, available: null, margin: null },
  },
];

describe("clamp-leakage", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("clamp-leakage", run), expected));

  it("says why: the pin below ground, against its lower limit, at the named temperature end", () => {
    expect(reasons("clamp-leakage", cases)).toMatchInlineSnapshot(`
      {
        "1 µA at 25 °C is 4 µA at the 45 °C hot end: −0.40 V against a −0.6 V pin": "pass: with the comparator low the diode blocks; its 4.00 µA leakage at 45 °C (the hot end) through the 100 kΩ pull-down pulls the pin to −0.40 V, above the pin's −0.60 V limit (logic.pin_min_v): 0.20 V to spare",
        "2.5 µA × 100 kΩ: −0.25 V, 50 mV inside −0.30 V": "marginal: with the comparator low the diode blocks; its 2.50 µA leakage at 25 °C (the hot end) through the 100 kΩ pull-down pulls the pin to −0.25 V, above the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 0.05 V to spare",
        "25 nA × 100 kΩ: the pin at −2.5 mV": "pass: with the comparator low the diode blocks; its 25.0 nA leakage at 25 °C (the hot end) through the 100 kΩ pull-down pulls the pin to −2.50 mV, above the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 0.30 V to spare",
        "acceptance: 4 µA × 100 kΩ pulls the pin to −0.40 V, below −0.30 V": "fail: with the comparator low the diode blocks; its 4.00 µA leakage at 25 °C (the hot end) through the 100 kΩ pull-down pulls the pin to −0.40 V, below the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 0.10 V short",
        "leakage empty (as a part object; the schema requires it)": "unrated: not rated: needs 'ir_na', which is empty for this part",
        "no negative rail: the diode does not block": "pass: with no negative rail the comparator's low level is not below ground, so the diode does not block and its leakage cannot pull the pin below ground; the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 0.30 V to spare",
      }
    `);
  });
});
