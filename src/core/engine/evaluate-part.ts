// Runs a role's rules on one part and ranks the parts of a role (SPEC §7).
import type { Part } from "../catalogue.ts";
import type { Policy, Role } from "../schemas/design.ts";
import { finding } from "./finding.ts";
import { VERDICTS, type Finding, type RoleContext, type Rule, type Stage, type Verdict } from "./types.ts";
import { severity, unratedFinding, worst } from "./verdict.ts";

const UNRATED = severity("unrated");

export type PartResult = {
  readonly part: Part;
  readonly verdict: Verdict;
  /** Every rule's finding, in the role's rule order. */
  readonly findings: Finding[];
  /** Named for this role in the design's BOM. */
  readonly bom: boolean;
  /** Smallest margin relative to its limit, over the findings that have one. */
  readonly relative: number;
};

/**
 * A part's result keeps only its verdict and ranking key; the findings are
 * worked out again on first read. Rules are pure, so the second run gives the
 * same numbers, and a 2,000-part catalogue does not hold 30,000 findings in
 * memory between keystrokes of the try page when a page shows only a few.
 */
class LazyPartResult implements PartResult {
  readonly part: Part;
  readonly verdict: Verdict;
  readonly bom: boolean;
  readonly relative: number;
  #rules: readonly Rule[];
  #ctx: RoleContext;
  #findings: Finding[] | undefined;

  constructor(rules: readonly Rule[], ctx: RoleContext, part: Part, bom: boolean, verdict: Verdict, relative: number) {
    this.part = part;
    this.verdict = verdict;
    this.bom = bom;
    this.relative = relative;
    this.#rules = rules;
    this.#ctx = ctx;
  }

  get findings(): Finding[] {
    this.#findings ??= this.#rules.map((rule) => {
      const missing = missingColumns(rule, this.part);
      return missing.length > 0
        ? unratedFinding(rule.id, missing, rule.unit)
        : finding(rule, rule.measure(this.#ctx, this.part), this.#ctx, this.part);
    });
    return this.#findings;
  }

  toJSON() {
    return { part: this.part, verdict: this.verdict, findings: this.findings, bom: this.bom, relative: this.relative };
  }
}

function missingColumns(rule: Rule, part: Part): string[] {
  const needs = rule.needs[part.kind];
  if (needs === undefined) return [];
  const cells = part as Record<string, unknown>;
  return needs.filter((c) => cells[c] === undefined);
}

/** Whether any column the rule needs is empty; a loop, not a filter, as it runs for every part. */
function lacksColumn(rule: Rule, part: Part): boolean {
  const needs = rule.needs[part.kind];
  if (needs === undefined) return false;
  const cells = part as Record<string, unknown>;
  for (let i = 0; i < needs.length; i++) if (cells[needs[i] as string] === undefined) return true;
  return false;
}

/**
 * The hot path: every rule's numbers for one part, folded straight into the
 * verdict and the ranking key. No finding, sentence or array is made here.
 */
export function evaluatePart(rules: readonly Rule[], ctx: RoleContext, part: Part, bom: boolean): PartResult {
  let worstSeverity = 0;
  let least = Infinity;
  for (let i = 0; i < rules.length; i++) {
    const rule = rules[i] as Rule;
    if (lacksColumn(rule, part)) {
      worstSeverity = Math.max(worstSeverity, UNRATED);
      continue;
    }
    const m = rule.measure(ctx, part);
    worstSeverity = Math.max(worstSeverity, severity(m.verdict));
    if (m.limit !== undefined && m.limit > 0) least = Math.min(least, m.margin / m.limit);
  }
  const verdict = verdictOf(worstSeverity, ctx.policy);
  return new LazyPartResult(rules, ctx, part, bom, verdict, Number.isFinite(least) ? least : 0);
}

/** The worst finding; with allow_unrated an unrated finding counts as marginal. */
export function partVerdict(findings: readonly Finding[], policy: Policy): Verdict {
  return verdictOf(severity(worst(findings.map((f) => f.verdict))), policy);
}

function verdictOf(worstSeverity: number, policy: Policy): Verdict {
  const v = VERDICTS[worstSeverity] ?? "fail";
  return v === "unrated" && policy.allow_unrated ? "marginal" : v;
}

const STATUS_ORDER: Record<string, number> = { stocked: 0, approved: 1, listed: 2 };

/** Ranking of SPEC §7: verdict, status, cost band, relative margin (largest first), id. */
export function compareResults(a: PartResult, b: PartResult): number {
  return (
    severity(a.verdict) - severity(b.verdict) ||
    (STATUS_ORDER[a.part.status] ?? 3) - (STATUS_ORDER[b.part.status] ?? 3) ||
    (a.part.cost_band ?? 6) - (b.part.cost_band ?? 6) ||
    b.relative - a.relative ||
    (a.part.id < b.part.id ? -1 : a.part.id > b.part.id ? 1 : 0)
  );
}

export function isFit(v: Verdict): boolean {
  return v === "pass" || v === "marginal";
}

export type RoleParts = { fits: PartResult[]; rejected: PartResult[] };

export function rankRole(results: PartResult[]): RoleParts {
  const sorted = [...results].sort(compareResults);
  return { fits: sorted.filter((r) => isFit(r.verdict)), rejected: sorted.filter((r) => !isFit(r.verdict)) };
}

export type { Role, Stage };
