// zero-crossing (SPEC §7, rectifier): jump time 2·Vf / slew against timing_fraction / f.
import { describe, expect, it } from "vitest";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";
import { check, expectFinding, reasons, rectifierStage, type RuleCase } from "../helpers/rules.ts";

const at = (f: number) => design({ signal: { max_frequency_hz: f } });
const slow = opAmp({ slew_v_per_us: 0.5 });
const rect = rectifierStage({ vf: 0.6 }); // jumps 1.2 V: 2.4 µs at 0.5 V/µs

const cases: RuleCase[] = [
  {
    label: "1.2 V at 0.5 V/µs (2.4 µs) against 1 % of 5 ms",
    run: { part: slow, stage: rect, design: at(200) },
    expected: { verdict: "pass", needed: 50e-6, available: 2.4e-6, margin: 47.6e-6 },
  },
  {
    label: "2.4 µs against 1 % of 250 µs = 2.5 µs",
    run: { part: slow, stage: rect, design: at(4000) },
    expected: { verdict: "marginal", needed: 2.5e-6, available: 2.4e-6, margin: 0.1e-6 },
  },
  {
    label: "2.4 µs against 1 % of 200 µs = 2 µs",
    run: { part: slow, stage: rect, design: at(5000) },
    expected: { verdict: "fail", needed: 2e-6, available: 2.4e-6, margin: -0.4e-6 },
  },
  {
    label: "Schottky drops (2 × 0.3 V) at 10 V/µs and 20 kHz",
    run: { part: opAmp({ slew_v_per_us: 10 }), stage: rectifierStage({ vf: 0.3 }), design: at(20e3) },
    expected: { verdict: "pass", needed: 0.5e-6, available: 0.06e-6, margin: 0.44e-6 },
  },
];

describe("zero-crossing", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("zero-crossing", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("zero-crossing", cases)).toMatchInlineSnapshot(`
      {
        "1.2 V at 0.5 V/µs (2.4 µs) against 1 % of 5 ms": "pass: jumps 1.20 V (two diode drops) at 0.500 V/µs in 2.40 µs; the limit is 50.0 µs (1 % of the 5.00 ms period): 47.6 µs to spare",
        "2.4 µs against 1 % of 200 µs = 2 µs": "fail: jumps 1.20 V (two diode drops) at 0.500 V/µs in 2.40 µs; the limit is 2.00 µs (1 % of the 200 µs period): 400 ns short",
        "2.4 µs against 1 % of 250 µs = 2.5 µs": "marginal: jumps 1.20 V (two diode drops) at 0.500 V/µs in 2.40 µs; the limit is 2.50 µs (1 % of the 250 µs period): 100 ns to spare",
        "Schottky drops (2 × 0.3 V) at 10 V/µs and 20 kHz": "pass: jumps 600 mV (two diode drops) at 10.0 V/µs in 60.0 ns; the limit is 500 ns (1 % of the 50.0 µs period): 440 ns to spare",
      }
    `);
  });
});
