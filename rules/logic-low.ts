import {
  defineRule,
  record,
  spareOrShort,
  voltageVerdict,
  volts,
  type RoleContext,
} from "../src/core/rule-kit/index.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";
import { INPUT_CLAMP_V, NPN_VBE_ON_V, NPN_VCE_SAT_V, outputHigh, outputLow, type Driver } from "./levels.ts";

export const logicLow = defineRule({
  id: "logic-low",
  unit: "V",
  checks: "When the signal is negative, the logic input sees a level below V_IL and not below −0.3 V.",
  formula:
    "diode-clamp: V_low = ir · pull_down_ohm, margin = vil_v − V_low; pull-up: V_low = V− + out_neg_headroom_v, margin = min(vil_v − V_low, V_low + 0.3); npn-inverter: V_OH must exceed 0.7 V + 0.3 V to saturate the NPN, V_low = 0.2 V",
  source:
    "Logic thresholds per the logic family (JEDEC JESD8C.01 for 3.3 V LVCMOS); input limits −0.3 V … V_DD + 0.3 V (common practice).",
  policy: "headroom_margin_v",
  kinds: ["comparator", "op-amp"],
  needs: {},
  measure(ctx, part, out) {
    const l = lowLevel(ctx, part);
    record(out, voltageVerdict(l.margin, ctx.policy), l.needed, l.level, l.margin, ctx.design.logic.vil_v);
  },
  describe({ margin }, ctx, part) {
    const { vil_v: vil, pull_down_ohm: pull } = ctx.design.logic;
    const l = lowLevel(ctx, part);
    switch (l.case) {
      case "clamp-leakage":
        return {
          reason: `with the output low the clamp diode blocks, and its leakage of ${formatSI(l.ir, "A")} × ${formatSI(pull, "Ω")} holds the input at ${formatSI(l.level, "V")}; needs at most V_IL ${formatVolts(vil)}: ${spareOrShort(margin, "V")}`,
          steps: [
            { label: "clamp diode leakage ir", value: l.ir, unit: "A" },
            { label: "V_low = ir × pull_down_ohm", value: l.level, unit: "V" },
            { label: "margin = vil − V_low", value: margin, unit: "V" },
          ],
        };
      case "cannot-drive":
        return { reason: "an open-drain output cannot drive the NPN's base high", steps: [] };
      case "npn":
        return {
          reason: `the output high of ${volts(l.level)} must exceed ${formatVolts(l.needed)} to saturate the NPN, which then pulls the input to ${formatVolts(NPN_VCE_SAT_V)} against V_IL ${formatVolts(vil)}: ${spareOrShort(margin, "V")}`,
          steps: [
            { label: "V_OH", value: l.level, unit: "V" },
            { label: "margin = min(V_OH − 1.0 V, vil − 0.2 V)", value: margin, unit: "V" },
          ],
        };
      case "direct":
        return {
          reason: `the output low of ${volts(l.level)} reaches the input directly; ${l.tooLow ? "needs at least −0.30 V (below that the input's protection conducts)" : `needs at most V_IL ${formatVolts(vil)}`}: ${spareOrShort(margin, "V")}`,
          steps: [
            { label: "V_low = V− + out_neg_headroom_v", value: l.level, unit: "V" },
            { label: "vil − V_low", value: vil - l.level, unit: "V" },
            { label: "V_low + 0.3 V", value: l.level + INPUT_CLAMP_V, unit: "V" },
            { label: "margin = the smaller", value: margin, unit: "V" },
          ],
        };
    }
  },
});

/** The level the logic input sees when the signal is negative, by level shift; `needed` is the bound that binds. */
function lowLevel({ stage, design, rails }: RoleContext, part: Driver) {
  const { vil_v: vil, level_shift: shift, pull_down_ohm: pull } = design.logic;
  if (shift === "diode-clamp") {
    const ir = stage.stage === "sign" && stage.clamp ? stage.clamp.ir_na * 1e-9 : 0;
    const level = ir * pull;
    return { case: "clamp-leakage", needed: vil, level, margin: vil - level, ir } as const;
  }
  if (shift === "npn-inverter") {
    const drive = NPN_VBE_ON_V + INPUT_CLAMP_V;
    const high = outputHigh(part, rails);
    if (high === null) return { case: "cannot-drive", needed: drive, level: 0, margin: -drive, ir: 0 } as const;
    return {
      case: "npn",
      needed: drive,
      level: high,
      margin: Math.min(high - drive, vil - NPN_VCE_SAT_V),
      ir: 0,
    } as const;
  }
  const low = outputLow(part, rails);
  const tooLow = low + INPUT_CLAMP_V < vil - low;
  const margin = Math.min(vil - low, low + INPUT_CLAMP_V);
  return { case: "direct", needed: tooLow ? -INPUT_CLAMP_V : vil, level: low, margin, ir: 0, tooLow } as const;
}
