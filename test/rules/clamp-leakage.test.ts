// clamp-leakage (SPEC §11.6): with the comparator low (below ground) the series
// clamp diode is reverse-biased; its leakage flows out of the logic node, so the
// pull-down holds the pin at −ir·R_pd, below ground (polarity of a reverse-biased
// diode into a resistor, Ohm's law). Checked against logic.pin_min_v, −0.3 V
// when not given (common practice [M], REFERENCES "Logic thresholds"). Leakage
// doubles per 10 °C for silicon (common practice [M]). The pin goes no lower than
// the comparator's low level: a diode at zero bias carries no current (Shockley diode
// equation, Sedra & Smith ch. 4), so −ir·R_pd beyond that level is clipped there.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import type { DesignResult } from "../../src/core/engine/result.ts";
import type { Diode } from "../../src/core/schemas/diode.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { design, type DeepPartial } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";
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
    label: "clipped: 500 µA × 10 kΩ would be −5.00 V, but the pin stops at the −2.50 V low level, still below −0.30 V",
    run: { part: leaking("500k"), stage: clampDiodeStage({ negative: -2.5 }), design: pull(10e3), role: "clamp-diode" },
    expected: { verdict: "fail", needed: 0.3, available: 2.5, margin: -2.2 },
  },
  {
    label: "clipped at the rail's deepest point: a −2.5 V rail whose ripple reaches −2.7 V holds the pin at −2.70 V",
    run: {
      part: leaking("500k"),
      stage: { ...clampDiodeStage({ negative: -2.5 }), floor_v: -2.7 },
      design: pull(10e3),
      role: "clamp-diode",
    },
    expected: { verdict: "fail", needed: 0.3, available: 2.7, margin: -2.4 },
  },
  {
    label: "clipped inside the limit: 4 µA × 100 kΩ would be −0.40 V, but a −0.20 V low level holds it at −0.20 V",
    run: { part: leaking("4k"), stage: clampDiodeStage({ negative: -0.2 }), design: pull(100e3), role: "clamp-diode" },
    // 0.10 V of 0.30 V to spare is a third of the limit, above the 20 % marginal fraction.
    expected: { verdict: "pass", needed: 0.3, available: 0.2, margin: 0.1 },
  },
  {
    label: "clipped close to the limit: a −0.25 V low level leaves 50 mV of 0.30 V",
    run: { part: leaking("4k"), stage: clampDiodeStage({ negative: -0.25 }), design: pull(100e3), role: "clamp-diode" },
    expected: { verdict: "marginal", needed: 0.3, available: 0.25, margin: 0.05 },
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

  it("shows the clip in its steps: −ir·R, the low level, and the pin at the larger of the two", () => {
    const clipped = cases.find((c) => c.label.startsWith("clipped: 500 µA"));
    if (!clipped) throw new Error("case table changed");
    const f = check("clamp-leakage", clipped.run);
    expect(f.steps.map((x) => [x.label, Number(x.value.toPrecision(6))])).toEqual([
      ["ir at 25 °C (the hot end)", 500e-6],
      ["pull-down", 10e3],
      ["−ir·R", -5],
      ["comparator's lowest low level (deepest V−)", -2.5],
      ["V_pin = max(−ir·R, low level)", -2.5],
      ["lower limit of the pin", -0.3],
      ["margin = |limit| − |V_pin|", -2.2],
    ]);
  });

  it("says why: the pin below ground, against its lower limit, at the named temperature end", () => {
    expect(reasons("clamp-leakage", cases)).toMatchInlineSnapshot(`
      {
        "1 µA at 25 °C is 4 µA at the 45 °C hot end: −0.40 V against a −0.6 V pin": "pass: with the comparator low the diode blocks; its 4.00 µA leakage at 45 °C (the hot end) through the 100 kΩ pull-down pulls the pin to −0.40 V, above the pin's −0.60 V limit (logic.pin_min_v): 0.20 V to spare",
        "2.5 µA × 100 kΩ: −0.25 V, 50 mV inside −0.30 V": "marginal: with the comparator low the diode blocks; its 2.50 µA leakage at 25 °C (the hot end) through the 100 kΩ pull-down pulls the pin to −0.25 V, above the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 0.05 V to spare",
        "25 nA × 100 kΩ: the pin at −2.5 mV": "pass: with the comparator low the diode blocks; its 25.0 nA leakage at 25 °C (the hot end) through the 100 kΩ pull-down pulls the pin to −2.50 mV, above the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 0.30 V to spare",
        "acceptance: 4 µA × 100 kΩ pulls the pin to −0.40 V, below −0.30 V": "fail: with the comparator low the diode blocks; its 4.00 µA leakage at 25 °C (the hot end) through the 100 kΩ pull-down pulls the pin to −0.40 V, below the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 0.10 V short",
        "clipped at the rail's deepest point: a −2.5 V rail whose ripple reaches −2.7 V holds the pin at −2.70 V": "fail: with the comparator low the diode blocks; its 500 µA leakage at 25 °C (the hot end) through the 10.0 kΩ pull-down would pull the pin to −5.00 V as a constant current, but the leakage stops once the pin reaches the comparator's low level, so the pin goes no lower than −2.70 V (the deepest V−), below the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 2.40 V short",
        "clipped close to the limit: a −0.25 V low level leaves 50 mV of 0.30 V": "marginal: with the comparator low the diode blocks; its 4.00 µA leakage at 25 °C (the hot end) through the 100 kΩ pull-down would pull the pin to −0.40 V as a constant current, but the leakage stops once the pin reaches the comparator's low level, so the pin goes no lower than −0.25 V (the deepest V−), above the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 0.05 V to spare",
        "clipped inside the limit: 4 µA × 100 kΩ would be −0.40 V, but a −0.20 V low level holds it at −0.20 V": "pass: with the comparator low the diode blocks; its 4.00 µA leakage at 25 °C (the hot end) through the 100 kΩ pull-down would pull the pin to −0.40 V as a constant current, but the leakage stops once the pin reaches the comparator's low level, so the pin goes no lower than −0.20 V (the deepest V−), above the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 0.10 V to spare",
        "clipped: 500 µA × 10 kΩ would be −5.00 V, but the pin stops at the −2.50 V low level, still below −0.30 V": "fail: with the comparator low the diode blocks; its 500 µA leakage at 25 °C (the hot end) through the 10.0 kΩ pull-down would pull the pin to −5.00 V as a constant current, but the leakage stops once the pin reaches the comparator's low level, so the pin goes no lower than −2.50 V (the deepest V−), below the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 2.20 V short",
        "leakage empty (as a part object; the schema requires it)": "unrated: not rated: needs 'ir_na', which is empty for this part",
        "no negative rail: the diode does not block": "pass: with no negative rail the comparator's low level is not below ground, so the diode does not block and its leakage cannot pull the pin below ground; the pin's −0.30 V limit (logic.pin_min_v, −0.3 V when not given, common practice): 0.30 V to spare",
      }
    `);
  });
});

