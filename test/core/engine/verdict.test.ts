// Verdicts of SPEC §7: fail when margin < 0; voltage rules marginal when 0 ≤ margin <
// headroom_margin_v; budget/speed/timing rules marginal when 0 ≤ margin < marginal_fraction × limit.
import { describe, expect, it } from "vitest";
import {
  shareVerdict,
  spareOrShort,
  spareOrShortSmall,
  unratedFinding,
  voltageVerdict,
  worst,
} from "../../../src/core/engine/verdict.ts";
import { POLICY_DEFAULTS } from "../../../src/core/schemas/design.ts";

const policy = { ...POLICY_DEFAULTS };

describe("voltageVerdict (headroom_margin_v = 0.1 V)", () => {
  it.each([
    [-0.001, "fail"],
    [0, "marginal"],
    [0.0999, "marginal"],
    [0.1, "pass"],
    [5, "pass"],
  ] as const)("margin %d V → %s", (margin, verdict) => {
    expect(voltageVerdict(margin, policy)).toBe(verdict);
  });

  it("follows the design's own headroom_margin_v", () => {
    expect(voltageVerdict(0.15, { ...policy, headroom_margin_v: 0.2 })).toBe("marginal");
    expect(voltageVerdict(0, { ...policy, headroom_margin_v: 0 })).toBe("pass");
  });
});

describe("shareVerdict (marginal_fraction = 0.2)", () => {
  it.each([
    [-1e-12, 1, "fail"],
    [0, 1, "marginal"],
    [0.199, 1, "marginal"],
    [0.2, 1, "pass"],
    [0.002, 0.012, "marginal"],
    [0.0025, 0.012, "pass"],
  ] as const)("margin %d against limit %d → %s", (margin, limit, verdict) => {
    expect(shareVerdict(margin, limit, policy)).toBe(verdict);
  });
});

describe("worst (fail > unrated > marginal > pass)", () => {
  it.each([
    [[], "pass"],
    [["pass", "pass"], "pass"],
    [["pass", "marginal"], "marginal"],
    [["marginal", "unrated", "pass"], "unrated"],
    [["unrated", "fail", "marginal"], "fail"],
  ] as const)("%j → %s", (verdicts, verdict) => {
    expect(worst(verdicts)).toBe(verdict);
  });
});

describe("spareOrShort", () => {
  it.each([
    [0.9, "V", "0.90 V to spare"],
    [-0.4, "V", "0.40 V short"],
    [0, "V", "0.00 V to spare"],
    [1.5e-6, "s", "1.50 µs to spare"],
    [-2.5e5, "V/s", "0.250 V/µs short"],
    [3e-4, "A", "300 µA to spare"],
  ])("%d %s → %j", (margin, unit, text) => {
    expect(spareOrShort(margin, unit)).toBe(text);
  });

  it.each([
    [0.0126, "12.6 mV to spare"],
    [-0.005, "5.00 mV short"],
  ])("small volts %d → %j", (margin, text) => {
    expect(spareOrShortSmall(margin)).toBe(text);
  });
});

describe("unratedFinding", () => {
  it("names the empty columns and carries no numbers", () => {
    expect(unratedFinding("recovery", ["trr_ns"], "s")).toEqual({
      rule: "recovery",
      verdict: "unrated",
      needed: null,
      available: null,
      margin: null,
      unit: "s",
      reason: "not rated: needs 'trr_ns', which is empty for this part",
      steps: [],
    });
    expect(unratedFinding("x", ["a", "b"], "V").reason).toBe(
      "not rated: needs 'a' and 'b', which are empty for this part",
    );
  });
});
