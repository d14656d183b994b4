// A design's state in the words of SPEC §11.11 (holds / marginal / fails), with
// the reasons: every role has a fit, every BOM part fits and the budget's worst
// case fits the requirement (holds); only its root-sum-square fits (marginal).
// Anything else fails, including a budget that could not be summed because a
// role has no part: an unknown error is never a pass.
import type { DesignResult } from "../core/engine/result.ts";
import { designHolds } from "../core/engine/result.ts";
import { formatSI } from "../core/units.ts";
import { shortfalls } from "./summary.ts";

export const DESIGN_STATES = ["holds", "marginal", "fails"] as const;
export type DesignState = (typeof DESIGN_STATES)[number];

export type StateOfDesign = { state: DesignState; reasons: string[] };

export function designState(result: DesignResult): StateOfDesign {
  const reasons = shortfalls(result);
  const b = result.budget;
  const sums = `worst case ${formatSI(b.worst_case_v, "V")}, root-sum-square ${formatSI(b.rss_v, "V")}, required ${formatSI(b.required_v, "V")}`;
  if (b.missing.length > 0) reasons.push(`accuracy budget incomplete: no part for ${b.missing.join(", ")}`);
  else if (b.verdict === "fail") reasons.push(`accuracy budget fails (${sums})`);
  else if (b.verdict === "marginal") reasons.push(`accuracy budget marginal: only the root-sum-square fits (${sums})`);
  if (!designHolds(result) || b.verdict === "fail" || b.missing.length > 0) return { state: "fails", reasons };
  return { state: b.verdict === "marginal" ? "marginal" : "holds", reasons };
}
