// Small builders the rule modules share, so each rule reads as its formula.
import type { Finding, Rails, Range, Step, Verdict } from "./types.ts";
import { formatVolts } from "../units.ts";

type Lazy<T> = T | (() => T);

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
  #reason: Lazy<string>;
  #steps: Lazy<Step[]>;

  constructor(rule: string, f: FindingInput) {
    this.rule = rule;
    this.verdict = f.verdict;
    this.needed = f.needed;
    this.available = f.available;
    this.margin = f.margin;
    this.unit = f.unit;
    if (f.limit !== undefined) this.limit = f.limit;
    this.#reason = f.reason;
    this.#steps = f.steps;
  }

  get reason(): string {
    if (typeof this.#reason === "function") this.#reason = this.#reason();
    return this.#reason;
  }

  get steps(): Step[] {
    if (typeof this.#steps === "function") this.#steps = this.#steps();
    return this.#steps;
  }

  toJSON(): Finding {
    const { rule, verdict, needed, available, margin, unit, limit, reason, steps } = this;
    return { rule, verdict, needed, available, margin, unit, ...(limit !== undefined ? { limit } : {}), reason, steps };
  }
}

type FindingInput = {
  verdict: Verdict;
  needed: number;
  available: number;
  margin: number;
  unit: string;
  limit?: number;
  reason: Lazy<string>;
  steps: Lazy<Step[]>;
};

export function finding(rule: string, f: FindingInput): Finding {
  return new LazyFinding(rule, f);
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
