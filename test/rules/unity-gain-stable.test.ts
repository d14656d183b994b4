// unity-gain-stable (SPEC §7): passes or fails outright; never marginal, and the
// column is required, so never unrated from a valid catalogue.
import { describe, expect, it } from "vitest";
import { opAmp } from "../helpers/parts.ts";
import { bufferStage, check, expectFinding, reasons, rectifierStage, type RuleCase } from "../helpers/rules.ts";

const cases: RuleCase[] = [
  {
    label: "compensated class as the buffer",
    run: { part: opAmp({ unity_gain_stable: true }), stage: bufferStage() },
    expected: { verdict: "pass", needed: 1, available: 1, margin: 0 },
  },
  {
    label: "decompensated class as the buffer",
    run: { part: opAmp({ unity_gain_stable: false }), stage: bufferStage() },
    expected: { verdict: "fail", needed: 1, available: 0, margin: -1 },
  },
  {
    label: "decompensated class in the rectifier (noise gain 2)",
    run: { part: opAmp({ unity_gain_stable: false }), stage: rectifierStage() },
    expected: { verdict: "fail", needed: 1, available: 0, margin: -1 },
  },
];

describe("unity-gain-stable", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("unity-gain-stable", run), expected));

  it("says why", () => {
    expect(reasons("unity-gain-stable", cases)).toMatchInlineSnapshot(`
      {
        "compensated class as the buffer": "pass: stable as a follower; the buffer runs at noise gain 1",
        "decompensated class as the buffer": "fail: not unity-gain stable: the buffer runs at noise gain 1, where a decompensated part may oscillate",
        "decompensated class in the rectifier (noise gain 2)": "fail: not unity-gain stable: the rectifier runs at noise gain 2, where a decompensated part may oscillate",
      }
    `);
  });
});
