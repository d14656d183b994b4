// The try page's simulated reading, loaded only when asked for (a separate
// chunk, so the page's first script stays small): every topology of the result
// simulated with the parts it uses, drawn by the design page's renderer.
import type { Catalogue } from "../../core/catalogue-index.ts";
import type { DesignResult } from "../../core/engine/result.ts";
import { simulateDesign } from "../../simulation.ts";
import { renderSimulationSection } from "../../view/simulation-section.ts";

export function simulationHtml(result: DesignResult, catalogue: Catalogue): string {
  const results = result.comparison ? result.comparison.results : [result];
  return results
    .map((r) =>
      renderSimulationSection(simulateDesign(r, catalogue), {
        idPrefix: `try-${r.topology}-`,
        heading: 4,
        required_v: r.design.accuracy.required_v,
      }),
    )
    .join("");
}
