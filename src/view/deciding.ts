// The finding that decides a part's verdict in a role: the first, in rule
// order, as bad as the verdict itself (so a rejection shows why it fails and a
// marginal fit why it is marginal). None for a clean pass.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { Finding } from "../core/engine/types.ts";

export function decidingFinding(result: PartResult): Finding | undefined {
  if (result.verdict === "pass") return undefined;
  return result.findings.find((f) => f.verdict === result.verdict) ?? result.findings.find((f) => f.verdict !== "pass");
}

/**
 * What a shortlist row says about a fit: the deciding finding of a marginal
 * one, else the finding with the least margin relative to its limit (the key
 * the ranking breaks ties with, SPEC §7). None when no finding has a limit.
 */
export function closestFinding(result: PartResult): Finding | undefined {
  const deciding = decidingFinding(result);
  if (deciding) return deciding;
  let closest: Finding | undefined;
  let least = Infinity;
  for (const f of result.findings) {
    if (f.margin === null || f.limit === undefined || !(f.limit > 0)) continue;
    const relative = f.margin / f.limit;
    if (relative < least) {
      least = relative;
      closest = f;
    }
  }
  return closest;
}
