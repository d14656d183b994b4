// forward-current (rule's own formula, documented on rules/forward-current.ts): a pump
// diode conducts at most half of each cycle but passes the whole load charge, so it
// must carry 2 · load_a; margin if_max − needed, marginal below 0.2 × needed.
import { describe, expect, it } from "vitest";
import { diode } from "../helpers/parts.ts";
import { check, expectFinding, pumpDiodeStage, reasons, type RuleCase } from "../helpers/rules.ts";

const pump1mA = pumpDiodeStage({ load: 1e-3 });

const cases: RuleCase[] = [
  {
    label: "200 mA switching diode, 1 mA load (2 mA while on)",
    run: { part: diode({ if_max_ma: 200 }), stage: pump1mA, role: "pump-diode" },
    expected: { verdict: "pass", needed: 2e-3, available: 0.2, margin: 0.198 },
  },
  {
    label: "a 2.3 mA rating for 2 mA",
    run: { part: diode({ if_max_ma: 2.3 }), stage: pump1mA, role: "pump-diode" },
    expected: { verdict: "marginal", needed: 2e-3, available: 2.3e-3, margin: 0.3e-3 },
  },
  {
    label: "a 1 mA rating for 2 mA",
    run: { part: diode({ if_max_ma: 1 }), stage: pump1mA, role: "pump-diode" },
    expected: { verdict: "fail", needed: 2e-3, available: 1e-3, margin: -1e-3 },
  },
];

describe("forward-current", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("forward-current", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("forward-current", cases)).toMatchInlineSnapshot(`
      {
        "200 mA switching diode, 1 mA load (2 mA while on)": "pass: carries 2.00 mA while conducting (twice the load); rated 200 mA: 198 mA to spare",
        "a 1 mA rating for 2 mA": "fail: carries 2.00 mA while conducting (twice the load); rated 1.00 mA: 1.00 mA short",
        "a 2.3 mA rating for 2 mA": "marginal: carries 2.00 mA while conducting (twice the load); rated 2.30 mA: 300 µA to spare",
      }
    `);
  });
});
