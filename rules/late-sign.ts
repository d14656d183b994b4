// The sign decision is late (SPEC §11.4): the sign stage's own delay, the edge
// the level shift makes at the logic pin and an op amp's overload recovery, all
// after a true crossing. While the sign is wrong the reading is −x for +x, off
// by 2·2π·f·peak·t: this rule's error is the budget's late-sign term.
import { defineRule, record, shareVerdict, spareOrShortSmall, type RoleContext } from "../src/core/rule-kit/index.ts";
import { crossingError } from "../src/core/math/dead-time.ts";
import { sumDelay, type DelayComponent, type SignDelay } from "../src/core/math/late-sign.ts";
import { formatSI } from "../src/core/units.ts";
import type { Driver } from "./levels.ts";
import { stageDelay } from "./sign-delay.ts";
import { overloadRecovery, signEdge } from "./sign-path.ts";

type Late = SignDelay & {
  error: number;
  limit: number;
  /** What is not known (an edge without a pull-up, an unrated recovery): never a pass. */
  unknown: string[];
  never: boolean;
};

function late(ctx: RoleContext, part: Driver): Late {
  const own = stageDelay(ctx, part);
  const parts: DelayComponent[] = [...own.components];
  const unknown: string[] = [];
  if (own.overdrive_assumed) unknown.push("the overdrive the delay is rated at (100 mV assumed)");
  const edge = signEdge(ctx, part);
  let never = false;
  if (edge.case === "no-pull-up") unknown.push("the edge at the logic pin (no logic.pull_up_ohm)");
  else if (!Number.isFinite(edge.seconds)) never = true;
  else if (edge.seconds > 0)
    parts.push({ name: "edge", seconds: edge.seconds, formula: `level shift's edge (${edge.case})` });
  const recovery = overloadRecovery(part);
  if (recovery === undefined) unknown.push("the op amp's overload recovery (overload_recovery_us is empty)");
  else if (recovery > 0) parts.push({ name: "overload-recovery", seconds: recovery, formula: "overload_recovery_us" });
  const sum = sumDelay(parts);
  const { max_frequency_hz: f, peak_v: peak } = ctx.design.signal;
  const limit = ctx.policy.timing_share * ctx.design.accuracy.required_v;
  return { ...sum, error: crossingError(f, peak, sum.budget_seconds), limit, unknown, never };
}

export const lateSign = defineRule({
  id: "late-sign",
  unit: "V",
  checks:
    "The whole time the sign is late after a crossing (the sign stage's delay with its overdrive, the level shift's edge, an op amp's overload recovery) keeps the reading's error inside the timing share of the accuracy.",
  formula:
    "t_late = t_stage + t_edge + t_recovery (hysteresis left out: the dead band counts it as Vh/k); error = 2·2π·f·peak·t_late; limit = timing_share · required_v; an assumed overdrive, an unknown edge or an unrated recovery is at best marginal",
  source:
    "While the sign is wrong the reading is −x for +x, and x has reached 2π·f·peak·t (slope of a sine at its crossing, arithmetic); the parts' times as in propagation-delay, rise-time and overload-recovery.",
  policy: "timing_share",
  kinds: ["comparator", "op-amp"],
  needs: { comparator: ["tpd_ns"], "op-amp": ["gbw_mhz", "slew_v_per_us"] },
  measure(ctx, part, out) {
    const l = late(ctx, part);
    if (l.never) return record(out, "fail", l.limit, 2 * l.limit, -l.limit, l.limit);
    const margin = l.limit - l.error;
    const computed = shareVerdict(margin, l.limit, ctx.policy);
    record(out, l.unknown.length > 0 && computed === "pass" ? "marginal" : computed, l.limit, l.error, margin, l.limit);
  },
  describe({ available: error, margin, needed: limit }, ctx, part) {
    const l = late(ctx, part);
    if (l.never) {
      return {
        reason:
          "the logic pin never reaches its threshold through the level shift's edge, so the sign never arrives: fail",
        steps: [{ label: "limit", value: limit, unit: "V" }],
      };
    }
    const list = l.components.map((c) => `${c.name} ${formatSI(c.seconds, "s")}`).join(" + ");
    const counted = l.components.some((c) => c.counted_in_dead_band)
      ? " (the hysteresis part is counted in the dead band, not here)"
      : "";
    const unknown = l.unknown.length > 0 ? `; not known: ${l.unknown.join(", ")}, so at best marginal` : "";
    return {
      reason: `the sign is late by ${formatSI(l.seconds, "s")} (${list})${counted}; the reading is off by up to ${formatSI(error, "V")} (2·2π·f·peak·t); the limit is ${formatSI(limit, "V")} (timing share ${ctx.policy.timing_share * 100} % of the required accuracy): ${spareOrShortSmall(margin)}${unknown}`,
      steps: [
        ...l.components.map((c) => ({ label: `${c.name}: ${c.formula}`, value: c.seconds, unit: "s" })),
        { label: "late by (in the budget)", value: l.budget_seconds, unit: "s" },
        { label: "error = 2·2π·f·peak·t", value: error, unit: "V" },
        { label: "limit = timing_share × required_v", value: limit, unit: "V" },
        { label: "margin = limit − error", value: margin, unit: "V" },
      ],
    };
  },
});
