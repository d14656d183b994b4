// The reading's error over continuous time, for a converter that may convert at
// any instant (no sample rate given): between two simulated points the
// converter's input and the source are straight lines, the code is a staircase
// over them, and the error reading − input is a straight line between code
// changes. Its largest magnitude sits at a point or just either side of a code
// change, and its mean square integrates exactly piece by piece. A max taken
// only at the points would depend on where they fall against the staircase.
import type { ConverterModel, ReadingModel } from "./chain.ts";
import { quantize, reading } from "./converter.ts";

export class ErrorMeter {
  max = 0;
  maxAt = 0;
  private sumSq = 0;
  private span = 0;
  private readonly adc: ConverterModel;
  private readonly r: ReadingModel;
  private readonly full: number;
  private readonly q: number;

  constructor(adc: ConverterModel, r: ReadingModel) {
    this.adc = adc;
    this.r = r;
    this.full = 2 ** adc.bits;
    this.q = adc.reference_v / this.full;
  }

  /** One sample taken at an instant (a converter with a sample rate). */
  sample(t: number, err: number): void {
    this.note(t, err);
    this.sumSq += err * err;
    this.span += 1;
  }

  /** A stretch [ta, tb] with the converter input va→vb, the source xa→xb and a fixed sign. */
  stretch(ta: number, tb: number, va: number, vb: number, xa: number, xb: number, sign: number): void {
    const dt = tb - ta;
    if (!(dt > 0)) return;
    let ca = quantize(va, this.adc);
    const cb = quantize(vb, this.adc);
    let t = ta;
    let e = reading(ca, sign, this.r) - xa;
    this.note(ta, e);
    const step = cb > ca ? 1 : -1;
    // Each code boundary crossed, in time order.
    while (ca !== cb) {
      const boundary = (step > 0 ? ca + 1 : ca) * this.q;
      const u = vb === va ? 1 : Math.min(1, Math.max(0, (boundary - va) / (vb - va)));
      const tc = ta + u * dt;
      const xc = xa + (xb - xa) * u;
      const before = reading(ca, sign, this.r) - xc;
      this.piece(t, tc, e, before);
      this.note(tc, before);
      ca += step;
      t = tc;
      e = reading(ca, sign, this.r) - xc;
      this.note(tc, e);
    }
    const end = reading(cb, sign, this.r) - xb;
    this.piece(t, tb, e, end);
    this.note(tb, end);
  }

  private piece(ta: number, tb: number, ea: number, eb: number): void {
    const d = tb - ta;
    if (d > 0) {
      this.sumSq += ((ea * ea + ea * eb + eb * eb) / 3) * d;
      this.span += d;
    }
  }

  private note(t: number, err: number): void {
    const a = Math.abs(err);
    if (a > this.max) {
      this.max = a;
      this.maxAt = t;
    }
  }

  get rms(): number {
    return this.span > 0 ? Math.sqrt(this.sumSq / this.span) : 0;
  }
}
