// reverse-voltage (SPEC §7): pump diode ≥ 2 · drive_v, rectifier diode ≥ 2 · W, clamp
// diode ≥ |V−|; margin vr_max_v − needed, marginal below headroom_margin_v (0.1 V).
import { describe, expect, it } from "vitest";
import type { Diode } from "../../src/core/schemas/diode.ts";
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

// SPEC §11.12: in the two-diode inverting pump each diode blocks drive − Vf (node voltages of the
// inverter: the flying node swings from +Vf to −(drive − Vf)); the off diode of the inverting half-wave
// rectifier sees W + Vf. Vf from the rated points at the conduction current, −2 mV/°C from 25 °C
// (Sedra & Smith). Silicon 0.65 V at 1 mA, 0.75 V at 10 mA: 0.68 V at 2 mA at 25 °C
// (0.65 + 0.1·log10 2 = 0.68010), 0.61010 V at 60 °C; at 250 µA 0.58979 V, 0.62979 V at 5 °C.
const si = (vr: number | string) => diode({ vr_max_v: vr, vf_1ma_v: 0.65, vf_10ma_v: 0.75 });
const vfPump = 0.65 + 0.1 * Math.log10(2) - 2e-3 * (60 - 25);
const vfRect = 0.65 + 0.1 * Math.log10(0.25) - 2e-3 * (5 - 25);
const pumpPhysics = {
  ...pumpDiodeStage({ drive: 5 }),
  reverse_v: 5,
  reverse_what: "the 5.00 V drive",
  reverse_vf: { sign: -1 as const, current_a: 2e-3, temp_c: 60, at: "at 60 °C (the hot end)" },
};
const rectPhysics = {
  ...rectifierDiodeStage({ w: 2.5 }),
  reverse_v: 2.5,
  reverse_what: "the 2.50 V window",
  reverse_vf: { sign: 1 as const, current_a: 250e-6, temp_c: 5, at: "at 5 °C (the cold end)" },
};
const physics: RuleCase[] = [
  {
    label: "pump: 5 V drive − 0.610 V at the hot end = 4.39 V against 30 V",
    run: { part: si(30), stage: pumpPhysics, role: "pump-diode" },
    expected: { verdict: "pass", needed: 5 - vfPump, available: 30, margin: 25 + vfPump },
  },
  {
    label: "pump: 4.39 V against 4.45 V",
    run: { part: si(4.45), stage: pumpPhysics, role: "pump-diode" },
    expected: { verdict: "marginal", needed: 5 - vfPump, available: 4.45, margin: 4.45 - 5 + vfPump },
  },
  {
    label: "rectifier: 2.5 V window + 0.630 V at the cold end = 3.13 V against 3 V",
    run: { part: si(3), stage: rectPhysics, role: "rectifier-diode" },
    expected: { verdict: "fail", needed: 2.5 + vfRect, available: 3, margin: 0.5 - vfRect },
  },
  {
    label: "rectifier: rating empty (as a part object; the schema requires it)",
    run: { part: { ...si(3), vr_max_v: undefined } as unknown as Diode, stage: rectPhysics, role: "rectifier-diode" },
    expected: { verdict: "unrated", needed: null, available: null, margin: null },
  },
];

describe("reverse-voltage with the part's own drop (SPEC §11.12)", () => {
  it.each(physics)("$label", ({ run, expected }) => expectFinding(check("reverse-voltage", run), expected));

  it("says why, naming the temperature end", () => {
    expect(reasons("reverse-voltage", physics)).toMatchInlineSnapshot(`
      {
        "pump: 4.39 V against 4.45 V": "marginal: must block 4.39 V (the 5.00 V drive − its own 0.61 V drop at 60 °C (the hot end)); rated 4.45 V: 0.06 V to spare",
        "pump: 5 V drive − 0.610 V at the hot end = 4.39 V against 30 V": "pass: must block 4.39 V (the 5.00 V drive − its own 0.61 V drop at 60 °C (the hot end)); rated 30.00 V: 25.61 V to spare",
        "rectifier: 2.5 V window + 0.630 V at the cold end = 3.13 V against 3 V": "fail: must block 3.13 V (the 2.50 V window + its own 0.63 V drop at 5 °C (the cold end)); rated 3.00 V: 0.13 V short",
        "rectifier: rating empty (as a part object; the schema requires it)": "unrated: not rated: needs 'vr_max_v', which is empty for this part",
      }
    `);
  });
});

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
