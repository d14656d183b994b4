// What a change to the data does to the designs' verdicts: two sets of
// evaluated designs in, the differences out as data (the renderers word them).
// Pure: no disk, no git; src/node/ reads the two data sets.
import type { PartResult } from "../../core/engine/evaluate-part.ts";
import { isFitResult } from "../../core/engine/evaluate-part.ts";
import type { DesignResult, RoleResult } from "../../core/engine/result.ts";
import type { Finding, Verdict } from "../../core/engine/types.ts";
import { designState, type DesignState } from "../design-state.ts";

/** One rule's finding on one side of the change. */
export type RuleSide = { verdict: Verdict; reason: string };
/** A rule whose verdict differs between the sides (or that exists on one side only); `stage` in a role of several stages. */
export type RuleChange = { rule: string; stage?: string; before: RuleSide | null; after: RuleSide | null };

export type PartChangeKind =
  /** Did not fit (or was not a candidate) and now fits. */
  | "fit-gained"
  /** Fitted and now does not (or is no longer a candidate). */
  | "fit-lost"
  /** Still fits, or still does not, with another verdict (pass ↔ marginal, fail ↔ unrated). */
  | "verdict-changed";

export type PartChange = {
  part: string;
  change: PartChangeKind;
  /** Named for this role in the BOM on either side. */
  bom: boolean;
  /** Null when the part is no candidate for the role on that side (not in the catalogue, or another kind). */
  before: Verdict | null;
  after: Verdict | null;
  /** The rules that make the difference, each with its reason before and after. */
  rules: RuleChange[];
};

export type BomChange = {
  /** The BOM part on each side; a design edit may name another part. */
  before: string | null;
  after: string | null;
  fitsBefore: boolean | null;
  fitsAfter: boolean | null;
  /** The BOM part no longer fits where it (or the part it replaced) did, or is newly named and does not fit. */
  stopsFitting: boolean;
};

export type RoleDiff = {
  role: string;
  label: string;
  /** "added" / "removed" when the role exists on one side only (the topology changed). */
  presence: "both" | "added" | "removed";
  fits: { before: number; after: number };
  /** Present when the best-ranked fit differs. */
  best?: { before: string | null; after: string | null };
  /** Present when the BOM part, or whether it fits, differs. */
  bom?: BomChange;
  parts: PartChange[];
};

export type BudgetSide = { worst_case_v: number; rss_v: number; required_v: number; verdict: string };
export type TermSide = { label: string; v: number };
/** A budget term that moved, appeared or went (its label names the part it comes from). */
export type TermChange = { name: string; before: TermSide | null; after: TermSide | null };
export type BudgetChange = { before: BudgetSide; after: BudgetSide; terms: TermChange[] };

export type StateSide = { state: DesignState; reasons: string[] };

export type DesignDiff = {
  id: string;
  title: string;
  presence: "both" | "added" | "removed";
  topology: { before: string | null; after: string | null };
  state: { before: StateSide | null; after: StateSide | null };
  /** Present when the budget's worst case or verdict moved. */
  budget?: BudgetChange;
  /** Only the roles with a difference. */
  roles: RoleDiff[];
  /** Why this design makes `diff` exit 1; empty when it does not. */
  regressions: string[];
};

export type DiffReport = {
  before: string;
  after: string;
  /** Designs that differ, in id order. */
  changed: DesignDiff[];
  /** Ids of the designs evaluated on both sides with no difference. */
  unchanged: string[];
  regressions: string[];
};

/** Relative size of a budget move that counts (float noise from reordered sums is far below it). */
const BUDGET_TOLERANCE = 1e-9;

const fits = (p: PartResult | undefined): boolean => isFitResult(p);

function byId(role: RoleResult): Map<string, PartResult> {
  const map = new Map<string, PartResult>();
  for (const p of role.fits) map.set(p.part.id, p);
  for (const p of role.rejected) map.set(p.part.id, p);
  return map;
}

/** A rule is checked once per stage: the pair names one finding. */
const findingKey = (f: Finding) => `${f.stage ?? ""}/${f.rule}`;
const named = (f: Finding) => ({ rule: f.rule, ...(f.stage !== undefined ? { stage: f.stage } : {}) });

