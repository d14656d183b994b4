// The one-line state of a design (home page, design page head), read from designHolds (SPEC §10).
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import type { DesignEntry } from "../../src/view/design-entry.ts";
import { summarizeDesign } from "../../src/view/design-summary.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

const low = opAmp({ id: "oa-low", name: "Low swing", out_pos_headroom_v: 3 });
// 2 mV offset: the rectifier's summer runs at noise gain 4 and carries 4·Vos (SPEC §11.2), which the
// default class's 7 mV would not fit in a quarter of 100 mV.
const catalogue = catalogueFromParts([opAmp({ vos_max_mv: "2" }), low, comparator({ supply_max_v: 36 }), diode()]);

function entry(overrides = {}): DesignEntry {
  const d = design(overrides);
  return { id: d.id, file: "x.json", design: d, evaluation: evaluateDesign(d, catalogue) };
}

describe("summarizeDesign", () => {
  it("holds when every role has a fit and every BOM part fits", () => {
    // 0.01 % rectifier resistors so that the budget fits too (SPEC §11.11: the state includes the budget).
    const s = summarizeDesign(entry({ front_end: { rectifier_tolerance: 0.0001 } }));
    expect(s).toEqual(
      expect.objectContaining({
        ok: true,
        verdict: "holds",
        holds: true,
        line: expect.stringMatching(
          /^Every role has a fit and every BOM part fits\. Accuracy budget passes \(worst case /,
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
      `"BOM parts oa-low (buffer) and oa-low (rectifier) do not fit. Accuracy budget fails (worst case 442 mV against 100 mV)."`,
    );
  });

  it("names the roles with no fit", () => {
    // A ±10 V signal through a 0.25 divider makes the rectifier's offset too large: its stage 1 reaches the
    // output at weight 2 and its summer carries 4·Vos, both ÷ k = 0.25 (SPEC §7 offset rule, §11.2).
    const s = summarizeDesign(entry({ signal: { peak_v: 10 }, front_end: { divider_total_ohm: 40000 } }));
    expect(s).toEqual(expect.objectContaining({ ok: true, holds: false, verdict: "fails" }));
    expect(s.line).toMatchInlineSnapshot(
      `"No part fits the rectifier and sign comparator. Accuracy budget incomplete: no part for the rectifier and sign comparator."`,
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
