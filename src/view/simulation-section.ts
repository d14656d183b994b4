// The simulated reading of one design result (SPEC §13), for the design page and
// the try page alike: what was simulated, how the largest error compares with the
// static worst case (and which model to distrust when they disagree), and the
// two pictures with their tables. Pure: a string of HTML, every text escaped.
import type { DesignSimulation } from "../core/engine/simulate-result.ts";
import { delayWords, describeConditions, whyBeyond, type RunSummary } from "../core/sim/report.ts";
import type { Trace } from "../core/sim/simulate.ts";
import { formatSI } from "../core/units.ts";
import { escapeHtml } from "./escape.ts";
import { renderSimulationFigure } from "./simulation-chart.ts";

export type SimulationSectionOptions = {
  /** Distinguishes ids when a page shows several (one per topology, the try page). */
  idPrefix: string;
  heading: 2 | 3 | 4;
  required_v: number;
};

const v = (x: number) => formatSI(x, "V");

export function renderSimulationSection(sim: DesignSimulation, o: SimulationSectionOptions): string {
  const h = `h${o.heading}`;
  const id = `${o.idPrefix}sim`;
  const title = `<${h} id="${escapeHtml(id)}-h">Simulated reading — ${escapeHtml(sim.topology)}</${h}>`;
  const open = `<section class="simulation" aria-labelledby="${escapeHtml(id)}-h">${title}`;
  if (!sim.ran) return `${open}<p>${escapeHtml(`Not simulated: ${sim.reason}.`)}</p></section>`;
  const r = sim.report;
  const parts = Object.entries(sim.parts)
    .map(([role, part]) => `${role} ${part}`)
    .join(", ");
  const intro =
    `A time-domain simulation of this chain with ${parts}: each op amp a single pole at its noise gain with its slew rate, ` +
    "swing limits and offset (rated maximum plus drift, one sign), the rectifier's diodes by their Vf(I) law, the comparator's " +
    "offset, hysteresis and delay, the converter's steps and the firmware's reading; resistors and reference at nominal.";
  const c = r.comparison;
  const verdict = !c
    ? "There is no complete static budget to compare it with."
    : c.within
      ? `The largest simulated error, ${v(c.simulated_v)}, is inside the static worst case of ${v(c.worst_case_v)} by ${v(c.margin_v)}.`
      : `The largest simulated error, ${v(c.simulated_v)}, is beyond the static worst case of ${v(c.worst_case_v)} by ${v(-c.margin_v)}: distrust the budget, ${whyBeyond(r)}.`;
  const fast = sim.run.fast;
  const slow = sim.run.slow;
  return [
    open,
    `<p>${escapeHtml(intro)}</p>`,
    `<p class="sim-verdict${c && !c.within ? " sim-beyond" : ""}">${escapeHtml(verdict)}</p>`,
    `<ul class="sim-facts">${facts("At", r.fast)}${facts("At", r.slow)}</ul>`,
    `<div class="sim-figures">`,
    figure(
      `${id}-fast`,
      fast,
      `at ${formatSI(fast.frequency_hz, "Hz")} (the highest frequency)`,
      c?.worst_case_v ?? null,
      o.required_v,
    ),
    figure(
      `${id}-slow`,
      slow,
      `at ${formatSI(slow.frequency_hz, "Hz")} (a hundredth of it)`,
      c?.worst_case_v ?? null,
      o.required_v,
    ),
    `</div>`,
    "</section>",
  ].join("");
}

function facts(at: string, s: RunSummary): string {
  const bits = [`largest error ${v(s.max_error_v)}, rms ${v(s.rms_error_v)}`];
  if (s.reference_delay_s > 0) bits.push(delayWords(s.reference_delay_s));
  if (s.at_max_error.length > 0) bits.push(`at the largest, ${describeConditions(s.at_max_error)}`);
  if (s.dead_time_s !== null) bits.push(`rectifier dead time ${formatSI(s.dead_time_s, "s")}`);
  if (s.slewing.length > 0) bits.push(`slewing: ${s.slewing.join(", ")}`);
  if (s.clipped.length > 0) bits.push(`pinned at a swing limit: ${s.clipped.join(", ")}`);
  return `<li>${escapeHtml(`${at} ${formatSI(s.frequency_hz, "Hz")}: ${bits.join("; ")}.`)}</li>`;
}

function figure(id: string, t: Trace, caption: string, worst: number | null, required: number): string {
  const col = (name: string) => t.values[t.columns.indexOf(name)] ?? new Float64Array(0);
  return renderSimulationFigure({
    id,
    caption,
    time: col("time"),
    input: col("input"),
    reading: col("reading"),
    error: col("error"),
    max_error_v: t.max_error_v,
    max_error_at_s: t.max_error_at_s,
    rms_error_v: t.rms_error_v,
    worst_case_v: worst,
    required_v: required,
  });
}
