// Entry point of the engine: one design against one catalogue. Pure.
import type { Catalogue } from "../catalogue.ts";
import type { Design, Role, Topology } from "../schemas/design.ts";
import { compare } from "./compare.ts";
import type { DesignProblem, Evaluation } from "./result.ts";
import type { RoleSpec } from "./run-role.ts";
import { evaluateOffsetToMidRail, OFFSET_TO_MID_RAIL_ROLES } from "./topologies/offset-to-mid-rail.ts";
import { evaluateRectifyAndSign, RECTIFY_AND_SIGN_ROLES } from "./topologies/rectify-and-sign.ts";

const KIND_WORDS = { "op-amp": "an op amp", comparator: "a comparator", diode: "a diode" } as const;

export type SingleTopology = Exclude<Topology, "all">;
export const SINGLE_TOPOLOGIES: readonly SingleTopology[] = ["rectify-and-sign", "offset-to-mid-rail"];

/** Roles a design has in one topology (pump and clamp diodes only when used). */
export function rolesOf(design: Design, topology: SingleTopology = topologyOf(design)): Role[] {
  if (topology === "offset-to-mid-rail") return ["level-shift", "reference-buffer"];
  const roles: Role[] = ["buffer", "rectifier", "sign", "rectifier-diode"];
  if (design.supply.negative.kind === "charge-pump") roles.push("pump-diode");
  if (design.logic.level_shift === "diode-clamp") roles.push("clamp-diode");
  return roles;
}

function topologyOf(design: Design): SingleTopology {
  return design.topology === "all" ? "rectify-and-sign" : design.topology;
}

function specOf(role: Role): RoleSpec | undefined {
  return RECTIFY_AND_SIGN_ROLES[role] ?? (OFFSET_TO_MID_RAIL_ROLES as Partial<Record<Role, RoleSpec>>)[role];
}

/** BOM entries must name a part of a kind the role takes, for a role the design has. */
export function checkBom(
  design: Design,
  catalogue: Catalogue,
  topologies: readonly SingleTopology[] = [topologyOf(design)],
): DesignProblem[] {
  const problems: DesignProblem[] = [];
  const roles = topologies.flatMap((t) => rolesOf(design, t));
  for (const [role, id] of Object.entries(design.bom) as [Role, string][]) {
    const path = `bom.${role}`;
    const spec = specOf(role);
    if (!spec || !roles.includes(role)) {
      problems.push({
        path,
        message: `role is not used by this design (got '${role}', expected one of ${roles.join(", ")})`,
      });
      continue;
    }
    const part = catalogue.byId.get(id);
    const wanted = spec.kinds.map((k) => KIND_WORDS[k]).join(" or ");
    if (!part) {
      const sample = catalogue.parts.find((p) => spec.kinds.includes(p.kind))?.id;
      problems.push({
        path,
        message: `names no part in the catalogue (got '${id}', expected the id of ${wanted}${sample ? ` such as '${sample}'` : ""})`,
      });
    } else if (!spec.kinds.includes(part.kind)) {
      problems.push({
        path,
        message: `names a part of the wrong kind (got '${id}', ${KIND_WORDS[part.kind]}, expected ${wanted})`,
      });
    }
  }
  return problems;
}

function evaluateTopology(design: Design, catalogue: Catalogue, topology: SingleTopology): Evaluation {
  // A BOM may name roles of either topology when both are compared; each
  // topology only sees the roles it has.
  const own = rolesOf(design, topology);
  const bom = Object.fromEntries(Object.entries(design.bom).filter(([role]) => own.includes(role as Role)));
  const scoped = { ...design, bom };
  return topology === "offset-to-mid-rail"
    ? evaluateOffsetToMidRail(scoped, catalogue)
    : evaluateRectifyAndSign(scoped, catalogue);
}

/**
 * Evaluates a design in its own topology, or in `override` when given. For
 * "all" the result is the recommended topology's, with `comparison` holding both.
 */
export function evaluateDesign(design: Design, catalogue: Catalogue, override?: Topology): Evaluation {
  const topology = override ?? design.topology;
  // The BOM is checked against the topologies the design file names; a
  // topology asked for on the command line just ignores the roles it lacks.
  const expand = (t: Topology): readonly SingleTopology[] => (t === "all" ? SINGLE_TOPOLOGIES : [t]);
  const topologies = [...new Set([...expand(design.topology), ...expand(topology)])];
  const problems = checkBom(design, catalogue, topologies);
  if (problems.length > 0) return { ok: false, problems };
  if (topology !== "all") return evaluateTopology(design, catalogue, topology);
  const evaluations = SINGLE_TOPOLOGIES.map((t) => evaluateTopology(design, catalogue, t));
  const failed = evaluations.flatMap((e) => (e.ok ? [] : e.problems));
  if (failed.length > 0) return { ok: false, problems: failed };
  const results = evaluations.flatMap((e) => (e.ok ? [e.result] : []));
  const comparison = compare(results, catalogue);
  const primary = results.find((r) => r.topology === comparison.recommended) ?? results[0];
  if (!primary) throw new Error("no topology evaluated");
  return { ok: true, result: { ...primary, comparison } };
}
