// The topology and kind registries (issue 14): each topology module declares
// everything about itself, each role asks for a capability, and the engine
// knows none of them by name.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { createEngine } from "../../src/core/engine/engine.ts";
import { defineTopology } from "../../src/core/engine/topology.ts";
import { CAPABILITIES, KINDS, kindsThatCan } from "../../src/core/kinds.ts";
import { designSchema, engine, evaluateDesign, TOPOLOGY_IDS } from "../../src/engine.ts";
import { TOPOLOGIES } from "../../src/topologies/index.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";
import { offset } from "../../rules/offset.ts";
import { bufferStage } from "../helpers/rules.ts";

const shapeOf = (path: string): boolean => {
  let schema: unknown = designSchema;
  for (const key of path.split(".")) {
    const shape = (schema as { shape?: Record<string, unknown>; _def?: { in?: unknown } }).shape;
    const inner =
      shape ?? (schema as { _zod?: { def?: { in?: { shape?: Record<string, unknown> } } } })._zod?.def?.in?.shape;
    if (!inner || !(key in inner)) return false;
    schema = inner[key];
  }
  return true;
};

describe("topology registry", () => {
  it("the design schema's topologies are the registry's, then all", () => {
    expect(TOPOLOGY_IDS).toEqual([...TOPOLOGIES.map((t) => t.id), "all"]);
  });

  it.each(TOPOLOGIES.map((t) => [t.id, t] as const))("%s describes itself, its reading and its roles", (_id, t) => {
    expect(t.title).toMatch(/\w/);
    expect(t.description.length).toBeGreaterThan(80);
    expect(t.reading).toMatch(/code/);
    expect(t.roles.length).toBeGreaterThan(0);
    for (const role of t.roles) {
      expect(role.rules.length, role.id).toBeGreaterThan(0);
      expect(kindsThatCan(role.wants).length, role.id).toBeGreaterThan(0);
      expect(role.name).toMatch(/^[A-Z]/);
    }
    for (const term of t.roleTerms) {
      const role = t.roles.find((r) => r.id === term.role);
      expect(
        role?.rules.map((r) => r.id),
        term.name,
      ).toContain(term.rule);
    }
  });

  it.each(TOPOLOGIES.map((t) => [t.id, t] as const))("%s reads only fields the design schema has", (_id, t) => {
    expect(t.fields.filter((f) => !shapeOf(f))).toEqual([]);
  });

  it("a role is weighed over every kind that can do what it asks, and only those", () => {
    const parts = [opAmp({ id: "oa" }), comparator({ id: "cmp" }), diode({ id: "d" })];
    const catalogue = catalogueFromParts(parts);
    const e = evaluateDesign(design(), catalogue, "rectify-and-sign");
    if (!e.ok) throw new Error("does not evaluate");
    const seen = (role: string) => {
      const r = e.result.roles.find((x) => x.role === role);
      return [...(r?.fits ?? []), ...(r?.rejected ?? [])].map((p) => p.part.id).sort();
    };
    // A comparator compares; an op amp can stand in; a diode cannot (SPEC §7 sign row).
    expect(seen("sign")).toEqual(["cmp", "oa"]);
    expect(seen("buffer")).toEqual(["oa"]);
    expect(seen("rectifier-diode")).toEqual(["d"]);
  });

  it("every capability a role asks for is offered by some kind", () => {
    const asked = new Set(engine.roles.map((r) => r.wants));
    for (const c of asked) expect(CAPABILITIES).toContain(c);
    for (const c of asked) expect(KINDS.some((k) => (k.can as Record<string, unknown>)[c] !== undefined)).toBe(true);
  });

  it("a role of two stages checks its part at both and names the stage in each finding", () => {
    const two = defineTopology({
      id: "two-stage-test",
      title: "Two stages",
      description: "A test topology whose one role serves two op-amp stages, to show a role may span several.",
      reading: "volts = code",
      fields: [],
      roles: [
        { id: "buffer", name: "Buffer", field: "Buffer", label: "two stages", wants: "amplify", rules: [offset] },
      ],
      roleTerms: [],
      evaluate: ({ design: d, role }) => {
        const rails = { positive_v: 5, negative_v: -5 };
        role(
          "buffer",
          [
            { id: "stage-1", stage: bufferStage() },
            // Noise gain 4 and a multiplier of 4: the summer of SPEC §11.2 sees four times the offset.
            { id: "stage-2", stage: { ...bufferStage(), noise_gain: 4, vos_multiplier: 4 } },
          ],
          rails,
        );
        return {
          ok: true,
          outcome: {
            derived: {
              rails,
              negative: { kind: "fixed" },
              target_ratio: 1,
              divider: null,
              ratio: 1,
              window_v: 1,
              thevenin_ohm: 0,
              adc_step_at_input_v: d.adc.reference_v / 2 ** d.adc.bits,
            },
            notes: [],
            terms: [],
            codesSpannedBits: d.adc.bits,
            conversion: { volts_per_code: 1, offset_v: 0, formula: "", sign: "" },
            display: [],
          },
        };
      },
    });
    const e2 = createEngine([two]);
    const catalogue = catalogueFromParts([opAmp({ id: "oa", vos_max_mv: "1", ib_max_na: "0" })]);
    const e = e2.evaluateDesign({ ...design(), topology: "two-stage-test" }, catalogue, "two-stage-test");
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    const findings = e.result.roles[0]?.resultOf("oa")?.findings ?? [];
    expect(findings.map((f) => [f.stage, f.rule])).toEqual([
      ["stage-1", "offset"],
      ["stage-2", "offset"],
    ]);
    // Output error m·Vos + Ib·R (Fiore, Operational Amplifiers & Linear ICs, ch. 5): 1 mV, then 4 × 1 mV.
    expect(findings.map((f) => f.available)).toEqual([0.001, 0.004].map((v) => expect.closeTo(v, 12)));
  });
});
