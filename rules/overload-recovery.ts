import { defineRule, record, shareVerdict, spareOrShort } from "../src/core/rule-kit/index.ts";
import { formatSI } from "../src/core/units.ts";
import { overloadRecovery, signTimeLimit } from "./sign-path.ts";

export const overloadRecoveryRule = defineRule({
  id: "overload-recovery",
  unit: "s",
  checks:
    "An op amp used as a comparator comes out of saturation soon enough after each crossing; its recovery adds to the sign's delay.",
  formula:
    "op amp: t_rec = overload_recovery_us, margin = limit − t_rec (an empty rating is unrated); comparator: built to saturate, nothing to add",
  source:
    "The op amp's rated overload (saturation) recovery; an op amp run open loop saturates at every crossing (common practice [M]).",
  policy: "timing_share",
  kinds: ["op-amp", "comparator"],
  needs: { "op-amp": ["overload_recovery_us"] },
  measure(ctx, part, out) {
    const limit = signTimeLimit(ctx);
    const t = overloadRecovery(part) ?? 0;
    const margin = limit - t;
    record(out, shareVerdict(margin, limit, ctx.policy), limit, t, margin, limit);
  },
  describe({ needed: limit, available: t, margin }, _ctx, part) {
    const steps = [
      { label: "overload recovery", value: t, unit: "s" },
      { label: "limit", value: limit, unit: "s" },
      { label: "margin = limit − recovery", value: margin, unit: "s" },
    ];
    if (part.kind === "comparator") {
      return { reason: "a comparator is built to saturate: no overload recovery to add", steps };
    }
    return {
      reason: `used open loop it saturates at every crossing and needs ${formatSI(t, "s")} to recover before it moves, added to the sign's delay; the sign may be late by ${formatSI(limit, "s")}: ${spareOrShort(margin, "s")}`,
      steps,
    };
  },
});
