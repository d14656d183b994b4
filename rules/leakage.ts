import {
  defineRule,
  record,
  shareVerdict,
  spareOrShortSmall,
  stageAs,
  type DiodeStage,
  type Stage,
} from "../src/core/rule-kit/index.ts";
import { formatSI } from "../src/core/units.ts";
import type { Diode } from "../src/core/schemas/diode.ts";

/**
 * Reverse leakage at the hot end of the temperature range, from the 25 °C
 * rating: silicon and low-leakage junctions double every 10 °C, Schottky
 * leakage grows ten-fold every 25 °C (both common practice [M]). Never scaled down.
 */
export function leakageAt(d: Diode, maxC: number): number {
  const ir = d.ir_na * 1e-9;
  const rise = Math.max(0, maxC - 25);
  return d.type === "schottky" ? ir * 10 ** (rise / 25) : ir * 2 ** (rise / 10);
}

export const leakage = defineRule({
  id: "leakage",
  unit: "V",
  checks:
    "Reverse leakage at the hottest temperature, flowing through the resistance around the diode, stays inside its share of the error.",
  formula:
    "ir(T) = ir_na × 2^((T_max − 25)/10) (silicon, low-leakage) or × 10^((T_max − 25)/25) (Schottky); rectifier diode: ir(T) · rectifier_load_ohm / k ≤ offset_share · required_v",
  source: "Leakage doubling per 10 °C and Schottky ×10 per 25 °C: common practice [M].",
  policy: "offset_share",
  kinds: ["diode"],
  needs: { diode: ["ir_na"] },
  measure({ stage, design, policy }, part, out) {
    const s = leakageStage(stage);
    const ir = leakageAt(part, design.temperature.max_c);
    const error = (ir * s.leakage_ohm) / (s.leakage_per_input ?? 1);
    const limit = s.leakage_limit_v;
    const margin = limit - error;
    record(out, shareVerdict(margin, limit, policy), limit, error, margin, limit);
  },
  describe({ available: error, margin, needed: limit }, { stage, design }, part) {
    const s = leakageStage(stage);
    const hot = design.temperature.max_c;
    const ir = leakageAt(part, hot);
    const perInput = s.leakage_per_input ?? 1;
    const ir25 = part.ir_na * 1e-9;
    const scale = perInput === 1 ? "" : ` ÷ ${Number(perInput.toPrecision(3))}`;
    return {
      reason: `leaks ${formatSI(ir, "A")} at ${hot} °C (${formatSI(ir25, "A")} at 25 °C), × ${formatSI(s.leakage_ohm, "Ω")}${scale} = ${formatSI(error, "V")}; the limit is ${formatSI(limit, "V")} (${s.leakage_what ?? "error share"}): ${spareOrShortSmall(margin)}`,
      steps: [
        { label: "ir at 25 °C", value: ir25, unit: "A" },
        { label: `ir at ${hot} °C`, value: ir, unit: "A" },
        { label: "resistance it flows through", value: s.leakage_ohm, unit: "Ω" },
        { label: "error = ir × R (÷ k when input-referred)", value: error, unit: "V" },
        { label: "limit", value: limit, unit: "V" },
        { label: "margin = limit − error", value: margin, unit: "V" },
      ],
    };
  },
});

type LeakageStage = DiodeStage & { leakage_ohm: number; leakage_limit_v: number };

const hasLeakagePath = (s: DiodeStage): s is LeakageStage =>
  s.leakage_ohm !== undefined && s.leakage_limit_v !== undefined;

function leakageStage(stage: Stage): LeakageStage {
  const s = stageAs(stage, "diode", "leakage");
  if (!hasLeakagePath(s)) throw new Error("leakage needs a diode stage with a resistance and a limit");
  return s;
}
