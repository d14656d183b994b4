// recovery (SPEC §7): pump diode trr ≤ timing_fraction × the pump's half period
// 1/(2·frequency_hz); rectifier diode trr ≤ timing_fraction / max_frequency_hz.
// Recovery times of the classes are common practice [M] (switching ≤ 4 ns, rectifiers µs).
import { describe, expect, it } from "vitest";
import { design } from "../helpers/designs.ts";
import { diode } from "../helpers/parts.ts";
import { check, expectFinding, pumpDiodeStage, reasons, rectifierDiodeStage, type RuleCase } from "../helpers/rules.ts";

const pump980 = pumpDiodeStage({ frequency: 980 }); // limit 1 % of 510 µs = 5.102 µs
const limit980 = 0.01 / (2 * 980);

const cases: RuleCase[] = [
  {
    label: "4 ns switching diode in a 980 Hz pump",
    run: { part: diode({ trr_ns: 4 }), stage: pump980, role: "pump-diode" },
    expected: { verdict: "pass", needed: limit980, available: 4e-9, margin: limit980 - 4e-9 },
  },
  {
    label: "4.5 µs rectifier in a 980 Hz pump",
    run: { part: diode({ trr_ns: "4.5k" }), stage: pump980, role: "pump-diode" },
    expected: { verdict: "marginal", needed: limit980, available: 4.5e-6, margin: limit980 - 4.5e-6 },
  },
  {
    label: "general-purpose rectifier (10 µs) in a 980 Hz pump",
    run: { part: diode({ trr_ns: "10k" }), stage: pump980, role: "pump-diode" },
    expected: { verdict: "fail", needed: limit980, available: 10e-6, margin: limit980 - 10e-6 },
  },
  {
    label: "recovery time not stated",
    run: { part: diode({ trr_ns: "" }), stage: pump980, role: "pump-diode" },
    expected: { verdict: "unrated", needed: null, available: null, margin: null },
  },
  {
    label: "2 µs rectifier in the signal path at 200 Hz (limit 50 µs)",
    run: {
      part: diode({ trr_ns: "2k" }),
      stage: rectifierDiodeStage({ f: 200 }),
      design: design(),
      role: "rectifier-diode",
    },
    expected: { verdict: "pass", needed: 50e-6, available: 2e-6, margin: 48e-6 },
  },
];

describe("recovery", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("recovery", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("recovery", cases)).toMatchInlineSnapshot(`
      {
        "2 µs rectifier in the signal path at 200 Hz (limit 50 µs)": "pass: recovers in 2.00 µs; the limit is 50.0 µs (1 % of the signal period): 48.0 µs to spare",
        "4 ns switching diode in a 980 Hz pump": "pass: recovers in 4.00 ns; the limit is 5.10 µs (1 % of the pump's half period): 5.10 µs to spare",
        "4.5 µs rectifier in a 980 Hz pump": "marginal: recovers in 4.50 µs; the limit is 5.10 µs (1 % of the pump's half period): 602 ns to spare",
        "general-purpose rectifier (10 µs) in a 980 Hz pump": "fail: recovers in 10.0 µs; the limit is 5.10 µs (1 % of the pump's half period): 4.90 µs short",
        "recovery time not stated": "unrated: not rated: needs 'trr_ns', which is empty for this part",
      }
    `);
  });
});
