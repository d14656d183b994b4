// The static budget against the time-domain simulation on designs nobody wrote: seeded
// variants of the demo designs (peak ×0.5…2, frequency ×0.1…10, source 1 Ω…1 MΩ, no BOM)
// in every topology that can serve them. The simulation runs one corner of the circuit
// with the chosen parts (SPEC §13), the budget bounds every corner: a simulated error
// beyond the worst case means the budget left a mechanism out, which could pass a design
// that fails. This sweep found the level shift that ignored its source (issue 16 round).
import { describe, expect, it } from "vitest";
import { seededRandom } from "../../bench/generate.ts";
import type { Design } from "../../src/core/schemas/design.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { loadDataSet } from "../../src/node/load-data.ts";
import { simulateDesign } from "../../src/simulation.ts";

const demo = loadDataSet("data");
const bases = demo.designs.flatMap((d) => (d.design ? [d.design] : []));

function variants(seed: number, count: number): Design[] {
  const random = seededRandom(seed);
  const span = (lo: number, hi: number) => lo * (hi / lo) ** random();
  const out: Design[] = [];
  for (let i = 0; i < count; i++) {
    const base = bases[i % bases.length] as Design;
    const d = structuredClone(base);
    d.id = `${base.id}-v${i}`;
    d.topology = "all";
    d.bom = {};
    d.signal.peak_v = Number((d.signal.peak_v * span(0.5, 2)).toPrecision(3));
    d.signal.max_frequency_hz = Number((d.signal.max_frequency_hz * span(0.1, 10)).toPrecision(3));
    d.signal.source_ohm = Number(span(1, 1e6).toPrecision(2));
    out.push(d);
  }
  return out;
}

describe("simulation against the static worst case on random designs", () => {
  it("stays inside it in every topology of 40 seeded variants", () => {
    const beyond: string[] = [];
    let simulated = 0;
    for (const d of variants(7, 40)) {
      const e = evaluateDesign(d, demo.catalogue);
      if (!e.ok) continue;
      for (const r of e.result.comparison ? e.result.comparison.results : [e.result]) {
        const sim = simulateDesign(r, demo.catalogue);
        if (!sim.ran) continue;
        simulated++;
        const c = sim.report.comparison;
        if (c && !c.within)
          beyond.push(
            `${d.id} ${r.topology}: ${(c.simulated_v * 1e3).toFixed(2)} mV > ${(c.worst_case_v * 1e3).toFixed(2)} mV`,
          );
      }
    }
    expect(simulated).toBeGreaterThan(80);
    expect(beyond).toEqual([]);
  });
});
