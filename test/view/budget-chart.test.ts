// The budget bar chart: escaped text, bars to scale, the requirement marked.
import { describe, expect, it } from "vitest";
import { budgetTerm, type Budget } from "../../src/core/engine/budget.ts";
import { renderBudgetChart } from "../../src/view/budget-chart.ts";

const budget: Budget = {
  terms: [
    budgetTerm("quantization", "quantization <b>&", 0.01, "0.5 × Q / k", "none"),
    budgetTerm("reference", "reference", 0.04, "tolerance × peak", "one-point"),
  ],
  worst_case_v: 0.05,
  rss_v: Math.hypot(0.01, 0.04),
  required_v: 0.1,
  verdict: "pass",
  dominant: "reference",
  calibrated: { worst_case_v: 0.01, rss_v: 0.01, verdict: "pass", dominant: "quantization" },
  calibrated_two_point: { worst_case_v: 0.01, rss_v: 0.01, verdict: "pass", dominant: "quantization" },
  codes_spanned_bits: 10,
  missing: [],
};

describe("renderBudgetChart", () => {
  const svg = renderBudgetChart(budget);

  it("escapes term labels", () => {
    expect(svg).toContain("quantization &lt;b&gt;&amp;");
    expect(svg).not.toContain("<b>");
  });

  it("draws bars in proportion, scaled to the larger of requirement and worst case", () => {
    const widths = [...svg.matchAll(/<rect class="budget-bar[^"]*"[^>]*width="([\d.]+)"/g)].map((m) => Number(m[1]));
    // Sorted largest first: reference 0.04, quantization 0.01, then the sums 0.05 and rss.
    expect(widths[0]! / widths[1]!).toBeCloseTo(4, 1);
    expect(widths[2]! / widths[0]!).toBeCloseTo(1.25, 1);
    expect(svg).toContain("required 100 mV");
    expect(svg).toContain("◆ largest");
  });

  it("keeps the largest term's value and mark inside the picture when it nearly fills the scale", () => {
    const crowded: Budget = {
      ...budget,
      terms: [budgetTerm("reference", "reference", 0.0999, "tolerance × peak", "one-point")],
      worst_case_v: 0.0999,
      rss_v: 0.0999,
      required_v: 0.05,
    };
    const out = renderBudgetChart(crowded);
    const width = Number(/viewBox="0 0 (\d+)/.exec(out)?.[1]);
    // Left-anchored value texts: x plus about 7 px per character (12 px sans) must stay inside.
    const ends = [...out.matchAll(/<text class="budget-value" x="([\d.]+)"[^>]*>([^<]*)</g)].map(
      (m) => Number(m[1]) + 7 * m[2]!.length,
    );
    expect(ends.length).toBe(3);
    for (const end of ends) expect(end).toBeLessThanOrEqual(width);
  });

  it("uses no style attribute (the CSP allows none)", () => {
    expect(svg).not.toMatch(/\sstyle=/);
  });
});
