import { defineRule, record, shareVerdict, spareOrShort, type Step } from "../src/core/rule-kit/index.ts";
import { ASSUMED_OVERDRIVE_V } from "../src/core/math/late-sign.ts";
import { formatQuantity, formatSI } from "../src/core/units.ts";
import { signInputSlope, stageDelay } from "./sign-delay.ts";
import { signTimeLimit } from "./sign-path.ts";

export const propagationDelay = defineRule({
  id: "propagation-delay",
  unit: "s",
  checks:
    "The sign stage decides soon enough after a zero crossing: its rated delay, plus the time the input needs to reach the overdrive the delay is rated at and to pass its hysteresis.",
  formula:
    "S_in = 2π·f·W; comparator: t = tpd + V_od/S_in + (Vh/2)/S_in (V_od = tpd_overdrive_mv, 100 mV assumed and at best marginal when empty); op amp as comparator: integrator then slew through V_OH − V_OL, t = √(2·swing/(2π·GBW·S_in)) or t₁ + (swing − SR·t₁/2)/SR, at best marginal; limit = the time in which 2·2π·f·peak·t reaches timing_share · required_v",
  source:
    "Comparator delay rated at an overdrive (datasheet practice); the input's slope at a crossing (arithmetic); op amp as an integrator beyond its pole (textbook single-pole model, T. Fiore, Operational Amplifiers & Linear Integrated Circuits, ch. 5); 100 mV assumed overdrive is common practice [M].",
  policy: "timing_share",
  kinds: ["comparator", "op-amp"],
  needs: { comparator: ["tpd_ns"], "op-amp": ["gbw_mhz", "slew_v_per_us"] },
  measure(ctx, part, out) {
    const limit = signTimeLimit(ctx);
    const d = stageDelay(ctx, part);
    const margin = limit - d.seconds;
    const computed = shareVerdict(margin, limit, ctx.policy);
    // An op amp's saturated transition and an assumed overdrive are estimates: at best marginal.
    const estimate = part.kind === "op-amp" || d.overdrive_assumed;
    record(out, estimate && computed === "pass" ? "marginal" : computed, limit, d.seconds, margin, limit);
  },
  describe({ available: delay, margin, needed: limit }, ctx, part) {
    const d = stageDelay(ctx, part);
    const slope = signInputSlope(ctx);
    const tail = `the sign may be late by ${formatSI(limit, "s")} (timing share ${ctx.policy.timing_share * 100} % of the required accuracy at 2·2π·f·peak·t): ${spareOrShort(margin, "s")}`;
    const total: Step[] = [
      { label: "input slope at the crossing S_in = 2π·f·W", value: slope, unit: "V/s" },
      ...d.components.map((c) => ({ label: `${c.name}: ${c.formula}`, value: c.seconds, unit: "s" })),
      { label: "delay", value: delay, unit: "s" },
      { label: "limit", value: limit, unit: "s" },
      { label: "margin = limit − delay", value: margin, unit: "s" },
    ];
    if (part.kind === "op-amp") {
      return {
        reason: `an op amp used as a comparator leaves its old level as an integrator driven by the input's ${formatSI(slope, "V/s")} ramp, then slews: ${formatSI(delay, "s")} to cross ${formatSI(d.swing_v ?? 0, "V")} at ${formatSI(part.gbw_mhz * 1e6, "Hz")} GBW and ${formatQuantity(part.slew_v_per_us * 1e6, "V/s")}; ${tail}; an estimate, so at best marginal`,
        steps: total,
      };
    }
    const byName = (n: string) => d.components.find((c) => c.name === n)?.seconds ?? 0;
    const od = part.tpd_overdrive_mv === undefined ? ASSUMED_OVERDRIVE_V : part.tpd_overdrive_mv * 1e-3;
    const hyst = byName("hysteresis");
    const hystText =
      hyst > 0
        ? ` + ${formatSI(hyst, "s")} to pass half its ${formatSI((part.hysteresis_mv ?? 0) * 1e-3, "V")} hysteresis`
        : "";
    const odText = d.overdrive_assumed
      ? `${formatSI(od, "V")} (assumed, common practice: tpd_overdrive_mv is empty, so at best marginal)`
      : formatSI(od, "V");
    return {
      reason: `switches ${formatSI(byName("propagation"), "s")} after its input passes the threshold by ${odText}, which the ${formatSI(slope, "V/s")} ramp takes ${formatSI(byName("overdrive"), "s")} to reach${hystText}: ${formatSI(delay, "s")} in all; ${tail}`,
      steps: total,
    };
  },
});
