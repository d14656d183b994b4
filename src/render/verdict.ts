// How a verdict reads on a page: a word and a shape, so it never depends on
// colour alone (colour comes from the `verdict-<name>` class in site.css).
import type { Verdict } from "../core/engine/types.ts";
import { escapeHtml } from "./escape.ts";

export type VerdictLook = { word: string; glyph: string; meaning: string };

export const VERDICT_LOOK: Readonly<Record<Verdict, VerdictLook>> = {
  pass: { word: "pass", glyph: "✓", meaning: "meets the rule with margin to spare" },
  marginal: { word: "marginal", glyph: "◆", meaning: "meets the rule, but with less margin than the policy asks" },
  unrated: { word: "not rated", glyph: "?", meaning: "a column the rule needs is empty for this part" },
  fail: { word: "fail", glyph: "✕", meaning: "does not meet the rule" },
};

/** `<span class="verdict verdict-fail"><span aria-hidden="true">✕</span> fail</span>` */
export function renderVerdict(verdict: Verdict): string {
  const look = VERDICT_LOOK[verdict];
  return `<span class="verdict verdict-${verdict}"><span class="glyph" aria-hidden="true">${look.glyph}</span> ${escapeHtml(look.word)}</span>`;
}