function ruleChanges(before: PartResult | undefined, after: PartResult | undefined): RuleChange[] {
  // A part on one side only: its findings that are not a pass say why it fits, or not.
  if (!before || !after) {
    const side = (before ?? after) as PartResult;
    const shown = side.findings.filter((f) => f.verdict !== "pass");
    return shown.map((f) => {
      const s = { verdict: f.verdict, reason: f.reason };
      return { ...named(f), before: before ? s : null, after: after ? s : null };
    });
  }
  const out: RuleChange[] = [];
  const afterByRule = new Map(after.findings.map((f) => [findingKey(f), f]));
  for (const b of before.findings) {
    const a = afterByRule.get(findingKey(b));
    afterByRule.delete(findingKey(b));
    if (a && a.verdict === b.verdict) continue;
    out.push({
      ...named(b),
      before: { verdict: b.verdict, reason: b.reason },
      after: a ? { verdict: a.verdict, reason: a.reason } : null,
    });
  }
  for (const a of afterByRule.values())
    out.push({ ...named(a), before: null, after: { verdict: a.verdict, reason: a.reason } });
  return out;
}

function partChange(
  id: string,
  before: PartResult | undefined,
  after: PartResult | undefined,
  bom: boolean,
): PartChange | undefined {
  if (before && after && before.verdict === after.verdict) return undefined;
  const fb = fits(before);
  const fa = fits(after);
  const change: PartChangeKind = !fb && fa ? "fit-gained" : fb && !fa ? "fit-lost" : "verdict-changed";
  // A part that joins or leaves the catalogue without fitting either way changes no verdict.
  if (change === "verdict-changed" && (!before || !after)) return undefined;
  return {
    part: id,
    change,
    bom,
    before: before?.verdict ?? null,
    after: after?.verdict ?? null,
    rules: ruleChanges(before, after),
  };
}

const CHANGE_ORDER: Record<PartChangeKind, number> = { "fit-lost": 0, "fit-gained": 1, "verdict-changed": 2 };

function bomChange(before: RoleResult | undefined, after: RoleResult | undefined): BomChange | undefined {
  const b = before?.bom ?? null;
  const a = after?.bom ?? null;
  if (b === null && a === null) return undefined;
  const fitsBefore = b === null || !before ? null : fits(before.resultOf(b));
  const fitsAfter = a === null || !after ? null : fits(after.resultOf(a));
  if (b === a && fitsBefore === fitsAfter) return undefined;
  // Already failing with the same BOM part is not news; anything else that ends unfit is.
  const stopsFitting = fitsAfter === false && !(b === a && fitsBefore === false);
  return { before: b, after: a, fitsBefore, fitsAfter, stopsFitting };
}

export function compareRoles(before: RoleResult | undefined, after: RoleResult | undefined): RoleDiff | undefined {
  const some = (after ?? before) as RoleResult;
  const beforeParts = before ? byId(before) : new Map<string, PartResult>();
  const afterParts = after ? byId(after) : new Map<string, PartResult>();
  const boms = new Set([before?.bom, after?.bom].filter((x): x is string => x !== undefined));
  const parts: PartChange[] = [];
  for (const id of new Set([...beforeParts.keys(), ...afterParts.keys()])) {
    const c = partChange(id, beforeParts.get(id), afterParts.get(id), boms.has(id));
    if (c) parts.push(c);
  }
  parts.sort((x, y) => CHANGE_ORDER[x.change] - CHANGE_ORDER[y.change] || x.part.localeCompare(y.part));
  const bestBefore = before?.fits[0]?.part.id ?? null;
  const bestAfter = after?.fits[0]?.part.id ?? null;
  const bom = bomChange(before, after);
  const presence = before && after ? "both" : before ? "removed" : "added";
  if (presence === "both" && parts.length === 0 && bestBefore === bestAfter && !bom) return undefined;
  return {
    role: some.role,
    label: some.label,
    presence,
    fits: { before: before?.fitCount ?? 0, after: after?.fitCount ?? 0 },
    ...(bestBefore !== bestAfter ? { best: { before: bestBefore, after: bestAfter } } : {}),
    ...(bom ? { bom } : {}),
    parts,
  };
}

