import {
  defineRule,
  record,
  spareOrShort,
  voltageVerdict,
  volts,
  type RoleContext,
} from "../src/core/rule-kit/index.ts";
import { forwardVoltage } from "../src/core/math/diode.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";
import { INPUT_CLAMP_V, NPN_OFF_BELOW_V, outputHigh, outputLow, type Driver } from "./levels.ts";

export const logicHigh = defineRule({
  id: "logic-high",
  unit: "V",
  checks: "When the signal is positive, the logic input sees a level above V_IH and not above its own supply.",
  formula:
    "diode-clamp: V_high = (V+ − out_pos_headroom_v) − Vf_clamp(V_OH / pull_down_ohm), margin = min(V_high − vih_v, vdd_v + 0.3 − V_high); pull-up: open-drain V_high = vdd_v, push-pull as diode-clamp without the diode; npn-inverter: output low must stay below 0.4 V to keep the NPN off, then V_high = vdd_v",
  source:
    "Logic thresholds per the logic family (JEDEC JESD8C.01 for 3.3 V LVCMOS); input limits −0.3 V … V_DD + 0.3 V (common practice).",
  policy: "headroom_margin_v",
  kinds: ["comparator", "op-amp"],
  needs: {},
  measure(ctx, part, out) {
    const h = highLevel(ctx, part);
    const verdict = h.case === "cannot-drive" ? "fail" : voltageVerdict(h.margin, ctx.policy);
    record(out, verdict, h.needed, h.level, h.margin, ctx.design.logic.vih_v);
  },
  describe({ margin }, ctx, part) {
    const { vih_v: vih, vdd_v: vdd } = ctx.design.logic;
    const h = highLevel(ctx, part);
    switch (h.case) {
      case "npn":
        return {
          reason: `the output low of ${volts(h.level)} must stay below ${formatVolts(NPN_OFF_BELOW_V)} to turn the NPN off, so the pull-up gives ${formatVolts(vdd)} against V_IH ${formatVolts(vih)}: ${spareOrShort(margin, "V")}`,
          steps: [
            { label: "output low = V− + out_neg_headroom_v", value: h.level, unit: "V" },
            { label: "margin = min(0.4 V − output low, vdd − vih)", value: margin, unit: "V" },
          ],
        };
      case "pulled-up":
        return {
          reason: `the open-drain output lets the pull-up lift the input to ${formatVolts(vdd)} against V_IH ${formatVolts(vih)}: ${spareOrShort(margin, "V")}`,
          steps: [{ label: "V_high = vdd", value: vdd, unit: "V" }],
        };
      case "cannot-drive":
        return {
          reason:
            "an open-drain output cannot drive the clamp diode high; use a push-pull output or the pull-up level shift",
          steps: [],
        };
      case "driven": {
        const top = vdd + INPUT_CLAMP_V;
        const diode =
          h.vf > 0
            ? `, minus ${formatVolts(h.vf)} across the clamp diode at ${formatSI(h.current, "A")} = ${formatVolts(h.level)}`
            : "";
        const bound = h.tooHigh
          ? `needs at most ${formatVolts(top)} (V_DD + 0.3 V)`
          : `needs at least V_IH ${formatVolts(vih)}`;
        return {
          reason: `the output high reaches ${formatVolts(h.high)}${diode}; ${bound}: ${spareOrShort(margin, "V")}`,
          steps: [
            { label: "V_OH = V+ − out_pos_headroom_v", value: h.high, unit: "V" },
            { label: "clamp current = V_OH / pull_down_ohm", value: h.current, unit: "A" },
            { label: "Vf of the clamp diode at that current", value: h.vf, unit: "V" },
            { label: "V_high = V_OH − Vf", value: h.level, unit: "V" },
            { label: "V_high − vih", value: h.level - vih, unit: "V" },
            { label: "vdd + 0.3 V − V_high", value: top - h.level, unit: "V" },
            { label: "margin = the smaller", value: margin, unit: "V" },
          ],
        };
      }
    }
  },
});

/** The level the logic input sees when the signal is positive, by level shift; `needed` is the bound that binds. */
function highLevel({ stage, design, rails }: RoleContext, part: Driver) {
  const { vih_v: vih, vdd_v: vdd, level_shift: shift, pull_down_ohm: pull } = design.logic;
  const none = { high: 0, vf: 0, current: 0 };
  if (shift === "npn-inverter") {
    const low = outputLow(part, rails);
    return {
      case: "npn",
      needed: NPN_OFF_BELOW_V,
      level: low,
      margin: Math.min(NPN_OFF_BELOW_V - low, vdd - vih),
      ...none,
    } as const;
  }
  const high = outputHigh(part, rails);
  if (high === null) {
    return shift === "pull-up"
      ? ({ case: "pulled-up", needed: vih, level: vdd, margin: vdd - vih, ...none } as const)
      : ({ case: "cannot-drive", needed: vih, level: 0, margin: -vih, ...none } as const);
  }
  let vf = 0;
  let current = 0;
  if (shift === "diode-clamp" && stage.stage === "sign" && stage.clamp) {
    current = Math.max(0, high) / pull;
    vf = forwardVoltage(stage.clamp, current);
  }
  const top = vdd + INPUT_CLAMP_V;
  const level = high - vf;
  const tooHigh = top - level < level - vih;
  return {
    case: "driven",
    tooHigh,
    needed: tooHigh ? top : vih,
    level,
    margin: Math.min(level - vih, top - level),
    high,
    vf,
    current,
  } as const;
}
