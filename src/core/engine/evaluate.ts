// Entry point of the engine: one design against one catalogue. Pure.
import type { Catalogue } from "../catalogue.ts";
import type { Design, Role } from "../schemas/design.ts";
import type { DesignProblem, Evaluation } from "./result.ts";
import { evaluateRectifyAndSign, RECTIFY_AND_SIGN_ROLES } from "./topologies/rectify-and-sign.ts";

const KIND_WORDS = { "op-amp": "an op amp", comparator: "a comparator", diode: "a diode" } as const;

/** Roles a design of this topology has (pump and clamp diodes only when used). */
export function rolesOf(design: Design): Role[] {
  const roles: Role[] = ["buffer", "rectifier", "sign", "rectifier-diode"];
  if (design.supply.negative.kind === "charge-pump") roles.push("pump-diode");
  if (design.logic.level_shift === "diode-clamp") roles.push("clamp-diode");
  return roles;
}

/** BOM entries must name a part of a kind the role takes, for a role the design has. */
export function checkBom(design: Design, catalogue: Catalogue): DesignProblem[] {
  const problems: DesignProblem[] = [];
  const roles = rolesOf(design);
  for (const [role, id] of Object.entries(design.bom) as [Role, string][]) {
    const path = `bom.${role}`;
    const spec = RECTIFY_AND_SIGN_ROLES[role];
    if (!spec || !roles.includes(role)) {
      problems.push({ path, message: `role is not used by this design (got '${role}', expected one of ${roles.join(", ")})` });
      continue;
    }
    const part = catalogue.byId.get(id);
    const wanted = spec.kinds.map((k) => KIND_WORDS[k]).join(" or ");
    if (!part) {
      const sample = catalogue.parts.find((p) => spec.kinds.includes(p.kind))?.id;
      problems.push({ path, message: `names no part in the catalogue (got '${id}', expected the id of ${wanted}${sample ? ` such as '${sample}'` : ""})` });
    } else if (!spec.kinds.includes(part.kind)) {
      problems.push({ path, message: `names a part of the wrong kind (got '${id}', ${KIND_WORDS[part.kind]}, expected ${wanted})` });
    }
  }
  return problems;
}

export function evaluateDesign(design: Design, catalogue: Catalogue): Evaluation {
  const problems = checkBom(design, catalogue);
  if (problems.length > 0) return { ok: false, problems };
  return evaluateRectifyAndSign(design, catalogue);
}
