// The rule set of SPEC §7: ids exactly as listed, each documented, each asking only
// for columns that exist in the kinds it applies to.
import { describe, expect, it } from "vitest";
import { KINDS } from "../../src/core/catalogue.ts";
import { POLICY_DEFAULTS } from "../../src/core/schemas/design.ts";
import { RULES, RULES_BY_ID } from "../../rules/index.ts";

const SPEC_IDS = [
  "supply-range",
  "input-common-mode",
  "output-swing",
  "unity-gain-stable",
  "phase-reversal",
  "offset",
  "bandwidth",
  "slew-rate",
  "zero-crossing",
  "logic-high",
  "logic-low",
  "propagation-delay",
  "sign-dead-band",
  "reverse-voltage",
  "recovery",
  "leakage",
  "forward-current",
];

describe("RULES", () => {
  it("has the 17 rules of SPEC §7, ids exactly as written there, once each", () => {
    expect(RULES.map((r) => r.id)).toEqual(SPEC_IDS);
    expect([...RULES_BY_ID.keys()]).toEqual(SPEC_IDS);
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
