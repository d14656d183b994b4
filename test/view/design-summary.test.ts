// The one-line state of a design (home page, design page head), read from designHolds (SPEC §10).
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import type { DesignEntry } from "../../src/view/design-entry.ts";
import { summarizeDesign } from "../../src/view/design-summary.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

const low = opAmp({ id: "oa-low", name: "Low swing", out_pos_headroom_v: 3 });
const catalogue = catalogueFromParts([opAmp(), low, comparator({ supply_max_v: 36 }), diode()]);

function entry(overrides = {}): DesignEntry {
  const d = design(overrides);
  return { id: d.id, file: "x.json", design: d, evaluation: evaluateDesign(d, catalogue) };
}

describe("summarizeDesign", () => {
  it("holds when every role has a fit and every BOM part fits", () => {
    const s = summarizeDesign(entry());
    expect(s).toEqual(
      expect.objectContaining({
        ok: true,
        holds: true,
        verdict: expect.stringMatching(/^(holds|marginal|fails)$/),
        line: expect.stringMatching(
          /^Every role has a fit and every BOM part fits\. Accuracy budget (passes|is marginal|fails) \(worst case /,
        ),
      }),
    );
    expect(s.ok && s.roles.map((r) => `${r.name} ${r.fits}/${r.total}`)).toEqual([
      "Buffer 1/2",
      "Rectifier 1/2",
      "Sign comparator 1/3",
      "Rectifier diode 1/1",
      "Clamp diode 1/1",
    ]);
  });

  it("names a BOM part that does not fit", () => {
    expect(summarizeDesign(entry({ bom: { buffer: "oa-low", rectifier: "oa-low" } })).line).toMatchInlineSnapshot(
      `"BOM parts oa-low (buffer) and oa-low (rectifier) do not fit. Accuracy budget passes (worst case 87.5 mV against 100 mV)."`,
    );
  });

  it("names the roles with no fit", () => {
    // A ±10 V signal through a 0.25 divider makes both op amps' offset too large (SPEC §7 offset rule).
    const s = summarizeDesign(entry({ signal: { peak_v: 10 }, front_end: { divider_total_ohm: 40000 } }));
    expect(s).toEqual(expect.objectContaining({ ok: true, holds: false, verdict: "fails" }));
    expect(s.line).toMatchInlineSnapshot(
      `"No part fits the buffer, rectifier and sign comparator. Accuracy budget incomplete: no part for the buffer, rectifier and sign comparator."`,
    );
  });

  it("says when the design cannot be evaluated", () => {
    expect(summarizeDesign(entry({ bom: { buffer: "nope" } }))).toEqual({
      ok: false,
      verdict: "fails",
      line: "Could not be evaluated: 1 problem in the design file.",
    });
  });
});
