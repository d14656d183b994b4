// Runs a role's rules on one part and ranks the parts of a role (SPEC §7).
import type { Part } from "../catalogue-index.ts";
import type { Policy } from "../schemas/design.ts";
import { measured } from "../rule-kit/define.ts";
import { VERDICTS, type AnyRule, type Finding, type RoleContext, type Verdict } from "../rule-kit/types.ts";
import { severity, unratedFinding, worst } from "../rule-kit/verdict.ts";
import { finding } from "./finding.ts";

/**
 * What a role checks a part with: for each of its stages, the stage's rules
 * and context (the stage id names findings when a role has several stages).
 */
export type Checks = readonly { rules: readonly AnyRule[]; ctx: RoleContext; stage?: string }[];

const UNRATED = severity("unrated");
const MARGINAL = severity("marginal");

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
 * What a role's results read their verdict and ranking key from: the typed
 * arrays the engine scored the candidate list into, shared by every result.
 */
export type ScoredList = {
  readonly checks: Checks;
  /** Severity of each place in the list, after allow_unrated. */
  readonly severity: Uint8Array;
  readonly relative: Float64Array;
  /** The part the design's BOM names for the role. */
  readonly bom: string | undefined;
};

/**
 * A part's result holds only the part, the list it was scored in and its
 * place there: verdict and ranking key are read from the list's typed arrays,
 * and the findings are worked out again on first read. Rules are pure, so the
 * second run gives the same numbers; a 2,000-part catalogue does not hold
 * 30,000 findings between keystrokes of the try page, and a 100,000-part
 * ranking makes small objects that the collector moves cheaply.
 */
class LazyPartResult implements PartResult {
  readonly part: Part;
  readonly #list: ScoredList;
  readonly #place: number;
  #findings: Finding[] | undefined;

  constructor(list: ScoredList, part: Part, place: number) {
    this.part = part;
    this.#list = list;
    this.#place = place;
  }

  get verdict(): Verdict {
    return VERDICTS[this.#list.severity[this.#place] as number] ?? "fail";
  }

  get relative(): number {
    return this.#list.relative[this.#place] as number;
  }

  get bom(): boolean {
    return this.part.id === this.#list.bom;
  }

  get findings(): Finding[] {
    this.#findings ??= this.#list.checks.flatMap(({ rules, ctx, stage }) =>
      rules.map((rule) => {
        const missing = missingColumns(rule, this.part);
        if (missing.length === 0) return finding(rule, ctx, this.part, stage);
        const unrated = unratedFinding(rule.id, missing, rule.unit);
        return stage === undefined ? unrated : { ...unrated, stage };
      }),
    );
    return this.#findings;
  }

  toJSON() {
    return { part: this.part, verdict: this.verdict, findings: this.findings, bom: this.bom, relative: this.relative };
  }
}

function missingColumns(rule: AnyRule, part: Part): string[] {
  const needs: readonly string[] | undefined = rule.needs[part.kind];
  if (needs === undefined) return [];
  const cells = part as Record<string, unknown>;
  return needs.filter((c) => cells[c] === undefined);
}

// Most catalogues fill every column a role's rules need, so whether a part
// leaves any empty is worked out once per candidate list and set of rules
// (parts are immutable), and the per-rule check runs only for the parts that do.
const gapsByList = new WeakMap<readonly Part[], Map<string, Uint8Array>>();

/** 1 for each part that leaves a column some rule of these checks needs empty. */
export function partsWithGaps(parts: readonly Part[], checks: Checks): Uint8Array {
  const rules = [...new Set(checks.flatMap((c) => c.rules))];
  const key = rules.map((r) => r.id).join(" ");
  let byRules = gapsByList.get(parts);
  if (byRules === undefined) {
    byRules = new Map();
    gapsByList.set(parts, byRules);
  }
  let gaps = byRules.get(key);
  if (gaps === undefined) {
    const needed = new Map<string, string[]>();
    const columnsOf = (kind: string) => {
      let cols = needed.get(kind);
      if (cols === undefined) {
        cols = [...new Set(rules.flatMap((r): readonly string[] => r.needs[kind as Part["kind"]] ?? []))];
        needed.set(kind, cols);
      }
      return cols;
    };
    gaps = Uint8Array.from(parts, (p) =>
      columnsOf(p.kind).some((c) => (p as Record<string, unknown>)[c] === undefined) ? 1 : 0,
    );
    byRules.set(key, gaps);
  }
  return gaps;
}

