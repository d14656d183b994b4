// What the try page knows of every topology before it has loaded any (its
// first script carries this and no topology module): ids in registry order,
// titles and roles without their rules or labels. Each topology's module (rules, budget
// terms, simulation) is loaded when a design names it (src/topologies/load.ts).
// The modules take their titles and roles from here and add each role's label
// and rules (`rolesOf`), so the two cannot drift apart.
import type { RoleDef } from "../core/engine/topology.ts";
import type { AnyRule } from "../core/rule-kit/index.ts";

/** A role as the page needs it before its topology loads: no rules, and no label (the result carries it). */
export type RoleMeta = Omit<RoleDef, "rules" | "label">;
export type TopologyMeta = { id: string; title: string; roles: readonly RoleMeta[] };

export const TOPOLOGY_META: readonly TopologyMeta[] = [
  {
    id: "rectify-and-sign",
    title: "Rectify and sign",
    roles: [
      {
        id: "buffer",
        name: "Buffer",
        field: "Buffer op amp",
        wants: "amplify",
      },
      {
        id: "rectifier",
        name: "Rectifier",
        field: "Rectifier op amp",
        wants: "amplify",
        count: 2,
      },
      {
        id: "sign",
        name: "Sign comparator",
        field: "Sign comparator",
        wants: "compare",
      },
      {
        id: "pump-diode",
        name: "Pump diode",
        field: "Pump diode",
        wants: "rectify",
        count: 2,
        when: [{ path: "supply.negative.kind", is: ["charge-pump"] }],
      },
      {
        id: "rectifier-diode",
        name: "Rectifier diode",
        field: "Rectifier diode",
        wants: "rectify",
        count: 2,
      },
      {
        id: "clamp-diode",
        name: "Clamp diode",
        field: "Clamp diode",
        wants: "clamp",
        when: [{ path: "logic.level_shift", is: ["diode-clamp"] }],
      },
      {
        id: "base-clamp-diode",
        name: "Base clamp diode",
        field: "NPN base clamp diode",
        wants: "clamp",
        when: [
          { path: "logic.level_shift", is: ["npn-inverter"] },
          { path: "logic.npn_base_clamp", is: ["true"] },
        ],
      },
    ],
  },
  {
    id: "offset-to-mid-rail",
    title: "Offset to mid-rail",
    roles: [
      {
        id: "level-shift",
        name: "Level shift",
        field: "Level-shift op amp",
        wants: "amplify",
      },
      {
        id: "reference-buffer",
        name: "Reference buffer",
        field: "Reference buffer op amp",
        wants: "amplify",
        optional: true,
      },
    ],
  },
  {
    id: "gained-level-shift",
    title: "Gained level shift",
    roles: [
      {
        id: "gain-stage",
        name: "Gain stage",
        field: "Gain-stage op amp",
        wants: "amplify",
      },
    ],
  },
  {
    id: "difference-to-mid",
    title: "Difference amplifier to mid-reference",
    roles: [
      {
        id: "difference",
        name: "Difference amplifier",
        field: "Difference-amplifier op amp",
        wants: "amplify",
      },
    ],
  },
];

/** Every role of every topology, first definition of each id, in registry order (as the engine's `roles`). */
export const ROLE_META: readonly RoleMeta[] = TOPOLOGY_META.flatMap((t) => t.roles).filter(
  (r, i, all) => all.findIndex((x) => x.id === r.id) === i,
);

/** A topology's metadata by id; a missing id is a programming error in a module. */
export function metaOf(id: string): TopologyMeta {
  const meta = TOPOLOGY_META.find((t) => t.id === id);
  if (!meta) throw new Error(`topology '${id}' has no entry in TOPOLOGY_META`);
  return meta;
}

/** The module's roles: each role's metadata with its label and rules, every role given one. */
export function rolesOf(
  meta: TopologyMeta,
  own: Readonly<Record<string, { label: string; rules: readonly AnyRule[] }>>,
): RoleDef[] {
  const extra = Object.keys(own).filter((id) => !meta.roles.some((r) => r.id === id));
  if (extra.length > 0) throw new Error(`topology '${meta.id}': roles ${extra.join(", ")} are not in TOPOLOGY_META`);
  return meta.roles.map((r) => {
    const o = own[r.id];
    if (!o) throw new Error(`topology '${meta.id}': role '${r.id}' has no label and rules`);
    return { ...r, label: o.label, rules: o.rules };
  });
}
