// logic-low (SPEC §7): diode-clamp V_low = ir · pull_down_ohm, margin vil − V_low; pull-up
// V_low = V− + out_neg_headroom_v within −0.3 V … V_IL; npn-inverter V_OH must exceed
// 0.7 V + 0.3 V, then the input sits at 0.2 V. NPN and input-clamp figures are common practice [M].
import { describe, expect, it } from "vitest";
import type { ClampDiode } from "../../src/core/engine/types.ts";
import { design } from "../helpers/designs.ts";
import { comparator } from "../helpers/parts.ts";
import { check, expectFinding, GROUND_5V, reasons, signStage, SPLIT_5V, type RuleCase } from "../helpers/rules.ts";

const clamp = (ir_na: number): ClampDiode => ({ id: "d-clamp", vf_1ma_v: 0.65, vf_10ma_v: 0.75, ir_na });
const logic = (level_shift: string, vil_v = 0.8) =>
  design({ logic: { vdd_v: 3.3, vih_v: 2.0, vil_v, level_shift, pull_down_ohm: 10000 } });
const openDrain = comparator({ output: "open-drain", out_neg_headroom_v: "", out_pos_headroom_v: "" });

const cases: RuleCase[] = [
  {
    label: "silicon clamp leaking 25 nA into 10 kΩ: 0.25 mV",
    run: { part: comparator(), stage: signStage({ clamp: clamp(25) }), rails: SPLIT_5V, design: logic("diode-clamp") },
    expected: { verdict: "pass", needed: 0.8, available: 0.25e-3, margin: 0.8 - 0.25e-3 },
  },
  {
    label: "a clamp leaking 75 µA: 0.75 V against V_IL 0.8 V",
    run: {
      part: comparator(),
      stage: signStage({ clamp: clamp(75_000) }),
      rails: SPLIT_5V,
      design: logic("diode-clamp"),
    },
    expected: { verdict: "marginal", needed: 0.8, available: 0.75, margin: 0.05 },
  },
  {
    label: "a clamp leaking 100 µA: 1.0 V against V_IL 0.8 V",
    run: {
      part: comparator(),
      stage: signStage({ clamp: clamp(100_000) }),
      rails: SPLIT_5V,
      design: logic("diode-clamp"),
    },
    expected: { verdict: "fail", needed: 0.8, available: 1.0, margin: -0.2 },
  },
  {
    label: "pull-up: push-pull output low at V− = −5 V drives the input below −0.3 V",
    run: { part: comparator(), stage: signStage(), rails: SPLIT_5V, design: logic("pull-up") },
    expected: { verdict: "fail", needed: -0.3, available: -5, margin: -4.7 },
  },
  {
    label: "pull-up: output low 0.75 V above ground against V_IL 0.8 V",
    run: {
      part: comparator({ out_neg_headroom_v: 0.75 }),
      stage: signStage(),
      rails: GROUND_5V,
      design: logic("pull-up"),
    },
    expected: { verdict: "marginal", needed: 0.8, available: 0.75, margin: 0.05 },
  },
  {
    label: "pull-up: open-drain output low on ground",
    run: { part: openDrain, stage: signStage(), rails: GROUND_5V, design: logic("pull-up") },
    expected: { verdict: "pass", needed: -0.3, available: 0, margin: 0.3 },
  },
  {
    label: "npn-inverter: a 5 V high saturates the NPN, input at 0.2 V",
    run: { part: comparator(), stage: signStage(), rails: GROUND_5V, design: logic("npn-inverter") },
    expected: { verdict: "pass", needed: 1.0, available: 5, margin: 0.6 },
  },
  {
    label: "npn-inverter: an open-drain output cannot drive the base",
    run: { part: openDrain, stage: signStage(), rails: GROUND_5V, design: logic("npn-inverter") },
    expected: { verdict: "fail", needed: 1.0, available: 0, margin: -1.0 },
  },
];

describe("logic-low", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("logic-low", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("logic-low", cases)).toMatchInlineSnapshot(`
      {
        "a clamp leaking 100 µA: 1.0 V against V_IL 0.8 V": "fail: with the output low the clamp diode blocks, and its leakage of 100 µA × 10.0 kΩ holds the input at 1.00 V; needs at most V_IL 0.80 V: 0.20 V short",
        "a clamp leaking 75 µA: 0.75 V against V_IL 0.8 V": "marginal: with the output low the clamp diode blocks, and its leakage of 75.0 µA × 10.0 kΩ holds the input at 750 mV; needs at most V_IL 0.80 V: 0.05 V to spare",
        "npn-inverter: a 5 V high saturates the NPN, input at 0.2 V": "pass: the output high of +5.00 V must exceed 1.00 V to saturate the NPN, which then pulls the input to 0.20 V against V_IL 0.80 V: 0.60 V to spare",
        "npn-inverter: an open-drain output cannot drive the base": "fail: an open-drain output cannot drive the NPN's base high",
        "pull-up: open-drain output low on ground": "pass: the output low of 0.00 V reaches the input directly; needs at least −0.30 V (below that the input's protection conducts): 0.30 V to spare",
        "pull-up: output low 0.75 V above ground against V_IL 0.8 V": "marginal: the output low of +0.75 V reaches the input directly; needs at most V_IL 0.80 V: 0.05 V to spare",
        "pull-up: push-pull output low at V− = −5 V drives the input below −0.3 V": "fail: the output low of −5.00 V reaches the input directly; needs at least −0.30 V (below that the input's protection conducts): 4.70 V short",
        "silicon clamp leaking 25 nA into 10 kΩ: 0.25 mV": "pass: with the output low the clamp diode blocks, and its leakage of 25.0 nA × 10.0 kΩ holds the input at 250 µV; needs at most V_IL 0.80 V: 0.80 V to spare",
      }
    `);
  });
});
