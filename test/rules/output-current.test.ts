// output-current (issue 21): Ohm's law with the clamp diode's Vf(I) (SPEC §4). A flat 0.65 V
// diode makes the arithmetic exact: I = (V_OH − 0.65 V)/R_pd (REFERENCES, logic thresholds:
// 3.3 V, 0.65 V, 10 kΩ → 2.65 V). The 100 µA any output drives is common practice [M].
import { describe, expect, it } from "vitest";
import { design } from "../helpers/designs.ts";
import { comparator } from "../helpers/parts.ts";
import { check, expectFinding, reasons, signStage, SPLIT_5V, type RuleCase } from "../helpers/rules.ts";

const flat = { id: "d-flat", vf_1ma_v: 0.65, vf_10ma_v: 0.65, ir_na: 1 };
const clampStage = signStage({ clamp: flat });
const I10K = (5 - 0.65) / 10e3; // 435 µA from a 5 V high through the diode into 10 kΩ
const I100K = (5 - 0.65) / 100e3; // 43.5 µA
const pushPull = (iout: number | undefined) => comparator({ out_pos_headroom_v: 0, iout_max_ma: iout });

const cases: RuleCase[] = [
  {
    label: "diode clamp into 10 kΩ, rated 10 mA",
    run: { part: pushPull(10), stage: clampStage, role: "sign", rails: SPLIT_5V },
    expected: { verdict: "pass", needed: I10K, available: 10e-3, margin: 10e-3 - I10K },
  },
  {
    label: "diode clamp into 10 kΩ, rated 0.5 mA",
    run: { part: pushPull(0.5), stage: clampStage, role: "sign", rails: SPLIT_5V },
    expected: { verdict: "marginal", needed: I10K, available: 0.5e-3, margin: 0.5e-3 - I10K },
  },
  {
    label: "diode clamp into 10 kΩ, rated 0.4 mA",
    run: { part: pushPull(0.4), stage: clampStage, role: "sign", rails: SPLIT_5V },
    expected: { verdict: "fail", needed: I10K, available: 0.4e-3, margin: 0.4e-3 - I10K },
  },
  {
    label: "diode clamp into 10 kΩ, not rated",
    run: { part: pushPull(undefined), stage: clampStage, role: "sign", rails: SPLIT_5V },
    expected: { verdict: "unrated", needed: I10K, available: 100e-6, margin: 100e-6 - I10K },
  },
  {
    label: "diode clamp into 100 kΩ, not rated: 43.5 µA needs no rating",
    run: {
      part: pushPull(undefined),
      stage: clampStage,
      role: "sign",
      rails: SPLIT_5V,
      design: design({ logic: { pull_down_ohm: 100e3 } }),
    },
    expected: { verdict: "pass", needed: I100K, available: 100e-6, margin: 100e-6 - I100K },
  },
  {
    label: "NPN base through 10 kΩ from a 5 V high: (5 − 0.7)/10 kΩ",
    run: {
      part: pushPull(10),
      stage: signStage(),
      role: "sign",
      rails: SPLIT_5V,
      design: design({ logic: { level_shift: "npn-inverter", npn_base_ohm: 10e3 } }),
    },
    expected: { verdict: "pass", needed: 430e-6, available: 10e-3, margin: 10e-3 - 430e-6 },
  },
];

describe("output-current", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("output-current", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("output-current", cases)).toMatchInlineSnapshot(`
      {
        "NPN base through 10 kΩ from a 5 V high: (5 − 0.7)/10 kΩ": "pass: with the output high at 5.00 V it sources 430 µA into the NPN's base through 10.0 kΩ; rated 10.0 mA: 9.57 mA to spare",
        "diode clamp into 10 kΩ, not rated": "unrated: with the output high at 5.00 V it sources 435 µA through the clamp diode into the 10.0 kΩ pull-down; and 'iout_max_ma' is empty for this part: not rated",
        "diode clamp into 10 kΩ, rated 0.4 mA": "fail: with the output high at 5.00 V it sources 435 µA through the clamp diode into the 10.0 kΩ pull-down; rated 400 µA: 35.0 µA short",
        "diode clamp into 10 kΩ, rated 0.5 mA": "marginal: with the output high at 5.00 V it sources 435 µA through the clamp diode into the 10.0 kΩ pull-down; rated 500 µA: 65.0 µA to spare",
        "diode clamp into 10 kΩ, rated 10 mA": "pass: with the output high at 5.00 V it sources 435 µA through the clamp diode into the 10.0 kΩ pull-down; rated 10.0 mA: 9.56 mA to spare",
        "diode clamp into 100 kΩ, not rated: 43.5 µA needs no rating": "pass: with the output high at 5.00 V it sources 43.5 µA through the clamp diode into the 100 kΩ pull-down; at most 100 µA, which any output drives (common practice): no rating needed",
      }
    `);
  });
});
