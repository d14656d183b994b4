// A design's verdict (SPEC §11.11): it holds when every role has a fit, every
// BOM part fits and the budget's worst case fits the requirement; it is
// marginal when only the budget's root-sum-square fits; it fails otherwise,
// including when the budget could not be summed because a role has no part
// (an unknown error is never a pass). A budget that leaves out an unrated
// part's noise is at best marginal. Every surface (CLI text, JSON, CSV,
// markdown, JUnit, exit code, home page, design pages, try page) reads this.
import { formatSI } from "../units.ts";
import { isFitResult } from "./evaluate-part.ts";
import type { Budget } from "./budget.ts";
import type { RoleResult } from "./result.ts";

// The verdict's shape lives in verdict-shape.ts, which result.ts reads too (no import cycle).
export {
  DESIGN_STATES,
  STATE_WORDS,
  VERDICT_REASONS,
  type DesignState,
  type DesignVerdict,
  type VerdictReason,
  type VerdictReasonKind,
} from "./verdict-shape.ts";
import type { DesignVerdict, VerdictReason } from "./verdict-shape.ts";

// A rule every candidate fails is the design's problem, not the parts': name it
// first (a ground-only rail fails every op amp's negative output swing).
export function noFit(role: RoleResult): string {
  const candidates = role.rejected;
  const best = candidates[0];
  if (!best) return `${role.role}: no part fits, and the catalogue has no candidate of this kind`;
  const failsEverywhere = role.rules.filter((rule) =>
    candidates.every((p) => p.findings.some((f) => f.rule === rule && f.verdict === "fail")),
  );
  const rule = failsEverywhere.includes("output-swing") ? "output-swing" : failsEverywhere[0];
  if (rule !== undefined) {
    const example = candidates.map((p) => p.findings.find((f) => f.rule === rule)).find((f) => f !== undefined);
    return `${role.role}: no part fits; every candidate fails ${rule}, e.g. ${best.part.id}: ${example?.reason ?? ""}`;
  }
  const first = best.findings.find((f) => f.verdict === "fail") ?? best.findings.find((f) => f.verdict === "unrated");
  return `${role.role}: no part fits; the closest, ${best.part.id}, ${first?.verdict === "fail" ? "fails" : "is unrated on"} ${first?.rule ?? "a rule"}: ${first?.reason ?? ""}`;
}

/** Roles with no fit and BOM parts that do not fit, as reasons. */
export function roleShortfalls(roles: readonly RoleResult[]): VerdictReason[] {
  const out: VerdictReason[] = [];
  for (const role of roles) {
    if (role.fitCount === 0 && !(role.optional && role.bom === undefined)) {
      out.push({ kind: "no-fit", role: role.role, text: noFit(role) });
    }
    if (role.bom !== undefined) {
      const bom = role.resultOf(role.bom);
      if (isFitResult(bom)) continue;
      const first = bom?.findings.find((f) => f.verdict === "fail" || f.verdict === "unrated");
      out.push({
        kind: "bom-part-fails",
        role: role.role,
        text: `${role.role}: BOM part ${role.bom} does not fit${first ? ` (${first.rule}: ${first.reason})` : ""}`,
      });
    }
  }
  return out;
}

/** The budget's sums in words, as every reason about the budget states them. */
export function budgetSums(b: Budget): string {
  return `worst case ${formatSI(b.worst_case_v, "V")}, root-sum-square ${formatSI(b.rss_v, "V")}, required ${formatSI(b.required_v, "V")}`;
}

export function designVerdict(roles: readonly RoleResult[], budget: Budget): DesignVerdict {
  const reasons = roleShortfalls(roles);
  const b = budget;
  if (b.missing.length > 0) {
    reasons.push({
      kind: "budget-incomplete",
      text: `accuracy budget incomplete: no part for ${b.missing.join(", ")}`,
    });
  } else if (b.verdict === "fail") {
    reasons.push({ kind: "budget-fails", text: `accuracy budget fails (${budgetSums(b)})` });
  } else if (b.verdict === "marginal") {
    reasons.push({
      kind: "budget-marginal",
      text: `accuracy budget marginal: only the root-sum-square fits (${budgetSums(b)})`,
    });
  }
  // A noise figure missing a part's rating may understate the budget: never a plain "holds".
  if (b.noise && b.noise.unrated.length > 0 && b.missing.length === 0) {
    reasons.push({
      kind: "budget-unrated",
      text: `accuracy budget leaves out the noise of ${b.noise.unrated.join(", ")} (no noise_nv_rthz rating)`,
    });
  }
  const failing = reasons.some((r) => r.kind !== "budget-marginal" && r.kind !== "budget-unrated");
  return { state: failing ? "fails" : reasons.length > 0 ? "marginal" : "holds", reasons };
}

/** `check`'s exit code for a set of verdicts: 1 when one fails (or, strict, is marginal), else 0. */
export function exitCodeFor(verdicts: readonly DesignVerdict[], strict: boolean): 0 | 1 {
  return verdicts.some((v) => v.state === "fails" || (strict && v.state === "marginal")) ? 1 : 0;
}
