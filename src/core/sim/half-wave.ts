// Stage 1 of the full-wave rectifier (see HalfWaveStage in chain.ts), with its
// diodes by their Vf(I) law and the op amp open loop while both diodes are off.
//
// Three regions, one at a time:
//   D1 on  (input below zero): the op amp holds its inverting node at Vos
//          through D1, its output one drop above; the output node rests near 0.
//          Feedback factor ≈ 1 (the diode ties output to input).
//   D2 on  (input above zero): output node = −(Rf/Rin)·x + (1 + Rf/Rin)·Vos,
//          the op amp's output one drop below it; feedback factor Rin/(Rin + Rf).
//   off    (around each zero crossing): no feedback. The inverting node sits on
//          the resistive network (n = cn·x), and the op amp integrates the error,
//          dv/dt = ωt·(Vos − n), at most at its slew rate (SPEC §11.3), until
//          its output has crossed the two diode drops and the other diode closes
//          the loop again. Meanwhile the output node passes ca·x to the summer.
// A diode takes the loop over once its small-signal resistance m/(ln10·I) has
// fallen to the feedback resistance (m = Vf step per decade): the drops the
// op amp must cross are Vf at that current, I_on = m/(ln10·Rf), not at the
// operating current. This is this simulator's modelling choice (a diode with
// a higher resistance than Rf cannot carry the feedback), stated so it can be
// checked; it makes the simulated dead time no longer than SPEC §11.3's, which
// takes both drops at the operating current.
import { forwardVoltage } from "../math/diode.ts";
import type { HalfWaveStage } from "./chain.ts";
import { advancePole, type PoleStats } from "./pole.ts";

export const D1 = 0;
export const OFF = 1;
export const D2 = 2;

/** Resolution of the open-loop swing: the fine step is this share of the shortest possible dead time. */
const FINE_SHARE = 1 / 32;

export class HalfWaveRunner {
  /** Op amp output (V) and the output node the summer reads (V). */
  amp = 0;
  node = 0;
  region = D1;
  /** Longest open-loop interval seen while counting, seconds, and how many ended. */
  deadMax_s = 0;
  deadCount = 0;
  readonly pole: PoleStats = { slewing_s: 0, clipped_s: 0, counting: false };

  private offSince = 0;
  private holdUntil = 0;
  private lastEnd = 0;
  private changed = false;
  /** One saved state per refinement depth (the driver redoes a step in parts). */
  private readonly saved: number[][] = [];

  private readonly gain: number;
  private readonly wt: number;
  private readonly wcD1: number;
  private readonly wcD2: number;
  private readonly cn: number;
  private readonly ca: number;
  /** Output node per Vos in region D1 (n = Vos divided by Rf and the load). */
  private readonly restShare: number;
  private readonly loadG: number;
  private readonly vfOn: number;
  private readonly iOn: number;

  private readonly s: HalfWaveStage;

  constructor(s: HalfWaveStage) {
    this.s = s;
    const { r_in_ohm: rin, r_feedback_ohm: rf, load_ohm: rs } = s;
    this.gain = rf / rin;
    // An ideal amplifier is a very fast one here: the open-loop arithmetic needs finite numbers.
    this.wt = Math.min(2 * Math.PI * s.amp.gbw_hz, 1e18);
    this.wcD1 = this.wt;
    this.wcD2 = (this.wt * rin) / (rin + rf);
    if (rs === Infinity) {
      this.cn = 1;
      this.ca = 1;
      this.restShare = 1;
      this.loadG = 0;
    } else {
      this.cn = (rf + rs) / (rin + rf + rs);
      this.ca = rs / (rin + rf + rs);
      this.restShare = rs / (rf + rs);
      this.loadG = rs > 0 ? 1 / rs : 0;
    }
    const m = Math.max(0, s.diode.vf_10ma_v - s.diode.vf_1ma_v);
    this.iOn = Math.max(1e-15, m / (Math.LN10 * rf));
    this.vfOn = this.vf(0);
  }

  /** Vf at a current, never below the take-over current. */
  private vf(current: number): number {
    return forwardVoltage(this.s.diode, Math.max(current, this.iOn));
  }

