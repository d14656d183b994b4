// Small builders the rule modules share, so each rule reads as its formula.
import type { Part } from "../catalogue.ts";
import type { Explanation, Finding, Measured, Rails, Range, RoleContext, Rule, Stage, Step, Verdict } from "./types.ts";
import { formatVolts } from "../units.ts";

/** Identity, so a rule module's object literal is checked and typed as a Rule. */
export function defineRule(rule: Rule): Rule {
  return rule;
}

/** A fresh record for `measure` to fill. */
export function measured(): Measured {
  return { verdict: "pass", needed: 0, available: 0, margin: 0, limit: undefined };
}

/** Fills a rule's record; every rule ends its `measure` with it. */
export function record(
  out: Measured,
  verdict: Verdict,
  needed: number,
  available: number,
  margin: number,
  limit: number | undefined,
): void {
  out.verdict = verdict;
  out.needed = needed;
  out.available = available;
  out.margin = margin;
  out.limit = limit;
}

/**
 * A finding whose sentence and arithmetic steps are written only when first
 * read: a page shows a few hundred reasons, but the engine weighs thousands of
 * parts on every keystroke of the try page. toJSON keeps them in JSON output.
 */
class LazyFinding implements Finding {
  readonly rule: string;
  readonly verdict: Verdict;
  readonly needed: number;
  readonly available: number;
  readonly margin: number;
  readonly unit: string;
  readonly limit?: number;
  #explain: (() => Explanation) | Explanation;

  constructor(rule: Rule, m: Readonly<Measured>, ctx: RoleContext, part: Part) {
    this.rule = rule.id;
    this.verdict = m.verdict;
    this.needed = m.needed;
    this.available = m.available;
    this.margin = m.margin;
    this.unit = rule.unit;
    if (m.limit !== undefined) this.limit = m.limit;
    this.#explain = () => rule.describe(m, ctx, part);
  }

  #explained(): Explanation {
    if (typeof this.#explain === "function") this.#explain = this.#explain();
    return this.#explain;
  }

  get reason(): string {
    return this.#explained().reason;
  }

  get steps(): Step[] {
    return this.#explained().steps;
  }

  toJSON(): Finding {
    const { rule, verdict, needed, available, margin, unit, limit, reason, steps } = this;
    return { rule, verdict, needed, available, margin, unit, ...(limit !== undefined ? { limit } : {}), reason, steps };
  }
}

/** The finding of a rule for one part; its text is written on first read. */
export function finding(rule: Rule, ctx: RoleContext, part: Part): Finding {
  const m = measured();
  rule.measure(ctx, part, m);
  return new LazyFinding(rule, m, ctx, part);
}

/** The stage as the kind a rule works on; any other is a wiring mistake in a role table. */
export function stageAs<K extends Stage["stage"]>(stage: Stage, kind: K, rule: string): Extract<Stage, { stage: K }> {
  if (stage.stage !== kind) throw new Error(`${rule} applies to ${kind} stages only`);
  return stage as Extract<Stage, { stage: K }>;
}

/** Which side of a needed range binds, against a reachable range. */
export function rangeMargin(
  needed: Range,
  reach: Range,
): { margin: number; side: "low" | "high"; needed: number; reached: number } {
  const lowMargin = needed.low - reach.low;
  const highMargin = reach.high - needed.high;
  return lowMargin <= highMargin
    ? { margin: lowMargin, side: "low", needed: needed.low, reached: reach.low }
    : { margin: highMargin, side: "high", needed: needed.high, reached: reach.high };
}

export function railPhrase(side: "low" | "high", rails: Rails): string {
  return side === "high" ? `at V+ = ${formatVolts(rails.positive_v)}` : `with V− = ${formatVolts(rails.negative_v)}`;
}

export const volts = (v: number) => formatVolts(v, { signed: true });

/** Temperature distance used for drift: the far end of the range from 25 °C. */
export function driftSpanC(minC: number, maxC: number): number {
  return Math.max(Math.abs(minC - 25), Math.abs(maxC - 25));
}
