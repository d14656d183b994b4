// Runs a role's rules on one part and ranks the parts of a role (SPEC §7).
import type { Part } from "../catalogue.ts";
import type { Policy, Role } from "../schemas/design.ts";
import type { Finding, Rule, RuleContext, Stage, Verdict } from "./types.ts";
import { severity, unratedFinding, worst } from "./verdict.ts";

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
 * same findings, and a 2,000-part catalogue does not hold 30,000 findings in
 * memory between keystrokes of the try page when a page shows only a few.
 */
class LazyPartResult implements PartResult {
  readonly part: Part;
  readonly verdict: Verdict;
  readonly bom: boolean;
  readonly relative: number;
  #rules: readonly Rule[];
  #ctx: Omit<RuleContext, "part">;
  #findings: Finding[] | undefined;

  constructor(rules: readonly Rule[], ctx: Omit<RuleContext, "part">, part: Part, bom: boolean) {
    const findings = runRules(rules, ctx, part);
    this.part = part;
    this.verdict = partVerdict(findings, ctx.policy);
    this.bom = bom;
    this.relative = relativeMargin(findings);
    this.#rules = rules;
    this.#ctx = ctx;
  }

  get findings(): Finding[] {
    this.#findings ??= runRules(this.#rules, this.#ctx, this.part);
    return this.#findings;
  }

  toJSON() {
    return { part: this.part, verdict: this.verdict, findings: this.findings, bom: this.bom, relative: this.relative };
  }
}

function runRules(rules: readonly Rule[], ctx: Omit<RuleContext, "part">, part: Part): Finding[] {
  const findings: Finding[] = [];
  const partCtx: RuleContext = { ...ctx, part };
  const cells = part as Record<string, unknown>;
  for (const rule of rules) {
    const needs = rule.needs[part.kind];
    if (needs !== undefined && needs.some((c) => cells[c] === undefined)) {
      findings.push(
        unratedFinding(
          rule.id,
          needs.filter((c) => cells[c] === undefined),
          rule.unit,
        ),
      );
    } else findings.push(rule.evaluate(partCtx));
  }
  return findings;
}

export function evaluatePart(
  rules: readonly Rule[],
  ctx: Omit<RuleContext, "part">,
  part: Part,
  bom: boolean,
): PartResult {
  return new LazyPartResult(rules, ctx, part, bom);
}

/** The worst finding; with allow_unrated an unrated finding counts as marginal. */
export function partVerdict(findings: readonly Finding[], policy: Policy): Verdict {
  const v = worst(findings.map((f) => f.verdict));
  return v === "unrated" && policy.allow_unrated ? "marginal" : v;
}

function relativeMargin(findings: readonly Finding[]): number {
  let least = Infinity;
  for (const f of findings) {
    if (f.margin === null || f.limit === undefined || !(f.limit > 0)) continue;
    least = Math.min(least, f.margin / f.limit);
  }
  return Number.isFinite(least) ? least : 0;
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
