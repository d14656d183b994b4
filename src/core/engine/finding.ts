// A rule's finding for one part, with its sentence written on first read.
// (The builders rules use, defineRule, record and the rest, are in the rule kit.)
import type { Part } from "../catalogue-index.ts";
import { measured } from "../rule-kit/define.ts";
import type { AnyRule, Explanation, Finding, Measured, RoleContext, Step, Verdict } from "../rule-kit/types.ts";

export {
  defineRule,
  driftSpanC,
  measured,
  railPhrase,
  rangeMargin,
  record,
  stageAs,
  volts,
} from "../rule-kit/define.ts";

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
  readonly stage?: string;
  #explain: (() => Explanation) | Explanation;

  constructor(rule: AnyRule, m: Readonly<Measured>, ctx: RoleContext, part: Part, stage?: string) {
    this.rule = rule.id;
    this.verdict = m.verdict;
    this.needed = m.needed;
    this.available = m.available;
    this.margin = m.margin;
    this.unit = rule.unit;
    if (m.limit !== undefined) this.limit = m.limit;
    if (stage !== undefined) this.stage = stage;
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
    const { rule, verdict, needed, available, margin, unit, limit, reason, steps, stage } = this;
    return {
      rule,
      verdict,
      needed,
      available,
      margin,
      unit,
      ...(limit !== undefined ? { limit } : {}),
      reason,
      steps,
      ...(stage !== undefined ? { stage } : {}),
    };
  }
}

/** The finding of a rule for one part; its text is written on first read. */
export function finding(rule: AnyRule, ctx: RoleContext, part: Part, stage?: string): Finding {
  const m = measured();
  rule.measure(ctx, part, m);
  return new LazyFinding(rule, m, ctx, part, stage);
}
