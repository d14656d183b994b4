// The accuracy budget of SPEC §8: input-referred error terms, their worst-case
// sum and root-sum-square (JCGM 100:2008, the GUM), the dominant term, and the
// same after a one-point gain calibration.
import type { Design } from "../schemas/design.ts";

/** What the budget reads of a role's result (RoleResult has it; no import, so no type cycle). */
export type BudgetRole = {
  role: string;
  optional?: boolean;
  chosen?: string;
  resultOf(
    id: string,
  ): { part: { id: string }; findings: readonly { rule: string; available: number | null }[] } | undefined;
};

export type BudgetTerm = {
  /** Stable key ("quantization", "buffer-offset" …). */
  name: string;
  /** Words for tables ("buffer offset (oa-x)"). */
  label: string;
  /** Input-referred error, volts (≥ 0). */
  v: number;
  /** Removed by a one-point gain calibration. */
  calibrates_out: boolean;
};

export type BudgetVerdict = "pass" | "marginal" | "fail";

export type BudgetSum = { worst_case_v: number; rss_v: number; verdict: BudgetVerdict; dominant: string | null };

export type Budget = BudgetSum & {
  terms: BudgetTerm[];
  required_v: number;
  /** After a one-point gain calibration: divider/network ratio and reference terms removed. */
  calibrated: BudgetSum;
  /** Codes of the ADC the signal actually spans, in bits. */
  effective_bits: number;
  /** Roles with no part to take terms from. */
  missing: string[];
};

/** A term taken from the chosen part's finding of one rule (its `available` is the input-referred error). */
export type RoleTerm = { name: string; label: string; role: string; rule: string };

export function sumTerms(terms: readonly BudgetTerm[], required: number): BudgetSum {
  let worst = 0;
  let squares = 0;
  let dominant: BudgetTerm | undefined;
  for (const t of terms) {
    worst += Math.abs(t.v);
    squares += t.v * t.v;
    if (!dominant || Math.abs(t.v) > Math.abs(dominant.v)) dominant = t;
  }
  const rss = Math.sqrt(squares);
  const verdict: BudgetVerdict = worst <= required ? "pass" : rss <= required ? "marginal" : "fail";
  return { worst_case_v: worst, rss_v: rss, verdict, dominant: dominant?.name ?? null };
}

export function buildBudget(
  design: Design,
  fixed: BudgetTerm[],
  roleTerms: readonly RoleTerm[],
  roles: readonly BudgetRole[],
  effectiveBits: number,
): Budget {
  const terms = [...fixed];
  const missing: string[] = [];
  for (const rt of roleTerms) {
    const role = roles.find((r) => r.role === rt.role);
    if (!role) continue;
    const chosen = role.chosen === undefined ? undefined : role.resultOf(role.chosen);
    const f = chosen?.findings.find((x) => x.rule === rt.rule);
    if (!chosen || !f || f.available === null) {
      if (!role.optional && !missing.includes(rt.role)) missing.push(rt.role);
      continue;
    }
    terms.push({
      name: rt.name,
      label: `${rt.label} (${chosen.part.id})`,
      v: Math.abs(f.available),
      calibrates_out: false,
    });
  }
  const required = design.accuracy.required_v;
  const all = sumTerms(terms, required);
  const calibrated = sumTerms(
    terms.filter((t) => !t.calibrates_out),
    required,
  );
  // An incomplete budget cannot pass: a role without a part hides its errors.
  if (missing.length > 0) {
    all.verdict = "fail";
    calibrated.verdict = "fail";
  }
  return { terms, required_v: required, ...all, calibrated, effective_bits: effectiveBits, missing };
}

/** Firmware conversion: input volts = (code + 0.5) · volts_per_code − offset_v, then the sign. */
export type Conversion = {
  volts_per_code: number;
  /** Input volts subtracted after scaling (0 when the sign comes from a comparator). */
  offset_v: number;
  /** The reading formula with this design's numbers. */
  formula: string;
  /** How the sign is obtained. */
  sign: string;
};
