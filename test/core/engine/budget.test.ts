// Accuracy budget (SPEC §8): terms, sums, verdicts and calibration.
import { describe, expect, it } from "vitest";
import { budgetTerm, buildBudget, sumTerms, type BudgetTerm } from "../../../src/core/engine/budget.ts";
import { fixedTerms } from "../../../src/topologies/rectify-and-sign.ts";
import { design as designFor } from "../../helpers/designs.ts";

const term = (name: string, v: number, calibrates_out = false): BudgetTerm =>
  budgetTerm(name, name, v, `${name} = ${v} V`, calibrates_out ? "one-point" : "none");

const divider = { top_ohm: 30000, bottom_ohm: 10000, ratio: 0.25, total_ohm: 40000, source_ohm: 0 };

const design = () => designFor({ id: "budget-case", signal: { peak_v: 10 } });

describe("sumTerms", () => {
  // JCGM 100:2008 (GUM): worst case Σ|aᵢ|, root-sum-square √Σaᵢ². Limits of
  // ±0.1 %, ±0.1 %, ±0.2 % give 0.4000 % and 0.24495 % (shared/REFERENCES.md).
  it("combines the GUM example: worst case 0.4 %, RSS 0.24495 %", () => {
    const s = sumTerms([term("a", 0.001), term("b", 0.001), term("c", 0.002)], 1);
    expect(s.worst_case_v).toBeCloseTo(0.004, 12);
    expect(s.rss_v).toBeCloseTo(0.0024495, 7);
    expect(s.dominant).toBe("c");
  });

  it.each([
    // [terms, required, verdict]: pass when the worst case fits, marginal when only the RSS does (SPEC §8).
    [[0.03, 0.04], 0.08, "pass"],
    [[0.03, 0.04], 0.07, "pass"],
    [[0.03, 0.04], 0.06, "marginal"],
    [[0.03, 0.04], 0.05, "marginal"],
    [[0.03, 0.04], 0.049, "fail"],
  ] as const)("terms %j against %s V are %s", (values, required, verdict) => {
    expect(
      sumTerms(
        values.map((v, i) => term(`t${i}`, v)),
        required,
      ).verdict,
    ).toBe(verdict);
  });
});

describe("fixedTerms for rectify-and-sign", () => {
  const d = design();
  const terms = Object.fromEntries(fixedTerms(d, 0.25, divider).map((t) => [t.name, t]));

  it("quantization is half a step referred through k (IEEE 1241: 10 bit at 5 V, Q = 4.8828 mV)", () => {
    expect(terms.quantization?.v).toBeCloseTo((0.5 * 4.8828125e-3) / 0.25, 12);
    expect(terms.quantization?.calibrates_out).toBe(false);
  });

  it("reference is its tolerance times the peak, removed by calibration", () => {
    expect(terms.reference?.v).toBeCloseTo(0.1, 12);
    expect(terms.reference?.calibrates_out).toBe(true);
  });

  it("divider ratio is the exact worst case of both tolerances (30k/10k at 1 %: +1.5075 %)", () => {
    // shared/REFERENCES.md, divider: k_max/k − 1 = 2t(1−k)/(1 − t + 2kt) = +1.5075 % for k = 0.25, t = 1 %.
    expect(terms["divider-ratio"]?.v).toBeCloseTo(0.015075 * 10, 5);
    expect(terms["divider-ratio"]?.calibrates_out).toBe(true);
  });

  it("has no divider term when no divider is needed (k = 1)", () => {
    expect(fixedTerms(d, 1, null).map((t) => t.name)).toEqual(["quantization", "reference"]);
  });
});

describe("buildBudget", () => {
  it("marks a budget with a role lacking a part as failed and names the role", () => {
    const d = design();
    const roles = [{ role: "buffer", fits: [], rejected: [], optional: false }] as never;
    const b = buildBudget(d, {
      fixed: [term("quantization", 0.001)],
      roleTerms: [{ name: "buffer-offset", label: "buffer", role: "buffer", rule: "offset" }],
      roles,
      codesSpannedBits: 10,
    });
    expect(b.missing).toEqual(["buffer"]);
    expect(b.verdict).toBe("fail");
  });

  it("after calibration keeps only the terms a gain calibration cannot remove", () => {
    const d = design();
    const b = buildBudget(d, {
      fixed: [term("quantization", 0.01), term("reference", 0.1, true), term("divider-ratio", 0.05, true)],
      roleTerms: [],
      roles: [],
      codesSpannedBits: 10,
    });
    expect(b.verdict).toBe("fail");
    expect(b.calibrated.worst_case_v).toBeCloseTo(0.01, 12);
    expect(b.calibrated.verdict).toBe("pass");
    expect(b.dominant).toBe("reference");
  });
});
