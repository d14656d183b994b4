import { defineRule, volts } from "../src/core/engine/finding.ts";
import { spareOrShort, voltageVerdict } from "../src/core/engine/verdict.ts";
import { forwardVoltage } from "../src/core/math/diode.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";
import { INPUT_CLAMP_V, NPN_OFF_BELOW_V, outputHigh, outputLow } from "./levels.ts";

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
  measure({ stage, design, rails, policy }, part) {
    const { vih_v: vih, vdd_v: vdd, level_shift: shift, pull_down_ohm: pull } = design.logic;
    if (shift === "npn-inverter") {
      const low = outputLow(part, rails);
      const margin = Math.min(NPN_OFF_BELOW_V - low, vdd - vih);
      const verdict = voltageVerdict(margin, policy);
      return {
        case: "npn",
        verdict,
        needed: NPN_OFF_BELOW_V,
        available: low,
        margin,
        limit: vih,
        high: 0,
        vf: 0,
        current: 0,
        tooHigh: false,
      } as const;
    }
    const high = outputHigh(part, rails);
    if (high === null) {
      if (shift === "pull-up") {
        const margin = vdd - vih;
        const verdict = voltageVerdict(margin, policy);
        return {
          case: "pulled-up",
          verdict,
          needed: vih,
          available: vdd,
          margin,
          limit: vih,
          high: 0,
          vf: 0,
          current: 0,
          tooHigh: false,
        } as const;
      }
      return {
        case: "cannot-drive",
        verdict: "fail",
        needed: vih,
        available: 0,
        margin: -vih,
        limit: vih,
        high: 0,
        vf: 0,
        current: 0,
        tooHigh: false,
      } as const;
    }
    let vf = 0;
    let current = 0;
    if (shift === "diode-clamp" && stage.stage === "sign" && stage.clamp) {
      current = Math.max(0, high) / pull;
      vf = forwardVoltage(stage.clamp, current);
    }
    const top = vdd + INPUT_CLAMP_V;
    const level = high - vf;
    const margin = Math.min(level - vih, top - level);
    const tooHigh = top - level < level - vih;
    const verdict = voltageVerdict(margin, policy);
    const needed = tooHigh ? top : vih;
    return {
      case: "driven",
      verdict,
      needed,
      available: level,
      margin,
      limit: vih,
      high,
      vf,
      current,
      tooHigh,
    } as const;
  },
  describe(m, { design }) {
    const { vih_v: vih, vdd_v: vdd } = design.logic;
    const { available: level, margin } = m;
    switch (m.case) {
      case "npn":
        return {
          reason: `the output low of ${volts(level)} must stay below ${formatVolts(NPN_OFF_BELOW_V)} to turn the NPN off, so the pull-up gives ${formatVolts(vdd)} against V_IH ${formatVolts(vih)}: ${spareOrShort(margin, "V")}`,
          steps: [
            { label: "output low = V− + out_neg_headroom_v", value: level, unit: "V" },
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
          m.vf > 0
            ? `, minus ${formatVolts(m.vf)} across the clamp diode at ${formatSI(m.current, "A")} = ${formatVolts(level)}`
            : "";
        const bound = m.tooHigh
          ? `needs at most ${formatVolts(top)} (V_DD + 0.3 V)`
          : `needs at least V_IH ${formatVolts(vih)}`;
        return {
          reason: `the output high reaches ${formatVolts(m.high)}${diode}; ${bound}: ${spareOrShort(margin, "V")}`,
          steps: [
            { label: "V_OH = V+ − out_pos_headroom_v", value: m.high, unit: "V" },
            { label: "clamp current = V_OH / pull_down_ohm", value: m.current, unit: "A" },
            { label: "Vf of the clamp diode at that current", value: m.vf, unit: "V" },
            { label: "V_high = V_OH − Vf", value: level, unit: "V" },
            { label: "V_high − vih", value: level - vih, unit: "V" },
            { label: "vdd + 0.3 V − V_high", value: top - level, unit: "V" },
            { label: "margin = the smaller", value: margin, unit: "V" },
          ],
        };
      }
    }
  },
});
