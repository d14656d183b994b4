// Runs a chain (chain.ts) in the time domain and reports what the firmware reads.
//
// Integration: a fixed grid of `steps_per_period` steps per signal period (512
// unless asked), each stage advanced by its exact solution for an input that is
// a straight line over the step (pole.ts, half-wave.ts). Where a rectifier's
// loop is open or opens/closes inside a step, that step is redone for the whole
// chain in eight parts, and those parts that still hold an event in eight
// again, down to 1/32 of the shortest possible dead time: the zero crossing is
// resolved whatever the grid, at a cost that grows only with the log of the
// ratio between the grid and the dead time. The first period settles the chain
// (one warm-up period) and the second is measured. Halving the grid changes the
// max error by less than 1 % (test/core/sim/convergence.test.ts).
import type { Chain, Stage } from "./chain.ts";
import { ComparatorRunner } from "./comparator.ts";
import { quantize, reading } from "./converter.ts";
import { ErrorMeter } from "./error-meter.ts";
import { HalfWaveRunner } from "./half-wave.ts";
import { Columns } from "./columns.ts";
import { chainDelay } from "./chain-delay.ts";
import { advancePole, type PoleStats } from "./pole.ts";

export type RunOptions = {
  frequency_hz: number;
  steps_per_period?: number;
  warmup_periods?: number;
  /** The source's open-circuit voltage at time t; a sine of the chain's peak when absent. */
  waveform?: (t: number) => number;
  /** The latency the reading is compared after (chain-delay.ts); 0 compares at the same instant. */
  reference_delay_s?: number;
};

export type StageStats = {
  id: string;
  /** Time the output spent slewing / pinned at a swing limit in the measured period, s. */
  slewing_s: number;
  clipped_s: number;
  /** Longest open-loop interval at a zero crossing (half-wave stages), s; null for other stages. */
  dead_time_s: number | null;
};

/** A stage's state at an instant that matters for the error. */
export type Condition = { stage: string; state: "clipped" | "slewing" | "dead-time" | "sign-wrong" };

export type Trace = {
  frequency_hz: number;
  /** Column names: time, input, front, each stage's node(s), sign, code, reading, error, reference. */
  columns: string[];
  /** One array per column, all the same length (the recorded points of the measured period). */
  values: Float64Array[];
  max_error_v: number;
  /** Time of the largest |error|, s from the start of the measured period. */
  max_error_at_s: number;
  /** What the chain was doing at the largest error: the mechanisms to blame. */
  at_max_error: Condition[];
  rms_error_v: number;
  stages: StageStats[];
  /** The reading is compared with the input this much earlier: the chain's shared phase delay, s. */
  reference_delay_s: number;
};

export const STEPS_PER_PERIOD = 512;
/** Points kept for the waveform table (statistics use every point). */
const KEEP_AT_MOST = 8192;
/** A refined step is redone in this many parts, at most MAX_DEPTH times over (8⁶ ≈ 2.6·10⁵ parts). */
const SPLIT = 8;
const MAX_DEPTH = 6;

interface Runner {
  save(depth: number): void;
  restore(depth: number): void;
  advance(t0: number, h: number, prev: Float64Array, cur: Float64Array): void;
  init(cur: Float64Array): void;
  fineStep(prev: Float64Array, cur: Float64Array, h: number): number;
  stats(): StageStats;
  setCounting(on: boolean): void;
  /** Adds what the stage is doing now, if anything notable, to `out`. */
  conditions(out: Condition[]): void;
}

function poleStats(): PoleStats {
  return { slewing_s: 0, clipped_s: 0, counting: false };
}

