// offset (SPEC §7): buffer (Vos + Ib·R_th)/k, rectifier (2·Vos + Ib·R_load)/k, Vos grown by
// drift × the largest distance of the temperature range from 25 °C; limit offset_share · A.
// Reference: V_err = V_OS + I_B·R_S; 100 nA × 100 kΩ = 10.000 mV, 1 pA × 1 MΩ = 1.000 µV
// (op-amp error analysis, T. Fiore, Operational Amplifiers & Linear Integrated Circuits, ch. 5).
import { describe, expect, it } from "vitest";
import { stageOffset } from "../../rules/offset.ts";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";
import { bufferStage, check, expectFinding, reasons, rectifierStage, type RuleCase } from "../helpers/rules.ts";

const biasOnly = opAmp({ vos_max_mv: 0, ib_max_na: 100 });
const accuracy = (required_v: number) => design({ accuracy: { required_v } });
// 39k/13k divider behind a 1 kΩ source: R_th = 40k·13k/53k.
const rth = (40e3 * 13e3) / 53e3;

const cases: RuleCase[] = [
  {
    // SPEC §11.7: a FET input's bias current doubles per 10 °C (common practice [M], REFERENCES "JFET input"):
    // 1 nA at 25 °C is 8 nA at 55 °C; × 1 MΩ = 8 mV against 25 mV.
    label: "FET input, 1 nA at 25 °C, 8 nA at the 55 °C hot end × 1 MΩ",
    run: {
      part: opAmp({ vos_max_mv: 0, ib_max_na: 1, input_fet: "yes" }),
      stage: bufferStage({ rth: 1e6 }),
      design: design({ temperature: { min_c: 25, max_c: 55 }, accuracy: { required_v: 0.1 } }),
    },
    expected: { verdict: "pass", needed: 0.025, available: 0.008, margin: 0.017 },
  },
  {
    label: "the same bipolar input keeps its rated 1 nA",
    run: {
      part: opAmp({ vos_max_mv: 0, ib_max_na: 1, input_fet: "no" }),
      stage: bufferStage({ rth: 1e6 }),
      design: design({ temperature: { min_c: 25, max_c: 55 }, accuracy: { required_v: 0.1 } }),
    },
    expected: { verdict: "pass", needed: 0.025, available: 0.001, margin: 0.024 },
  },
  {
    label: "100 nA × 100 kΩ = 10 mV against a 25 mV limit",
    run: { part: biasOnly, stage: bufferStage({ rth: 100e3 }), design: accuracy(0.1) },
    expected: { verdict: "pass", needed: 0.025, available: 0.01, margin: 0.015 },
  },
  {
    label: "10 mV against a 12 mV limit: 2 mV is under a fifth of it",
    run: { part: biasOnly, stage: bufferStage({ rth: 100e3 }), design: accuracy(0.048) },
    expected: { verdict: "marginal", needed: 0.012, available: 0.01, margin: 0.002 },
  },
  {
    label: "10 mV against a 5 mV limit",
    run: { part: biasOnly, stage: bufferStage({ rth: 100e3 }), design: accuracy(0.02) },
    expected: { verdict: "fail", needed: 0.005, available: 0.01, margin: -0.005 },
  },
  {
    label: "1 pA × 1 MΩ = 1 µV (CMOS bias current)",
    run: { part: opAmp({ vos_max_mv: 0, ib_max_na: 0.001 }), stage: bufferStage({ rth: 1e6 }), design: accuracy(0.1) },
    expected: { verdict: "pass", needed: 0.025, available: 1e-6, margin: 0.025 - 1e-6 },
  },
  {
    label: "7 mV offset + 7 µV/°C over 0…50 °C and 250 nA through 9.81 kΩ, ÷ k = 0.25, against 45 mV",
    run: {
      part: opAmp({ vos_max_mv: 7, vos_drift_uv_per_c: 7, ib_max_na: 250 }),
      stage: bufferStage({ k: 0.25, rth }),
      design: design({ temperature: { min_c: 0, max_c: 50 }, accuracy: { required_v: 0.18 } }),
    },
    expected: {
      verdict: "marginal",
      needed: 0.045,
      available: (7.175e-3 + 250e-9 * rth) / 0.25,
      margin: 0.045 - (7.175e-3 + 250e-9 * rth) / 0.25,
    },
  },
  {
    label: "rectifier: 2 × 1 mV + 100 nA × 10 kΩ = 3 mV",
    run: {
      part: opAmp({ vos_max_mv: 1, ib_max_na: 100 }),
      stage: rectifierStage({ load: 10e3 }),
      design: accuracy(0.1),
    },
    expected: { verdict: "pass", needed: 0.025, available: 0.003, margin: 0.022 },
  },
];

