// Verdicts from margins (SPEC §7), and the phrases every reason shares.
import { formatQuantity, formatVolts } from "../units.ts";
import type { Policy } from "../schemas/design.ts";
import { VERDICTS, type Finding, type Verdict } from "./types.ts";

/** Voltage rules: marginal when 0 ≤ margin < headroom_margin_v. */
export function voltageVerdict(margin: number, policy: Policy): Verdict {
  if (margin < 0) return "fail";
  return margin < policy.headroom_margin_v ? "marginal" : "pass";
}

/** Budget, speed and timing rules: marginal when 0 ≤ margin < marginal_fraction · limit. */
export function shareVerdict(margin: number, limit: number, policy: Policy): Verdict {
  if (margin < 0) return "fail";
  return margin < policy.marginal_fraction * Math.abs(limit) ? "marginal" : "pass";
}

const SEVERITY = Object.fromEntries(VERDICTS.map((v, i) => [v, i])) as Record<Verdict, number>;

export function severity(v: Verdict): number {
  return SEVERITY[v];
}

export function worst(verdicts: Iterable<Verdict>): Verdict {
  let w: Verdict = "pass";
  for (const v of verdicts) if (SEVERITY[v] > SEVERITY[w]) w = v;
  return w;
}

/** "0.90 V to spare" / "0.40 V short"; rail voltages keep two decimals, everything else gets a prefix. */
export function spareOrShort(margin: number, unit: string): string {
  const amount = unit === "V" ? formatVolts(Math.abs(margin)) : formatQuantity(Math.abs(margin), unit);
  return margin >= 0 ? `${amount} to spare` : `${amount} short`;
}

/** Same, for small voltages such as offsets ("12.6 mV to spare"). */
export function spareOrShortSmall(margin: number): string {
  const amount = formatQuantity(Math.abs(margin), "V-prefixed");
  return margin >= 0 ? `${amount} to spare` : `${amount} short`;
}

/** A finding for a rule that cannot be judged because a column is empty. */
export function unratedFinding(rule: string, columns: readonly string[], unit: string): Finding {
  const list = columns.map((c) => `'${c}'`).join(" and ");
  return {
    rule,
    verdict: "unrated",
    needed: null,
    available: null,
    margin: null,
    unit,
    reason: `not rated: needs ${list}, which ${columns.length > 1 ? "are" : "is"} empty for this part`,
    steps: [],
  };
}
