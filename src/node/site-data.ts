// Build-time data for every page: the data folder is read and each design
// evaluated once per build, then shared by the home, part and design pages
// (module scope lives as long as the build's page renderer).
import { resolve } from "node:path";
import type { Catalogue } from "../core/catalogue.ts";
import { formatProblem } from "../core/problems.ts";
import { loadDataSet, type DataSet } from "./load-data.ts";
import type { DesignEntry } from "../view/design-entry.ts";

export type SiteData = {
  dataDir: string;
  catalogue: Catalogue;
  designs: DesignEntry[];
  builtAt: Date;
};

let cached: SiteData | undefined;

/**
 * scripts/build.ts reads and evaluates the data folder to validate it before it
 * builds, in the same process: it leaves the set here so the pages use it
 * rather than read and evaluate 2,000 parts a second time (issue 18). Astro
 * bundles this module, so a module variable would not be shared; a global is.
 */
export const LOADED_DATA = Symbol.for("railsieve.loaded-data");
type Loaded = { dataDir: string; set: DataSet };

function loaded(dataDir: string): DataSet {
  const handed = (globalThis as { [LOADED_DATA]?: Loaded })[LOADED_DATA];
  return handed && handed.dataDir === dataDir ? handed.set : loadDataSet(dataDir);
}

/** Reads RAILSIEVE_DATA (default ./data) and evaluates every design, once. */
export function siteData(): SiteData {
  if (cached) return cached;
  const dataDir = resolve(process.env.RAILSIEVE_DATA ?? "data");
  const set = loaded(dataDir);
  if (set.problems.length > 0) {
    // scripts/build.ts validates first; this guards `astro dev` and direct `astro build`.
    throw new Error(
      `railsieve: the data in ${dataDir} has ${set.problems.length} problem(s):\n${set.problems.map(formatProblem).join("\n")}`,
    );
  }
  // loadDataSet has evaluated every design already (it must, to refuse bad BOMs).
  const designs: DesignEntry[] = set.evaluated.map(({ file, design, evaluation }) => ({
    id: design.id,
    file,
    design,
    evaluation,
  }));
  cached = { dataDir, catalogue: set.catalogue, designs, builtAt: buildDate() };
  return cached;
}

// SOURCE_DATE_EPOCH (reproducible-builds.org) pins the date so two builds of the same data are identical.
function buildDate(): Date {
  const epoch = Number(process.env.SOURCE_DATE_EPOCH);
  return Number.isFinite(epoch) && epoch > 0 ? new Date(epoch * 1000) : new Date();
}