  /** Open loop, or settling from it (as long again as it was open): errors now come from the crossing. */
  inDeadTime(): boolean {
    return this.region === OFF || this.lastEnd < this.holdUntil;
  }

  /** Starts in the region the input puts it in, settled. */
  init(x: number): void {
    this.region = x < 0 ? D1 : D2;
    this.amp = this.target(x);
    this.node = this.nodeFor(x);
  }

  /** Current D1 must carry (negative: the diode would turn off). */
  private currentD1(x: number): number {
    const { vos_v } = this.s.amp;
    const rest = vos_v * this.restShare;
    return (vos_v - x) / this.s.r_in_ohm + (vos_v - rest) / this.s.r_feedback_ohm;
  }

  private nodeD2(x: number): number {
    return -this.gain * x + (1 + this.gain) * this.s.amp.vos_v;
  }

  private currentD2(x: number): number {
    const v = this.nodeD2(x);
    return (this.s.amp.vos_v - v) / this.s.r_feedback_ohm - v * this.loadG;
  }

  private target(x: number): number {
    if (this.region === D1) return this.s.amp.vos_v + this.vf(this.currentD1(x));
    const v = this.nodeD2(x);
    return v - this.vf(this.currentD2(x));
  }

  private nodeFor(x: number): number {
    if (this.region === D1) return this.s.amp.vos_v * this.restShare;
    if (this.region === OFF) return this.ca * x;
    return this.amp + this.vf(this.currentD2(x));
  }

  save(depth: number): void {
    const v = (this.saved[depth] ??= [0, 0, 0, 0, 0, 0, 0, 0, 0, 0]);
    v[0] = this.amp;
    v[1] = this.node;
    v[2] = this.region;
    v[3] = this.deadMax_s;
    v[4] = this.deadCount;
    v[5] = this.offSince;
    v[6] = this.pole.slewing_s;
    v[7] = this.pole.clipped_s;
    v[8] = this.holdUntil;
    v[9] = this.lastEnd;
    this.changed = false;
  }

  restore(depth: number): void {
    const v = this.saved[depth] ?? [];
    this.amp = v[0] ?? 0;
    this.node = v[1] ?? 0;
    this.region = v[2] ?? D1;
    this.deadMax_s = v[3] ?? 0;
    this.deadCount = v[4] ?? 0;
    this.offSince = v[5] ?? 0;
    this.pole.slewing_s = v[6] ?? 0;
    this.pole.clipped_s = v[7] ?? 0;
    this.holdUntil = v[8] ?? 0;
    this.lastEnd = v[9] ?? 0;
    this.changed = false;
  }

  /**
   * The step the driver should use around here: fine while the loop is open,
   * when it opened or closed during the last step, and for as long again after
   * it closed (the reading's error peaks while the stages behind settle), else
   * Infinity. The ramp itself is exact at any step; the fine step is for the
   * instants and the shape of the error the trace records.
   */
  fineStep(x0: number, x1: number, h: number): number {
    if (!this.changed && this.region !== OFF && this.lastEnd >= this.holdUntil) return Infinity;
    const slope = Math.abs(x1 - x0) / h;
    // Shortest dead time: neither faster than the integrator ramp, t = √(2ΔV/(ωt·c·S)),
    // nor than the slew rate allows, ΔV/SR (SPEC §11.3).
    const swing = 2 * this.vfOn;
    const ramp = Math.sqrt((2 * swing) / (this.wt * this.cn * Math.max(slope, 1e-30)));
    const shortest = Math.max(ramp, swing / Math.min(this.s.amp.slew_v_per_s, 1e30));
    return shortest * FINE_SHARE;
  }

  /** Advances over [t0, t0 + h] with the input going linearly from x0 to x1. */
  advance(t0: number, h: number, x0: number, x1: number): void {
    let t = 0;
    for (let guard = 0; guard < 8 && t < h; guard++) {
      const xa = x0 + ((x1 - x0) * t) / h;
      const rest = h - t;
      if (this.region === OFF) t += this.advanceOpen(t0 + t, rest, xa, x1);
      else t += this.advanceClosed(t0 + t, rest, xa, x1);
    }
    this.node = this.nodeFor(x1);
    this.lastEnd = t0 + h;
  }

