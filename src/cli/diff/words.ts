// The diff's wording, shared by its text and markdown forms.
import { formatSI } from "../../core/units.ts";
import type { DesignDiff, PartChangeKind, TermChange } from "./compare.ts";

export const CHANGE_WORDS: Readonly<Record<PartChangeKind, string>> = {
  "fit-gained": "new fit",
  "fit-lost": "lost fit",
  "verdict-changed": "verdict changed",
};

export const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** "holds → fails", or the state of a design present on one side only. */
export function stateWords(d: DesignDiff): string {
  const { before, after } = d.state;
  if (before && after && before.state === after.state) return `${after.state}, as before`;
  return `${before?.state ?? "absent"} → ${after?.state ?? "absent"}`;
}

/** A line for a design that is new, removed, or evaluated with another topology; none otherwise. */
export function presenceLine(d: DesignDiff): string | undefined {
  if (d.presence === "added") return `new design (${d.topology.after ?? "?"})`;
  if (d.presence === "removed") return `design removed (was ${d.topology.before ?? "?"})`;
  if (d.topology.before !== d.topology.after) return `topology ${d.topology.before} → ${d.topology.after}`;
  return undefined;
}

/** "rectifier offset (oa-a): 8.00 mV → 8.13 mV", naming both labels when the part changed. */
export function termWords(t: TermChange): string {
  const v = (s: TermChange["before"]) => (s === null ? "none" : formatSI(s.v, "V"));
  const label = t.after?.label ?? t.before?.label ?? t.name;
  if (t.before && t.after && t.before.label !== t.after.label)
    return `${t.before.label}: ${v(t.before)} → ${t.after.label}: ${v(t.after)}`;
  return `${label}: ${v(t.before)} → ${v(t.after)}`;
}
