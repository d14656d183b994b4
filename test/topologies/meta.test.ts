// The try page knows every topology by its light metadata (src/topologies/meta.ts)
// and loads each module when a design names it (src/topologies/load.ts). Both
// repeat what the static registry (src/topologies/index.ts) holds; these checks
// fail as soon as they drift apart: ids and order, titles, every role's fields.
import { describe, expect, it } from "vitest";
import { engine } from "../../src/engine.ts";
import { TOPOLOGIES } from "../../src/topologies/index.ts";
import { TOPOLOGY_LOADERS } from "../../src/topologies/load.ts";
import { ROLE_META, TOPOLOGY_META } from "../../src/topologies/meta.ts";
import type { RoleDef } from "../../src/core/engine/topology.ts";

const withoutRules = ({ rules: _rules, label: _label, ...meta }: RoleDef) => meta;

describe("topology metadata and loaders", () => {
  it("list the registry's topologies, in its order", () => {
    expect(TOPOLOGY_META.map((t) => t.id)).toEqual(TOPOLOGIES.map((t) => t.id));
    expect(Object.keys(TOPOLOGY_LOADERS)).toEqual(TOPOLOGIES.map((t) => t.id));
  });

  it.each(TOPOLOGIES.map((t) => [t.id, t] as const))("%s: title and roles as its module declares them", (id, t) => {
    const meta = TOPOLOGY_META.find((m) => m.id === id);
    expect(meta).toEqual({ id, title: t.title, roles: t.roles.map(withoutRules) });
  });

  it("roles: the first definition of each id, as the engine lists them", () => {
    expect(ROLE_META).toEqual(engine.roles.map(withoutRules));
  });

  it.each(TOPOLOGIES.map((t) => [t.id, t] as const))(
    "%s: its loader gives the registry's own module object",
    async (id, t) => {
      const load = TOPOLOGY_LOADERS[id];
      expect(load).toBeDefined();
      expect(await load!()).toBe(t);
    },
  );
});
