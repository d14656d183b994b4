// A part page's full entries: each role of one design. A fit with every finding,
// all the arithmetic and a rail diagram (without its own key); a rejection with
// the rules it does not pass, their arithmetic, the rules it passes by name, and
// the diagram only when an input or output range is among what falls short.
import { describe, expect, it } from "vitest";
import { catalogueFromParts, type Part } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { renderDesignPlaces } from "../../src/view/part-places.ts";
import type { DesignEntry } from "../../src/view/design-entry.ts";
import { placesOf } from "../../src/view/part-uses.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

// On fixed ±5 V rails (10 V supply, ±2.5 V window):
// rated only to 8 V, so supply-range fails in every op-amp role; its ranges fit.
const low = opAmp({ id: "oa-low", name: "Low <voltage>", supply_max_v: 8 });
// inputs only down to −5 + 2.6 = −2.40 V against −2.50 V: input-common-mode fails by 0.10 V.
const narrow = opAmp({ id: "oa-narrow", name: "Narrow", icm_neg_headroom_v: 2.6 });
const good = opAmp();
const d = diode();
const catalogue = catalogueFromParts([low, narrow, good, comparator({ supply_max_v: 36 }), d]);
const title = `Bench <script>alert(1)</script>`;
const des = design({ id: "d1", title });
const entries: DesignEntry[] = [
  { id: "d1", file: "designs/d1.json", design: des, evaluation: evaluateDesign(des, catalogue) },
];
const links = {
  designUrl: (id: string, anchor?: string) => `/s/designs/${id}/${anchor ? `#${anchor}` : ""}`,
  rulesUrl: (r?: string) => `/s/rules/#rule-${r}`,
};

function render(part: Part): string {
  return renderDesignPlaces({
    part,
    design: { id: "d1", title, topology: "rectify-and-sign" },
    places: placesOf(part.id, "d1", entries),
    links,
  });
}

const entry = (html: string, id: string) => {
  const start = html.indexOf(`id="${id}"`);
  return start < 0 ? "" : html.slice(html.lastIndexOf("<li", start), html.indexOf("</li>", start));
};

describe("renderDesignPlaces", () => {
  it("gives each op-amp role an anchored entry that links back to the design's list", () => {
    const html = render(low);
    expect(
      [...html.matchAll(/<li class="result result-([a-z]+)" id="(in-d1--[a-z-]+)"/g)].map((m) => [m[2], m[1]]),
    ).toEqual([
      ["in-d1--buffer", "fail"],
      ["in-d1--rectifier", "fail"],
      ["in-d1--sign", "fail"],
    ]);
    expect(html).toContain('<a href="/s/designs/d1/#buffer--oa-low">on the design page</a>');
    expect(html).toContain('<span class="mark">op-amp standing in</span>');
  });

  it("writes a rejection as the rules that reject it, their arithmetic, and the rules it passes by name", () => {
    const buffer = entry(render(low), "in-d1--buffer");
    expect([...buffer.matchAll(/<th scope="row"><a href="\/s\/rules\/#rule-([a-z-]+)">/g)].map((m) => m[1])).toEqual([
      "supply-range",
    ]);
    expect(buffer).toContain("rated 3.00 V to 8.00 V: 2.00 V short");
    expect(buffer).toContain(
      '<p class="passes">It passes input-common-mode, output-swing, unity-gain-stable, phase-reversal, offset, bandwidth and slew-rate.</p>',
    );
    expect(buffer).toContain(
      '<summary>Arithmetic of the rules it does not pass</summary><table aria-label="supply-range: arithmetic">',
    );
    // Its input and output ranges fit, so there is nothing for a diagram to show.
    expect(buffer).not.toContain("<svg");
  });

  it("draws the diagram, without its own key, for a rejection on an input or output range and for every fit", () => {
    const rejected = entry(render(narrow), "in-d1--buffer");
    expect(rejected.match(/<svg class="rail-diagram"/g)?.length).toBe(1);
    expect(rejected).toContain(">0.10 V short</text>");
    const fit = entry(render(good), "in-d1--buffer");
    expect(fit).toMatch(/<span>fit, rank 1 of \d+<\/span>/);
    expect(fit.match(/<svg class="rail-diagram"/g)?.length).toBe(1);
    expect(fit).not.toContain("rd-legend");
    expect(fit).toContain("<summary>Arithmetic</summary>");
    expect(fit).not.toContain('class="passes"');
    expect(fit.match(/<th scope="row"><a href="\/s\/rules\/#rule-/g)?.length).toBe(8);
  });

  it("escapes the design title and the part name", () => {
    const html = render(low);
    expect(html).not.toContain("<script>");
    expect(html).toContain(`<a href="/s/designs/d1/">Bench &lt;script&gt;alert(1)&lt;/script&gt;</a> <code>d1</code>`);
    expect(html).toContain('aria-label="Rules not passed for Low &lt;voltage&gt; as buffer in Bench &lt;script&gt;');
  });

  it("draws no diagram for a diode and shows a fit's rank", () => {
    const html = render(d);
    expect(html).not.toContain("<svg");
    expect(html).toMatch(
      /id="in-d1--rectifier-diode"><div class="result-head"><h4>Rectifier diode<\/h4><span class="verdict verdict-(pass|marginal)">.*?<\/span> <span>fit, rank 1 of 1<\/span>/,
    );
  });
});