  /** Closed loop until the diode's current would reverse; returns the time used. */
  private advanceClosed(t: number, dt: number, xa: number, xb: number): number {
    const d1 = this.region === D1;
    const ia = d1 ? this.currentD1(xa) : this.currentD2(xa);
    const ib = d1 ? this.currentD1(xb) : this.currentD2(xb);
    let used = dt;
    let xe = xb;
    if (ia <= 0) {
      used = 0;
      xe = xa;
    } else if (ib <= 0) {
      used = (dt * ia) / (ia - ib);
      xe = xa + ((xb - xa) * used) / dt;
    }
    const wc = d1 ? this.wcD1 : this.wcD2;
    const { slew_v_per_s, out_low_v, out_high_v } = this.s.amp;
    this.amp = advancePole(
      this.amp,
      this.target(xa),
      this.target(xe),
      used,
      wc,
      slew_v_per_s,
      out_low_v,
      out_high_v,
      this.pole,
    );
    if (ib <= 0 || ia <= 0) {
      this.region = OFF;
      this.offSince = t + used;
      this.changed = true;
      // A zero-length remainder still counts as progress.
      return used > 0 ? used : dt * 1e-9;
    }
    return used;
  }

  /** Open loop: the op amp integrates its input error until a diode closes the loop. */
  private advanceOpen(t: number, dt: number, xa: number, xb: number): number {
    const { vos_v, out_low_v: lo, out_high_v: hi } = this.s.amp;
    const sr = Math.min(this.s.amp.slew_v_per_s, 1e30);
    // The rate ωt·(Vos − cn·x) is a straight line over the step; clipped at ±SR its integral is exact.
    const ra = this.wt * (vos_v - this.cn * xa);
    const rb = this.wt * (vos_v - this.cn * xb);
    let next = this.amp + clippedIntegral(ra, rb, sr) * dt;
    if (next > hi) next = hi;
    else if (next < lo) next = lo;
    const upA = this.amp - (this.cn * xa + this.vfOn);
    const upB = next - (this.cn * xb + this.vfOn);
    const downA = this.amp - (this.ca * xa - this.vfOn);
    const downB = next - (this.ca * xb - this.vfOn);
    let region = OFF;
    let frac = 1;
    if (upB >= 0) {
      region = D1;
      frac = upA >= 0 ? 0 : upA / (upA - upB);
    } else if (downB <= 0) {
      region = D2;
      frac = downA <= 0 ? 0 : downA / (downA - downB);
    }
    if (this.pole.counting && (rb >= sr || rb <= -sr)) this.pole.slewing_s += dt * frac;
    if (region === OFF) {
      this.amp = next;
      return dt;
    }
    this.amp += (next - this.amp) * frac;
    const used = dt * frac;
    const dead = t + used - this.offSince;
    this.holdUntil = t + used + dead;
    if (this.pole.counting) {
      this.deadCount++;
      if (dead > this.deadMax_s) this.deadMax_s = dead;
    }
    this.region = region;
    this.changed = true;
    return used > 0 ? used : dt * 1e-9;
  }
}

/** Mean over [0, 1] of a straight line from a to b clipped to ±limit. */
export function clippedIntegral(a: number, b: number, limit: number): number {
  if (a === b) return Math.max(-limit, Math.min(limit, a));
  // Integrate clip(a + (b − a)·u) du piecewise between the instants it meets ±limit.
  const at = (v: number) => Math.min(1, Math.max(0, (v - a) / (b - a)));
  const uLo = at(-limit);
  const uHi = at(limit);
  const u0 = Math.min(uLo, uHi);
  const u1 = Math.max(uLo, uHi);
  const clip = (u: number) => Math.max(-limit, Math.min(limit, a + (b - a) * u));
  // Outside [u0, u1] the line is clipped (constant); inside it is free.
  const mid = (clip(u0) + clip(u1)) / 2;
  return clip(u0 / 2) * u0 + mid * (u1 - u0) + clip((1 + u1) / 2) * (1 - u1);
}
