// Loading for commands: catalogue and designs, with every problem gathered and
// the design-level engine problems tied to their file.
import { resolve } from "node:path";
import type { Catalogue } from "../core/catalogue.ts";
import type { DesignFile } from "../core/designs.ts";
import { formatProblem, type Problem } from "../core/problems.ts";
import { loadCatalogue, loadDesignFiles } from "../node/load-data.ts";

export function dataDir(flagValue: string | undefined): string {
  return resolve(flagValue ?? "data");
}

export type Loaded = { catalogue: Catalogue; designs: DesignFile[] } | { problems: Problem[] };

export function loadForCheck(data: string, designPaths: string[]): Loaded {
  const { catalogue, problems: catalogueProblems } = loadCatalogue(data);
  const { designs, problems: designProblems } = loadDesignFiles(designPaths);
  const problems = [...catalogueProblems, ...designProblems];
  return problems.length > 0 ? { problems } : { catalogue, designs };
}

export function renderProblems(problems: readonly Problem[]): string {
  const lines = problems.map(formatProblem);
  lines.push(`railsieve: ${problems.length} problem${problems.length === 1 ? "" : "s"} found; nothing was checked`);
  return `${lines.join("\n")}\n`;
}