class LinearRunner implements Runner {
  private y = 0;
  private target = 0;
  /** [y, slewing, clipped] per refinement depth. */
  private readonly saved: number[][] = [];
  private readonly pole = poleStats();
  private readonly id: string;
  private readonly out: number;
  private readonly ins: readonly { index: number; weight: number }[];
  private readonly offset: number;
  private readonly wc: number;
  private readonly sr: number;
  private readonly lo: number;
  private readonly hi: number;
  constructor(
    id: string,
    out: number,
    ins: readonly { index: number; weight: number }[],
    offset: number,
    wc: number,
    sr: number,
    lo: number,
    hi: number,
  ) {
    this.id = id;
    this.out = out;
    this.ins = ins;
    this.offset = offset;
    this.wc = wc;
    this.sr = sr;
    this.lo = lo;
    this.hi = hi;
  }
  private u(v: Float64Array): number {
    let u = this.offset;
    const ins = this.ins;
    for (let k = 0; k < ins.length; k++) {
      const i = ins[k] as { index: number; weight: number };
      u += i.weight * (v[i.index] ?? 0);
    }
    return u;
  }
  init(cur: Float64Array): void {
    this.y = Math.min(this.hi, Math.max(this.lo, this.u(cur)));
    cur[this.out] = this.y;
  }
  save(depth: number): void {
    const v = (this.saved[depth] ??= [0, 0, 0]);
    v[0] = this.y;
    v[1] = this.pole.slewing_s;
    v[2] = this.pole.clipped_s;
  }
  restore(depth: number): void {
    const v = this.saved[depth] ?? [];
    this.y = v[0] ?? 0;
    this.pole.slewing_s = v[1] ?? 0;
    this.pole.clipped_s = v[2] ?? 0;
  }
  advance(_t0: number, h: number, prev: Float64Array, cur: Float64Array): void {
    this.target = this.u(cur);
    this.y = advancePole(this.y, this.u(prev), this.target, h, this.wc, this.sr, this.lo, this.hi, this.pole);
    cur[this.out] = this.y;
  }
  conditions(out: Condition[]): void {
    const pushing = this.target - this.y;
    if ((this.y >= this.hi && pushing > 0) || (this.y <= this.lo && pushing < 0))
      out.push({ stage: this.id, state: "clipped" });
    else if (Math.abs(this.wc * pushing) >= this.sr * (1 - 1e-9)) out.push({ stage: this.id, state: "slewing" });
  }
  fineStep(): number {
    return Infinity;
  }
  stats(): StageStats {
    return { id: this.id, slewing_s: this.pole.slewing_s, clipped_s: this.pole.clipped_s, dead_time_s: null };
  }
  setCounting(on: boolean): void {
    this.pole.counting = on;
  }
}

class HalfWaveAdapter implements Runner {
  private readonly r: HalfWaveRunner;
  private readonly id: string;
  private readonly from: number;
  private readonly node: number;
  private readonly amp: number;
  private readonly lo: number;
  private readonly hi: number;
  constructor(id: string, stage: Extract<Stage, { kind: "half-wave" }>, from: number, node: number, amp: number) {
    this.r = new HalfWaveRunner(stage);
    this.lo = stage.amp.out_low_v;
    this.hi = stage.amp.out_high_v;
    this.id = id;
    this.from = from;
    this.node = node;
    this.amp = amp;
  }
  init(cur: Float64Array): void {
    this.r.init(cur[this.from] ?? 0);
    cur[this.node] = this.r.node;
    cur[this.amp] = this.r.amp;
  }
  save(depth: number): void {
    this.r.save(depth);
  }
  restore(depth: number): void {
    this.r.restore(depth);
  }
  advance(t0: number, h: number, prev: Float64Array, cur: Float64Array): void {
    this.r.advance(t0, h, prev[this.from] ?? 0, cur[this.from] ?? 0);
    cur[this.node] = this.r.node;
    cur[this.amp] = this.r.amp;
  }
  fineStep(prev: Float64Array, cur: Float64Array, h: number): number {
    return this.r.fineStep(prev[this.from] ?? 0, cur[this.from] ?? 0, h);
  }
  conditions(out: Condition[]): void {
    if (this.r.inDeadTime()) out.push({ stage: this.id, state: "dead-time" });
    if (this.r.amp >= this.hi || this.r.amp <= this.lo) out.push({ stage: this.id, state: "clipped" });
  }
  stats(): StageStats {
    return {
      id: this.id,
      slewing_s: this.r.pole.slewing_s,
      clipped_s: this.r.pole.clipped_s,
      dead_time_s: this.r.deadMax_s,
    };
  }
  setCounting(on: boolean): void {
    this.r.pole.counting = on;
  }
}

