// rise-time (issue 21): a first-order RC edge rises 10–90 % in ln 9·RC ≈ 2.2·RC (textbook,
// e.g. Sedra & Smith, Microelectronic Circuits, single-time-constant networks [M for the
// section]); the pin's 10 pF and the NPN's 300 ns storage time are common practice [M].
import { describe, expect, it } from "vitest";
import { design } from "../helpers/designs.ts";
import { comparator } from "../helpers/parts.ts";
import { check, expectFinding, reasons, signStage, GROUND_5V, type RuleCase } from "../helpers/rules.ts";

const LN9 = Math.log(9);
// The late-sign limit (SPEC §11.4): the time in which 2·2π·f·peak·t reaches timing_share (25 %) ×
// required_v. With required_v = 0.4π V at 200 Hz and 2.5 V peak it is 50 µs (arithmetic).
const REQUIRED = 0.4 * Math.PI;
const LIMIT = (0.25 * REQUIRED) / (2 * 2 * Math.PI * 200 * 2.5);
const openDrain = comparator({ output: "open-drain", out_neg_headroom_v: undefined, out_pos_headroom_v: undefined });
const pullUp = (ohm: number | undefined, cap?: number) =>
  design({
    signal: { max_frequency_hz: 200 },
    accuracy: { required_v: REQUIRED },
    logic: { level_shift: "pull-up", pull_up_ohm: ohm, ...(cap === undefined ? {} : { pin_cap_f: cap }) },
  });
const npn = (logic: Record<string, number | boolean | undefined>) =>
  design({
    signal: { max_frequency_hz: 200 },
    accuracy: { required_v: REQUIRED },
    logic: { level_shift: "npn-inverter", ...logic },
  });

const cases: RuleCase[] = [
  {
    label: "acceptance: 100 kΩ pull-up into the default 10 pF adds 2.2 µs",
    run: { part: openDrain, stage: signStage(), role: "sign", rails: GROUND_5V, design: pullUp(100e3) },
    expected: { verdict: "pass", needed: LIMIT, available: LN9 * 1e-6, margin: LIMIT - LN9 * 1e-6 },
  },
  {
    label: "1 MΩ into 20 pF: 43.9 µs",
    run: { part: openDrain, stage: signStage(), role: "sign", rails: GROUND_5V, design: pullUp(1e6, 20e-12) },
    expected: { verdict: "marginal", needed: LIMIT, available: LN9 * 20e-6, margin: LIMIT - LN9 * 20e-6 },
  },
  {
    label: "1 MΩ into 30 pF: 65.9 µs",
    run: { part: openDrain, stage: signStage(), role: "sign", rails: GROUND_5V, design: pullUp(1e6, 30e-12) },
    expected: { verdict: "fail", needed: LIMIT, available: LN9 * 30e-6, margin: LIMIT - LN9 * 30e-6 },
  },
  {
    label: "open-drain with no pull-up value",
    run: { part: openDrain, stage: signStage(), role: "sign", rails: GROUND_5V, design: pullUp(undefined) },
    expected: { verdict: "unrated", needed: LIMIT, available: 0, margin: LIMIT },
  },
  {
    label: "NPN: 300 ns storage (assumed) + 10 kΩ × 10 pF",
    run: { part: comparator(), stage: signStage(), role: "sign", design: npn({ pull_up_ohm: 10e3 }) },
    expected: {
      verdict: "pass",
      needed: LIMIT,
      available: 300e-9 + LN9 * 100e-9,
      margin: LIMIT - 300e-9 - LN9 * 100e-9,
    },
  },
];

describe("rise-time", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("rise-time", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("rise-time", cases)).toMatchInlineSnapshot(`
      {
        "1 MΩ into 20 pF: 43.9 µs": "marginal: the 1.00 MΩ pull-up charges the 20.0 pF pin from 0.00 V: 2.2·R·C = 43.9 µs, 24.1 µs to V_IH 3.50 V, so 43.9 µs added to the sign's delay; the sign may be late by 50.0 µs: 6.06 µs to spare",
        "1 MΩ into 30 pF: 65.9 µs": "fail: the 1.00 MΩ pull-up charges the 30.0 pF pin from 0.00 V: 2.2·R·C = 65.9 µs, 36.1 µs to V_IH 3.50 V, so 65.9 µs added to the sign's delay; the sign may be late by 50.0 µs: 15.9 µs short",
        "NPN: 300 ns storage (assumed) + 10 kΩ × 10 pF": "pass: the NPN stays on for its 300 ns storage time (assumed, common practice), then the 10.0 kΩ pull-up charges the 10.0 pF (assumed, common practice) pin: 2.2·R·C = 220 ns; 520 ns added to the sign's delay; the sign may be late by 50.0 µs: 49.5 µs to spare",
        "acceptance: 100 kΩ pull-up into the default 10 pF adds 2.2 µs": "pass: the 100 kΩ pull-up charges the 10.0 pF (assumed, common practice) pin from 0.00 V: 2.2·R·C = 2.20 µs, 1.20 µs to V_IH 3.50 V, so 2.20 µs added to the sign's delay; the sign may be late by 50.0 µs: 47.8 µs to spare",
        "open-drain with no pull-up value": "unrated: not rated: the design gives no logic.pull_up_ohm, which sets how fast the open-drain output's pin rises",
      }
    `);
  });
});
