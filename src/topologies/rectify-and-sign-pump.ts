// The charge pump carries the parts (SPEC §11.5): the amplifiers on V− draw their
// supply current from the pumped rail, and which amplifiers fit depends on the
// rail. Settled the way an engineer would: work the rail out with the parts in
// the BOM (others drawing nothing yet), pick, work it out again with the picks,
// and repeat until the picks stop changing; a few passes, or a clear failure.
import type { Catalogue } from "../core/catalogue-index.ts";
import type { RoleResult } from "../core/engine/result.ts";
import type { TopologyEvaluation, TopologyRun } from "../core/engine/topology.ts";
import { supplyDraw, type PumpLoad, type SupplyDraw } from "../core/math/pump-load.ts";
import type { Design } from "../core/schemas/design.ts";
import { formatSI } from "../core/units.ts";

/** Roles whose parts sit between V+ and V−, with the channels each needs. */
export const ROLES_ON_RAIL = [
  { role: "buffer", channels: 1 },
  { role: "rectifier", channels: 2 },
  { role: "sign", channels: 1 },
] as const;

/** Passes before the fixed point is declared unsettled (two suffice when the picks agree). */
export const MAX_PASSES = 5;

function drawsOf(catalogue: Catalogue, pick: (role: string) => string | undefined): SupplyDraw[] {
  const draws: SupplyDraw[] = [];
  for (const { role, channels } of ROLES_ON_RAIL) {
    const id = pick(role);
    const part = id === undefined ? undefined : catalogue.byId.get(id);
    if (part && (part.kind === "op-amp" || part.kind === "comparator")) draws.push(supplyDraw(role, part, channels));
  }
  return draws;
}

const key = (draws: readonly SupplyDraw[]) => draws.map((d) => `${d.role}=${d.part}`).join(", ");

/** "1.00 mA stated + 2 × 700 µA (oa-x, rectifier) + … = 3.80 mA": the rail's load as a sum. */
export function loadSum(load: PumpLoad): string {
  const parts = load.draws.map((d) => `${d.channels} × ${formatSI(d.per_channel_a, "A")} (${d.part}, ${d.role})`);
  return [`${formatSI(load.stated_a, "A")} stated`, ...parts].join(" + ") + ` = ${formatSI(load.total_a, "A")}`;
}

export function settlePumpedRail(
  run: TopologyRun,
  evaluateWith: (run: TopologyRun, draws: readonly SupplyDraw[]) => TopologyEvaluation,
): TopologyEvaluation {
  const design: Design = run.design;
  if (design.supply.negative.kind !== "charge-pump") return evaluateWith(run, []);
  const results = new Map<string, RoleResult>();
  const recording: TopologyRun = {
    ...run,
    role: (id, stages, rails) => {
      const r = run.role(id, stages, rails);
      results.set(id, r);
      return r;
    },
  };
  // Pass 1: the BOM's parts (the others draw nothing yet). Then each role's assumed draw only grows to its pick's,
  // so the rail only gets shallower and the passes end: every pick is checked on a rail no deeper than its own.
  let draws = drawsOf(run.catalogue, (role) => design.bom[role]);
  const seen: string[] = [key(draws) || "nothing"];
  for (let pass = 1; pass <= MAX_PASSES; pass++) {
    results.clear();
    const out = evaluateWith(recording, draws);
    if (!out.ok) return out;
    // The BOM part, else the best fit: what would go on the board. A role with no fit keeps its assumed draw
    // (the design fails on that role anyway; a least-bad part's draw would only hide the others' fits).
    const picks = drawsOf(run.catalogue, (role) => results.get(role)?.chosen);
    const grown = picks.filter((p) => p.amps > (draws.find((d) => d.role === p.role)?.amps ?? 0) + 1e-15);
    if (grown.length === 0) {
      out.outcome.notes.push(
        `The pumped rail carries its parts: worked out with ${key(draws) || "no part"} and checked again until no pick drew more than the rail was worked out with (${pass} pass${pass === 1 ? "" : "es"}).`,
      );
      return out;
    }
    draws = [...draws.filter((d) => !grown.some((g) => g.role === d.role)), ...grown].sort(
      (a, b) => ROLES_ON_RAIL.findIndex((x) => x.role === a.role) - ROLES_ON_RAIL.findIndex((x) => x.role === b.role),
    );
    seen.push(key(draws));
  }
  return {
    ok: false,
    problems: [
      {
        path: "supply.negative",
        message: `the pumped rail and the parts on it do not settle (got loads ${seen.join(" → ")} over ${MAX_PASSES} passes, expected a pass where no pick draws more than the rail was worked out with); name the amplifiers in the design's bom, or make the rail stiffer (larger flying capacitor, higher pump frequency)`,
      },
    ],
  };
}
