// Evaluates every candidate part for one role and ranks them; shared by the topologies.
import type { Part, PartKind } from "../catalogue.ts";
import type { Design, Role } from "../schemas/design.ts";
import { RULES_BY_ID, type RuleId } from "../../../rules/index.ts";
import { evaluatePart, rankRole } from "./evaluate-part.ts";
import type { RoleResult } from "./result.ts";
import type { Rails, Rule, Stage } from "./types.ts";

/** What every op-amp signal stage must pass, whatever the topology (SPEC §7, buffer row). */
export const OP_AMP_STAGE_RULES: readonly RuleId[] = [
  "supply-range",
  "input-common-mode",
  "output-swing",
  "unity-gain-stable",
  "phase-reversal",
  "offset",
  "bandwidth",
  "slew-rate",
];

export type RoleSpec = {
  kind: PartKind;
  kinds: readonly PartKind[];
  label: string;
  rules: readonly RuleId[];
  optional?: boolean;
};

export function runRole(
  design: Design,
  role: Role,
  spec: RoleSpec,
  stage: Stage,
  rails: Rails,
  candidates: readonly Part[],
): RoleResult {
  const rules = spec.rules.map((id) => RULES_BY_ID.get(id)).filter((r): r is Rule => r !== undefined);
  const bom = design.bom[role];
  const ctx = { role, stage, design, policy: design.policy, rails };
  const ranked = rankRole(candidates.map((p) => evaluatePart(rules, ctx, p, p.id === bom)));
  const chosen = bom ?? ranked.fits[0]?.part.id;
  return {
    role,
    kind: spec.kind,
    kinds: spec.kinds,
    label: spec.label,
    rules: spec.rules,
    stage,
    ...ranked,
    ...(bom !== undefined ? { bom } : {}),
    ...(chosen !== undefined ? { chosen } : {}),
    ...(spec.optional ? { optional: true } : {}),
  };
}
