// The sign comparator: switches when its input passes the threshold (offset ±
// half the hysteresis) by the overdrive its delay is rated at, and its output
// follows that delay later. A crossing is placed inside a step by linear
// interpolation of the input.
import type { ComparatorModel } from "./chain.ts";

export class ComparatorRunner {
  /** +1 (input above) or −1. */
  out = 1;
  private pendingAt = Infinity;
  /** When the output last changed, s. */
  changedAt = -Infinity;
  private moved = false;
  private pending = 1;
  /** The decided state (what the output will become), before the delay. */
  private decided = 1;
  /** One saved state per refinement depth. */
  private readonly saved: number[][] = [];

  private readonly c: ComparatorModel;

  constructor(c: ComparatorModel) {
    this.c = c;
  }

  init(v: number): void {
    this.out = this.decided = this.pending = v < this.c.offset_v ? -1 : 1;
    this.pendingAt = Infinity;
  }

  save(depth: number): void {
    const v = (this.saved[depth] ??= [1, Infinity, 1, 1, -Infinity]);
    v[4] = this.changedAt;
    v[0] = this.out;
    v[1] = this.pendingAt;
    v[2] = this.pending;
    v[3] = this.decided;
    this.moved = false;
  }

  restore(depth: number): void {
    const v = this.saved[depth] ?? [];
    this.out = v[0] ?? 1;
    this.pendingAt = v[1] ?? Infinity;
    this.pending = v[2] ?? 1;
    this.decided = v[3] ?? 1;
    this.changedAt = v[4] ?? -Infinity;
    this.moved = false;
  }

  /** The output at time t (applies a pending change whose delay has run out). */
  at(t: number): number {
    if (t >= this.pendingAt) {
      this.changedAt = this.pendingAt;
      this.out = this.pending;
      this.pendingAt = Infinity;
    }
    return this.out;
  }

  /**
   * Fine step while a decision waits out its delay or was taken in the last
   * step: the error ramps until the output moves, and the trace should catch
   * its peak. Infinity otherwise, and for a comparator with no delay and no
   * band to cross.
   */
  fineStep(v0: number, v1: number, h: number): number {
    if (!this.moved && this.pendingAt === Infinity) return Infinity;
    const { hysteresis_v, overdrive_v, delay_s } = this.c;
    const slope = Math.abs(v1 - v0) / h;
    const band = slope > 0 ? (hysteresis_v + overdrive_v) / slope : 0;
    const span = Math.max(delay_s, band);
    return span > 0 ? span / 32 : Infinity;
  }

  /** Looks for a crossing in [t0, t0 + h] with the input going from v0 to v1. */
  advance(t0: number, h: number, v0: number, v1: number): void {
    const { offset_v, hysteresis_v, overdrive_v, delay_s } = this.c;
    const edge =
      this.decided > 0 ? offset_v - hysteresis_v / 2 - overdrive_v : offset_v + hysteresis_v / 2 + overdrive_v;
    const crossed = this.decided > 0 ? v1 < edge : v1 > edge;
    this.moved = crossed;
    if (!crossed) return;
    const frac = v0 === v1 ? 0 : Math.min(1, Math.max(0, (edge - v0) / (v1 - v0)));
    // A change still waiting is overtaken: the output can only follow the latest decision.
    this.at(t0 + frac * h);
    this.decided = -this.decided;
    this.pending = this.decided;
    this.pendingAt = t0 + frac * h + delay_s;
  }
}