describe("clamp-leakage in rectify-and-sign: the floor is the rail's deepest point", () => {
  const catalogue = catalogueFromParts([
    opAmp(),
    comparator({ supply_max_v: 36 }),
    diode({ id: "d-leaky", ir_na: "500k" }),
  ]);
  const clampFinding = (r: DesignResult) =>
    r.roles
      .find((x) => x.role === "clamp-diode")
      ?.resultOf("d-leaky")
      ?.findings.find((f) => f.rule === "clamp-leakage");
  const run = (negative: DeepPartial) => {
    const e = evaluateDesign(
      design({ supply: { negative }, logic: { pull_down_ohm: 10000 }, temperature: { min_c: 25, max_c: 25 } }),
      catalogue,
    );
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    return e.result;
  };

  it("a fixed −2.5 V rail: 500 µA × 10 kΩ = −5.00 V is held at −2.50 V, 2.20 V below −0.30 V", () => {
    const f = clampFinding(run({ kind: "fixed", v: -2.5 }));
    expect([f?.verdict, f?.available, f?.margin]).toEqual(["fail", 2.5, -2.2]);
  });

  it("a charge pump: the floor is min(no-load rail, mean − ripple/2), deeper than the rail the checks use", () => {
    const r = run({
      kind: "charge-pump",
      drive_v: 5,
      frequency_hz: 980,
      flying_cap_f: 1e-6,
      reservoir_cap_f: 10e-6,
      load_a: 0.001,
    });
    const n = r.derived.negative;
    if (n.kind !== "charge-pump") throw new Error("no pump");
    const deepest = Math.min(n.no_load_v, n.dc_v - n.ripple_v / 2);
    expect(deepest).toBeLessThan(r.derived.rails.negative_v);
    const f = clampFinding(r);
    expect(f?.steps.find((x) => x.label.startsWith("comparator's lowest"))?.value).toBeCloseTo(deepest, 12);
    expect(f?.available).toBeCloseTo(-deepest, 12);
    expect(f?.verdict).toBe("fail");
  });
});
