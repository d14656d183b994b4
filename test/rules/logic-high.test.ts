// logic-high (SPEC §7): diode-clamp V_high = (V+ − out_pos_headroom_v) − Vf_clamp(V_OH/pull_down),
// margin min(V_high − vih, vdd + 0.3 − V_high); an open-drain output fails under diode-clamp.
// Reference: comparator → series diode → pull-down, V_OH 3.3 V, 0.65 V diode, 10 kΩ → 2.65 V
// (REFERENCES.md, Logic thresholds); 3.3 V LVCMOS V_IH 2.0 V (JEDEC JESD8C.01; value from memory [M]);
// inputs limited to V_DD + 0.3 V (common practice [M]).
import { describe, expect, it } from "vitest";
import type { ClampDiode } from "../../src/core/engine/types.ts";
import { design } from "../helpers/designs.ts";
import { comparator, opAmp } from "../helpers/parts.ts";
import { check, expectFinding, GROUND_5V, reasons, signStage, SPLIT_5V, type RuleCase } from "../helpers/rules.ts";

// A flat 0.65 V diode, so the worked value holds at any current.
const flat065: ClampDiode = { id: "d-flat", vf_1ma_v: 0.65, vf_10ma_v: 0.65, ir_na: 25 };
const schottky: ClampDiode = { id: "d-sch", vf_1ma_v: 0.3, vf_10ma_v: 0.3, ir_na: 500 };
const silicon: ClampDiode = { id: "d-si", vf_1ma_v: 0.65, vf_10ma_v: 0.75, ir_na: 25 };
const rails33: { positive_v: number; negative_v: number } = { positive_v: 3.3, negative_v: -2.5 };
const logic = (o: Record<string, string | number>) => design({ supply: { positive_v: 5 }, logic: o });
const lvcmos = (vih: number) =>
  logic({ vdd_v: 3.3, vih_v: vih, vil_v: 0.8, level_shift: "diode-clamp", pull_down_ohm: 10000 });
const openDrain = comparator({ output: "open-drain", out_neg_headroom_v: "", out_pos_headroom_v: "" });
// Silicon clamp at V_OH/10 kΩ = 0.35 mA: 0.65 + 0.1·log10(0.35) V.
const vfAt035mA = 0.65 + 0.1 * Math.log10(0.35);

const cases: RuleCase[] = [
  {
    label: "3.3 V push-pull through a 0.65 V diode into 3.3 V LVCMOS (V_IH 2.0 V): 2.65 V",
    run: { part: comparator(), stage: signStage({ clamp: flat065 }), rails: rails33, design: lvcmos(2.0) },
    expected: { verdict: "pass", needed: 2.0, available: 2.65, margin: 0.65 },
  },
  {
    label: "the same 2.65 V against V_IH 2.6 V",
    run: { part: comparator(), stage: signStage({ clamp: flat065 }), rails: rails33, design: lvcmos(2.6) },
    expected: { verdict: "marginal", needed: 2.6, available: 2.65, margin: 0.05 },
  },
  {
    label: "the same 2.65 V against V_IH 3.0 V",
    run: { part: comparator(), stage: signStage({ clamp: flat065 }), rails: rails33, design: lvcmos(3.0) },
    expected: { verdict: "fail", needed: 3.0, available: 2.65, margin: -0.35 },
  },
  {
    label: "5 V push-pull through a 0.3 V Schottky into 3.3 V logic: 4.7 V is above V_DD + 0.3 V",
    run: { part: comparator(), stage: signStage({ clamp: schottky }), rails: GROUND_5V, design: lvcmos(2.0) },
    expected: { verdict: "fail", needed: 3.6, available: 4.7, margin: -1.1 },
  },
  {
    label: "ground-sensing op amp as comparator (V_OH 3.5 V) through silicon at 0.35 mA into 5 V CMOS (V_IH 0.7·V_DD)",
    run: {
      part: opAmp(),
      stage: signStage({ clamp: silicon }),
      rails: SPLIT_5V,
      design: logic({ vdd_v: 5, vih_v: 3.5, vil_v: 1.5, level_shift: "diode-clamp", pull_down_ohm: 10000 }),
    },
    expected: { verdict: "fail", needed: 3.5, available: 3.5 - vfAt035mA, margin: -vfAt035mA },
  },
  {
    label: "open-drain output under diode-clamp",
    run: { part: openDrain, stage: signStage({ clamp: flat065 }), rails: GROUND_5V, design: lvcmos(2.0) },
    expected: { verdict: "fail", needed: 2.0, available: 0, margin: -2.0 },
  },
  {
    label: "open-drain output with a pull-up to 3.3 V",
    run: {
      part: openDrain,
      stage: signStage(),
      rails: GROUND_5V,
      design: logic({ vdd_v: 3.3, vih_v: 2.0, vil_v: 0.8, level_shift: "pull-up", pull_down_ohm: 10000 }),
    },
    expected: { verdict: "pass", needed: 2.0, available: 3.3, margin: 1.3 },
  },
  {
    label: "npn-inverter: output low 0.35 V only just keeps the NPN off",
    run: {
      part: comparator({ out_neg_headroom_v: 0.35 }),
      stage: signStage(),
      rails: GROUND_5V,
      design: logic({ vdd_v: 3.3, vih_v: 2.0, vil_v: 0.8, level_shift: "npn-inverter", pull_down_ohm: 10000 }),
    },
    expected: { verdict: "marginal", needed: 0.4, available: 0.35, margin: 0.05 },
  },
  {
    label: "npn-inverter: output low on the rail",
    run: {
      part: comparator(),
      stage: signStage(),
      rails: GROUND_5V,
      design: logic({ vdd_v: 3.3, vih_v: 2.0, vil_v: 0.8, level_shift: "npn-inverter", pull_down_ohm: 10000 }),
    },
    expected: { verdict: "pass", needed: 0.4, available: 0, margin: 0.4 },
  },
];

