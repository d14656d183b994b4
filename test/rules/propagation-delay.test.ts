// propagation-delay (SPEC §11.4): the sign stage's own delay after a true
// crossing. A comparator switches tpd after its input passes the threshold by
// the overdrive its delay is rated at; a ramp of slope S_in = 2π·f·W reaches it
// after V_od/S_in, and hysteresis adds (Vh/2)/S_in (arithmetic). An op amp used
// as a comparator follows the integrator-then-slew law of the textbook
// single-pole model (T. Fiore, Operational Amplifiers & Linear Integrated
// Circuits, ch. 5) through its swing, and is at best marginal. The limit is the
// time in which 2·2π·f·peak·t reaches timing_share (25 %) × required_v.
import { describe, expect, it } from "vitest";
import type { Comparator } from "../../src/core/schemas/comparator.ts";
import { design } from "../helpers/designs.ts";
import { comparator, opAmp } from "../helpers/parts.ts";
import { check, expectFinding, reasons, signStage, SPLIT_5V, type RuleCase } from "../helpers/rules.ts";

// 200 Hz, W = peak = 2.5 V: S_in = 3141.6 V/s.
const S = 2 * Math.PI * 200 * 2.5;
const at = (required: number) => design({ signal: { max_frequency_hz: 200 }, accuracy: { required_v: required } });
const limit = (required: number) => (0.25 * required) / (2 * S); // 3.979 µs at 100 mV
const t = (tpd: number, od: number, vh = 0) => tpd + od / S + vh / 2 / S;
// Ground-sensing bipolar op amp on ±5 V: swing −4.98 … +3.50 V = 8.48 V, GBW 1 MHz, 0.5 V/µs.
const a = 2 * Math.PI * 1e6 * S;
const t1 = 0.5e6 / a;
const tOpAmp = t1 + (8.48 - (0.5e6 * t1) / 2) / 0.5e6; // past the slew onset (6.33 V)

const cmp = (tpd: string, od: string, vh = "") => comparator({ tpd_ns: tpd, tpd_overdrive_mv: od, hysteresis_mv: vh });
const cases: RuleCase[] = [
  {
    label: "450 ns at 5 mV: 2.04 µs against 3.98 µs",
    run: { part: cmp("450", "5"), stage: signStage(), design: at(0.1) },
    expected: { verdict: "pass", needed: limit(0.1), available: t(450e-9, 5e-3), margin: limit(0.1) - t(450e-9, 5e-3) },
  },
  {
    label: "1.8 µs at 5 mV: 3.39 µs against 3.98 µs",
    run: { part: cmp("1.8k", "5"), stage: signStage(), design: at(0.1) },
    expected: {
      verdict: "marginal",
      needed: limit(0.1),
      available: t(1.8e-6, 5e-3),
      margin: limit(0.1) - t(1.8e-6, 5e-3),
    },
  },
  {
    label: "1.3 µs at 10 mV with 10 mV hysteresis: 6.07 µs against 3.98 µs",
    run: { part: cmp("1300", "10", "10"), stage: signStage(), design: at(0.1) },
    expected: {
      verdict: "fail",
      needed: limit(0.1),
      available: t(1.3e-6, 10e-3, 10e-3),
      margin: limit(0.1) - t(1.3e-6, 10e-3, 10e-3),
    },
  },
  {
    label: "overdrive not stated: 100 mV assumed, would pass, so marginal",
    run: { part: comparator({ tpd_ns: "100", tpd_overdrive_mv: "" }), stage: signStage(), design: at(2) },
    expected: { verdict: "marginal", needed: limit(2), available: t(100e-9, 0.1), margin: limit(2) - t(100e-9, 0.1) },
  },
  {
    label: "op amp as comparator: 29.6 µs against 79.6 µs would pass, so marginal",
    run: { part: opAmp(), stage: signStage(), rails: SPLIT_5V, design: at(2) },
    expected: { verdict: "marginal", needed: limit(2), available: tOpAmp, margin: limit(2) - tOpAmp },
  },
  {
    label: "op amp as comparator: 29.6 µs against 3.98 µs",
    run: { part: opAmp(), stage: signStage(), rails: SPLIT_5V, design: at(0.1) },
    expected: { verdict: "fail", needed: limit(0.1), available: tOpAmp, margin: limit(0.1) - tOpAmp },
  },
  {
    label: "delay empty",
    run: {
      part: { ...cmp("450", "5"), tpd_ns: undefined } as unknown as Comparator,
      stage: signStage(),
      design: at(0.1),
    },
    expected: { verdict: "unrated", needed: null, available: null, margin: null },
  },
];

describe("propagation-delay", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("propagation-delay", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("propagation-delay", cases)).toMatchInlineSnapshot(`
      {
        "1.3 µs at 10 mV with 10 mV hysteresis: 6.07 µs against 3.98 µs": "fail: switches 1.30 µs after its input passes the threshold by 10.0 mV, which the 3.14 kV/s ramp takes 3.18 µs to reach + 1.59 µs to pass half its 10.0 mV hysteresis: 6.07 µs in all; the sign may be late by 3.98 µs (timing share 25 % of the required accuracy at 2·2π·f·peak·t): 2.10 µs short",
        "1.8 µs at 5 mV: 3.39 µs against 3.98 µs": "marginal: switches 1.80 µs after its input passes the threshold by 5.00 mV, which the 3.14 kV/s ramp takes 1.59 µs to reach: 3.39 µs in all; the sign may be late by 3.98 µs (timing share 25 % of the required accuracy at 2·2π·f·peak·t): 587 ns to spare",
        "450 ns at 5 mV: 2.04 µs against 3.98 µs": "pass: switches 450 ns after its input passes the threshold by 5.00 mV, which the 3.14 kV/s ramp takes 1.59 µs to reach: 2.04 µs in all; the sign may be late by 3.98 µs (timing share 25 % of the required accuracy at 2·2π·f·peak·t): 1.94 µs to spare",
        "delay empty": "unrated: not rated: needs 'tpd_ns', which is empty for this part",
        "op amp as comparator: 29.6 µs against 3.98 µs": "fail: an op amp used as a comparator leaves its old level as an integrator driven by the input's 3.14 kV/s ramp, then slews: 29.6 µs to cross 8.48 V at 1.00 MHz GBW and 0.500 V/µs; the sign may be late by 3.98 µs (timing share 25 % of the required accuracy at 2·2π·f·peak·t): 25.6 µs short; an estimate, so at best marginal",
        "op amp as comparator: 29.6 µs against 79.6 µs would pass, so marginal": "marginal: an op amp used as a comparator leaves its old level as an integrator driven by the input's 3.14 kV/s ramp, then slews: 29.6 µs to cross 8.48 V at 1.00 MHz GBW and 0.500 V/µs; the sign may be late by 79.6 µs (timing share 25 % of the required accuracy at 2·2π·f·peak·t): 50.0 µs to spare; an estimate, so at best marginal",
        "overdrive not stated: 100 mV assumed, would pass, so marginal": "marginal: switches 100 ns after its input passes the threshold by 100 mV (assumed, common practice: tpd_overdrive_mv is empty, so at best marginal), which the 3.14 kV/s ramp takes 31.8 µs to reach: 31.9 µs in all; the sign may be late by 79.6 µs (timing share 25 % of the required accuracy at 2·2π·f·peak·t): 47.6 µs to spare",
      }
    `);
  });
});
