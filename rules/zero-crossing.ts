// Dead time of the rectifier's diode stage at each zero crossing (SPEC §11.3):
// the exact piecewise time (integrator, then slew) from src/core/math/dead-time.ts,
// turned into the error it makes in the reading, against the timing share of
// the required accuracy. The same error is the budget's dead-time term.
import {
  defineRule,
  record,
  shareVerdict,
  spareOrShortSmall,
  stageAs,
  type RoleContext,
} from "../src/core/rule-kit/index.ts";
import type { PartOf } from "../src/core/kind-rows.ts";
import { crossingError, deadTime, type DeadTime } from "../src/core/math/dead-time.ts";
import { formatQuantity, formatSI } from "../src/core/units.ts";

/**
 * β of the inverting half-wave stage with equal resistors, R/(R + R) = ½, used
 * when a stage does not give its own: the smaller β, the slower the integrator
 * ramp, so ½ is the conservative choice against a follower's 1.
 */
export const DEAD_TIME_BETA_DEFAULT = 0.5;

type Worked = { t: DeadTime; slope: number; jump: number; beta: number; error: number; limit: number };

function work(ctx: RoleContext, part: PartOf<"op-amp">): Worked {
  const s = stageAs(ctx.stage, "op-amp", "zero-crossing");
  const f = ctx.design.signal.max_frequency_hz;
  const amplitude = s.zero_crossing_signal_v ?? Math.max(Math.abs(s.input.low), Math.abs(s.input.high));
  const slope = 2 * Math.PI * f * amplitude;
  const jump = s.zero_crossing_v ?? 0;
  const beta = s.zero_crossing_beta ?? DEAD_TIME_BETA_DEFAULT;
  const t = deadTime({
    gbw_hz: part.gbw_mhz * 1e6,
    slew_v_per_s: part.slew_v_per_us * 1e6,
    beta,
    input_slope_v_per_s: slope,
    jump_v: jump,
  });
  return {
    t,
    slope,
    jump,
    beta,
    error: crossingError(
      f,
      s.zero_crossing_peak_v ?? s.bandwidth_peak_v,
      t.seconds,
      s.zero_crossing_error ?? "inverts",
    ),
    limit: ctx.policy.timing_share * ctx.design.accuracy.required_v,
  };
}

export const zeroCrossing = defineRule({
  id: "zero-crossing",
  unit: "V",
  checks:
    "At each zero crossing the rectifier's diode stage crosses its two diode drops soon enough: while it is dead the reading is wrong, and that error stays inside the timing share of the accuracy.",
  formula:
    "S = 2π·f·W; a = 2π·GBW·β·S (β = ½ unless the stage says); t₁ = SR/a; t = √(2·2Vf/a) if 2Vf ≤ SR·t₁/2 (gain-bandwidth), else t₁ + (2Vf − SR·t₁/2)/SR (then slew); error = 2·2π·f·peak·t where the reading inverts (−x for +x), 2π·f·peak·t where the output clips at 0 V (a single-supply converter reads 0 for −x, as in rectify-and-sign); limit = timing_share · required_v",
  source:
    "Open-loop op amp as an integrator beyond its pole, A(s) ≈ ωt/s, ωt = 2π·GBW (textbook single-pole model, T. Fiore, Operational Amplifiers & Linear Integrated Circuits, ch. 5), driven by an input error growing as β·S·t, then slew-limited.",
  policy: "timing_share",
  kinds: ["op-amp"],
  needs: { "op-amp": ["gbw_mhz", "slew_v_per_us"] },
  measure(ctx, part, out) {
    const { error, limit } = work(ctx, part);
    const margin = limit - error;
    record(out, shareVerdict(margin, limit, ctx.policy), limit, error, margin, limit);
  },
  describe({ available: error, margin, needed: limit }, ctx, part) {
    const { t, slope, jump, beta } = work(ctx, part);
    const slew = part.slew_v_per_us * 1e6;
    const st = stageAs(ctx.stage, "op-amp", "zero-crossing");
    const clips = st.zero_crossing_error === "clips";
    const drops = st.zero_crossing_at === undefined ? "two diode drops" : `two diode drops ${st.zero_crossing_at}`;
    const how =
      t.regime === "gain-bandwidth"
        ? `gain-bandwidth limited: the open-loop output ramps as an integrator and crosses ${formatSI(jump, "V")} (${drops}) in ${formatSI(t.seconds, "s")}, before its rate reaches the ${formatQuantity(slew, "V/s")} slew rate (slew alone would take ${formatSI(t.slew_only_s, "s")})`
        : `gain-bandwidth, then slew: the open-loop output ramps as an integrator for ${formatSI(t.slew_onset_s, "s")} (${formatSI(t.slew_onset_v, "V")}) until its rate reaches the ${formatQuantity(slew, "V/s")} slew rate, then slews the rest of the ${formatSI(jump, "V")} (${drops}): ${formatSI(t.seconds, "s")} in all`;
    return {
      reason: `dead ${formatSI(t.seconds, "s")} at each crossing, ${how}; the reading is off by up to ${formatSI(error, "V")} (${clips ? "2π·f·peak·t: the output would go below 0 V, where the converter reads 0" : "2·2π·f·peak·t: −x for +x"}); the limit is ${formatSI(limit, "V")} (timing share ${ctx.policy.timing_share * 100} % of the required accuracy): ${spareOrShortSmall(margin)}`,
      steps: [
        { label: "jump = 2·Vf", value: jump, unit: "V" },
        { label: "input slope at the crossing S = 2π·f·W", value: slope, unit: "V/s" },
        { label: "feedback factor β", value: beta, unit: "" },
        { label: "integrator ramp a = 2π·GBW·β·S", value: t.acceleration_v_per_s2, unit: "V/s²" },
        { label: "slew onset t₁ = SR / a", value: t.slew_onset_s, unit: "s" },
        { label: "gain-bandwidth only √(2·jump/a)", value: t.gbw_only_s, unit: "s" },
        { label: "slew only jump / SR", value: t.slew_only_s, unit: "s" },
        { label: "dead time", value: t.seconds, unit: "s" },
        { label: clips ? "error = 2π·f·peak·t (clips at 0 V)" : "error = 2·2π·f·peak·t", value: error, unit: "V" },
        { label: "limit = timing_share × required_v", value: limit, unit: "V" },
        { label: "margin = limit − error", value: margin, unit: "V" },
      ],
    };
  },
});
