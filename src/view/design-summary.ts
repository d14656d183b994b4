// The one-line state of a design for the home page and the design page head.
import { designHolds } from "../core/engine/result.ts";
import type { DesignState } from "../core/engine/design-verdict.ts";
import { formatSI } from "../core/units.ts";
import type { Role } from "../core/schemas/design.ts";
import type { DesignEntry } from "./design-entry.ts";
import { roleName } from "./roles.ts";

export type RoleState = {
  role: Role;
  name: string;
  fits: number;
  total: number;
  chosen?: string;
  bomFails: boolean;
  optional: boolean;
};

/** SPEC §11.11's design state, as the engine gives it (core/engine/design-verdict.ts). */
export type DesignVerdict = DesignState;

export type DesignSummary =
  | { ok: false; line: string; verdict: "fails" }
  | { ok: true; holds: boolean; verdict: DesignVerdict; line: string; roles: RoleState[] };

export function summarizeDesign(entry: DesignEntry): DesignSummary {
  if (!entry.evaluation.ok) {
    const n = entry.evaluation.problems.length;
    return {
      ok: false,
      verdict: "fails",
      line: `Could not be evaluated: ${n} problem${n === 1 ? "" : "s"} in the design file.`,
    };
  }
  const result = entry.evaluation.result;
  const roles: RoleState[] = result.roles.map((r) => ({
    role: r.role,
    name: roleName(r.role),
    fits: r.fits.length,
    total: r.fits.length + r.rejected.length,
    ...(r.chosen !== undefined ? { chosen: r.chosen } : {}),
    bomFails: r.bom !== undefined && !r.fits.some((p) => p.part.id === r.bom),
    optional: r.optional === true,
  }));
  const empty = roles.filter((r) => r.fits === 0 && !r.optional).map((r) => r.name.toLowerCase());
  const bad = roles.filter((r) => r.bomFails).map((r) => `${r.chosen ?? "?"} (${r.name.toLowerCase()})`);
  const holds = designHolds(result);
  const problems: string[] = [];
  if (empty.length > 0) problems.push(`no part fits the ${list(empty)}`);
  if (bad.length > 0)
    problems.push(`BOM part${bad.length === 1 ? "" : "s"} ${list(bad)} ${bad.length === 1 ? "does" : "do"} not fit`);
  const b = result.budget;
  const budget =
    b.missing.length > 0
      ? `Accuracy budget incomplete: no part for the ${list(b.missing.map((r) => roleName(r).toLowerCase()))}.`
      : `Accuracy budget ${b.verdict === "pass" ? "passes" : b.verdict === "marginal" ? "is marginal" : "fails"} (worst case ${formatSI(b.worst_case_v, "V")} against ${formatSI(b.required_v, "V")}).`;
  const compared = result.comparison ? ` Both topologies compared: ${result.comparison.recommended} recommended.` : "";
  const line = `${
    holds
      ? "Every role has a fit and every BOM part fits."
      : `${capitalize(problems.join("; ") || "the design does not hold")}.`
  } ${budget}${compared}`;
  // A budget that leaves out an unrated part's noise is at best marginal: say why (SPEC §11.9).
  const unrated = result.verdict.reasons.find((r) => r.kind === "budget-unrated");
  const tail = unrated ? ` ${capitalize(unrated.text)}.` : "";
  return { ok: true, holds, verdict: result.verdict.state, line: `${line}${tail}`, roles };
}

function list(items: string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}

function capitalize(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
