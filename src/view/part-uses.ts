// Where one part class stands in every design: the matrix on its part page and
// the full entries under it. Looked up through one index per set of designs,
// since a part page asks for one part among thousands in each of ~60 roles.
import type { Part } from "../core/catalogue.ts";
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { DesignResult, RoleResult } from "../core/engine/result.ts";
import type { Rails, Verdict } from "../core/engine/types.ts";
import type { Role } from "../core/schemas/design.ts";
import { closestFinding } from "./deciding.ts";
import type { DesignEntry } from "./design-entry.ts";
import { rolesTaking } from "./roles.ts";

export type UseCell =
  | { state: "unused" }
  | {
      state: "fit" | "rejected";
      verdict: Verdict;
      /** 1-based place among the role's fits; only for fits. */
      rank?: number;
      fits: number;
      /** Rule and sentence that decide the verdict (deciding.ts); absent for a clean pass. */
      rule?: string;
      reason?: string;
      bom: boolean;
      chosen: boolean;
    };

export type UseRow = { id: string; title: string; problems?: string[]; cells: { role: Role; cell: UseCell }[] };

export type PartUses = { roles: Role[]; rows: UseRow[] };

/** One part in one role of one design, with what a full entry needs to draw it. */
export type PartPlace = {
  designId: string;
  topology: DesignResult["topology"];
  role: RoleResult;
  rails: Rails;
  result: PartResult;
  /** 1-based place among the role's fits; absent for a rejection. */
  rank?: number;
};

/** A design's own result, then, under topology "all", the other topologies it was compared with. */
export function topologyResults(result: DesignResult): DesignResult[] {
  const others = result.comparison?.results.filter((r) => r.topology !== result.topology) ?? [];
  return [result, ...others];
}

type Index = Map<string, Map<string, PartPlace[]>>;

const indexes = new WeakMap<readonly DesignEntry[], Index>();

function indexOf(designs: readonly DesignEntry[]): Index {
  const known = indexes.get(designs);
  if (known) return known;
  const index: Index = new Map();
  const add = (place: PartPlace) => {
    const id = place.result.part.id;
    let byDesign = index.get(id);
    if (!byDesign) index.set(id, (byDesign = new Map()));
    let places = byDesign.get(place.designId);
    if (!places) byDesign.set(place.designId, (places = []));
    places.push(place);
  };
  for (const entry of designs) {
    if (!entry.evaluation.ok) continue;
    for (const result of topologyResults(entry.evaluation.result)) {
      const rails = result.derived.rails;
      for (const role of result.roles) {
        const base = { designId: entry.id, topology: result.topology, role, rails };
        role.fits.forEach((r, i) => add({ ...base, result: r, rank: i + 1 }));
        for (const r of role.rejected) add({ ...base, result: r });
      }
    }
  }
  indexes.set(designs, index);
  return index;
}

/** Every role of `designId` (any topology evaluated for it) that weighed this part, in page order. */
export function placesOf(partId: string, designId: string, designs: readonly DesignEntry[]): PartPlace[] {
  return indexOf(designs).get(partId)?.get(designId) ?? [];
}

function cellOf(place: PartPlace | undefined): UseCell {
  if (!place) return { state: "unused" };
  const { result, role, rank } = place;
  // A rejection says what decides it; a fit what comes closest to its limit.
  const first = closestFinding(result);
  return {
    state: rank !== undefined ? "fit" : "rejected",
    verdict: result.verdict,
    fits: role.fits.length,
    ...(rank !== undefined ? { rank } : {}),
    ...(first ? { rule: first.rule, reason: first.reason } : {}),
    bom: result.bom,
    chosen: role.chosen === result.part.id,
  };
}

export function partUses(part: Part, designs: readonly DesignEntry[]): PartUses {
  const roles = rolesTaking(part.kind);
  const rows = designs.map((entry): UseRow => {
    const base = { id: entry.id, title: entry.design.title };
    if (!entry.evaluation.ok)
      return { ...base, problems: entry.evaluation.problems.map((p) => `${p.path}: ${p.message}`), cells: [] };
    const places = placesOf(part.id, entry.id, designs);
    return { ...base, cells: roles.map((role) => ({ role, cell: cellOf(places.find((p) => p.role.role === role)) })) };
  });
  return { roles, rows };
}
