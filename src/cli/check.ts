// `railsieve check DESIGN.json…`: evaluate, print, and exit 0 / 1 / 2.
import { exitCodeFor } from "../core/engine/design-verdict.ts";
import type { DesignResult } from "../core/engine/result.ts";
import { InputError, type Problem } from "../core/problems.ts";
import { evaluateDesign, TOPOLOGY_IDS } from "../engine.ts";
import { withSimulation } from "../simulation.ts";
import { flag, UsageError, type ParsedArgs } from "./args.ts";
import type { Io } from "./io.ts";
import { loadForCheck } from "./load.ts";
import { guideLinks } from "./guide-links.ts";
import { renderCsv } from "./render-csv.ts";
import { renderJunit } from "./render-junit.ts";
import { renderCheckMarkdown } from "./render-markdown.ts";
import { renderJson } from "./render-json.ts";
import { renderDesignText } from "./render-text.ts";

const FORMATS = ["text", "json", "csv", "markdown", "junit"] as const;

/** Evaluates the design files; with `simulate`, each result also carries its simulation report. */
export function evaluateFiles(args: ParsedArgs, data: string, simulate = false): DesignResult[] {
  if (args.positional.length === 0) throw new UsageError("check needs at least one design file");
  const topologyFlag = flag(args, "topology");
  if (topologyFlag !== undefined && !TOPOLOGY_IDS.includes(topologyFlag)) {
    throw new UsageError(`unknown topology '${topologyFlag}' (expected ${TOPOLOGY_IDS.join(", ")})`);
  }
  const topology = topologyFlag;
  const loaded = loadForCheck(data, args.positional);
  if ("problems" in loaded) throw new InputError(loaded.problems);
  const problems: Problem[] = [];
  const results: DesignResult[] = [];
  for (const file of loaded.designs) {
    if (!file.design) continue;
    const evaluation = evaluateDesign(file.design, loaded.catalogue, topology);
    if (evaluation.ok) results.push(simulate ? withSimulation(evaluation.result, loaded.catalogue) : evaluation.result);
    else problems.push(...evaluation.problems.map((p) => ({ file: file.file, path: p.path, message: p.message })));
  }
  if (problems.length > 0) throw new InputError(problems);
  return results;
}

export function runCheck(args: ParsedArgs, data: string, io: Io): number {
  const format = flag(args, "format") ?? "text";
  if (!(FORMATS as readonly string[]).includes(format))
    throw new UsageError(`unknown format '${format}' (expected text, json, csv, markdown or junit)`);
  const links = guideLinks(flag(args, "guide-url"));
  const results = evaluateFiles(args, data, true);
  if (format === "json") io.out(renderJson(results));
  else if (format === "csv") io.out(renderCsv(results));
  else if (format === "markdown") io.out(renderCheckMarkdown(results, links));
  else if (format === "junit") io.out(renderJunit(results, args.flags.has("strict")));
  else io.out(results.map((r) => renderDesignText(r, io)).join("\n"));
  // SPEC §11.11: 1 when a design fails (its roles, its BOM or its budget); --strict: marginal too.
  return exitCodeFor(
    results.map((r) => r.verdict),
    args.flags.has("strict"),
  );
}
