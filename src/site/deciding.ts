// The finding that decides a part's verdict in a role: the first, in rule
// order, as bad as the verdict itself (so a rejection shows why it fails and a
// marginal fit why it is marginal). None for a clean pass.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { Finding } from "../core/engine/types.ts";

export function decidingFinding(result: PartResult): Finding | undefined {
  if (result.verdict === "pass") return undefined;
  return result.findings.find((f) => f.verdict === result.verdict) ?? result.findings.find((f) => f.verdict !== "pass");
}
