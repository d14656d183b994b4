// A part page's full entries: each role of one design with every finding, the
// arithmetic and, for amplifiers, a rail diagram without its own key.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/core/engine/evaluate.ts";
import { renderDesignPlaces, type DesignPlacesInput } from "../../src/render/part-places.ts";
import type { DesignEntry } from "../../src/site/design-entry.ts";
import { placesOf } from "../../src/site/part-uses.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

// Rated only to 8 V against the 10 V of ±5 V rails: rejected in every op-amp role.
const low = opAmp({ id: "oa-low", name: "Low <voltage>", supply_max_v: 8 });
const good = opAmp();
const d = diode();
const catalogue = catalogueFromParts([low, good, comparator({ supply_max_v: 36 }), d]);
const title = `Bench <script>alert(1)</script>`;
const entries: DesignEntry[] = [
  (() => {
    const des = design({ id: "d1", title });
    return { id: "d1", file: "designs/d1.json", design: des, evaluation: evaluateDesign(des, catalogue) };
  })(),
];
const links = {
  designUrl: (id: string, anchor?: string) => `/s/designs/${id}/${anchor ? `#${anchor}` : ""}`,
  rulesUrl: (r?: string) => `/s/rules/#rule-${r}`,
};

function render(part: typeof low | typeof d): string {
  const input: DesignPlacesInput = {
    part,
    design: { id: "d1", title, topology: "rectify-and-sign" },
    places: placesOf(part.id, "d1", entries),
    links,
  };
  return renderDesignPlaces(input);
}

describe("renderDesignPlaces", () => {
  it("gives each op-amp role an anchored entry with a diagram, every finding, and a link back to the design's list", () => {
    const html = render(low);
    expect(
      [...html.matchAll(/<li class="result result-([a-z]+)" id="(in-d1--[a-z-]+)"/g)].map((m) => [m[2], m[1]]),
    ).toEqual([
      ["in-d1--buffer", "fail"],
      ["in-d1--rectifier", "fail"],
      ["in-d1--sign", "fail"],
    ]);
    expect(html.match(/<svg class="rail-diagram"/g)?.length).toBe(3);
    // The page draws one key for all its diagrams.
    expect(html).not.toContain("rd-legend");
    expect(html).toContain('<a href="/s/designs/d1/#buffer--oa-low">on the design page</a>');
    expect(html).toContain('<span class="mark">op-amp standing in</span>');
    expect(html).toContain(
      '<summary>Arithmetic of the rules it does not pass</summary><table aria-label="supply-range: arithmetic">',
    );
  });

  it("escapes the design title and the part name", () => {
    const html = render(low);
    expect(html).not.toContain("<script>");
    expect(html).toContain(`<a href="/s/designs/d1/">Bench &lt;script&gt;alert(1)&lt;/script&gt;</a> <code>d1</code>`);
    expect(html).toContain("Rail diagram: Low &lt;voltage&gt; as the buffer");
  });

  it("draws no diagram for a diode and shows a fit's rank", () => {
    const html = render(d);
    expect(html).not.toContain("<svg");
    expect(html).toMatch(
      /id="in-d1--rectifier-diode"><div class="result-head"><h4>Rectifier diode<\/h4><span class="verdict verdict-(pass|marginal)">.*?<\/span> <span>fit, rank 1 of 1<\/span>/,
    );
  });
});
