// Small builders the rule modules share, so each rule reads as its formula.
import type { PartKind } from "../catalogue-index.ts";
import { formatVolts } from "../units.ts";
import type { Measured, Rails, Range, Rule, Stage, Verdict } from "./types.ts";

/**
 * Identity, so a rule module's object literal is checked as a Rule of the
 * kinds it lists: `measure` and `describe` get those part types, and the id
 * stays a literal type (rules/index.ts derives RuleId from the list).
 */
export function defineRule<const K extends PartKind, const Id extends string>(rule: Rule<K, Id>): Rule<K, Id> {
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
