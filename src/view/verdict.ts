// How a verdict reads on a page: a word and a shape, so it never depends on
// colour alone (colour comes from the `verdict-<name>` class in site.css).
import { STATE_WORDS, type DesignState } from "../core/engine/design-verdict.ts";
import type { Verdict } from "../core/engine/types.ts";
import { escapeHtml } from "./escape.ts";

export type VerdictLook = { word: string; glyph: string; meaning: string };

export const VERDICT_LOOK: Readonly<Record<Verdict, VerdictLook>> = {
  pass: { word: "pass", glyph: "✓", meaning: "meets the rule with margin to spare" },
  marginal: { word: "marginal", glyph: "◆", meaning: "meets the rule, but with less margin than the policy asks" },
  unrated: { word: "not rated", glyph: "?", meaning: "a column the rule needs is empty for this part" },
  fail: { word: "fail", glyph: "✕", meaning: "does not meet the rule" },
};

function markup(verdict: Verdict): string {
  const look = VERDICT_LOOK[verdict];
  return `<span class="verdict verdict-${verdict}"><span class="glyph" aria-hidden="true">${look.glyph}</span> ${escapeHtml(look.word)}</span>`;
}

// Four strings, written once: a large site shows a verdict in every row of every table.
const MARKUP: Readonly<Record<Verdict, string>> = {
  pass: markup("pass"),
  marginal: markup("marginal"),
  unrated: markup("unrated"),
  fail: markup("fail"),
};

/** `<span class="verdict verdict-fail"><span aria-hidden="true">✕</span> fail</span>` */
export function renderVerdict(verdict: Verdict): string {
  return MARKUP[verdict];
}

/** A design's state (SPEC §11.11) as it reads on every page: the same three words as the CLI. */
const STATE_AS_VERDICT: Readonly<Record<DesignState, Verdict>> = { holds: "pass", marginal: "marginal", fails: "fail" };

/** `<span class="verdict verdict-marginal"><span aria-hidden="true">◆</span> marginal</span>` */
export function renderDesignState(state: DesignState): string {
  const verdict = STATE_AS_VERDICT[state];
  return `<span class="verdict verdict-${verdict}"><span class="glyph" aria-hidden="true">${VERDICT_LOOK[verdict].glyph}</span> ${escapeHtml(STATE_WORDS[state])}</span>`;
}

/** The `state-…` class of a design's state line. */
export function stateClass(state: DesignState): string {
  return `state-${state}`;
}
