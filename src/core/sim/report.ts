// A simulation's findings as data (SPEC §13): per frequency the largest and rms
// error and what caused the largest, and how the largest compares with the
// static budget's worst case. Text is made from it at the edges (CLI, pages).
import { formatPercent, formatSI } from "../units.ts";
import type { ChainRun, Condition, Trace } from "./simulate.ts";

export type RunSummary = {
  frequency_hz: number;
  max_error_v: number;
  max_error_at_s: number;
  rms_error_v: number;
  /** What the chain was doing at the largest error. */
  at_max_error: Condition[];
  /** Longest zero-crossing dead time of any rectifier stage, s (null without one). */
  dead_time_s: number | null;
  /** Stages that slewed or clipped during the period. */
  slewing: string[];
  clipped: string[];
  /** Least-squares line through the error against the input: a gain error (share) and a zero error (V). */
  fit: { gain_error: number; offset_v: number };
  /** The reading was compared with the input this much earlier (the chain's shared phase delay), s. */
  reference_delay_s: number;
};

export type Comparison = {
  worst_case_v: number;
  /** The larger of the two runs' max errors. */
  simulated_v: number;
  within: boolean;
  /** worst case − simulated: negative when the simulation goes beyond it. */
  margin_v: number;
  /** Which model to distrust when they disagree, null when they agree. */
  distrust: null | { model: "budget"; by_v: number; because: Condition[] };
};

export type SimulationReport = {
  topology: string;
  fast: RunSummary;
  slow: RunSummary;
  comparison: Comparison | null;
};

/** What a design result carries of its simulation: the report, or why there is none. */
export type SimulationOutcome =
  | { ran: true; topology: string; parts: Record<string, string>; report: SimulationReport }
  | { ran: false; topology: string; reason: string };

export function summarizeRun(t: Trace): RunSummary {
  let dead: number | null = null;
  const slewing: string[] = [];
  const clipped: string[] = [];
  for (const s of t.stages) {
    if (s.dead_time_s !== null) dead = Math.max(dead ?? 0, s.dead_time_s);
    if (s.slewing_s > 0) slewing.push(s.id);
    if (s.clipped_s > 0) clipped.push(s.id);
  }
  return {
    fit: fitError(t),
    frequency_hz: t.frequency_hz,
    max_error_v: t.max_error_v,
    max_error_at_s: t.max_error_at_s,
    rms_error_v: t.rms_error_v,
    at_max_error: t.at_max_error,
    dead_time_s: dead,
    slewing,
    clipped,
    reference_delay_s: t.reference_delay_s,
  };
}

/** error ≈ gain_error·input + offset, by least squares over the recorded points. */
export function fitError(t: Trace): { gain_error: number; offset_v: number } {
  // Against what the error was measured from: the delayed input where the trace has one.
  const x = t.values[t.columns.indexOf("reference")] ?? t.values[t.columns.indexOf("input")];
  const e = t.values[t.columns.indexOf("error")];
  if (!x || !e || x.length < 2) return { gain_error: 0, offset_v: 0 };
  let sx = 0;
  let se = 0;
  let sxx = 0;
  let sxe = 0;
  const n = x.length;
  for (let i = 0; i < n; i++) {
    const xi = x[i] ?? 0;
    const ei = e[i] ?? 0;
    sx += xi;
    se += ei;
    sxx += xi * xi;
    sxe += xi * ei;
  }
  const det = n * sxx - sx * sx;
  if (!(det > 0)) return { gain_error: 0, offset_v: se / n };
  const gain = (n * sxe - sx * se) / det;
  return { gain_error: gain, offset_v: (se - gain * sx) / n };
}

/**
 * The static worst case bounds every error the budget models, each at its worst
 * at once; the simulation runs one corner (nominal resistors and reference,
 * offsets at their rated maximum). So a simulated error beyond the worst case
 * means the budget left a mechanism out: distrust the budget, by the excess.
 */
export function compareWithBudget(run: ChainRun, worstCaseV: number | null): Comparison | null {
  if (worstCaseV === null || !Number.isFinite(worstCaseV)) return null;
  const larger = run.fast.max_error_v >= run.slow.max_error_v ? run.fast : run.slow;
  const simulated = larger.max_error_v;
  const margin = worstCaseV - simulated;
  return {
    worst_case_v: worstCaseV,
    simulated_v: simulated,
    within: margin >= 0,
    margin_v: margin,
    distrust: margin >= 0 ? null : { model: "budget", by_v: -margin, because: larger.at_max_error },
  };
}

export function reportOf(topology: string, run: ChainRun, worstCaseV: number | null): SimulationReport {
  return {
    topology,
    fast: summarizeRun(run.fast),
    slow: summarizeRun(run.slow),
    comparison: compareWithBudget(run, worstCaseV),
  };
}

/** "measured against the input 234 ns earlier, the chain's phase delay (a fixed latency, not an error)". */
export function delayWords(delayS: number): string {
  return `measured against the input ${formatSI(delayS, "s")} earlier, the chain's phase delay at this frequency (a fixed latency, not an error)`;
}

const STATE_WORDS: Record<Condition["state"], string> = {
  clipped: "was pinned at its output swing limit",
  slewing: "was slewing",
  "dead-time": "was crossing its diode drops at a zero crossing (dead time)",
  "sign-wrong": "had not yet switched (the sign was wrong)",
};

/** "rectifier-1 was crossing its diode drops …; sign had not yet switched …". */
export function describeConditions(conditions: readonly Condition[]): string {
  return conditions.map((c) => `${c.stage} ${STATE_WORDS[c.state]}`).join("; ");
}

/** Why the simulation went beyond the budget: what the chain was doing, or the static error it found. */
export function whyBeyond(r: SimulationReport): string {
  const because = r.comparison?.distrust?.because ?? [];
  if (because.length > 0) return `which leaves out what happened while ${describeConditions(because)}`;
  const f = r.slow.fit;
  return `whose static model differs from the circuit: even at ${formatSI(r.slow.frequency_hz, "Hz")} the reading is off by ${formatPercent(f.gain_error)} in gain and ${formatSI(f.offset_v, "V")} at zero`;
}
