// propagation-delay (SPEC §7): tpd against timing_fraction / f. An op amp used as the
// comparator is estimated as (V_OH − V_OL) / slew and is at best marginal, since its
// overload recovery is not rated (issue 3: "at best marginal, with a reason that says why").
import { describe, expect, it } from "vitest";
import { design } from "../helpers/designs.ts";
import { comparator, opAmp } from "../helpers/parts.ts";
import { check, expectFinding, reasons, signStage, SPLIT_5V, type RuleCase } from "../helpers/rules.ts";

const at = (f: number) => design({ signal: { max_frequency_hz: f } });
// Ground-sensing bipolar on ±5 V swings from −4.98 V to +3.50 V: 8.48 V at 0.5 V/µs.
const opAmpDelay = 8.48 / 0.5e6;

const cases: RuleCase[] = [
  {
    label: "open-drain general purpose (1.3 µs) at 200 Hz: limit 50 µs",
    run: { part: comparator({ tpd_ns: 1300 }), stage: signStage(), design: at(200) },
    expected: { verdict: "pass", needed: 50e-6, available: 1.3e-6, margin: 48.7e-6 },
  },
  {
    label: "micropower (45 µs) at 200 Hz",
    run: { part: comparator({ tpd_ns: "45k" }), stage: signStage(), design: at(200) },
    expected: { verdict: "marginal", needed: 50e-6, available: 45e-6, margin: 5e-6 },
  },
  {
    label: "micropower (60 µs) at 200 Hz",
    run: { part: comparator({ tpd_ns: "60k" }), stage: signStage(), design: at(200) },
    expected: { verdict: "fail", needed: 50e-6, available: 60e-6, margin: -10e-6 },
  },
  {
    label: "op amp as comparator at 200 Hz: 17 µs would pass, so marginal",
    run: { part: opAmp(), stage: signStage(), rails: SPLIT_5V, design: at(200) },
    expected: { verdict: "marginal", needed: 50e-6, available: opAmpDelay, margin: 50e-6 - opAmpDelay },
  },
  {
    label: "op amp as comparator at 1 kHz: 17 µs against 10 µs",
    run: { part: opAmp(), stage: signStage(), rails: SPLIT_5V, design: at(1000) },
    expected: { verdict: "fail", needed: 10e-6, available: opAmpDelay, margin: 10e-6 - opAmpDelay },
  },
];

describe("propagation-delay", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("propagation-delay", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("propagation-delay", cases)).toMatchInlineSnapshot(`
      {
        "micropower (45 µs) at 200 Hz": "marginal: switches in 45.0 µs; the limit is 50.0 µs (1 % of the 5.00 ms period): 5.00 µs to spare",
        "micropower (60 µs) at 200 Hz": "fail: switches in 60.0 µs; the limit is 50.0 µs (1 % of the 5.00 ms period): 10.0 µs short",
        "op amp as comparator at 1 kHz: 17 µs against 10 µs": "fail: an op amp used as a comparator: about 17.0 µs to slew 8.48 V at 0.500 V/µs against a limit of 10.0 µs (1 % of the 1.00 ms period): 6.96 µs short; its overload recovery is not rated, so at best marginal",
        "op amp as comparator at 200 Hz: 17 µs would pass, so marginal": "marginal: an op amp used as a comparator: about 17.0 µs to slew 8.48 V at 0.500 V/µs against a limit of 50.0 µs (1 % of the 5.00 ms period): 33.0 µs to spare; its overload recovery is not rated, so at best marginal",
        "open-drain general purpose (1.3 µs) at 200 Hz: limit 50 µs": "pass: switches in 1.30 µs; the limit is 50.0 µs (1 % of the 5.00 ms period): 48.7 µs to spare",
      }
    `);
  });
});
