// The rule registry: each rule documented, used by a role, and asking only for
// columns that exist in the kinds it applies to.
import { describe, expect, it } from "vitest";
import { KINDS } from "../../src/core/catalogue.ts";
import { POLICY_DEFAULTS } from "../../src/core/schemas/design.ts";
import { RULE_IDS, RULES, RULES_BY_ID } from "../../rules/index.ts";
import { TOPOLOGIES } from "../../src/topologies/index.ts";

describe("RULES", () => {
  // Ids come from the list itself (RuleId is derived from it): no second copy to keep in step.
  it("has each id once, in kebab case, and RULES_BY_ID follows the list", () => {
    expect(new Set(RULE_IDS).size).toBe(RULES.length);
    for (const id of RULE_IDS) expect(id).toMatch(/^[a-z]+(-[a-z]+)*$/);
    expect([...RULES_BY_ID.keys()]).toEqual(RULE_IDS);
  });

  it("every rule is used by some role of some topology, and every role's rule is in the registry", () => {
    const used = new Set(TOPOLOGIES.flatMap((t) => t.roles.flatMap((r) => r.rules)));
    expect(RULES.filter((r) => !used.has(r)).map((r) => r.id)).toEqual([]);
    expect([...used].filter((r) => RULES_BY_ID.get(r.id) !== r).map((r) => r.id)).toEqual([]);
  });

  it.each(RULES.map((r) => [r.id, r] as const))("%s says what it checks, its formula and its source", (_id, rule) => {
    expect(rule.checks).toMatch(/\w.*\.$/);
    expect(rule.formula.length).toBeGreaterThan(10);
    expect(rule.source.length).toBeGreaterThan(10);
    expect(rule.kinds.length).toBeGreaterThan(0);
    if (rule.policy !== null) expect(Object.keys(POLICY_DEFAULTS)).toContain(rule.policy);
  });

  it.each(RULES.map((r) => [r.id, r] as const))("%s needs only columns its kinds have", (_id, rule) => {
    for (const [kind, columns] of Object.entries(rule.needs)) {
      expect(rule.kinds).toContain(kind);
      const known = Object.keys(KINDS.find((k) => k.kind === kind)?.columns ?? {});
      for (const c of columns ?? []) expect(known).toContain(c);
    }
  });
});
