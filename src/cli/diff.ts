// `railsieve diff BEFORE [AFTER]`: what a change to the data does to every
// design's verdicts. Each side is a data folder, or `git:REV` for the --data
// folder as committed at REV (read with git show; nothing is checked out).
// Exit 1 when a design goes from holding to failing or a BOM part stops
// fitting, 0 otherwise, 2 on invalid input on either side.
import { resolve } from "node:path";
import type { DesignResult } from "../core/engine/result.ts";
import { InputError, type Problem } from "../core/problems.ts";
import { displayPath, loadDataSet, type DataSet } from "../node/load-data.ts";
import { loadDataRevision, RevisionError } from "../node/data-revision.ts";
import { flag, UsageError, type ParsedArgs } from "./args.ts";
import { compareDataSets, type Side } from "./diff/compare.ts";
import { renderDiffMarkdown } from "./diff/render-markdown.ts";
import { renderDiffText } from "./diff/render-text.ts";
import { guideLinks } from "./guide-links.ts";
import type { Io } from "./io.ts";

const FORMATS = ["text", "json", "markdown"] as const;
const GIT = "git:";

function loadSide(spec: string, data: string): { label: string; set: DataSet } {
  if (spec.startsWith(GIT)) {
    const rev = spec.slice(GIT.length);
    if (rev === "") throw new UsageError("git: needs a revision after it (e.g. git:main or git:HEAD~1)");
    try {
      return { label: `${spec} (${displayPath(data)})`, set: loadDataRevision(data, rev) };
    } catch (e) {
      if (e instanceof RevisionError) throw new InputError([{ file: spec, message: e.message }]);
      throw e;
    }
  }
  const dir = resolve(spec);
  return { label: displayPath(dir), set: loadDataSet(dir) };
}

function resultsOf(set: DataSet): DesignResult[] {
  return set.evaluated.flatMap((e) => (e.evaluation.ok ? [e.evaluation.result] : []));
}

export function runDiff(args: ParsedArgs, data: string, io: Io): number {
  const format = flag(args, "format") ?? "text";
  if (!(FORMATS as readonly string[]).includes(format))
    throw new UsageError(`unknown format '${format}' for diff (expected text, json or markdown)`);
  if (flag(args, "topology") !== undefined)
    throw new UsageError("diff compares each design with the topology its file names; --topology is for check");
  const [beforeSpec, afterSpec, ...extra] = args.positional;
  if (beforeSpec === undefined || extra.length > 0)
    throw new UsageError("diff needs one or two data sets: BEFORE [AFTER], each a folder or git:REV");
  const links = guideLinks(flag(args, "guide-url"));
  const before = loadSide(beforeSpec, data);
  const after =
    afterSpec === undefined ? { label: displayPath(data), set: loadDataSet(data) } : loadSide(afterSpec, data);
  const problems: Problem[] = [...before.set.problems, ...after.set.problems];
  if (problems.length > 0) throw new InputError(problems);
  const sides: [Side, Side] = [
    { label: before.label, results: resultsOf(before.set) },
    { label: after.label, results: resultsOf(after.set) },
  ];
  const report = compareDataSets(sides[0], sides[1], args.flags.has("strict"));
  if (format === "json") io.out(`${JSON.stringify(report, null, 2)}\n`);
  else if (format === "markdown") io.out(renderDiffMarkdown(report, links));
  else io.out(renderDiffText(report, io));
  return report.regressions.length > 0 ? 1 : 0;
}
