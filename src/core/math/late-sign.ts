// How late the sign decision is after a true zero crossing (SPEC §11.4), as a
// sum of named components so other checks (rise time of a pull-up, overload
// recovery, NPN storage) can add theirs: see /work/notes/SIGN-DELAY.md.
import { deadTime } from "./dead-time.ts";

/** One part of the sign's lateness. */
export type DelayComponent = {
  /** Short stable name ("propagation", "overdrive", "hysteresis", "rise-time" …). */
  name: string;
  seconds: number;
  /** The formula with its numbers, for the reason and the steps ("5 mV / 15.7 kV/s"). */
  formula: string;
  /**
   * Set when this time is a threshold shift whose error the dead band already
   * counts (hysteresis: Vh/k). It is part of how late the sign is, but the
   * budget's late-sign term leaves it out so the error is counted once.
   */
  counted_in_dead_band?: true;
};

export type SignDelay = { components: DelayComponent[]; seconds: number; budget_seconds: number };

/** Adds the components up; `budget_seconds` leaves out what the dead band already counts. */
export function sumDelay(components: readonly DelayComponent[]): SignDelay {
  let seconds = 0;
  let budget = 0;
  for (const c of components) {
    seconds += c.seconds;
    if (!c.counted_in_dead_band) budget += c.seconds;
  }
  return { components: [...components], seconds, budget_seconds: budget };
}

/**
 * Common-practice overdrive a datasheet's delay is usually stated at when the
 * catalogue does not say (100 mV is the largest in common use, so the time
 * the input needs to reach it is the longest) [M]. A delay read with it is at
 * best marginal.
 */
export const ASSUMED_OVERDRIVE_V = 0.1;

export type ComparatorDelayInput = {
  tpd_s: number;
  /** Overdrive the delay is rated at, volts; undefined when not stated. */
  overdrive_v: number | undefined;
  /** Built-in hysteresis, volts (0 or undefined for none). */
  hysteresis_v: number | undefined;
  /** Slope of the comparator's input at the crossing, 2π·f·W, V/s. */
  input_slope_v_per_s: number;
};

/**
 * A comparator switches tpd after its input has passed the threshold by the
 * overdrive it is rated at, V_od/S_in; hysteresis moves the threshold by Vh/2,
 * (Vh/2)/S_in more (SPEC §11.4).
 */
export function comparatorDelay(p: ComparatorDelayInput): { delay: SignDelay; overdrive_assumed: boolean } {
  const s = p.input_slope_v_per_s;
  const assumed = p.overdrive_v === undefined;
  const od = p.overdrive_v ?? ASSUMED_OVERDRIVE_V;
  const parts: DelayComponent[] = [
    { name: "propagation", seconds: p.tpd_s, formula: "tpd" },
    { name: "overdrive", seconds: od / s, formula: assumed ? "V_od (assumed) / S_in" : "V_od / S_in" },
  ];
  const vh = p.hysteresis_v ?? 0;
  if (vh > 0)
    parts.push({ name: "hysteresis", seconds: vh / 2 / s, formula: "(Vh/2) / S_in", counted_in_dead_band: true });
  return { delay: sumDelay(parts), overdrive_assumed: assumed };
}

export type OpAmpComparatorInput = {
  gbw_hz: number;
  slew_v_per_s: number;
  /** V_OH − V_OL: the output must cross it from one level to the other. */
  swing_v: number;
  input_slope_v_per_s: number;
};

/**
 * An op amp used open loop as a comparator leaves its old level as an
 * integrator driven by the growing input (β = 1) and then slews: the same
 * piecewise law as the rectifier's dead time, through the whole output swing.
 * Saturation (overload) recovery comes on top and is not rated here, so a
 * verdict from this is at best marginal.
 */
export function opAmpComparatorDelay(p: OpAmpComparatorInput): SignDelay {
  const t = deadTime({
    gbw_hz: p.gbw_hz,
    slew_v_per_s: p.slew_v_per_s,
    beta: 1,
    input_slope_v_per_s: p.input_slope_v_per_s,
    jump_v: p.swing_v,
  });
  return sumDelay([
    {
      name: "output-transition",
      seconds: t.seconds,
      formula:
        t.regime === "gain-bandwidth" ? "√(2·swing / (2π·GBW·S_in))" : "SR/(2π·GBW·S_in) + (swing − SR·t₁/2) / SR",
    },
  ]);
}
