// Why a design does not hold, in words: shared by the text output and the exit message.
import type { DesignResult } from "../core/engine/result.ts";

export function shortfalls(result: DesignResult): string[] {
  const lines: string[] = [];
  for (const role of result.roles) {
    if (role.fits.length === 0 && !(role.optional && role.bom === undefined)) {
      const best = role.rejected[0];
      const first = best?.findings.find((f) => f.verdict === "fail") ?? best?.findings.find((f) => f.verdict === "unrated");
      lines.push(
        best && first
          ? `${role.role}: no part fits; the closest, ${best.part.id}, ${first.verdict === "fail" ? "fails" : "is unrated on"} ${first.rule}: ${first.reason}`
          : `${role.role}: no part fits, and the catalogue has no candidate of this kind`,
      );
    }
    if (role.bom !== undefined && !role.fits.some((p) => p.part.id === role.bom)) {
      const bom = role.rejected.find((p) => p.part.id === role.bom);
      const first = bom?.findings.find((f) => f.verdict === "fail" || f.verdict === "unrated");
      lines.push(`${role.role}: BOM part ${role.bom} does not fit${first ? ` (${first.rule}: ${first.reason})` : ""}`);
    }
  }
  return lines;
}
