// Ranking of SPEC §7 from the engine's typed arrays: fits (pass, marginal) and
// rejections (unrated, fail), each by verdict, status, cost band, relative
// margin (largest first), then id.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Part } from "../../../src/core/catalogue.ts";
import { compareResults, majorKey } from "../../../src/core/engine/evaluate-part.ts";
import { RoleRanking } from "../../../src/core/engine/ranking.ts";
import type { Verdict } from "../../../src/core/engine/types.ts";
import { severity } from "../../../src/core/engine/verdict.ts";
import { RULES_BY_ID } from "../../../rules/index.ts";
import { design } from "../../helpers/designs.ts";
import { opAmp } from "../../helpers/parts.ts";
import { bufferStage, SPLIT_5V } from "../../helpers/rules.ts";

type Row = { id: string; verdict: Verdict; status?: string; cost_band?: number; relative?: number };

const ROWS: Row[] = [
  { id: "oa-fail", verdict: "fail", status: "stocked" },
  { id: "oa-listed", verdict: "pass", status: "listed" },
  { id: "oa-marginal", verdict: "marginal", status: "stocked" },
  { id: "oa-unrated", verdict: "unrated", status: "stocked" },
  { id: "oa-stocked-2", verdict: "pass", status: "stocked", cost_band: 2 },
  { id: "oa-stocked-1b", verdict: "pass", status: "stocked", cost_band: 1, relative: 0.5 },
  { id: "oa-stocked-1a", verdict: "pass", status: "stocked", cost_band: 1, relative: 0.5 },
  { id: "oa-stocked-1c", verdict: "pass", status: "stocked", cost_band: 1, relative: 2 },
];

const d = design();
const ctx = { role: "buffer" as const, stage: bufferStage(), design: d, policy: d.policy, rails: SPLIT_5V };
const rules = [RULES_BY_ID.get("offset")!];

function ranking(rows: readonly Row[], bom?: string): RoleRanking {
  const parts: Part[] = rows.map((r) => opAmp({ id: r.id, status: r.status ?? "listed", cost_band: r.cost_band ?? 1 }));
  const severities = Uint8Array.from(rows, (r) => severity(r.verdict));
  const majorKeys = Uint16Array.from(parts, (p, i) => majorKey(severities[i]!, p));
  const relative = Float64Array.from(rows, (r) => r.relative ?? 0);
  return new RoleRanking([{ rules, ctx }], parts, severities, majorKeys, relative, bom);
}

const FITS = ["oa-stocked-1c", "oa-stocked-1a", "oa-stocked-1b", "oa-stocked-2", "oa-listed", "oa-marginal"];

describe("RoleRanking", () => {
  it("splits fits from rejections, each in rank order (list not in id order: ids compared)", () => {
    const r = ranking(ROWS);
    expect(r.fits.map((p) => p.part.id)).toEqual(FITS);
    expect(r.rejected.map((p) => p.part.id)).toEqual(["oa-unrated", "oa-fail"]);
    expect(r.fitCount).toBe(6);
    expect(r.bestFit()).toBe("oa-stocked-1c");
  });

  it("gives the same order for a list in id order, where ties fall back to position", () => {
    const sorted = [...ROWS].sort((a, b) => (a.id < b.id ? -1 : 1));
    expect(ranking(sorted).fits.map((p) => p.part.id)).toEqual(FITS);
  });

  it("agrees with compareResults, keeps verdict and relative margin, and marks the BOM part", () => {
    const fits = ranking(ROWS, "oa-listed").fits;
    expect([...fits].sort(compareResults)).toEqual(fits);
    expect(fits.map((p) => [p.verdict, p.relative, p.bom])[0]).toEqual(["pass", 2, false]);
    expect(fits.find((p) => p.bom)?.part.id).toBe("oa-listed");
  });

  it("makes each list once, on first read", () => {
    const r = ranking(ROWS);
    expect(r.fits).toBe(r.fits);
    expect(r.rejected).toBe(r.rejected);
  });

  it("has no best fit when nothing fits", () => {
    const r = ranking(ROWS.filter((x) => x.verdict === "fail" || x.verdict === "unrated"));
    expect(r.bestFit()).toBeUndefined();
    expect(r.fits).toEqual([]);
  });

  // The lists are dealt into buckets of the major key and only each bucket is
  // sorted; on any rows, with ties on every key but the id, the order must be
  // the one compareResults gives (SPEC §7).
  it("orders any rows as compareResults does", () => {
    const row = fc.record({
      verdict: fc.constantFrom<Verdict>("pass", "marginal", "unrated", "fail"),
      status: fc.constantFrom("stocked", "approved", "listed"),
      cost_band: fc.option(fc.integer({ min: 1, max: 5 }), { nil: undefined }),
      relative: fc.constantFrom(-1, -0.25, 0, 0.25, 3),
    });
    fc.assert(
      fc.property(
        fc.uniqueArray(
          fc.string({ unit: fc.constantFrom("a", "b", "c", "1", "-"), minLength: 1, maxLength: 4 }).map((t) => `p${t}`),
          { minLength: 1, maxLength: 40 },
        ),
        fc.array(row, { minLength: 40, maxLength: 40 }),
        (ids, rows) => {
          const r = ranking(ids.map((id, i) => ({ id, ...rows[i]! })));
          for (const list of [r.fits, r.rejected]) expect(list).toEqual([...list].sort(compareResults));
          expect(r.fits.length + r.rejected.length).toBe(ids.length);
        },
      ),
      { seed: 18, numRuns: 200 },
    );
  });
});
