// Why a design does not hold, in words: shared by the text output and the exit message.
import type { DesignResult, RoleResult } from "../core/engine/result.ts";

// A rule every candidate fails is the design's problem, not the parts': name it
// first (a ground-only rail fails every op amp's negative output swing).
export function noFit(role: RoleResult): string {
  const candidates = role.rejected;
  const best = candidates[0];
  if (!best) return `${role.role}: no part fits, and the catalogue has no candidate of this kind`;
  const failsEverywhere = role.rules.filter((rule) =>
    candidates.every((p) => p.findings.some((f) => f.rule === rule && f.verdict === "fail")),
  );
  const rule = failsEverywhere.includes("output-swing") ? "output-swing" : failsEverywhere[0];
  if (rule !== undefined) {
    const example = candidates.map((p) => p.findings.find((f) => f.rule === rule)).find((f) => f !== undefined);
    return `${role.role}: no part fits; every candidate fails ${rule}, e.g. ${best.part.id}: ${example?.reason ?? ""}`;
  }
  const first = best.findings.find((f) => f.verdict === "fail") ?? best.findings.find((f) => f.verdict === "unrated");
  return `${role.role}: no part fits; the closest, ${best.part.id}, ${first?.verdict === "fail" ? "fails" : "is unrated on"} ${first?.rule ?? "a rule"}: ${first?.reason ?? ""}`;
}

export function shortfalls(result: DesignResult): string[] {
  const lines: string[] = [];
  for (const role of result.roles) {
    if (role.fits.length === 0 && !(role.optional && role.bom === undefined)) lines.push(noFit(role));
    if (role.bom !== undefined && !role.fits.some((p) => p.part.id === role.bom)) {
      const bom = role.rejected.find((p) => p.part.id === role.bom);
      const first = bom?.findings.find((f) => f.verdict === "fail" || f.verdict === "unrated");
      lines.push(`${role.role}: BOM part ${role.bom} does not fit${first ? ` (${first.rule}: ${first.reason})` : ""}`);
    }
  }
  return lines;
}
