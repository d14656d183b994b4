// The series clamp diode's leakage (SPEC §11.6): with the comparator low, below
// ground, the diode blocks and its leakage flows out of the logic node towards
// the comparator, so the pull-down holds the pin below ground at −ir(T)·R_pd,
// clipped at the comparator's low level (the leakage stops where the diode's
// bias does: math/clamp-leakage.ts). Checked against the pin's lower limit, not
// against V_IL.
import {
  defineRule,
  record,
  shareVerdict,
  spareOrShort,
  stageAs,
  type RoleContext,
} from "../src/core/rule-kit/index.ts";
import { clampLowLevel, PIN_MIN_DEFAULT_V } from "../src/core/math/clamp-leakage.ts";
import { endPhrase, leakageAt } from "../src/core/math/temperature.ts";
import type { Diode } from "../src/core/schemas/diode.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";

function work(ctx: RoleContext, part: Diode) {
  const s = stageAs(ctx.stage, "diode", "clamp-leakage");
  const hot = ctx.design.temperature.max_c;
  const ir = leakageAt(part, hot);
  const pull = ctx.design.logic.pull_down_ohm;
  // The stage's reverse voltage is |V−| with the comparator low: a negative low level makes the diode block.
  const low = clampLowLevel(-s.reverse_v, ir, pull, s.floor_v);
  const pinMin = ctx.design.logic.pin_min_v ?? PIN_MIN_DEFAULT_V;
  return { ir, hot, pull, low, pinMin, assumed: ctx.design.logic.pin_min_v === undefined };
}

export const clampLeakage = defineRule({
  id: "clamp-leakage",
  unit: "V",
  checks:
    "With the comparator low the clamp diode blocks, and its leakage at the hottest temperature pulls the logic pin below ground through the pull-down; the pin stays above its lower limit.",
  formula:
    "V_pin = max(−ir(T_max)·pull_down_ohm, V_low) with V_low the comparator's lowest low level, the deepest V− (ir × 2 per 10 °C, Schottky × 10 per 25 °C); limit = |logic.pin_min_v| (−0.3 V when not given); margin = |pin_min| − |V_pin|",
  source:
    "Polarity of a reverse-biased series diode into a pull-down (SPEC §11.6); the floor: a diode at zero bias carries no current (Shockley diode equation, Sedra & Smith ch. 4), so its leakage stops where the node reaches the level at its other end; inputs typically limited to −0.3 V below their ground and leakage growth with temperature: common practice [M].",
  policy: "marginal_fraction",
  kinds: ["diode"],
  needs: { diode: ["ir_na"] },
  measure(ctx, part, out) {
    const w = work(ctx, part);
    const limit = -w.pinMin;
    const below = -w.low.level_v;
    const margin = limit - below;
    record(out, shareVerdict(margin, limit, ctx.policy), limit, below, margin, limit);
  },
  describe({ available: below, margin, needed: limit }, ctx, part) {
    const w = work(ctx, part);
    const pinLimit = `the pin's ${formatVolts(w.pinMin, { signed: true })} limit (logic.pin_min_v${w.assumed ? ", −0.3 V when not given, common practice" : ""})`;
    const { pulled_v: pulled, floor_v: floor, clipped } = w.low;
    const steps = [
      { label: `ir ${endPhrase("hot", w.hot)}`, value: w.ir, unit: "A" },
      { label: "pull-down", value: w.pull, unit: "Ω" },
      ...(pulled === undefined || floor === undefined
        ? [{ label: "V_pin (the diode does not block)", value: w.low.level_v, unit: "V" }]
        : [
            { label: "−ir·R", value: pulled, unit: "V" },
            { label: "comparator's lowest low level (deepest V−)", value: floor, unit: "V" },
            { label: "V_pin = max(−ir·R, low level)", value: w.low.level_v, unit: "V" },
          ]),
      { label: "lower limit of the pin", value: w.pinMin, unit: "V" },
      { label: "margin = |limit| − |V_pin|", value: margin, unit: "V" },
    ];
    if (!w.low.reverse_biased) {
      return {
        reason: `with no negative rail the comparator's low level is not below ground, so the diode does not block and its leakage cannot pull the pin below ground; ${pinLimit}: ${spareOrShort(margin, "V")}`,
        steps,
      };
    }
    const side = below > limit ? "below" : "above";
    const volts = (v: number) => (Math.abs(v) >= 0.01 ? formatVolts(v, { signed: true }) : formatSI(v, "V"));
    const where =
      clipped && pulled !== undefined
        ? `would pull the pin to ${volts(pulled)} as a constant current, but the leakage stops once the pin reaches the comparator's low level, so the pin goes no lower than ${volts(-below)} (the deepest V−)`
        : `pulls the pin to ${volts(-below)}`;
    return {
      reason: `with the comparator low the diode blocks; its ${formatSI(w.ir, "A")} leakage ${endPhrase("hot", w.hot)} through the ${formatSI(w.pull, "Ω")} pull-down ${where}, ${side} ${pinLimit}: ${spareOrShort(margin, "V")}`,
      steps,
    };
  },
});
