// How late the sign stage itself decides (SPEC §11.4): a comparator's rated
// delay plus the time the input needs to reach the overdrive it is rated at and
// to pass its hysteresis; an op amp used as a comparator, its own integrator-
// then-slew transition through the output swing. Shared by propagation-delay
// and late-sign, so the time is worked out once, the same way.
import type { RoleContext } from "../src/core/rule-kit/index.ts";
import { comparatorDelay, opAmpComparatorDelay, type SignDelay } from "../src/core/math/late-sign.ts";
import { outputHigh, outputLow, type Driver } from "./levels.ts";

/** Slope of the sign stage's input at a crossing, 2π·f·W (W the largest input it sees). */
export function signInputSlope(ctx: RoleContext): number {
  const s = ctx.stage;
  const amplitude = s.stage === "diode" ? 0 : Math.max(Math.abs(s.input.low), Math.abs(s.input.high));
  return 2 * Math.PI * ctx.design.signal.max_frequency_hz * amplitude;
}

export type StageDelay = SignDelay & {
  /** A comparator rated at no stated overdrive: the common-practice 100 mV is assumed, at best marginal. */
  overdrive_assumed: boolean;
  /** Op amp as comparator: the swing it crosses and its slew rate. */
  swing_v?: number;
};

/** The sign stage's own delay after a true crossing. */
export function stageDelay(ctx: RoleContext, part: Driver): StageDelay {
  const slope = signInputSlope(ctx);
  if (part.kind === "comparator") {
    const { delay, overdrive_assumed } = comparatorDelay({
      tpd_s: part.tpd_ns * 1e-9,
      overdrive_v: part.tpd_overdrive_mv === undefined ? undefined : part.tpd_overdrive_mv * 1e-3,
      hysteresis_v: part.hysteresis_mv === undefined ? undefined : part.hysteresis_mv * 1e-3,
      input_slope_v_per_s: slope,
    });
    return { ...delay, overdrive_assumed };
  }
  // An op amp whose headrooms leave it no swing on these rails makes no edge here; the level rules fail it.
  const swing = Math.max(0, (outputHigh(part, ctx.rails) ?? ctx.rails.positive_v) - outputLow(part, ctx.rails));
  const delay = opAmpComparatorDelay({
    gbw_hz: part.gbw_mhz * 1e6,
    slew_v_per_s: part.slew_v_per_us * 1e6,
    swing_v: swing,
    input_slope_v_per_s: slope,
  });
  return { ...delay, overdrive_assumed: false, swing_v: swing };
}
