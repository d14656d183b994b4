// leakage (rule's own formula, documented on rules/leakage.ts): leakage at the hottest
// temperature — silicon and low-leakage ×2 per 10 °C, Schottky ×10 per 25 °C (common
// practice [M], REFERENCES.md) — through the resistance around the diode:
// rectifier ir(T)·R_load/k ≤ offset_share · A; clamp ir(T)·pull_down ≤ V_IL.
import { describe, expect, it } from "vitest";
import { leakageAt } from "../../rules/leakage.ts";
import { design } from "../helpers/designs.ts";
import { diode } from "../helpers/parts.ts";
import {
  check,
  clampDiodeStage,
  expectFinding,
  reasons,
  rectifierDiodeStage,
  type RuleCase,
} from "../helpers/rules.ts";

const hot = (max_c: number) => design({ temperature: { min_c: 0, max_c } });
// 10 kΩ rectifier load behind k = 0.25, limit 0.25 × 0.1 V = 25 mV.
const rect = rectifierDiodeStage({ load: 10e3, k: 0.25, limit: 0.025 });
const siliconAt50 = (irNa: number) => (irNa * 1e-9 * 2 ** 2.5 * 10e3) / 0.25;

const cases: RuleCase[] = [
  {
    label: "silicon 25 nA → 141 nA at 50 °C, × 10 kΩ ÷ 0.25 = 5.66 mV",
    run: { part: diode({ ir_na: 25 }), stage: rect, design: hot(50), role: "rectifier-diode" },
    expected: { verdict: "pass", needed: 0.025, available: siliconAt50(25), margin: 0.025 - siliconAt50(25) },
  },
  {
    label: "silicon 97.2 nA at 25 °C: 22.0 mV of a 25 mV limit",
    run: { part: diode({ ir_na: 97.2 }), stage: rect, design: hot(50), role: "rectifier-diode" },
    expected: { verdict: "marginal", needed: 0.025, available: siliconAt50(97.2), margin: 0.025 - siliconAt50(97.2) },
  },
  {
    label: "small Schottky 2 µA → 20 µA at 50 °C: 0.8 V",
    run: {
      part: diode({ type: "schottky", ir_na: "2k", vf_1ma_v: 0.3, vf_10ma_v: 0.4 }),
      stage: rect,
      design: hot(50),
      role: "rectifier-diode",
    },
    expected: { verdict: "fail", needed: 0.025, available: 0.8, margin: -0.775 },
  },
  {
    label: "Schottky clamp 500 nA into 10 kΩ at 25 °C against V_IL 1.5 V",
    run: {
      part: diode({ type: "schottky", ir_na: 500 }),
      stage: clampDiodeStage({ pull: 10e3, vil: 1.5 }),
      design: hot(25),
      role: "clamp-diode",
    },
    expected: { verdict: "pass", needed: 1.5, available: 5e-3, margin: 1.495 },
  },
];

describe("leakage", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("leakage", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("leakage", cases)).toMatchInlineSnapshot(`
      {
        "Schottky clamp 500 nA into 10 kΩ at 25 °C against V_IL 1.5 V": "pass: leaks 500 nA at 25 °C (500 nA at 25 °C), × 10.0 kΩ = 5.00 mV; the limit is 1.50 V (V_IL of the logic input): 1.50 V to spare",
        "silicon 25 nA → 141 nA at 50 °C, × 10 kΩ ÷ 0.25 = 5.66 mV": "pass: leaks 141 nA at 50 °C (25.0 nA at 25 °C), × 10.0 kΩ ÷ 0.25 = 5.66 mV; the limit is 25.0 mV (offset share of the required accuracy, input-referred): 19.3 mV to spare",
        "silicon 97.2 nA at 25 °C: 22.0 mV of a 25 mV limit": "marginal: leaks 550 nA at 50 °C (97.2 nA at 25 °C), × 10.0 kΩ ÷ 0.25 = 22.0 mV; the limit is 25.0 mV (offset share of the required accuracy, input-referred): 3.01 mV to spare",
        "small Schottky 2 µA → 20 µA at 50 °C: 0.8 V": "fail: leaks 20.0 µA at 50 °C (2.00 µA at 25 °C), × 10.0 kΩ ÷ 0.25 = 800 mV; the limit is 25.0 mV (offset share of the required accuracy, input-referred): 775 mV short",
      }
    `);
  });
});

describe("leakageAt", () => {
  it.each([
    ["silicon", 25, 25, 25e-9],
    ["silicon", 25, 35, 50e-9],
    ["silicon", 25, 85, 25e-9 * 64],
    ["low-leakage", 0.01, 45, 0.04e-9],
    ["schottky", 1000, 50, 10e-6],
    ["schottky", 1000, 75, 100e-6],
    ["silicon", 25, -40, 25e-9], // never scaled below its 25 °C rating
  ] as const)("%s rated %d nA at 25 °C leaks %d A at %d °C", (type, irNa, t, amps) => {
    const d = diode({ type, ir_na: irNa, ...(type === "schottky" ? { vf_1ma_v: 0.3, vf_10ma_v: 0.4 } : {}) });
    expect(Math.abs(leakageAt(d, t) - amps)).toBeLessThanOrEqual(amps * 1e-12);
  });
});
