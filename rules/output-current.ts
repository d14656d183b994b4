import {
  defineRule,
  record,
  shareVerdict,
  spareOrShort,
  type PartOf,
  type RoleContext,
} from "../src/core/rule-kit/index.ts";
import { baseDriveCurrent, baseReverse } from "../src/core/math/npn-inverter.ts";
import { clampSourceCurrent, pullUpSinkCurrent, pullUpSourceCurrent } from "../src/core/math/output-current.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";
import { outputHigh, outputLow } from "./levels.ts";

/** Every op-amp and comparator class drives this much; below it no rating is needed (common practice [M]). */
export const OUTPUT_CURRENT_FLOOR_A = 100e-6;

export const outputCurrent = defineRule({
  id: "output-current",
  unit: "A",
  checks: "The sign stage's output drives the level shift's current within its rating.",
  formula:
    "diode clamp: I·pull_down_ohm + Vf(I) = V_OH (sourced); pull-up: (vdd_v − V_OL)/pull_up_ohm sunk, (V_OH − vdd_v)/pull_up_ohm sourced; npn-inverter: (V_OH − 0.7 V)/npn_base_ohm into the base, and with a base clamp (|V_OL| − Vf)/npn_base_ohm sunk; margin = iout_max_ma − I; with an empty iout_max_ma only I ≤ 100 µA passes",
  source:
    "Ohm's law with the diode's Vf(I) (SPEC §4); the output's rated current; 100 µA that any op amp or comparator output drives is common practice [M].",
  policy: "marginal_fraction",
  kinds: ["comparator", "op-amp"],
  needs: {},
  measure(ctx, part, out) {
    const l = load(ctx, part);
    const rated = part.iout_max_ma === undefined ? undefined : part.iout_max_ma * 1e-3;
    if (l.case === "no-resistor") return record(out, "unrated", 0, 0, 0, undefined);
    if (rated === undefined) {
      const margin = OUTPUT_CURRENT_FLOOR_A - l.current;
      return record(
        out,
        margin >= 0 ? "pass" : "unrated",
        l.current,
        OUTPUT_CURRENT_FLOOR_A,
        margin,
        OUTPUT_CURRENT_FLOOR_A,
      );
    }
    const margin = rated - l.current;
    record(out, shareVerdict(margin, rated, ctx.policy), l.current, rated, margin, rated);
  },
  describe({ needed: current, available: rated, margin }, ctx, part) {
    const l = load(ctx, part);
    if (l.case === "no-resistor") {
      return { reason: `not rated: the design gives no logic.${l.field}, which sets the output's current`, steps: [] };
    }
    const steps = [
      { label: l.formula, value: current, unit: "A" },
      {
        label: part.iout_max_ma === undefined ? "no rating; any output drives" : "iout_max_ma",
        value: rated,
        unit: "A",
      },
      { label: "margin", value: margin, unit: "A" },
    ];
    const bound =
      part.iout_max_ma === undefined
        ? margin >= 0
          ? `at most ${formatSI(OUTPUT_CURRENT_FLOOR_A, "A")}, which any output drives (common practice): no rating needed`
          : `and 'iout_max_ma' is empty for this part: not rated`
        : `rated ${formatSI(rated, "A")}: ${spareOrShort(margin, "A")}`;
    return { reason: `${l.sentence().replace("%I", formatSI(current, "A"))}; ${bound}`, steps };
  },
});

type Load =
  | { case: "no-resistor"; field: string }
  | {
      case: "drives";
      current: number; /** Worded only when a reason is asked for: measure runs on every candidate. */
      sentence: () => string;
      formula: string;
    };

/** The larger of the currents the output sources (high) and sinks (low) in this level shift. */
function load(ctx: RoleContext, part: PartOf<"comparator" | "op-amp">): Load {
  const { logic } = ctx.design;
  const high = outputHigh(part, ctx.rails);
  const low = outputLow(part, ctx.rails);
  switch (logic.level_shift) {
    case "diode-clamp": {
      const clamp = ctx.stage.stage === "sign" ? ctx.stage.clamp : undefined;
      const flat = { vf_1ma_v: 0, vf_10ma_v: 0 };
      const current = high === null || !(high > 0) ? 0 : clampSourceCurrent(high, logic.pull_down_ohm, clamp ?? flat);
      return {
        case: "drives",
        current,
        sentence: () =>
          `with the output high at ${formatVolts(high ?? 0)} it sources %I through the clamp diode into the ${formatSI(logic.pull_down_ohm, "Ω")} pull-down`,
        formula: "I·pull_down_ohm + Vf(I) = V_OH",
      };
    }
    case "pull-up": {
      const pullUp = logic.pull_up_ohm;
      if (pullUp === undefined) return { case: "no-resistor", field: "pull_up_ohm" };
      const sink = pullUpSinkCurrent(logic.vdd_v, low, pullUp);
      const source = high === null ? 0 : pullUpSourceCurrent(logic.vdd_v, high, pullUp);
      return source > sink
        ? {
            case: "drives",
            current: source,
            sentence: () =>
              `with the output high at ${formatVolts(high ?? 0)}, above V_DD, it sources %I into the ${formatSI(pullUp, "Ω")} pull-up`,
            formula: "(V_OH − vdd) / pull_up_ohm",
          }
        : {
            case: "drives",
            current: sink,
            sentence: () =>
              `with the output low at ${formatVolts(low, { signed: true })} it sinks %I from the ${formatSI(pullUp, "Ω")} pull-up`,
            formula: "(vdd − V_OL) / pull_up_ohm",
          };
    }
    case "npn-inverter": {
      const rb = logic.npn_base_ohm;
      if (rb === undefined) return { case: "no-resistor", field: "npn_base_ohm" };
      const base = high === null ? 0 : baseDriveCurrent(high, rb);
      const clamp = logic.npn_base_clamp === true && ctx.stage.stage === "sign" ? ctx.stage.base_clamp : undefined;
      const sink = clamp ? baseReverse(low, { diode: clamp, base_ohm: rb }).clamp_current_a : 0;
      return sink > base
        ? {
            case: "drives",
            current: sink,
            sentence: () =>
              `with the output low at ${formatVolts(low, { signed: true })} it sinks %I through the ${formatSI(rb, "Ω")} base resistor and the base clamp`,
            formula: "(|V_OL| − Vf) / npn_base_ohm",
          }
        : {
            case: "drives",
            current: base,
            sentence: () =>
              `with the output high at ${formatVolts(high ?? 0)} it sources %I into the NPN's base through ${formatSI(rb, "Ω")}`,
            formula: "(V_OH − 0.7 V) / npn_base_ohm",
          };
    }
  }
}
