// The shape of a design's verdict (SPEC §11.11), apart from how it is worked out
// (design-verdict.ts), so the result type can name it without an import cycle.
export const DESIGN_STATES = ["holds", "marginal", "fails"] as const;
export type DesignState = (typeof DESIGN_STATES)[number];

export const VERDICT_REASONS = [
  "no-fit",
  "bom-part-fails",
  "budget-incomplete",
  "budget-fails",
  "budget-marginal",
  "budget-unrated",
] as const;
export type VerdictReasonKind = (typeof VERDICT_REASONS)[number];

/** One reason a design does not simply hold: data first (kind, role), then the sentence. */
export type VerdictReason = { kind: VerdictReasonKind; role?: string; text: string };

export type DesignVerdict = { state: DesignState; reasons: VerdictReason[] };

/** The words every surface uses for a state. */
export const STATE_WORDS: Record<DesignState, string> = { holds: "holds", marginal: "marginal", fails: "fails" };
