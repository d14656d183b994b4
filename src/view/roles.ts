// Roles for headings and table columns, read from the topology registry.
import type { PartKind } from "../core/catalogue.ts";
import type { RoleDef } from "../core/engine/topology.ts";
import { canDo } from "../core/kinds.ts";
import { engine } from "../engine.ts";

/** Short name of a role ("Sign comparator"); the id itself for a role no topology has. */
export function roleName(role: string): string {
  return engine.roles.find((r) => r.id === role)?.name ?? role;
}

/** Roles of the topologies the engine knows that take a part of this kind, in page order. */
export function rolesTaking(kind: PartKind): string[] {
  return engine.roles.filter((r) => canDo(kind, r.wants)).map((r) => r.id);
}

/** Every role of every topology (first definition of each id), in registry order. */
export function allRoles(): readonly RoleDef[] {
  return engine.roles;
}