/** Node names of a chain, in the order the trace lists them. */
export function nodeNames(chain: Chain): string[] {
  const names = ["input", "front"];
  for (const s of chain.stages) {
    names.push(s.id);
    if (s.kind === "half-wave") names.push(`${s.id}.amp`);
  }
  return names;
}

function buildRunners(chain: Chain, names: readonly string[]): Runner[] {
  const index = (name: string, by: string): number => {
    const i = names.indexOf(name);
    if (i < 0) throw new Error(`simulation chain: stage '${by}' reads '${name}', which no earlier stage makes`);
    return i;
  };
  const runners: Runner[] = [];
  const seen = new Set(["input", "front"]);
  for (const s of chain.stages) {
    const check = (from: string) => {
      if (!seen.has(from)) throw new Error(`simulation chain: stage '${s.id}' reads '${from}' before it is made`);
      return index(from, s.id);
    };
    const out = index(s.id, s.id);
    if (s.kind === "linear") {
      const ins = s.inputs.map((i) => ({ index: check(i.from), weight: i.weight }));
      const { amp } = s;
      runners.push(
        new LinearRunner(
          s.id,
          out,
          ins,
          s.offset_v + s.noise_gain * amp.vos_v,
          (2 * Math.PI * amp.gbw_hz) / s.noise_gain,
          amp.slew_v_per_s,
          amp.out_low_v,
          amp.out_high_v,
        ),
      );
    } else if (s.kind === "rc") {
      runners.push(
        new LinearRunner(
          s.id,
          out,
          [{ index: check(s.from), weight: 1 }],
          0,
          1 / s.tau_s,
          Infinity,
          -Infinity,
          Infinity,
        ),
      );
    } else {
      const from = check(s.from);
      runners.push(new HalfWaveAdapter(s.id, s, from, out, index(`${s.id}.amp`, s.id)));
      seen.add(`${s.id}.amp`);
    }
    seen.add(s.id);
  }
  return runners;
}

