// base-emitter-reverse (issue 21): with the sign output low at V_OL the NPN's base sits at
// V_OL (no clamp: the junction only leaks) or one clamp drop below ground. V_EBO 5 V (low end
// of the 5–6 V of small-signal NPN classes) and the 80 % derating are common practice [M];
// the clamp's drop is the ideal junction of REFERENCES (Shockley, I_S = 10⁻¹⁴ A, 300 K).
import { describe, expect, it } from "vitest";
import { design } from "../helpers/designs.ts";
import { diodeLoopCurrent } from "../../src/core/math/diode-loop.ts";
import { forwardVoltage } from "../../src/core/math/diode.ts";
import { comparator } from "../helpers/parts.ts";
import { check, expectFinding, reasons, signStage, type RuleCase } from "../helpers/rules.ts";

const junction = { id: "d-junction", vf_1ma_v: 0.65479, vf_10ma_v: 0.71432, ir_na: 1 };
const rails = (negative: number) => ({ positive_v: 5, negative_v: negative });
const npn = (logic: Record<string, number | boolean | undefined> = {}) =>
  design({ logic: { level_shift: "npn-inverter", npn_base_ohm: 10e3, ...logic } });
const clamped = { ...signStage(), base_clamp: junction };
const clampI = diodeLoopCurrent(4.5, 10e3, junction);
const clampV = forwardVoltage(junction, clampI); // 0.630 V at 387 µA

const cases: RuleCase[] = [
  {
    label: "acceptance: −4.5 V low, no clamp: 4.5 V reverse, within 5 V but above 4 V",
    run: { part: comparator(), stage: signStage(), role: "sign", rails: rails(-4.5), design: npn() },
    expected: { verdict: "marginal", needed: 4.5, available: 5, margin: 0.5 },
  },
  {
    label: "acceptance: the same with a base clamp",
    run: {
      part: comparator(),
      stage: clamped,
      role: "sign",
      rails: rails(-4.5),
      design: npn({ npn_base_clamp: true }),
    },
    expected: { verdict: "pass", needed: clampV, available: 5, margin: 5 - clampV },
  },
  {
    label: "−3 V low, no clamp",
    run: { part: comparator(), stage: signStage(), role: "sign", rails: rails(-3), design: npn() },
    expected: { verdict: "pass", needed: 3, available: 5, margin: 2 },
  },
  {
    label: "−6 V low, no clamp: past V_EBO",
    run: { part: comparator(), stage: signStage(), role: "sign", rails: rails(-6), design: npn() },
    expected: { verdict: "fail", needed: 6, available: 5, margin: -1 },
  },
  {
    label: "clamp asked for with no base resistor",
    run: {
      part: comparator(),
      stage: clamped,
      role: "sign",
      rails: rails(-4.5),
      design: npn({ npn_base_clamp: true, npn_base_ohm: undefined }),
    },
    expected: { verdict: "unrated", needed: 0, available: 5, margin: 5 },
  },
  {
    label: "diode clamp level shift: no NPN",
    run: { part: comparator(), stage: signStage(), role: "sign", rails: rails(-4.5) },
    expected: { verdict: "pass", needed: 0, available: 5, margin: 5 },
  },
];

describe("base-emitter-reverse", () => {
  it("the clamp's drop is the junction's at (4.5 V − Vf)/10 kΩ: 387 µA, 0.630 V", () => {
    expect(clampI).toBeCloseTo(387e-6, 6);
    expect(clampV).toBeCloseTo(0.63, 3);
  });

  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("base-emitter-reverse", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("base-emitter-reverse", cases)).toMatchInlineSnapshot(`
      {
        "acceptance: the same with a base clamp": "pass: the base clamp holds the base at −0.63 V (387 µA through the 10.0 kΩ base resistor), a reverse base-emitter voltage of 0.63 V, against V_EBO 5.00 V (assumed, common practice): 4.37 V to spare",
        "acceptance: −4.5 V low, no clamp: 4.5 V reverse, within 5 V but above 4 V": "marginal: with no base clamp the output low of −4.50 V reverse-biases the NPN's base-emitter junction by 4.50 V, within its V_EBO 5.00 V (assumed, common practice) but above 4.00 V (80 % of it): 0.50 V to spare; a diode across base and emitter (logic.npn_base_clamp) removes the stress",
        "clamp asked for with no base resistor": "unrated: not rated: the design asks for a base clamp but gives no logic.npn_base_ohm, which sets its current",
        "diode clamp level shift: no NPN": "pass: the level shift has no NPN",
        "−3 V low, no clamp": "pass: with no base clamp the output low of −3.00 V reverse-biases the NPN's base-emitter junction by 3.00 V, against V_EBO 5.00 V (assumed, common practice): 2.00 V to spare",
        "−6 V low, no clamp: past V_EBO": "fail: with no base clamp the output low of −6.00 V reverse-biases the NPN's base-emitter junction by 6.00 V, beyond its V_EBO 5.00 V (assumed, common practice): 1.00 V short; the junction breaks down and the NPN's gain degrades; add a diode across base and emitter (logic.npn_base_clamp)",
      }
    `);
  });
});
