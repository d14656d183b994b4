// A design's state in the words of SPEC §11.11 (holds / marginal / fails), as
// the engine worked it out (DesignResult.verdict), with the reasons as text.
import type { DesignResult } from "../core/engine/result.ts";

export { DESIGN_STATES, type DesignState } from "../core/engine/design-verdict.ts";
import type { DesignState } from "../core/engine/design-verdict.ts";

export type StateOfDesign = { state: DesignState; reasons: string[] };

export function designState(result: DesignResult): StateOfDesign {
  return { state: result.verdict.state, reasons: result.verdict.reasons.map((r) => r.text) };
}