describe("logic-high", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("logic-high", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("logic-high", cases)).toMatchInlineSnapshot(`
      {
        "3.3 V push-pull through a 0.65 V diode into 3.3 V LVCMOS (V_IH 2.0 V): 2.65 V": "pass: the output high reaches 3.30 V, minus 0.65 V across the clamp diode at 330 µA = 2.65 V; needs at least V_IH 2.00 V: 0.65 V to spare",
        "5 V push-pull through a 0.3 V Schottky into 3.3 V logic: 4.7 V is above V_DD + 0.3 V": "fail: the output high reaches 5.00 V, minus 0.30 V across the clamp diode at 500 µA = 4.70 V; needs at most 3.60 V (V_DD + 0.3 V): 1.10 V short",
        "ground-sensing op amp as comparator (V_OH 3.5 V) through silicon at 0.35 mA into 5 V CMOS (V_IH 0.7·V_DD)": "fail: the output high reaches 3.50 V, minus 0.60 V across the clamp diode at 350 µA = 2.90 V; needs at least V_IH 3.50 V: 0.60 V short",
        "npn-inverter: output low 0.35 V only just keeps the NPN off": "marginal: the output low of +0.35 V must stay below 0.40 V to turn the NPN off, so the pull-up gives 3.30 V against V_IH 2.00 V: 0.05 V to spare",
        "npn-inverter: output low on the rail": "pass: the output low of 0.00 V must stay below 0.40 V to turn the NPN off, so the pull-up gives 3.30 V against V_IH 2.00 V: 0.40 V to spare",
        "open-drain output under diode-clamp": "fail: an open-drain output cannot drive the clamp diode high; use a push-pull output or the pull-up level shift",
        "open-drain output with a pull-up to 3.3 V": "pass: the open-drain output lets the pull-up lift the input to 3.30 V against V_IH 2.00 V: 1.30 V to spare",
        "the same 2.65 V against V_IH 2.6 V": "marginal: the output high reaches 3.30 V, minus 0.65 V across the clamp diode at 330 µA = 2.65 V; needs at least V_IH 2.60 V: 0.05 V to spare",
        "the same 2.65 V against V_IH 3.0 V": "fail: the output high reaches 3.30 V, minus 0.65 V across the clamp diode at 330 µA = 2.65 V; needs at least V_IH 3.00 V: 0.35 V short",
      }
    `);
  });
});
