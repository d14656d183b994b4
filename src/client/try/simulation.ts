// The try page's simulated reading, loaded only when asked for (a separate
// chunk, so the page's first script stays small): every topology of the result
// simulated with the parts it uses, through its topology's chain as
// src/simulation.ts does it, drawn by the design page's renderer. The
// topologies are loaded by then: the result was evaluated in them.
import type { Catalogue } from "../../core/catalogue-index.ts";
import type { DesignResult } from "../../core/engine/result.ts";
import { simulateResult } from "../../core/engine/simulate-result.ts";
import { renderSimulationSection } from "../../view/simulation-section.ts";
import { loadedTopology } from "./engine.ts";

export function simulationHtml(result: DesignResult, catalogue: Catalogue): string {
  const results = result.comparison ? result.comparison.results : [result];
  return results
    .map((r) =>
      renderSimulationSection(simulateResult(r, catalogue, loadedTopology(r.topology)?.simulation), {
        idPrefix: `try-${r.topology}-`,
        heading: 4,
        required_v: r.design.accuracy.required_v,
      }),
    )
    .join("");
}
