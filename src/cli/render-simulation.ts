// The simulation at the CLI's edge: one line for `check`, a few for `simulate`,
// and the waveforms as CSV for a spreadsheet. Pure text; the data comes from
// src/core/sim/report.ts.
import { csvLine } from "../core/csv-escape.ts";
import {
  delayWords,
  describeConditions,
  whyBeyond,
  type RunSummary,
  type SimulationOutcome,
  type SimulationReport,
} from "../core/sim/report.ts";
import type { Trace } from "../core/sim/simulate.ts";
import { formatSI } from "../core/units.ts";

const v = (x: number) => formatSI(x, "V");

/** A result's simulation outcome as the report or the reason it did not run. */
export function outcomeReport(o: SimulationOutcome): SimulationReport | SimulationSkip {
  return o.ran ? o.report : { topology: o.topology, reason: o.reason };
}

/** What the simulation could not do for a topology (a role with no part, an unrated column). */
export type SimulationSkip = { topology: string; reason: string };

/** One line: "simulation: largest error 176 mV at 200 Hz (rms 20.4 mV), 38.1 mV at 2.00 Hz; inside the worst case 620 mV by 444 mV". */
export function simulationLine(r: SimulationReport | SimulationSkip): string {
  if ("reason" in r) return `simulation: not run (${r.reason})`;
  const head = `simulation: largest error ${v(r.fast.max_error_v)} at ${formatSI(r.fast.frequency_hz, "Hz")} (rms ${v(r.fast.rms_error_v)}), ${v(r.slow.max_error_v)} at ${formatSI(r.slow.frequency_hz, "Hz")}`;
  const c = r.comparison;
  if (!c) return head;
  if (c.within) return `${head}; inside the static worst case ${v(c.worst_case_v)} by ${v(c.margin_v)}`;
  return `${head}; BEYOND the static worst case ${v(c.worst_case_v)} by ${v(-c.margin_v)}: distrust the budget, ${whyBeyond(r)}`;
}

function runLines(label: string, s: RunSummary): string[] {
  const lines = [
    `  ${label} ${formatSI(s.frequency_hz, "Hz")}: largest error ${v(s.max_error_v)} at ${formatSI(s.max_error_at_s, "s")} into the period, rms ${v(s.rms_error_v)}`,
  ];
  if (s.reference_delay_s > 0) lines.push(`    ${delayWords(s.reference_delay_s)}`);
  if (s.at_max_error.length > 0) lines.push(`    then ${describeConditions(s.at_max_error)}`);
  if (s.dead_time_s !== null)
    lines.push(`    rectifier dead time ${formatSI(s.dead_time_s, "s")} at each zero crossing`);
  if (s.slewing.length > 0) lines.push(`    slewing: ${s.slewing.join(", ")}`);
  if (s.clipped.length > 0) lines.push(`    pinned at a swing limit: ${s.clipped.join(", ")}`);
  return lines;
}

/** The text report of `railsieve simulate` for one design. */
export function simulationText(
  designId: string,
  reports: readonly (SimulationReport | SimulationSkip)[],
  parts: readonly string[],
): string {
  const out: string[] = [`${designId}`];
  for (const r of reports) {
    out.push(`topology ${r.topology}${parts.length > 0 ? ` with ${parts.join(", ")}` : ""}`);
    if ("reason" in r) {
      out.push(`  not simulated: ${r.reason}`);
      continue;
    }
    out.push(...runLines("at", r.fast), ...runLines("at", r.slow));
    out.push(`  ${simulationLine(r).replace(/^simulation: [^;]*;?\s*/, "") || "no static budget to compare with"}`);
  }
  return `${out.join("\n")}\n`;
}

/** The JSON block of one topology (SPEC §13): what `check --format json` adds per design and topology. */
export function simulationJson(r: SimulationReport | SimulationSkip) {
  if ("reason" in r) return { ran: false, reason: r.reason };
  const run = (s: RunSummary) => ({
    frequency_hz: s.frequency_hz,
    max_error_v: s.max_error_v,
    max_error_at_s: s.max_error_at_s,
    rms_error_v: s.rms_error_v,
    at_max_error: s.at_max_error,
    dead_time_s: s.dead_time_s,
    reference_delay_s: s.reference_delay_s,
    slewing: s.slewing,
    clipped: s.clipped,
  });
  return {
    ran: true,
    fast: run(r.fast),
    slow: run(r.slow),
    ...(r.comparison
      ? {
          worst_case_v: r.comparison.worst_case_v,
          within_worst_case: r.comparison.within,
          margin_v: r.comparison.margin_v,
          distrust: r.comparison.distrust,
        }
      : {}),
  };
}

const COLUMN_UNITS: Record<string, string> = { time: "time_s", sign: "sign", code: "code" };

function columnName(c: string): string {
  return COLUMN_UNITS[c] ?? `${c}_v`;
}

/** Waveforms of one or more runs as one CSV: topology, frequency, then the union of their columns. */
export function simulationCsv(runs: readonly { topology: string; trace: Trace }[]): string {
  const names: string[] = [];
  for (const { trace } of runs) for (const c of trace.columns) if (!names.includes(c)) names.push(c);
  const lines = [csvLine(["topology", "frequency_hz", ...names.map(columnName)])];
  for (const { topology, trace } of runs) {
    const index = names.map((n) => trace.columns.indexOf(n));
    const rows = trace.values[0]?.length ?? 0;
    for (let r = 0; r < rows; r++) {
      const cells: (string | number)[] = [topology, trace.frequency_hz];
      for (const i of index) cells.push(i < 0 ? "" : Number((trace.values[i]?.[r] ?? 0).toPrecision(7)));
      lines.push(csvLine(cells));
    }
  }
  return `${lines.join("\n")}\n`;
}
