// A design page's long lists: one row per part, in the role's order, linking
// to the part page's entry for the same design and role.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import type { RoleResult } from "../../src/core/engine/result.ts";
import { renderFitsTable, renderRejectedTable, type RoleListInput } from "../../src/view/role-lists.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

const hostile = `<img src=x onerror="alert(1)"> & co`;
const catalogue = catalogueFromParts([
  ...[1, 2, 3].map((n) => opAmp({ id: `oa-c${n}`, name: `Cost ${n}`, cost_band: n })),
  // Accepts inputs only down to −5 + 2.6 = −2.40 V against −2.50 V (0.10 V short), and rated only to 8 V.
  opAmp({ id: "oa-short", name: hostile, icm_neg_headroom_v: 2.6, supply_max_v: 8 }),
  opAmp({ id: "oa-unrated", name: "Unrated", phase_reversal: undefined }),
  comparator({ supply_max_v: 36 }),
  diode(),
]);

function buffer(bom: Record<string, string> = {}): RoleResult {
  const e = evaluateDesign(design({ id: "d1", bom }), catalogue);
  if (!e.ok) throw new Error(JSON.stringify(e.problems));
  const role = e.result.roles.find((r) => r.role === "buffer");
  if (!role) throw new Error("no buffer role");
  return role;
}

const input = (role: RoleResult, inFull: string[] = []): RoleListInput => ({
  designId: "d1",
  role,
  links: { partUrl: (id) => `/sub/parts/${id}/` },
  inFull: new Set(inFull),
});

describe("renderRejectedTable", () => {
  const role = buffer({ buffer: "oa-short" });

  it("lists every rejection in the role's order, each anchored and linked to its whole case", () => {
    const html = renderRejectedTable(input(role), "Rejected");
    expect([...html.matchAll(/<tr id="buffer--([a-z0-9-]+)">/g)].map((m) => m[1])).toEqual(
      role.rejected.map((r) => r.part.id),
    );
    expect(html).toContain('<a href="/sub/parts/oa-unrated/#in-d1--buffer">Unrated</a> <code>oa-unrated</code>');
    expect(html).toContain("phase-reversal: not rated");
    expect(html.match(/<th scope="(col|row)"/g)?.length).toBe(3 + role.rejected.length);
  });

  it("escapes a part's name and marks a BOM part, whose full entry elsewhere keeps the anchor", () => {
    const html = renderRejectedTable(input(role, ["oa-short"]), "Rejected");
    expect(html).not.toContain("<img");
    expect(html).toContain("&lt;img src=x onerror=&quot;alert(1)&quot;&gt; &amp; co");
    expect(html).toContain('<span class="mark mark-bom">in the BOM</span>');
    expect(html).not.toContain('id="buffer--oa-short"');
    expect(html).toContain('<ul class="reasons"><li>supply-range: ');
  });
});

describe("renderFitsTable", () => {
  it("ranks the rows from the given place on, each with status, cost and the finding closest to its limit", () => {
    const role = buffer();
    const html = renderFitsTable(input(role), 2, "Fits 2 on");
    expect(
      [...html.matchAll(/<tr id="buffer--([a-z0-9-]+)"><td class="num">(\d+)<\/td>/g)].map((m) => [m[1], m[2]]),
    ).toEqual(role.fits.slice(1).map((r, i) => [r.part.id, String(i + 2)]));
    expect(html).toContain("<td>listed, cost 2 of 5</td>");
    expect(html).toMatch(/<td>[a-z-]+: [^<]*\d[^<]*<\/td><\/tr>/);
  });
});
