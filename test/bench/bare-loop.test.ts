// The benchmark's bare loop is only a fair limit if it computes what the
// engine computes: every margin, verdict and ranking key, for every part.
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { bareLoop, outputsFor, planOf } from "../../bench/bare-loop.ts";
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
    // The front ends of issue 17 have one role each.
    expect(plans.length).toBeGreaterThanOrEqual(design.topology === "all" ? 6 : 1);
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