function budgetSide(r: DesignResult): BudgetSide {
  const b = r.budget;
  return { worst_case_v: b.worst_case_v, rss_v: b.rss_v, required_v: b.required_v, verdict: b.verdict };
}

const moved = (a: number, b: number) => Math.abs(a - b) > BUDGET_TOLERANCE * Math.max(Math.abs(a), Math.abs(b));

export function compareBudgets(before: DesignResult, after: DesignResult): BudgetChange | undefined {
  const b = budgetSide(before);
  const a = budgetSide(after);
  if (!moved(b.worst_case_v, a.worst_case_v) && b.verdict === a.verdict && b.required_v === a.required_v)
    return undefined;
  const terms: TermChange[] = [];
  const afterTerms = new Map(after.budget.terms.map((t) => [t.name, t]));
  const side = (t: { label: string; v: number }): TermSide => ({ label: t.label, v: t.v });
  for (const t of before.budget.terms) {
    const other = afterTerms.get(t.name);
    afterTerms.delete(t.name);
    if (!other || moved(t.v, other.v) || t.label !== other.label)
      terms.push({ name: t.name, before: side(t), after: other ? side(other) : null });
  }
  for (const t of afterTerms.values()) terms.push({ name: t.name, before: null, after: side(t) });
  return { before: b, after: a, terms };
}

/**
 * Compares one design on both sides. `strict` counts a marginal design as
 * failing, as `check --strict` does.
 */
export function compareDesigns(
  before: DesignResult | undefined,
  after: DesignResult | undefined,
  strict = false,
): DesignDiff | undefined {
  const some = (after ?? before) as DesignResult;
  const sb = before ? designState(before) : null;
  const sa = after ? designState(after) : null;
  const roles: RoleDiff[] = [];
  const names = [...(before?.roles ?? []), ...(after?.roles ?? [])].map((r) => r.role);
  for (const role of new Set(names)) {
    const d = compareRoles(
      before?.roles.find((r) => r.role === role),
      after?.roles.find((r) => r.role === role),
    );
    if (d) roles.push(d);
  }
  const budget = before && after ? compareBudgets(before, after) : undefined;
  const presence = before && after ? "both" : before ? "removed" : "added";
  const failing = (s: StateSide | null) => s !== null && (s.state === "fails" || (strict && s.state === "marginal"));
  const regressions: string[] = [];
  if (failing(sa) && !failing(sb)) {
    regressions.push(
      sb === null
        ? `${some.design.id} is a new design and ${sa?.state === "fails" ? "fails" : "is only marginal"}`
        : `${some.design.id} went from ${sb.state === "holds" ? "holding" : "marginal"} to ${sa?.state === "fails" ? "failing" : "marginal"}`,
    );
  }
  for (const r of roles) {
    if (r.bom?.stopsFitting) {
      regressions.push(
        r.bom.before === r.bom.after
          ? `${some.design.id}: BOM part ${r.bom.after} stops fitting the ${r.role}`
          : `${some.design.id}: BOM part ${r.bom.after} named for the ${r.role} does not fit`,
      );
    }
  }
  if (
    presence === "both" &&
    sb?.state === sa?.state &&
    roles.length === 0 &&
    !budget &&
    before?.topology === after?.topology
  )
    return undefined;
  return {
    id: some.design.id,
    title: some.design.title,
    presence,
    topology: { before: before?.topology ?? null, after: after?.topology ?? null },
    state: { before: sb, after: sa },
    ...(budget ? { budget } : {}),
    roles,
    regressions,
  };
}

export type Side = { label: string; results: readonly DesignResult[] };

export function compareDataSets(before: Side, after: Side, strict = false): DiffReport {
  const b = new Map(before.results.map((r) => [r.design.id, r]));
  const a = new Map(after.results.map((r) => [r.design.id, r]));
  const ids = [...new Set([...b.keys(), ...a.keys()])].sort();
  const changed: DesignDiff[] = [];
  const unchanged: string[] = [];
  for (const id of ids) {
    const d = compareDesigns(b.get(id), a.get(id), strict);
    if (d) changed.push(d);
    else unchanged.push(id);
  }
  return {
    before: before.label,
    after: after.label,
    changed,
    unchanged,
    regressions: changed.flatMap((d) => d.regressions),
  };
}
