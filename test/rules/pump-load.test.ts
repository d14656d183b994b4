// pump-load (SPEC §11.5): the pumped rail with the part's own supply current on it.
// Loaded diode charge-pump inverter V_out ≈ −(V_d − 2V_F − I/(f·C₁)) (switched-capacitor
// resistance 1/(f·C), S. Winder, Analog and Digital Filter Design, 2nd ed., ch. 14;
// REFERENCES "Diode charge-pump inverter"): 5 V drive, 980 Hz, 1 µF, silicon 0.7 V at
// 1 mA gives −2.580 V and collapses at 3.53 mA. A flat 0.7 V diode and a 1 F reservoir
// (no ripple) make the rule's rail that textbook case.
import { describe, expect, it } from "vitest";
import type { Comparator } from "../../src/core/schemas/comparator.ts";
import type { PumpOnRail, Rails } from "../../src/core/rule-kit/index.ts";
import { comparator, opAmp } from "../helpers/parts.ts";
import { bufferStage, check, expectFinding, reasons, signStage, SPLIT_5V, type RuleCase } from "../helpers/rules.ts";

const winder = (loadA: number) => -(5 - 2 * 0.7) + loadA / (980 * 1e-6) + loadA / (2 * 980 * 1);
const pump: PumpOnRail = {
  drive_v: 5,
  frequency_hz: 980,
  flying_cap_f: 1e-6,
  reservoir_cap_f: 1,
  drive_ohm: 0,
  diode: { vf_1ma_v: 0.7, vf_10ma_v: 0.7 },
  cold_c: 25,
  other_a: 0.5e-3,
  channels: 1,
  assumed_a: 0.5e-3,
};
// The role's other checks used the rail with its pick's 0.5 mA: 1 mA in all, −2.580 V.
const rails: Rails = { positive_v: 5, negative_v: winder(1e-3), pump };
const depth = -winder(1e-3);

const cases: RuleCase[] = [
  {
    label: "0.5 mA + its own 0.5 mA = 1 mA: −2.580 V, as the other checks used",
    run: { part: opAmp({ iq_ma: 0.5 }), stage: bufferStage(), rails },
    expected: { verdict: "pass", needed: depth, available: depth, margin: 0 },
  },
  {
    label: "0.5 mA + its own 1 mA = 1.5 mA: −2.07 V, 0.51 V shallower",
    run: { part: opAmp({ iq_ma: 1 }), stage: bufferStage(), rails },
    expected: {
      verdict: "marginal",
      needed: depth,
      available: -winder(1.5e-3),
      margin: -(winder(1.5e-3) - winder(1e-3)),
    },
  },
  {
    label: "0.5 mA + its own 3.5 mA = 4 mA, past the 3.53 mA collapse",
    run: { part: comparator({ iq_ma: 3.5 }), stage: signStage(), rails },
    expected: { verdict: "fail", needed: depth, available: 0, margin: -depth },
  },
  {
    label: "supply current empty (as a part object; the schema requires it)",
    run: { part: { ...comparator(), iq_ma: undefined } as unknown as Comparator, stage: signStage(), rails },
    expected: { verdict: "unrated", needed: null, available: null, margin: null },
  },
  {
    label: "a fixed V−: nothing to add",
    run: { part: opAmp({ iq_ma: 5 }), stage: bufferStage(), rails: SPLIT_5V },
    expected: { verdict: "pass", needed: 0, available: 0, margin: 0 },
  },
];

describe("pump-load", () => {
  it("the model is Winder's textbook case: −2.580 V at 1 mA", () => {
    expect(Number(winder(1e-3).toFixed(3))).toBe(-2.58);
  });

  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("pump-load", run), expected));

  it("says why, with the load as a sum", () => {
    expect(reasons("pump-load", cases)).toMatchInlineSnapshot(`
      {
        "0.5 mA + its own 0.5 mA = 1 mA: −2.580 V, as the other checks used": "pass: with this part the pumped rail carries 500 µA (the stated load and the other roles' parts) + 1 × 500 µA = 1.00 mA and sits at −2.58 V, no shallower than the −2.58 V the other checks used",
        "0.5 mA + its own 1 mA = 1.5 mA: −2.07 V, 0.51 V shallower": "marginal: with this part the pumped rail carries 500 µA (the stated load and the other roles' parts) + 1 × 1.00 mA = 1.50 mA and sits at −2.07 V, 510 mV shallower than the −2.58 V the other checks used, so they may be optimistic: at best marginal (name it in the BOM and the rail is worked out with its own draw)",
        "0.5 mA + its own 3.5 mA = 4 mA, past the 3.53 mA collapse": "fail: with this part the pumped rail carries 500 µA (the stated load and the other roles' parts) + 1 × 3.50 mA = 4.00 mA, past the 3.53 mA at which it collapses: no negative rail",
        "a fixed V−: nothing to add": "pass: V− is not pumped: the part's supply current does not move it",
        "supply current empty (as a part object; the schema requires it)": "unrated: not rated: needs 'iq_ma', which is empty for this part",
      }
    `);
  });
});
