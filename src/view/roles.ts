// Roles for headings and table columns, read from the topology registry's
// light metadata (src/topologies/meta.ts), so the try page can name roles
// without loading every topology.
import type { PartKind } from "../core/catalogue.ts";
import { canDo } from "../core/kinds.ts";
import { ROLE_META } from "../topologies/meta.ts";

/** Short name of a role ("Sign comparator"); the id itself for a role no topology has. */
export function roleName(role: string): string {
  return ROLE_META.find((r) => r.id === role)?.name ?? role;
}

/** Roles of the topologies the engine knows that take a part of this kind, in page order. */
export function rolesTaking(kind: PartKind): string[] {
  return ROLE_META.filter((r) => canDo(kind, r.wants)).map((r) => r.id);
}
