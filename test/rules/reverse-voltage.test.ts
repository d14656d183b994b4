// reverse-voltage (SPEC §7): pump diode ≥ 2 · drive_v, rectifier diode ≥ 2 · W, clamp
// diode ≥ |V−|; margin vr_max_v − needed, marginal below headroom_margin_v (0.1 V).
import { describe, expect, it } from "vitest";
import { diode } from "../helpers/parts.ts";
import {
  check,
  clampDiodeStage,
  expectFinding,
  pumpDiodeStage,
  reasons,
  rectifierDiodeStage,
  type RuleCase,
} from "../helpers/rules.ts";

const cases: RuleCase[] = [
  {
    label: "100 V silicon in a 5 V pump (needs 10 V)",
    run: { part: diode({ vr_max_v: 100 }), stage: pumpDiodeStage({ drive: 5 }), role: "pump-diode" },
    expected: { verdict: "pass", needed: 10, available: 100, margin: 90 },
  },
  {
    label: "a 10.05 V diode in a 5 V pump",
    run: { part: diode({ vr_max_v: 10.05 }), stage: pumpDiodeStage({ drive: 5 }), role: "pump-diode" },
    expected: { verdict: "marginal", needed: 10, available: 10.05, margin: 0.05 },
  },
  {
    label: "a 5 V low-voltage Schottky in a 5 V pump",
    run: {
      part: diode({ type: "schottky", vr_max_v: 5, vf_1ma_v: 0.2, vf_10ma_v: 0.3 }),
      stage: pumpDiodeStage({ drive: 5 }),
      role: "pump-diode",
    },
    expected: { verdict: "fail", needed: 10, available: 5, margin: -5 },
  },
  {
    label: "rectifier diode across 2 × a 2.5 V window",
    run: { part: diode({ vr_max_v: 30 }), stage: rectifierDiodeStage({ w: 2.5 }), role: "rectifier-diode" },
    expected: { verdict: "pass", needed: 5, available: 30, margin: 25 },
  },
  {
    label: "clamp diode against V− = −5 V",
    run: { part: diode({ vr_max_v: 4 }), stage: clampDiodeStage({ negative: -5 }), role: "clamp-diode" },
    expected: { verdict: "fail", needed: 5, available: 4, margin: -1 },
  },
];

describe("reverse-voltage", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("reverse-voltage", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("reverse-voltage", cases)).toMatchInlineSnapshot(`
      {
        "100 V silicon in a 5 V pump (needs 10 V)": "pass: must block 10.00 V (2 × the 5 V drive); rated 100 V: 90.00 V to spare",
        "a 10.05 V diode in a 5 V pump": "marginal: must block 10.00 V (2 × the 5 V drive); rated 10.05 V: 0.05 V to spare",
        "a 5 V low-voltage Schottky in a 5 V pump": "fail: must block 10.00 V (2 × the 5 V drive); rated 5.00 V: 5.00 V short",
        "clamp diode against V− = −5 V": "fail: must block 5.00 V (|V−|, when the comparator output sits low); rated 4.00 V: 1.00 V short",
        "rectifier diode across 2 × a 2.5 V window": "pass: must block 5.00 V (2 × the window); rated 30.00 V: 25.00 V to spare",
      }
    `);
  });
});
