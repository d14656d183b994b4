// The design × role matrix of a part page.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import type { DesignEntry } from "../../src/view/design-entry.ts";
import { partUses, placesOf } from "../../src/view/part-uses.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

const good = opAmp();
// Fixed ±5 V rails: supply 10 V against a 10.05 V maximum (0.05 V, marginal), then
// inputs only down to −5 + 2.6 = −2.40 V against −2.50 V needed (0.10 V short).
const edgy = opAmp({ id: "oa-edgy", name: "Edgy", supply_max_v: 10.05, icm_neg_headroom_v: 2.6 });
const catalogue = catalogueFromParts([good, edgy, comparator({ supply_max_v: 36 }), diode()]);

function entry(id: string, overrides = {}): DesignEntry {
  const d = design({ id, title: `Design ${id}`, ...overrides });
  return { id, file: `designs/${id}.json`, design: d, evaluation: evaluateDesign(d, catalogue) };
}

describe("partUses", () => {
  const designs = [
    entry("plain", { bom: { buffer: "oa-test" } }),
    entry("broken", { bom: { buffer: "no-such-part" } }),
  ];

  it("has a column for each role that takes the kind", () => {
    expect(partUses(good, designs).roles).toEqual(["buffer", "rectifier", "sign", "level-shift", "reference-buffer"]);
    expect(partUses(catalogue.byId.get("cmp-test")!, designs).roles).toEqual(["sign"]);
    expect(partUses(catalogue.byId.get("d-test")!, designs).roles).toEqual([
      "pump-diode",
      "rectifier-diode",
      "clamp-diode",
      "base-clamp-diode",
    ]);
  });

  it("ranks a fit and marks the BOM part", () => {
    const row = partUses(good, designs).rows[0];
    expect(row?.cells[0]).toEqual({
      role: "buffer",
      // A clean pass names the finding closest to its limit instead of a deciding one.
      cell: expect.objectContaining({ state: "fit", verdict: "pass", rank: 1, fits: 1, bom: true, chosen: true }),
    });
  });

  it("gives a rejection the reason that decides it, not an earlier marginal one", () => {
    const cell = partUses(edgy, designs).rows[0]?.cells[0]?.cell;
    expect(cell).toEqual(
      expect.objectContaining({ state: "rejected", verdict: "fail", rule: "input-common-mode", bom: false }),
    );
    expect(cell?.state !== "unused" && cell?.reason).toMatchInlineSnapshot(
      `"needs inputs from −2.50 V to +2.50 V; with V− = −5.00 V and V+ = +5.00 V it accepts −2.40 V to +3.50 V: 0.10 V short"`,
    );
  });

  it("marks a role the design does not have", () => {
    const pump = partUses(catalogue.byId.get("d-test")!, designs).rows[0]?.cells[0];
    expect(pump).toEqual({ role: "pump-diode", cell: { state: "unused" } });
  });

  it("carries the problems of a design that cannot be evaluated", () => {
    const row = partUses(good, designs).rows[1];
    expect(row?.cells).toEqual([]);
    expect(row?.problems?.[0]).toMatch(/^bom\.buffer: names no part in the catalogue \(got 'no-such-part'/);
  });

  it('fills the roles of the topology a design under topology "all" compared but did not choose', () => {
    const all = [entry("both", { topology: "all", adc: { reference_v: 5 } })];
    const result = all[0]?.evaluation;
    if (!result?.ok) throw new Error("design does not evaluate");
    const other = result.result.comparison?.results.find((r) => r.topology !== result.result.topology);
    expect(other).toBeDefined();
    const cells = partUses(good, all).rows[0]?.cells ?? [];
    for (const role of other?.roles ?? [])
      expect(cells.find((c) => c.role === role.role)?.cell.state, role.role).not.toBe("unused");
    expect(placesOf(good.id, "both", all).map((p) => [p.role.role, p.topology])).toEqual(
      [result.result, other!].flatMap((r) =>
        r.roles.filter((x) => x.kinds.includes("op-amp")).map((x) => [x.role, r.topology]),
      ),
    );
  });
});
