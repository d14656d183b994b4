// Why a design does not hold, in words: shared by the text output and the exit message.
// The engine words them once (design-verdict.ts); the CLI reads its text.
import type { DesignResult } from "../core/engine/result.ts";
import { noFit, roleShortfalls } from "../core/engine/design-verdict.ts";

export { noFit };

export function shortfalls(result: DesignResult): string[] {
  return roleShortfalls(result.roles).map((r) => r.text);
}
