// The accuracy budget of SPEC §8 and §11: input-referred error terms, their
// worst-case sum and root-sum-square (JCGM 100:2008, the GUM), the dominant
// term, and the same after a calibration. Every term carries its arithmetic
// with this design's numbers and the least calibration that removes it, so a
// new term (timing, noise, the converter) is one more entry in the list.
import type { Design } from "../schemas/design.ts";
import { formatSI } from "../units.ts";

/** What the budget reads of a role's result (RoleResult has it; no import, so no type cycle). */
export type BudgetRole = {
  role: string;
  optional?: boolean;
  chosen?: string;
  resultOf(id: string):
    | {
        part: { id: string };
        findings: readonly {
          rule: string;
          available: number | null;
          stage?: string;
          steps: readonly { label: string; value: number; unit: string }[];
        }[];
      }
    | undefined;
};

/**
 * The least calibration that removes a term: a one-point gain calibration
 * (one known input near full scale: ratios, reference tolerance, gain
 * errors), a two-point calibration (zero and full scale: also true offsets),
 * or none (quantization, noise, INL, timing, anything that differs between
 * the two half-waves).
 */
export const CALIBRATIONS = ["one-point", "two-point", "none"] as const;
export type Calibration = (typeof CALIBRATIONS)[number];

/** What every surface says a term's calibration is. */
export const CALIBRATION_WORDS: Record<Calibration, string> = {
  "one-point": "one-point gain calibration",
  "two-point": "two-point calibration",
  none: "no calibration",
};

export type BudgetTerm = {
  /** Stable key ("quantization", "buffer-offset" …). */
  name: string;
  /** Words for tables ("buffer offset (oa-x)"). */
  label: string;
  /** Input-referred error, volts (≥ 0). */
  v: number;
  /** Its arithmetic with this design's numbers ("0.5 × 4.883 mV ÷ 0.2453 = 9.953 mV"). */
  formula: string;
  /** The least calibration that removes it. */
  removed_by: Calibration;
  /** Removed by a one-point gain calibration (removed_by is "one-point"). */
  calibrates_out: boolean;
  /** The part it comes from, when it comes from one (role, part id, stage of a role of several). */
  from?: { role: string; part: string; stage?: string };
};

export type BudgetVerdict = "pass" | "marginal" | "fail";

export type BudgetSum = { worst_case_v: number; rss_v: number; verdict: BudgetVerdict; dominant: string | null };

/** Random noise of the chain, input-referred, and what it leaves of the converter's bits (SPEC §11.9). */
export type NoiseFigure = {
  /** RMS noise at the signal input, volts (every source combined root-sum-square). */
  rms_v: number;
  /** SINAD of a full-scale sine at the converter, noise plus quantization Q/√12, dB (IEEE Std 1241-2010). */
  sinad_db: number;
  /** (SINAD − 1.76)/6.02 (IEEE Std 1241-2010). */
  enob: number;
  /** Parts whose noise is not rated and is therefore left out: the figure is a lower bound. */
  unrated: string[];
};

export type Budget = BudgetSum & {
  terms: BudgetTerm[];
  required_v: number;
  /** After a one-point gain calibration: the terms it removes left out. */
  calibrated: BudgetSum;
  /** After a two-point (zero and full-scale) calibration: gain and true offset terms left out. */
  calibrated_two_point: BudgetSum;
  /** Codes of the ADC the signal actually spans, in bits (not an ENOB). */
  codes_spanned_bits: number;
  /** Noise and ENOB, when the topology reports them. */
  noise?: NoiseFigure;
  /** Roles with no part to take terms from. */
  missing: string[];
};

/**
 * A term taken from the chosen part's finding of one rule (its `available` is
 * the input-referred error). `stage` picks the finding of one stage of a role
 * of several; `removed_by` defaults to "none".
 */
export type RoleTerm = {
  name: string;
  label: string;
  role: string;
  rule: string;
  stage?: string;
  removed_by?: Calibration;
};

/** A term, with `calibrates_out` following from `removed_by`. */
export function budgetTerm(
  name: string,
  label: string,
  v: number,
  formula: string,
  removed_by: Calibration,
  from?: BudgetTerm["from"],
): BudgetTerm {
  return { name, label, v, formula, removed_by, calibrates_out: removed_by === "one-point", ...(from ? { from } : {}) };
}

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

/** A finding's arithmetic as a formula: its steps up to the error, without the limit and margin lines. */
function stepsFormula(steps: readonly { label: string; value: number; unit: string }[]): string {
  return steps
    .filter((s) => !/^(limit|margin)\b/.test(s.label))
    .map((s) => `${s.label} = ${s.unit === "" ? String(Number(s.value.toPrecision(4))) : formatSI(s.value, s.unit)}`)
    .join("; ");
}

export type BudgetInputs = {
  fixed: readonly BudgetTerm[];
  roleTerms: readonly RoleTerm[];
  roles: readonly BudgetRole[];
  codesSpannedBits: number;
  noise?: NoiseFigure;
};

export function buildBudget(design: Design, inputs: BudgetInputs): Budget {
  const { fixed, roleTerms, roles, codesSpannedBits, noise } = inputs;
  const terms = [...fixed];
  const missing: string[] = [];
  for (const rt of roleTerms) {
    const role = roles.find((r) => r.role === rt.role);
    if (!role) continue;
    const chosen = role.chosen === undefined ? undefined : role.resultOf(role.chosen);
    const f = chosen?.findings.find((x) => x.rule === rt.rule && (rt.stage === undefined || x.stage === rt.stage));
    if (!chosen || !f || f.available === null) {
      if (!role.optional && !missing.includes(rt.role)) missing.push(rt.role);
      continue;
    }
    terms.push(
      budgetTerm(
        rt.name,
        `${rt.label} (${chosen.part.id})`,
        Math.abs(f.available),
        stepsFormula(f.steps),
        rt.removed_by ?? "none",
        { role: rt.role, part: chosen.part.id, ...(rt.stage !== undefined ? { stage: rt.stage } : {}) },
      ),
    );
  }
  const required = design.accuracy.required_v;
  const all = sumTerms(terms, required);
  const calibrated = sumTerms(
    terms.filter((t) => t.removed_by === "none" || t.removed_by === "two-point"),
    required,
  );
  const twoPoint = sumTerms(
    terms.filter((t) => t.removed_by === "none"),
    required,
  );
  // An incomplete budget cannot pass: a role without a part hides its errors.
  if (missing.length > 0) {
    all.verdict = "fail";
    calibrated.verdict = "fail";
    twoPoint.verdict = "fail";
  }
  return {
    terms,
    required_v: required,
    ...all,
    calibrated,
    calibrated_two_point: twoPoint,
    codes_spanned_bits: codesSpannedBits,
    ...(noise ? { noise } : {}),
    missing,
  };
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