describe("offset", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("offset", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("offset", cases)).toMatchInlineSnapshot(`
      {
        "1 pA × 1 MΩ = 1 µV (CMOS bias current)": "pass: adds 1.00 µV at the input (0.00 V offset + 1.00 pA × 1.00 MΩ); the limit is 25.0 mV: 25.0 mV to spare",
        "10 mV against a 12 mV limit: 2 mV is under a fifth of it": "marginal: adds 10.0 mV at the input (0.00 V offset + 100 nA × 100 kΩ); the limit is 12.0 mV: 2.00 mV to spare",
        "10 mV against a 5 mV limit": "fail: adds 10.0 mV at the input (0.00 V offset + 100 nA × 100 kΩ); the limit is 5.00 mV: 5.00 mV short",
        "100 nA × 100 kΩ = 10 mV against a 25 mV limit": "pass: adds 10.0 mV at the input (0.00 V offset + 100 nA × 100 kΩ); the limit is 25.0 mV: 15.0 mV to spare",
        "7 mV offset + 7 µV/°C over 0…50 °C and 250 nA through 9.81 kΩ, ÷ k = 0.25, against 45 mV": "marginal: adds 38.5 mV at the input (7.17 mV offset incl. 175 µV drift + 250 nA × 9.81 kΩ, ÷ 0.25 to the input); the limit is 45.0 mV: 6.49 mV to spare",
        "FET input, 1 nA at 25 °C, 8 nA at the 55 °C hot end × 1 MΩ": "pass: adds 8.00 mV at the input (0.00 V offset + 8.00 nA at 55 °C (the hot end), a FET input doubling per 10 °C from 1.00 nA × 1.00 MΩ); the limit is 25.0 mV: 17.0 mV to spare",
        "rectifier: 2 × 1 mV + 100 nA × 10 kΩ = 3 mV": "pass: adds 3.00 mV at the input (2·1.00 mV offset + 100 nA × 10.0 kΩ); the limit is 25.0 mV: 22.0 mV to spare",
        "the same bipolar input keeps its rated 1 nA": "pass: adds 1.00 mV at the input (0.00 V offset + 1.00 nA × 1.00 MΩ); the limit is 25.0 mV: 24.0 mV to spare",
      }
    `);
  });
});

describe("stageOffset (V_err = V_OS + I_B·R_S)", () => {
  it.each([
    // REFERENCES.md, Bias-current offset
    [{ vos_max_mv: 0, ib_max_na: 100 }, 1, 100e3, 10e-3],
    [{ vos_max_mv: 0, ib_max_na: 0.001 }, 1, 1e6, 1e-6],
    [{ vos_max_mv: 2, ib_max_na: 100 }, 1, 100e3, 12e-3],
    [{ vos_max_mv: 2, ib_max_na: 100 }, 2, 10e3, 5e-3],
  ])("%j, Vos × %d, R = %d Ω → %d V", (cells, multiplier, ohm, volts) => {
    expect(stageOffset(opAmp(cells), multiplier, ohm, 25, 25).output_v).toBeCloseTo(volts, 15);
  });

  it("grows Vos by the drift over the far end of the temperature range", () => {
    const p = opAmp({ vos_max_mv: 1, vos_drift_uv_per_c: 10, ib_max_na: 0 });
    expect(stageOffset(p, 1, 0, -40, 85)).toMatchObject({
      vos25: 1e-3,
      drift: expect.closeTo(650e-6, 15),
      vos: expect.closeTo(1.65e-3, 15),
    });
    expect(stageOffset(p, 1, 0, 0, 50).drift).toBeCloseTo(250e-6, 15);
    expect(stageOffset(opAmp({ vos_drift_uv_per_c: "" }), 1, 0, -40, 85).drift).toBe(0);
  });
});