// One record every rule writes into in turn: the hot path allocates nothing per part.
const scratch = measured();

/**
 * The hot path: every rule's numbers for one part, folded straight into a
 * severity (returned, after allow_unrated) and the least relative margin
 * (written to relative[i]). No finding, sentence or result object is made.
 */
export function scorePart(checks: Checks, part: Part, mayLack: boolean, relative: Float64Array, i: number): number {
  let worstSeverity = 0;
  let least = Infinity;
  const m = scratch;
  for (let c = 0; c < checks.length; c++) {
    const { rules, ctx } = checks[c] as Checks[number];
    for (let r = 0; r < rules.length; r++) {
      const rule = rules[r] as AnyRule;
      if (mayLack && missingColumns(rule, part).length > 0) {
        worstSeverity = Math.max(worstSeverity, UNRATED);
        continue;
      }
      rule.measure(ctx, part, m);
      worstSeverity = Math.max(worstSeverity, severity(m.verdict));
      if (m.limit !== undefined && m.limit > 0) least = Math.min(least, m.margin / m.limit);
    }
  }
  relative[i] = Number.isFinite(least) ? least : 0;
  return allowingUnrated(worstSeverity, (checks[0] as Checks[number]).ctx.policy);
}

/** With allow_unrated an unrated part counts as marginal. */
function allowingUnrated(worstSeverity: number, policy: Policy): number {
  return worstSeverity === UNRATED && policy.allow_unrated ? MARGINAL : worstSeverity;
}

/** The result of the part at `place` in a scored list, as a role's ranking makes it when read. */
export function partResult(list: ScoredList, part: Part, place: number): PartResult {
  return new LazyPartResult(list, part, place);
}

/** Scores one part on its own (tests and single lookups); roles score whole lists in runRole. */
export function evaluatePart(rules: readonly AnyRule[], ctx: RoleContext, part: Part, bom: boolean): PartResult {
  const relative = new Float64Array(1);
  const checks: Checks = [{ rules, ctx }];
  const severity = Uint8Array.of(scorePart(checks, part, true, relative, 0));
  return partResult({ checks, severity, relative, bom: bom ? part.id : undefined }, part, 0);
}

/** The worst finding's verdict, as scorePart folds it; with allow_unrated an unrated finding counts as marginal. */
export function partVerdict(findings: readonly Finding[], policy: Policy): Verdict {
  return VERDICTS[allowingUnrated(severity(worst(findings.map((f) => f.verdict))), policy)] ?? "fail";
}

/** stocked, approved, listed, then anything else; a switch, as it runs for every candidate. */
function statusOrder(status: string): number {
  switch (status) {
    case "stocked":
      return 0;
    case "approved":
      return 1;
    case "listed":
      return 2;
    default:
      return 3;
  }
}

/** Verdict, status and cost band (unrated cost last) folded into one integer, smallest first. */
export function majorKey(severityOfPart: number, part: Part): number {
  return severityOfPart * 64 + statusOrder(part.status) * 8 + (part.cost_band ?? 6);
}

export function idOrder(a: Part, b: Part): number {
  return a.id < b.id ? -1 : a.id > b.id ? 1 : 0;
}

/** Ranking of SPEC §7: verdict, status, cost band, relative margin (largest first), id. */
export function compareResults(a: PartResult, b: PartResult): number {
  return (
    majorKey(severity(a.verdict), a.part) - majorKey(severity(b.verdict), b.part) ||
    b.relative - a.relative ||
    idOrder(a.part, b.part)
  );
}

export function isFit(v: Verdict): boolean {
  return v === "pass" || v === "marginal";
}

export function isFitResult(r: PartResult | undefined): boolean {
  return r !== undefined && isFit(r.verdict);
}
