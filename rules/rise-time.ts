import {
  defineRule,
  record,
  shareVerdict,
  spareOrShort,
  type Explanation,
  type Measured,
  type RoleContext,
  type Step,
} from "../src/core/rule-kit/index.ts";
import type { PartOf } from "../src/core/kind-rows.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";
import { pinCap, signEdge, signTimeLimit } from "./sign-path.ts";

export const riseTime = defineRule({
  id: "rise-time",
  unit: "s",
  checks:
    "The edge the level shift makes at the logic pin (a rise through a pull-up, a fall through the clamp's pull-down, an NPN's storage time) is short enough; it adds to the sign's delay.",
  formula:
    "t_edge = max(2.2·R·C_pin, R·C_pin·ln((V_end − V_start)/(V_end − V_threshold))), R = logic.pull_up_ohm (pull-up on an open-drain output, NPN collector; to V_IH) or pull_down_ohm (diode clamp, falling to V_IL); C_pin = logic.pin_cap_f, 10 pF when not given; npn-inverter adds its storage time (logic.npn_storage_s, 300 ns when not given); margin = limit − t_edge",
  source:
    "First-order RC step response: 10–90 % rise = ln 9 · RC ≈ 2.2·RC (textbook, e.g. Sedra & Smith, Microelectronic Circuits [M for the section]); the 10 pF pin and 300 ns NPN storage time are common practice [M].",
  policy: "timing_share",
  kinds: ["comparator", "op-amp"],
  needs: {},
  measure(ctx, part, out) {
    const limit = signTimeLimit(ctx);
    const e = signEdge(ctx, part);
    if (e.case === "no-pull-up") return record(out, "unrated", limit, 0, limit, limit);
    // An edge that never reaches its threshold is a fail with no finite delay:
    // it is shown as short by at least the whole limit.
    if (!Number.isFinite(e.seconds)) return record(out, "fail", limit, 2 * limit, -limit, limit);
    const margin = limit - e.seconds;
    record(out, shareVerdict(margin, limit, ctx.policy), limit, e.seconds, margin, limit);
  },
  describe(m, ctx, part) {
    const e = signEdge(ctx, part);
    if (e.case !== "no-pull-up" && !Number.isFinite(e.seconds)) {
      return {
        reason: `the pin never reaches its logic threshold through this RC edge (its final level is not past the threshold), so the sign never arrives: fail`,
        steps: [{ label: "limit", value: m.needed, unit: "s" }],
      };
    }
    return describeEdge(m, ctx, part, e);
  },
});

function describeEdge(
  { needed: limit, available: t, margin }: Readonly<Measured>,
  ctx: RoleContext,
  part: PartOf<"op-amp" | "comparator">,
  e: ReturnType<typeof signEdge>,
): Explanation {
  {
    const cap = pinCap(ctx);
    const c = `${formatSI(cap.farad, "F")}${cap.assumed ? " (assumed, common practice)" : ""}`;
    const tail = `the sign may be late by ${formatSI(limit, "s")}: ${spareOrShort(margin, "s")}`;
    const rc = (ohm: number): Step[] => [
      { label: "R", value: ohm, unit: "Ω" },
      { label: "C_pin", value: cap.farad, unit: "F" },
    ];
    const total: Step[] = [
      { label: "edge time added to the sign's delay", value: t, unit: "s" },
      { label: "limit", value: limit, unit: "s" },
      { label: "margin = limit − edge", value: margin, unit: "s" },
    ];
    switch (e.case) {
      case "driven":
        return { reason: `the output drives the logic pin itself: no RC edge to add; ${tail}`, steps: total };
      case "no-pull-up":
        return {
          reason: `not rated: the design gives no logic.pull_up_ohm, which sets how fast the ${ctx.design.logic.level_shift === "npn-inverter" ? "NPN's collector" : "open-drain output's pin"} rises`,
          steps: [],
        };
      case "clamp-fall":
        return {
          reason: `when the output goes low the clamp diode blocks and the ${formatSI(e.ohm, "Ω")} pull-down discharges the ${c} pin from ${formatVolts(e.from_v)}: 2.2·R·C = ${formatSI(e.edge.rise_1090_s, "s")}, ${formatSI(e.edge.threshold_s, "s")} to V_IL ${formatVolts(ctx.design.logic.vil_v)}, so ${formatSI(t, "s")} added to the sign's delay; ${tail}`,
          steps: [
            ...rc(e.ohm),
            { label: "2.2·R·C (10–90 %)", value: e.edge.rise_1090_s, unit: "s" },
            { label: "R·C·ln(V_high / V_IL)", value: e.edge.threshold_s, unit: "s" },
            ...total,
          ],
        };
      case "pull-up-rise":
        return {
          reason: `the ${formatSI(e.ohm, "Ω")} pull-up charges the ${c} pin from ${formatVolts(e.from_v, { signed: true })}: 2.2·R·C = ${formatSI(e.edge.rise_1090_s, "s")}, ${formatSI(e.edge.threshold_s, "s")} to V_IH ${formatVolts(ctx.design.logic.vih_v)}, so ${formatSI(t, "s")} added to the sign's delay; ${tail}`,
          steps: [
            ...rc(e.ohm),
            { label: "2.2·R·C (10–90 %)", value: e.edge.rise_1090_s, unit: "s" },
            { label: "R·C·ln((V_DD − V_OL)/(V_DD − V_IH))", value: e.edge.threshold_s, unit: "s" },
            ...total,
          ],
        };
      case "npn-off":
        return {
          reason: `the NPN stays on for its ${formatSI(e.off.storage_s, "s")} storage time${e.storage_assumed ? " (assumed, common practice)" : ""}, then the ${formatSI(e.ohm, "Ω")} pull-up charges the ${c} pin: 2.2·R·C = ${formatSI(e.off.edge.rise_1090_s, "s")}; ${formatSI(t, "s")} added to the sign's delay; ${tail}`,
          steps: [
            { label: "storage time", value: e.off.storage_s, unit: "s" },
            ...rc(e.ohm),
            { label: "2.2·R·C (10–90 %)", value: e.off.edge.rise_1090_s, unit: "s" },
            { label: "R·C·ln((V_DD − 0.2 V)/(V_DD − V_IH))", value: e.off.edge.threshold_s, unit: "s" },
            ...total,
          ],
        };
    }
  }
}
