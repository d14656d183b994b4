// Short names of the roles for headings and table columns.
import type { PartKind } from "../core/catalogue.ts";
import type { RoleSpec } from "../core/engine/run-role.ts";
import { OFFSET_TO_MID_RAIL_ROLES } from "../core/engine/topologies/offset-to-mid-rail.ts";
import { RECTIFY_AND_SIGN_ROLES } from "../core/engine/topologies/rectify-and-sign.ts";
import type { Role } from "../core/schemas/design.ts";

export const ROLE_NAMES: Readonly<Record<Role, string>> = {
  buffer: "Buffer",
  rectifier: "Rectifier",
  sign: "Sign comparator",
  "pump-diode": "Pump diode",
  "rectifier-diode": "Rectifier diode",
  "clamp-diode": "Clamp diode",
  "level-shift": "Level shift",
  "reference-buffer": "Reference buffer",
};

/** Roles of the topologies the engine knows that take a part of this kind, in page order. */
export function rolesTaking(kind: PartKind): Role[] {
  return allRoleSpecs()
    .filter(([, spec]) => spec.kinds.includes(kind))
    .map(([role]) => role);
}

/** Every role of every topology with its spec, rectify-and-sign first. */
export function allRoleSpecs(): [Role, RoleSpec][] {
  return [
    ...(Object.entries(RECTIFY_AND_SIGN_ROLES) as [Role, RoleSpec][]),
    ...(Object.entries(OFFSET_TO_MID_RAIL_ROLES) as [Role, RoleSpec][]),
  ];
}
