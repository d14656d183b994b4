// The benchmark's bare loop is only a fair limit if it computes what the
// engine computes: every margin, verdict and ranking key, for every part.
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { bareLoop, bareLoopSorted, outputsFor, planOf } from "../../bench/bare-loop.ts";
import { syntheticCatalogue } from "../../bench/generate.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { severity } from "../../src/core/engine/verdict.ts";
import { loadDataSet } from "../../src/node/load-data.ts";

const data = loadDataSet(resolve(import.meta.dirname, "../../data"));
const designs = data.designs.flatMap((d) => (d.design ? [d.design] : []));
const catalogues = [
  ["demo", data.catalogue],
  ["generated 600 parts", syntheticCatalogue(data.catalogue, 600, 7)],
] as const;

function close(a: number, b: number): boolean {
  return Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));
}

describe.each(catalogues)("bare loop against the engine, %s catalogue", (_label, catalogue) => {
  it.each(designs.map((d) => [d.id, d] as const))("%s: same margins, verdicts and ranking keys", (_id, design) => {
    const plans = planOf(design, catalogue);
    const out = outputsFor(plans);
    bareLoop(plans, out);
    expect(plans.length).toBeGreaterThanOrEqual(design.topology === "all" ? 6 : 2);
    const wrong: string[] = [];
    let checked = 0;
    plans.forEach((plan, r) => {
      const e = evaluateDesign(design, catalogue, plan.topology as "rectify-and-sign" | "offset-to-mid-rail");
      if (!e.ok) throw new Error("design does not evaluate");
      const role = e.result.roles.find((x) => x.role === plan.role);
      if (!role) throw new Error(`no role ${plan.role}`);
      const o = out[r]!;
      for (const result of [...role.fits, ...role.rejected]) {
        const i = plan.table.ids.indexOf(result.part.id);
        const who = `${plan.topology}/${plan.role}/${result.part.id}`;
        if (o.severity[i] !== severity(result.verdict))
          wrong.push(`${who}: verdict ${result.verdict}, loop ${o.severity[i]}`);
        if (!close(o.relative[i]!, result.relative))
          wrong.push(`${who}: relative ${result.relative}, loop ${o.relative[i]}`);
        result.findings.forEach((f, k) => {
          const m = o.margins[k]![i]!;
          if (f.margin === null ? !Number.isNaN(m) : !close(m, f.margin))
            wrong.push(`${who} ${f.rule}: ${f.margin} vs ${m}`);
          checked++;
        });
      }
    });
    expect(wrong.slice(0, 10)).toEqual([]);
    expect(checked).toBeGreaterThan(100);
  });
});

describe("the bare loop that also sorts", () => {
  // Judged against the engine with its ranked lists read (issue 18): it must rank the fits as SPEC §7 does.
  it.each(designs.map((d) => [d.id, d] as const))(
    "%s: the same fits as the engine, sorted by the ranking keys",
    (_id, design) => {
      const catalogue = catalogues[1][1];
      const plans = planOf(design, catalogue);
      const out = outputsFor(plans);
      const ranked = bareLoopSorted(plans, out);
      let compared = 0;
      plans.forEach((plan, r) => {
        const e = evaluateDesign(design, catalogue, plan.topology as "rectify-and-sign" | "offset-to-mid-rail");
        if (!e.ok) throw new Error("design does not evaluate");
        const role = e.result.roles.find((x) => x.role === plan.role)!;
        const loop = [...ranked[r]!].map((i) => plan.table.ids[i]);
        // Ties on every key fall back to list order in the loop and to id in the engine; compare the keys' order.
        expect(loop.length, `${plan.topology}/${plan.role}`).toBe(role.fits.length);
        expect([...loop].sort(), `${plan.topology}/${plan.role}`).toEqual(role.fits.map((p) => p.part.id).sort());
        const key = plan.table.col.status_cost!;
        const o = out[r]!;
        const major = (i: number) => o.severity[i]! * 64 + key[i]!;
        const order = [...ranked[r]!];
        for (let k = 1; k < order.length; k++) {
          const [a, b] = [order[k - 1]!, order[k]!];
          expect(major(a) < major(b) || (major(a) === major(b) && o.relative[a]! >= o.relative[b]!)).toBe(true);
        }
        compared += loop.length;
      });
      expect(compared).toBeGreaterThan(0);
    },
  );
});
