import {
  defineRule,
  record,
  spareOrShort,
  type PartOf,
  type RoleContext,
  type Verdict,
} from "../src/core/rule-kit/index.ts";
import { baseReverse, NPN_VEBO_DEFAULT_V, REVERSE_DERATING } from "../src/core/math/npn-inverter.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";
import { outputLow } from "./levels.ts";

export const baseEmitterReverse = defineRule({
  id: "base-emitter-reverse",
  unit: "V",
  checks:
    "With the sign output low, the NPN inverter's base-emitter junction is not reverse-biased beyond its rating (V_EBO).",
  formula:
    "V_OL = V− (deepest) + out_neg_headroom_v; without a base clamp V_EB = −V_OL; with one V_EB = Vf of the clamp at (|V_OL| − Vf)/npn_base_ohm; V_EBO = logic.npn_vebo_v, 5 V when not given; fail above V_EBO, at best marginal above 80 % of it; other level shifts have no NPN",
  source:
    "Small-signal NPN classes rate V_EBO at 5–6 V, and a junction is kept within about 80 % of an absolute-maximum rating (common practice [M]); the clamp's drop from its Vf(I) law (SPEC §4).",
  policy: "headroom_margin_v",
  kinds: ["comparator", "op-amp"],
  needs: {},
  measure(ctx, part, out) {
    const b = baseStress(ctx, part);
    if (b.case === "no-npn") return record(out, "pass", 0, b.vebo, b.vebo, b.vebo);
    if (b.case === "no-resistor") return record(out, "unrated", 0, b.vebo, b.vebo, b.vebo);
    record(out, b.verdict, b.reverse, b.vebo, b.vebo - b.reverse, b.vebo);
  },
  describe({ margin }, ctx, part) {
    const b = baseStress(ctx, part);
    const rating = `V_EBO ${formatVolts(b.vebo)}${b.assumed ? " (assumed, common practice)" : ""}`;
    if (b.case === "no-npn") return { reason: "the level shift has no NPN", steps: [] };
    if (b.case === "no-resistor") {
      return {
        reason: "not rated: the design asks for a base clamp but gives no logic.npn_base_ohm, which sets its current",
        steps: [],
      };
    }
    const steps = [
      { label: "output low V_OL (deepest V−)", value: b.low, unit: "V" },
      ...(b.clamped ? [{ label: "clamp current (|V_OL| − Vf) / R_B", value: b.current, unit: "A" }] : []),
      { label: "reverse base-emitter voltage", value: b.reverse, unit: "V" },
      { label: "V_EBO", value: b.vebo, unit: "V" },
      { label: `${REVERSE_DERATING * 100} % of V_EBO`, value: REVERSE_DERATING * b.vebo, unit: "V" },
      { label: "margin = V_EBO − reverse", value: margin, unit: "V" },
    ];
    const how = b.clamped
      ? `the base clamp holds the base at −${formatVolts(b.reverse)} (${formatSI(b.current, "A")} through the ${formatSI(ctx.design.logic.npn_base_ohm ?? 0, "Ω")} base resistor), a reverse base-emitter voltage of ${formatVolts(b.reverse)}`
      : `with no base clamp the output low of ${formatVolts(b.low, { signed: true })} reverse-biases the NPN's base-emitter junction by ${formatVolts(b.reverse)}`;
    const judged =
      b.verdict === "fail"
        ? `beyond its ${rating}: ${spareOrShort(margin, "V")}; the junction breaks down and the NPN's gain degrades; add a diode across base and emitter (logic.npn_base_clamp)`
        : b.verdict === "marginal"
          ? `within its ${rating} but above ${formatVolts(REVERSE_DERATING * b.vebo)} (${REVERSE_DERATING * 100} % of it): ${spareOrShort(margin, "V")}; a diode across base and emitter (logic.npn_base_clamp) removes the stress`
          : `against ${rating}: ${spareOrShort(margin, "V")}`;
    return { reason: `${how}, ${judged}`, steps };
  },
});

type Stress =
  | { case: "no-npn"; vebo: number; assumed: boolean }
  | { case: "no-resistor"; vebo: number; assumed: boolean }
  | {
      case: "npn";
      vebo: number;
      assumed: boolean;
      low: number;
      reverse: number;
      current: number;
      clamped: boolean;
      verdict: Verdict;
    };

function baseStress(ctx: RoleContext, part: PartOf<"comparator" | "op-amp">): Stress {
  const { logic } = ctx.design;
  const vebo = logic.npn_vebo_v ?? NPN_VEBO_DEFAULT_V;
  const assumed = logic.npn_vebo_v === undefined;
  if (logic.level_shift !== "npn-inverter") return { case: "no-npn", vebo, assumed };
  const deepest =
    ctx.stage.stage === "sign" ? (ctx.stage.deepest_negative_v ?? ctx.rails.negative_v) : ctx.rails.negative_v;
  const low = outputLow(part, {
    positive_v: ctx.rails.positive_v,
    negative_v: Math.min(deepest, ctx.rails.negative_v),
  });
  const clampDiode = logic.npn_base_clamp === true && ctx.stage.stage === "sign" ? ctx.stage.base_clamp : undefined;
  if (logic.npn_base_clamp === true && logic.npn_base_ohm === undefined) return { case: "no-resistor", vebo, assumed };
  const clamp =
    clampDiode && logic.npn_base_ohm !== undefined ? { diode: clampDiode, base_ohm: logic.npn_base_ohm } : undefined;
  const r = baseReverse(low, clamp);
  const margin = vebo - r.reverse_v;
  const verdict: Verdict =
    margin < 0
      ? "fail"
      : r.reverse_v > REVERSE_DERATING * vebo || margin < ctx.policy.headroom_margin_v
        ? "marginal"
        : "pass";
  return {
    case: "npn",
    vebo,
    assumed,
    low,
    reverse: r.reverse_v,
    current: r.clamp_current_a,
    clamped: clamp !== undefined,
    verdict,
  };
}
