// `railsieve simulate DESIGN.json [--part ROLE=ID]…`: the behavioural simulation
// of the design's chain (SPEC §13) with the parts it uses (its BOM, else the best
// fits; --part overrides one role), as text, JSON, or the waveforms as CSV.
// Exit 0 when every simulation ran and stayed inside the static worst case, 1
// otherwise, 2 on bad input.
import type { DesignResult } from "../core/engine/result.ts";
import { InputError, type Problem } from "../core/problems.ts";
import { evaluateDesign, TOPOLOGY_IDS } from "../engine.ts";
import { simulateDesign } from "../simulation.ts";
import { flag, flagValues, UsageError, type ParsedArgs } from "./args.ts";
import type { Io } from "./io.ts";
import { loadForCheck } from "./load.ts";
import { simulationCsv, simulationJson, simulationText, type SimulationSkip } from "./render-simulation.ts";
import type { SimulationReport } from "../core/sim/report.ts";
import type { Trace } from "../core/sim/simulate.ts";

const FORMATS = ["text", "json", "csv"] as const;

/** --part ROLE=ID, each split and checked for shape; the engine checks that the role and part exist. */
export function partOverrides(values: readonly string[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const v of values) {
    const m = /^([^=\s]+)=([^=\s]+)$/.exec(v);
    if (!m) throw new UsageError(`--part needs ROLE=ID (got '${v}', e.g. --part buffer=oa-bip-gs-single)`);
    out[m[1] as string] = m[2] as string;
  }
  return out;
}

export function runSimulate(args: ParsedArgs, data: string, io: Io): number {
  const format = flag(args, "format") ?? "text";
  if (!(FORMATS as readonly string[]).includes(format))
    throw new UsageError(`unknown format '${format}' (expected text, json or csv)`);
  const [designPath, ...extra] = args.positional;
  if (designPath === undefined || extra.length > 0) throw new UsageError("simulate needs one design file");
  const topology = flag(args, "topology");
  if (topology !== undefined && !TOPOLOGY_IDS.includes(topology)) {
    throw new UsageError(`unknown topology '${topology}' (expected ${TOPOLOGY_IDS.join(", ")})`);
  }
  const overrides = partOverrides(flagValues(args, "part"));
  const loaded = loadForCheck(data, [designPath]);
  if ("problems" in loaded) throw new InputError(loaded.problems);
  const file = loaded.designs[0];
  if (!file?.design) return 2;
  const design = { ...file.design, bom: { ...file.design.bom, ...overrides } };
  const evaluation = evaluateDesign(design, loaded.catalogue, topology);
  if (!evaluation.ok) {
    const problems: Problem[] = evaluation.problems.map((p) => ({ file: file.file, path: p.path, message: p.message }));
    throw new InputError(problems);
  }
  const results: DesignResult[] = evaluation.result.comparison
    ? evaluation.result.comparison.results
    : [evaluation.result];
  const reports: (SimulationReport | SimulationSkip)[] = [];
  const traces: { topology: string; trace: Trace }[] = [];
  let parts: string[] = [];
  for (const r of results) {
    const s = simulateDesign(r, loaded.catalogue);
    if (!s.ran) {
      reports.push({ topology: s.topology, reason: s.reason });
      continue;
    }
    reports.push(s.report);
    traces.push({ topology: s.topology, trace: s.run.fast }, { topology: s.topology, trace: s.run.slow });
    parts = Object.entries(s.parts).map(([role, id]) => `${role}=${id}`);
  }
  if (format === "csv") io.out(simulationCsv(traces));
  else if (format === "json") {
    const body = {
      design: design.id,
      simulations: reports.map((r) => ({ topology: r.topology, ...simulationJson(r) })),
    };
    io.out(`${JSON.stringify(body, null, 2)}\n`);
  } else io.out(simulationText(design.id, reports, results.length === 1 ? parts : []));
  return reports.every((r) => !("reason" in r) && (r.comparison?.within ?? true)) ? 0 : 1;
}
