// What the try page knows of every topology before it has loaded any (its
// first script carries this and no topology module): ids in registry order,
// titles and roles without their rules. Each topology's module (rules, budget
// terms, simulation) is loaded when a design names it (src/topologies/load.ts).
// This repeats what the modules declare; test/topologies/meta.test.ts fails
// when the two drift apart, so a change to a module's roles is made here too.
import type { RoleDef } from "../core/engine/topology.ts";

export type RoleMeta = Omit<RoleDef, "rules">;
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
        label: "follower after the divider (in = out = ±W)",
        wants: "amplify",
      },
      {
        id: "rectifier",
        name: "Rectifier",
        field: "Rectifier op amp",
        label:
          "two-op-amp precision rectifier (a dual, or two singles): stage 1 a half-wave inverter (output −(W + Vf) … +Vf, noise gain 2), stage 2 a summer (output 0 … W, noise gain 4); both inputs at 0 V",
        wants: "amplify",
        count: 2,
      },
      {
        id: "sign",
        name: "Sign comparator",
        field: "Sign comparator",
        label: "sign comparator driving a logic input (an op amp may stand in, at best marginal)",
        wants: "compare",
      },
      {
        id: "pump-diode",
        name: "Pump diode",
        field: "Pump diode",
        label: "charge-pump diode (two per pump)",
        wants: "rectify",
        count: 2,
        when: [{ path: "supply.negative.kind", is: ["charge-pump"] }],
      },
      {
        id: "rectifier-diode",
        name: "Rectifier diode",
        field: "Rectifier diode",
        label: "precision-rectifier feedback diode",
        wants: "rectify",
        count: 2,
      },
      {
        id: "clamp-diode",
        name: "Clamp diode",
        field: "Clamp diode",
        label: "series diode from the comparator to the logic input",
        wants: "clamp",
        when: [{ path: "logic.level_shift", is: ["diode-clamp"] }],
      },
      {
        id: "base-clamp-diode",
        name: "Base clamp diode",
        field: "NPN base clamp diode",
        label: "diode across the NPN's base and emitter, so a negative output cannot reverse-bias the base",
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
        label: "follower after the level-shift network, single supply (in = out = b ± a·peak)",
        wants: "amplify",
      },
      {
        id: "reference-buffer",
        name: "Reference buffer",
        field: "Reference buffer op amp",
        label: "optional follower driving the network from the ADC reference (in = out = V_ref)",
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
        label:
          "non-inverting gain stage after the level-shift network, single supply (in ≈ V_ref/(2·Gs), out = m … V_ref − m)",
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
        label:
          "difference amplifier with REF at V_ref/2, single supply (inputs at the divided common mode, out = REF ± G·peak)",
        wants: "amplify",
      },
    ],
  },
];

/** Every role of every topology, first definition of each id, in registry order (as the engine's `roles`). */
export const ROLE_META: readonly RoleMeta[] = TOPOLOGY_META.flatMap((t) => t.roles).filter(
  (r, i, all) => all.findIndex((x) => x.id === r.id) === i,
);