/** Simulates one warm-up period and one measured period of the chain at one frequency. */
export function runChain(chain: Chain, options: RunOptions): Trace {
  const f = options.frequency_hz;
  const period = 1 / f;
  const steps = options.steps_per_period ?? STEPS_PER_PERIOD;
  const warmup = options.warmup_periods ?? 1;
  const h = period / steps;
  const start = warmup * period;
  const end = start + period;
  const peak = chain.source.peak_v;
  const w = 2 * Math.PI * f;
  const wave = options.waveform ?? ((t: number) => peak * Math.sin(w * t));
  const delay = options.reference_delay_s ?? chainDelay(chain, f);
  /** What the reading is compared with: the input as it was one shared delay earlier. */
  const ref = (t: number) => wave(t - delay);
  const names = nodeNames(chain);
  const runners = buildRunners(chain, names);
  const n = names.length;
  const adcIndex = names.indexOf(chain.adc.from);
  if (adcIndex < 0) throw new Error(`simulation chain: the converter reads '${chain.adc.from}', which no stage makes`);
  const sign = chain.sign ? new ComparatorRunner(chain.sign) : null;
  const signIndex = chain.sign ? names.indexOf(chain.sign.from) : -1;
  if (chain.sign && signIndex < 0)
    throw new Error(`simulation chain: the comparator reads '${chain.sign.from}', which no stage makes`);

  let prev = new Float64Array(n);
  let cur = new Float64Array(n);
  const { gain, offset_v } = chain.front;
  cur[0] = wave(0);
  cur[1] = gain * (cur[0] ?? 0) + offset_v;
  for (const r of runners) r.init(cur);
  sign?.init(cur[signIndex] ?? 0);

  // Recorded columns: time, nodes, sign, code, reading, error, the delayed input it is measured against.
  const columns = ["time", ...names, "sign", "code", "reading", "error", "reference"];
  const store = new Columns(columns.length, steps + 256);
  const meter = new ErrorMeter(chain.adc, chain.reading);
  let counted = 0;
  const sampled = chain.adc.sample_rate_hz !== null;
  const ts = sampled ? 1 / (chain.adc.sample_rate_hz as number) : 0;
  let nextSample = sampled ? Math.ceil(start / ts - 1e-9) * ts : Infinity;
  const totalPoints = sampled ? Math.ceil(period / ts) : steps;
  const stride = Math.max(1, Math.ceil(totalPoints / KEEP_AT_MOST));
  let lastSign = 1;
  let atMax: Condition[] = [];
  /** Notes what the chain is doing when the error just reached a new largest value. */
  const blame = (before: number, signThen: number) => {
    if (meter.max === before) return;
    atMax = [];
    for (let i = 0; i < runners.length; i++) (runners[i] as Runner).conditions(atMax);
    const x = ref(meter.maxAt + start);
    if (sign && chain.reading.signed && x !== 0 && signThen !== (x > 0 ? 1 : -1))
      atMax.push({ stage: "sign", state: "sign-wrong" });
  };

  /** Keeps one row of the trace (every stride-th point) and returns its error. */
  const emit = (t: number, values: Float64Array, s: number): number => {
    const code = quantize(values[adcIndex] ?? 0, chain.adc);
    const read = reading(code, s, chain.reading);
    const against = delay === 0 ? (values[0] ?? 0) : ref(t);
    const err = read - against;
    if (counted++ % stride !== 0) return err;
    const at = store.append();
    const c = store.columns;
    (c[0] as Float64Array)[at] = t - start;
    for (let i = 0; i < n; i++) (c[i + 1] as Float64Array)[at] = values[i] ?? 0;
    (c[n + 1] as Float64Array)[at] = s;
    (c[n + 2] as Float64Array)[at] = code;
    (c[n + 3] as Float64Array)[at] = read;
    (c[n + 4] as Float64Array)[at] = err;
    (c[n + 5] as Float64Array)[at] = against;
    return err;
  };

  const between = new Float64Array(n);
  /** Records the points of [t0, t0 + dt] the trace keeps: the converter's samples, or the step's end. */
  const record = (t0: number, dt: number, a: Float64Array, b: Float64Array) => {
    const t1 = t0 + dt;
    const before = meter.max;
    if (!sampled) {
      const s1 = sign ? sign.at(t1) : 1;
      const va = a[adcIndex] ?? 0;
      const vb = b[adcIndex] ?? 0;
      const xa = delay === 0 ? (a[0] ?? 0) : ref(t0);
      const xb = delay === 0 ? (b[0] ?? 0) : ref(t1);
      if (s1 === lastSign) meter.stretch(t0 - start, t1 - start, va, vb, xa, xb, s1);
      else {
        // The sign changed inside the step: measure either side of the instant.
        const u = Math.min(1, Math.max(0, ((sign?.changedAt ?? t0) - t0) / dt));
        const vm = va + (vb - va) * u;
        const xm = xa + (xb - xa) * u;
        meter.stretch(t0 - start, t0 - start + u * dt, va, vm, xa, xm, lastSign);
        meter.stretch(t0 - start + u * dt, t1 - start, vm, vb, xm, xb, s1);
      }
      const changedAt = sign?.changedAt ?? -Infinity;
      blame(before, s1 !== lastSign && meter.maxAt + start <= changedAt + dt * 1e-9 ? lastSign : s1);
      lastSign = s1;
      emit(t1, b, s1);
      return;
    }
    while (nextSample <= t1 + dt * 1e-9 && nextSample < end - ts * 1e-6) {
      const frac = Math.min(1, Math.max(0, (nextSample - t0) / dt));
      for (let i = 0; i < n; i++) between[i] = (a[i] ?? 0) + ((b[i] ?? 0) - (a[i] ?? 0)) * frac;
      // The sampled input is the source itself at the instant, not its straight-line stand-in.
      between[0] = wave(nextSample);
      const m = meter.max;
      const s = sign ? sign.at(nextSample) : 1;
      meter.sample(nextSample - start, emit(nextSample, between, s));
      blame(m, s);
      nextSample += ts;
    }
  };
  const stepChain = (t0: number, dt: number) => {
    cur[0] = wave(t0 + dt);
    cur[1] = gain * (cur[0] ?? 0) + offset_v;
    for (let i = 0; i < runners.length; i++) (runners[i] as Runner).advance(t0, dt, prev, cur);
    if (sign) sign.advance(t0, dt, prev[signIndex] ?? 0, cur[signIndex] ?? 0);
    const swap = prev;
    prev = cur;
    cur = swap;
  };

  // The warm-up only has to settle the chain: straight-line inputs over 1/8 of
  // the measured grid still follow a sine to (π/256)²/8 ≈ 2·10⁻⁵ of its peak,
  // and the zero crossings are refined either way.
  const warmSteps = Math.round(warmup * Math.max(16, steps / 8));
  const hw = warmSteps > 0 ? start / warmSteps : 0;
  let counting = false;
  prev.set(cur);
  // Saved node values per refinement depth: a step that opens or closes a
  // rectifier's loop is redone as SPLIT parts, recursively, down to the
  // rectifier's fine step; the rest of the grid is stepped once.
  const starts: Float64Array[] = [];
  const advance = (t0: number, dt: number, depth: number) => {
    const at = (starts[depth] ??= new Float64Array(n));
    for (let i = 0; i < runners.length; i++) (runners[i] as Runner).save(depth);
    sign?.save(depth);
    at.set(prev);
    stepChain(t0, dt);
    let fine = Infinity;
    if (depth < MAX_DEPTH) {
      for (let i = 0; i < runners.length; i++) fine = Math.min(fine, (runners[i] as Runner).fineStep(at, prev, dt));
      if (sign) fine = Math.min(fine, sign.fineStep(at[signIndex] ?? 0, prev[signIndex] ?? 0, dt));
    }
    if (fine < dt) {
      for (let i = 0; i < runners.length; i++) (runners[i] as Runner).restore(depth);
      sign?.restore(depth);
      prev.set(at);
      const part = dt / SPLIT;
      for (let j = 0; j < SPLIT; j++) advance(t0 + j * part, part, depth + 1);
    } else if (counting) record(t0, dt, at, prev);
  };
  for (let k = 0; k < warmSteps + steps; k++) {
    const warm = k < warmSteps;
    const t0 = warm ? k * hw : start + (k - warmSteps) * h;
    if (!counting && !warm) {
      counting = true;
      for (const r of runners) r.setCounting(true);
      lastSign = sign ? sign.at(t0) : 1;
      if (!sampled) emit(t0, prev, lastSign);
    }
    // The warm-up is not measured: its crossings need no finer steps (each stage settles again after them).
    if (warm) stepChain(t0, hw);
    else advance(t0, h, 0);
  }

  const values = store.finish();
  return {
    frequency_hz: f,
    columns,
    values,
    max_error_v: meter.max,
    max_error_at_s: meter.maxAt,
    at_max_error: atMax,
    rms_error_v: meter.rms,
    stages: runners.map((r) => r.stats()),
    reference_delay_s: delay,
  };
}

/** The slow frequency is this fraction of the fastest: bandwidth error (∝ f²) falls 10⁴-fold, dead-time error (∝ √f) tenfold. */
export const SLOW_SHARE = 1 / 100;

export type ChainRun = { fast: Trace; slow: Trace };

/** The chain at the design's highest frequency and at a slow one, where only static errors remain. */
export function simulateChain(chain: Chain, maxFrequencyHz: number, stepsPerPeriod = STEPS_PER_PERIOD): ChainRun {
  return {
    fast: runChain(chain, { frequency_hz: maxFrequencyHz, steps_per_period: stepsPerPeriod }),
    slow: runChain(chain, { frequency_hz: maxFrequencyHz * SLOW_SHARE, steps_per_period: stepsPerPeriod }),
  };
}
