// Accuracy budget (SPEC §8): terms, sums, verdicts and calibration.
import { describe, expect, it } from "vitest";
import { budgetTerm, buildBudget, sumTerms, type BudgetTerm } from "../../../src/core/engine/budget.ts";
import { fixedTerms } from "../../../src/topologies/rectify-and-sign.ts";
import { design as designFor } from "../../helpers/designs.ts";

const term = (name: string, v: number, calibrates_out = false): BudgetTerm =>
  budgetTerm(name, name, v, `${name} = ${v} V`, calibrates_out ? "one-point" : "none");

const divider = {
  top_ohm: 30000,
  bottom_ohm: 10000,
  ratio: 0.25,
  total_ohm: 40000,
  source_ohm: 0,
  chosen_by: "search" as const,
};

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
    expect(fixedTerms(d, 1, null).map((t) => t.name)).toEqual([
      "quantization",
      "reference",
      "rectifier-ratio-common",
      "rectifier-ratio-difference",
    ]);
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

describe("GUM combination (JCGM 100:2008)", () => {
  it("±0.1 %, ±0.1 %, ±0.2 % limits read as rectangular: u_c = 0.14142 %, U (k = 2) = 0.28284 % (REFERENCES.md)", () => {
    // A rectangular ±a has u = a/√3 (GUM 4.3.7); the budget's noise term is entered at k = 2 (GUM §6).
    const u = Math.hypot(0.1 / Math.sqrt(3), 0.1 / Math.sqrt(3), 0.2 / Math.sqrt(3));
    expect(u).toBeCloseTo(0.14142, 5);
    expect(2 * u).toBeCloseTo(0.28284, 5);
    const s = sumTerms([term("a", 0.001), term("b", 0.001), term("c", 0.002)], 1);
    expect(s.rss_v / Math.sqrt(3)).toBeCloseTo(0.0014142, 7);
  });
});

describe("every term carries a formula with its numbers and what removes it (SPEC §11.10)", () => {
  const d = designFor({
    id: "terms-case",
    signal: { peak_v: 10, source_ohm: 1000, source_tolerance: 0.1 },
    adc: { reference_tempco_ppm_per_c: 50, offset_lsb: 2, gain_error: 0.001, inl_lsb: 1 },
    temperature: { min_c: 0, max_c: 50 },
  });
  const terms = Object.fromEntries(
    fixedTerms(d, 13 / 53, {
      top_ohm: 39000,
      bottom_ohm: 13000,
      ratio: 13 / 53,
      total_ohm: 52000,
      source_ohm: 1000,
      chosen_by: "search",
    }).map((t) => [t.name, t]),
  );

  it.each([
    ["quantization", "none"],
    ["reference", "one-point"],
    ["reference-tempco", "none"],
    ["adc-offset", "two-point"],
    ["adc-gain", "one-point"],
    ["adc-inl", "none"],
    ["divider-ratio", "one-point"],
    ["source-resistance", "one-point"],
    ["rectifier-ratio-common", "one-point"],
    ["rectifier-ratio-difference", "none"],
  ] as const)("%s is removed by %s", (name, by) => {
    expect(terms[name]?.removed_by).toBe(by);
    expect(terms[name]?.calibrates_out).toBe(by === "one-point");
    expect(terms[name]?.formula).toMatch(/\d/);
  });

  it("quantization with the fixture 39k/13k behind 1 kΩ: 0.5 × (5 V/2^10) / (13/53) = 9.953 mV (IEEE 1241, Q = V_ref/2^N)", () => {
    expect(terms.quantization?.v).toBeCloseTo((0.5 * (5 / 1024)) / (13 / 53), 12);
    expect(terms.quantization?.formula).toMatchInlineSnapshot(
      `"0.5 × Q / gain; Q = 5 V / 2^10 = 4.883 mV; 0.5 × 4.883 mV / 0.24528 = 9.953 mV"`,
    );
  });

  it("the tempco term: 50 ppm/°C × 25 °C × 10 V = 12.5 mV", () => {
    expect(terms["reference-tempco"]?.v).toBeCloseTo(0.0125, 12);
  });

  it("converter offset and INL are steps through k; gain error scales the peak", () => {
    expect(terms["adc-offset"]?.v).toBeCloseTo((2 * (5 / 1024)) / (13 / 53), 12);
    expect(terms["adc-inl"]?.v).toBeCloseTo(5 / 1024 / (13 / 53), 12);
    expect(terms["adc-gain"]?.v).toBeCloseTo(0.01, 12);
  });

  it("the source term: 1 kΩ ± 10 % behind 39k/13k moves k by +0.189 % / −0.188 % (53/52.9 − 1), × 10 V", () => {
    expect(terms["source-resistance"]?.v).toBeCloseTo((53 / 52.9 - 1) * 10, 12);
  });
});
