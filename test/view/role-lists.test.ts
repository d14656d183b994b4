// A role's lists as the design page and the try page both show them (SPEC §14):
// the fits one row each with their ranking keys, the rejections grouped by the
// rule that decides them with the count, the shortfall range and an example.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import type { RoleResult } from "../../src/core/engine/result.ts";
import { pieceHtml } from "../../src/view/pieces.ts";
import {
  fitLinesPiece,
  fitsPiece,
  RANKING_KEYS,
  rankingKeys,
  rejectionGroups,
  rejectionsPiece,
  type RoleListInput,
} from "../../src/view/role-lists.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

const hostile = `<img src=x onerror="alert(1)"> & co`;
// The test design: V+ 5 V, V− −5 V, the buffer's inputs ±2.50 V (helpers/designs.ts).
const catalogue = catalogueFromParts([
  ...[1, 2, 3].map((n) => opAmp({ id: `oa-c${n}`, name: `Cost ${n}`, cost_band: n })),
  // Needs a 10 V supply, rated to 8 V: 2.00 V short on supply-range (checked first).
  opAmp({ id: "oa-short", name: hostile, supply_max_v: 8 }),
  // Accepts inputs down to −5 + 2.6 = −2.40 V against −2.50 V: 0.10 V short; −5 + 3.0 = −2.00 V: 0.50 V short.
  opAmp({ id: "oa-icm-1", name: "ICM one", icm_neg_headroom_v: 2.6 }),
  opAmp({ id: "oa-icm-5", name: "ICM five", icm_neg_headroom_v: 3.0 }),
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

const input = (role: RoleResult, extra: Partial<RoleListInput> = {}): RoleListInput => ({
  designId: "d1",
  role,
  links: { partUrl: (id) => `/sub/parts/${id}/`, rulesUrl: (rule) => `/sub/rules/#rule-${rule}` },
  ...extra,
});

describe("rejectionGroups", () => {
  it("groups by the deciding rule, largest group first, with the range of shortfalls", () => {
    const groups = rejectionGroups(buffer());
    expect(
      groups.map((g) => ({
        rule: g.rule,
        verdict: g.verdict,
        ids: g.parts.map((p) => p.result.part.id),
        s: g.shortfall,
      })),
    ).toEqual([
      {
        rule: "input-common-mode",
        verdict: "fail",
        ids: ["oa-icm-1", "oa-icm-5"],
        s: { low: expect.closeTo(0.1, 9), high: expect.closeTo(0.5, 9), unit: "V" },
      },
      { rule: "supply-range", verdict: "fail", ids: ["oa-short"], s: { low: 2, high: 2, unit: "V" } },
      { rule: "phase-reversal", verdict: "unrated", ids: ["oa-unrated"], s: undefined },
    ]);
  });
});

describe("rejectionsPiece", () => {
  it("heads each group with its count, shortfall range and an example, then one line per part", () => {
    const html = pieceHtml(rejectionsPiece(input(buffer())));
    expect(html).toContain(
      '<p class="reject-head"><a href="/sub/rules/#rule-input-common-mode">input-common-mode</a>: <strong>2</strong> parts fail, short by 100 mV to 500 mV. For example oa-icm-1: ',
    );
    expect(html).toContain('<li><a href="/sub/parts/oa-icm-5/">oa-icm-5</a> 500 mV short</li>');
    expect(html).toContain("<strong>1</strong> part cannot be checked (not rated).");
    expect(html).toContain('<li><a href="/sub/parts/oa-unrated/">oa-unrated</a> not rated</li>');
  });

  it("escapes a part's text in the example and marks a BOM part", () => {
    const html = pieceHtml(rejectionsPiece(input(buffer({ buffer: "oa-short" }))));
    expect(html).not.toContain("<img");
    expect(html).toContain('<span class="mark mark-bom">in the BOM</span>');
  });

  it("shows the first lines of each group behind a button on the try page, all when opened", () => {
    const role = buffer();
    const first = pieceHtml(rejectionsPiece(input(role, { first: 1, dataAttributes: true })));
    expect(first.match(/<li /g)?.length).toBe(3);
    expect(first).toContain(
      'data-toggle="buffer:rejected" aria-expanded="false">Show all 2 rejected parts of each rule',
    );
    const all = pieceHtml(rejectionsPiece(input(role, { first: 1, expanded: new Set(["buffer:rejected"]) })));
    expect(all.match(/<li>/g)?.length).toBe(4);
  });
});

describe("a long list on the try page", () => {
  it("shows the first rejections in the role's order with their rules until opened, then groups them", () => {
    const role = buffer();
    const closed = pieceHtml(rejectionsPiece(input(role, { first: 2, groupLimit: 2 })));
    expect(closed).toContain("<strong>4</strong> parts rejected; the first 2, each with the rule that decides it:");
    expect(closed.match(/<li>/g)?.length).toBe(2);
    expect(closed).not.toContain('class="reject-group"');
    expect(closed).toContain('aria-expanded="false">Show all 4 rejected parts, grouped by the rule that decides them');
    const open = pieceHtml(
      rejectionsPiece(input(role, { first: 2, groupLimit: 2, expanded: new Set(["buffer:rejected"]) })),
    );
    expect(open.match(/class="reject-group"/g)?.length).toBe(3);
  });
});

describe("fitsPiece", () => {
  it("ranks the rows from the given place on, each with its own ranking keys", () => {
    const role = buffer();
    const html = pieceHtml(fitsPiece(input(role), 2, "Fits 2 on"));
    expect(
      [...html.matchAll(/<tr><td>(\d+)<\/td><th scope="row"><a href="[^"]*">([a-z0-9-]+)</g)].map((m) => [m[2], m[1]]),
    ).toEqual(role.fits.slice(1).map((r, i) => [r.part.id, String(i + 2)]));
    // Equal parts but for the cost band: ranked by it, and each row says its own.
    expect(role.fits.map((r) => r.part.id)).toEqual(["oa-c1", "oa-c2", "oa-c3"]);
    expect(html).toContain("<td>listed</td><td>2 of 5</td>");
    expect(html).toMatch(/<td>[a-z-]+: [^<]*\d[^<]* to spare<\/td><\/tr>/);
  });

  it("states the keys in the order the ranking applies them", () => {
    expect(RANKING_KEYS).toMatchInlineSnapshot(
      `"Fits are ranked by verdict (pass before marginal), then status (stocked, approved, listed), then cost band (1 lowest; not given last), then the least margin relative to its limit (larger first), then id."`,
    );
    const best = buffer().fits[0];
    if (!best) throw new Error("no fit");
    expect(rankingKeys(best)).toEqual({
      status: "listed",
      cost: "1 of 5",
      margin: `${Math.round(best.relative * 100)} %`,
    });
  });
});

describe("fitLinesPiece (a topology shown for comparison)", () => {
  it("numbers the fits by rank from the given place, one line each with its ranking keys", () => {
    const role = buffer();
    const html = pieceHtml(fitLinesPiece(input(role), 2));
    expect(html.startsWith('<ol class="fit-lines" start="2">')).toBe(true);
    const lines = [...html.matchAll(/<li><a href="\/sub\/parts\/([a-z0-9-]+)\/">\1<\/a> ([^<]*)<\/li>/g)];
    expect(lines.map((m) => m[1])).toEqual(role.fits.slice(1).map((r) => r.part.id));
    for (const [i, r] of role.fits.slice(1).entries()) {
      const k = rankingKeys(r);
      expect(lines[i]?.[2]).toBe(`${r.verdict}, ${k.status}, cost ${k.cost}, least margin ${k.margin}`);
    }
  });
});

describe("a role that takes another kind standing in", () => {
  // The sign role takes comparators first and op amps standing in (src/core/kinds.ts: compare).
  const sign = () => {
    const e = evaluateDesign(design({ id: "d1" }), catalogue);
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    const role = e.result.roles.find(
      (r) => r.kinds.length > 1 && r.fits.concat(r.rejected).some((p) => p.part.kind !== r.kind),
    );
    if (!role) throw new Error("no role with a stand-in kind");
    return role;
  };

  it("marks a stand-in among the fits, but not on a rejection's line, where the role's kinds say it once", () => {
    const role = sign();
    const standIns = [...role.fits, ...role.rejected].filter((p) => p.part.kind !== role.kind);
    expect(standIns.length).toBeGreaterThan(0);
    const rejected = pieceHtml(rejectionsPiece(input(role)));
    expect(rejected).not.toContain("standing in");
    const fits = pieceHtml(fitsPiece(input(role), 1, "all"));
    for (const p of role.fits.filter((f) => f.part.kind !== role.kind)) {
      expect(fits).toContain(`>${p.part.id}</a> <span class="mark">${p.part.kind} standing in</span>`);
    }
  });
});
