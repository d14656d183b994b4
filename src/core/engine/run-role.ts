// Evaluates every candidate part for one role and ranks them; shared by the topologies.
import type { Part, PartKind } from "../catalogue-index.ts";
import type { Design, Role } from "../schemas/design.ts";
import type { AnyRule, Rails, RoleContext, Stage } from "../rule-kit/types.ts";
import { majorKey, partsWithGaps, scorePart, type Checks } from "./evaluate-part.ts";
import { RoleRanking } from "./ranking.ts";
import type { RoleResult } from "./result.ts";
import type { StagePlan } from "./topology.ts";

/** A role as the engine runs it: its definition with the kinds that can fill it worked out. */
export type RoleSpec = {
  /** The kind made for the role (the first of `kinds`). */
  kind: PartKind;
  kinds: readonly PartKind[];
  label: string;
  rules: readonly AnyRule[];
  optional?: boolean;
  count?: number;
};

export function runRole(
  design: Design,
  role: Role,
  spec: RoleSpec,
  stages: Stage | readonly StagePlan[],
  rails: Rails,
  candidates: readonly Part[],
): RoleResult {
  const checks: Checks = !isPlanList(stages)
    ? [{ rules: spec.rules, ctx: { role, stage: stages, design, policy: design.policy, rails } }]
    : stages.map((p) => ({
        rules: p.rules ?? spec.rules,
        ctx: { role, stage: p.stage, design, policy: design.policy, rails } satisfies RoleContext,
        stage: p.id,
      }));
  const bom = design.bom[role];
  const n = candidates.length;
  const severities = new Uint8Array(n);
  const majorKeys = new Uint16Array(n);
  let bomPlace = -1;
  const relative = new Float64Array(n);
  const gaps = partsWithGaps(candidates, checks);
  for (let i = 0; i < n; i++) {
    const part = candidates[i] as Part;
    if (bom !== undefined && part.id === bom) bomPlace = i;
    const severity = scorePart(checks, part, gaps[i] === 1, relative, i);
    severities[i] = severity;
    majorKeys[i] = majorKey(severity, part);
  }
  const ranking = new RoleRanking(checks, candidates, severities, majorKeys, relative, bom, bomPlace);
  const chosen = bom ?? ranking.bestFit();
  const first = checks[0] as Checks[number];
  return {
    role,
    kind: spec.kind,
    kinds: spec.kinds,
    label: spec.label,
    rules: [...new Set(checks.flatMap((c) => c.rules.map((r) => r.id)))],
    stage: first.ctx.stage,
    stages: checks.map((c) => ({
      ...(c.stage !== undefined ? { id: c.stage } : {}),
      stage: c.ctx.stage,
      rules: c.rules.map((r) => r.id),
    })),
    ...(spec.count !== undefined ? { count: spec.count } : {}),
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

function isPlanList(stages: Stage | readonly StagePlan[]): stages is readonly StagePlan[] {
  return Array.isArray(stages);
}
