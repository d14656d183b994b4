// SPEC §4/§7: an empty cell in a column a rule needs gives `unrated`, never a silent
// pass. For every rule, kind and needed column: either the schema makes the column
// required (so a valid catalogue cannot leave it empty), or an empty cell gives an
// unrated finding that names the column.
import { describe, expect, it } from "vitest";
import type { Part, PartKind } from "../../src/core/catalogue.ts";
import { RULES } from "../../rules/index.ts";
import { rowProblems } from "../helpers/catalogue.ts";
import { comparator, diode, opAmp, type Cells } from "../helpers/parts.ts";
import { bufferStage, check, pumpDiodeStage, signStage } from "../helpers/rules.ts";
import type { RuleId } from "../../rules/index.ts";

const build: Record<PartKind, (c: Cells) => Part> = { "op-amp": opAmp, comparator, diode };
const stageFor = { "op-amp": bufferStage(), comparator: signStage(), diode: pumpDiodeStage() };

const needs = RULES.flatMap((rule) =>
  Object.entries(rule.needs as Readonly<Record<string, readonly string[]>>).flatMap(([kind, columns]) =>
    (columns ?? []).map((column) => [rule.id, kind as PartKind, column] as const),
  ),
);

describe("rules with an empty needed column", () => {
  it.each(needs)("%s on a %s with '%s' empty is unrated or cannot be loaded", (rule, kind, column) => {
    const problems = rowProblems(kind, { [column]: "" });
    if (problems.length > 0) {
      expect(problems.join("\n")).toContain(`column '${column}': required value is missing`);
      return;
    }
    const f = check(rule as RuleId, { part: build[kind]({ [column]: "" }), stage: stageFor[kind] });
    expect(f).toMatchObject({ rule, verdict: "unrated", needed: null, available: null, margin: null });
    expect(f.reason).toBe(`not rated: needs '${column}', which is empty for this part`);
  });

  it("the optional columns some rule needs are exactly phase_reversal, out_load_ohm, overload_recovery_us and trr_ns", () => {
    const optional = needs
      .filter(([, kind, column]) => rowProblems(kind, { [column]: "" }).length === 0)
      .map(([rule, , column]) => `${rule}:${column}`);
    expect(optional).toEqual([
      "output-load:out_load_ohm",
      "phase-reversal:phase_reversal",
      "overload-recovery:overload_recovery_us",
      "recovery:trr_ns",
    ]);
  });
});
