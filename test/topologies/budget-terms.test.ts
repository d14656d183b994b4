// The rules page lists every budget term (issue 15): every term the demo designs produce, in
// both topologies, is in BUDGET_TERM_INFO with the same calibration, and carries a formula with numbers.
import { describe, expect, it } from "vitest";
import { evaluateDesign } from "../../src/engine.ts";
import { loadDataSet } from "../../src/node/load-data.ts";
import { BUDGET_TERM_INFO } from "../../src/topologies/budget-terms.ts";

const demo = loadDataSet("data");

describe("BUDGET_TERM_INFO", () => {
  it("names every term a demo design produces, with the calibration the term carries", () => {
    const info = new Map(BUDGET_TERM_INFO.map((t) => [t.name, t]));
    let seen = 0;
    for (const f of demo.designs) {
      if (!f.design) continue;
      for (const t of ["rectify-and-sign", "offset-to-mid-rail"]) {
        const e = evaluateDesign(f.design, demo.catalogue, t);
        if (!e.ok) continue;
        for (const term of e.result.budget.terms) {
          seen++;
          expect(info.get(term.name)?.removed_by, `${f.design.id} ${term.name}`).toBe(term.removed_by);
          expect(term.formula, `${f.design.id} ${term.name}`).toMatch(/\d/);
        }
      }
    }
    expect(seen).toBeGreaterThan(50);
  });

  it("lists each name once", () => {
    const names = BUDGET_TERM_INFO.map((t) => t.name);
    expect(new Set(names).size).toBe(names.length);
  });
});
