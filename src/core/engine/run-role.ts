// Evaluates every candidate part for one role and ranks them; shared by the topologies.
import type { Part, PartKind } from "../catalogue.ts";
import type { Design, Role } from "../schemas/design.ts";
import { RULES_BY_ID, type RuleId } from "../../../rules/index.ts";
import { majorKey, partsWithGaps, scorePart } from "./evaluate-part.ts";
import { RoleRanking } from "./ranking.ts";
import type { RoleResult } from "./result.ts";
import type { Rails, RoleContext, Rule, Stage } from "./types.ts";

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
  const ctx: RoleContext = { role, stage, design, policy: design.policy, rails };
  const n = candidates.length;
  const severities = new Uint8Array(n);
  const majorKeys = new Uint16Array(n);
  let bomPlace = -1;
  const relative = new Float64Array(n);
  const gaps = partsWithGaps(candidates);
  for (let i = 0; i < n; i++) {
    const part = candidates[i] as Part;
    if (bom !== undefined && part.id === bom) bomPlace = i;
    const severity = scorePart(rules, ctx, part, gaps[i] === 1, relative, i);
    severities[i] = severity;
    majorKeys[i] = majorKey(severity, part);
  }
  const ranking = new RoleRanking(rules, ctx, candidates, severities, majorKeys, relative, bom, bomPlace);
  const chosen = bom ?? ranking.bestFit();
  return {
    role,
    kind: spec.kind,
    kinds: spec.kinds,
    label: spec.label,
    rules: spec.rules,
    stage,
    // Ranked, and made into result objects, only when read.
    get fits() {
      return ranking.fits;
    },
    get rejected() {
      return ranking.rejected;
    },
    get fitCount() {
      return ranking.fitCount;
    },
    resultOf: (id: string) => ranking.resultOf(id),
    ...(bom !== undefined ? { bom } : {}),
    ...(chosen !== undefined ? { chosen } : {}),
    ...(spec.optional ? { optional: true } : {}),
  };
}
