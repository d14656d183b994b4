// `npm run build`: validate the data first, build into a scratch folder, and
// only then swap it in for dist/, so a failed build never touches the last
// good site (issue: nothing lost).
import { spawnSync } from "node:child_process";
import { existsSync, renameSync, rmSync } from "node:fs";
import { resolve } from "node:path";
import { formatProblem } from "../src/core/problems.ts";
import { loadDataSet } from "../src/node/load-data.ts";

const root = resolve(import.meta.dirname, "..");
const dataDir = resolve(process.env.RAILSIEVE_DATA ?? resolve(root, "data"));
const outDir = resolve(root, process.env.RAILSIEVE_DIST ?? "dist");
const scratch = `${outDir}.building`;
const old = `${outDir}.old`;

const { problems } = loadDataSet(dataDir);
if (problems.length > 0) {
  for (const p of problems) console.error(formatProblem(p));
  console.error(`railsieve: build stopped: ${problems.length} problem${problems.length === 1 ? "" : "s"} in ${dataDir}; ${existsSync(outDir) ? "the previous site in dist/ is unchanged" : "nothing was written"}`);
  process.exit(2);
}

rmSync(scratch, { recursive: true, force: true });
const astro = resolve(root, "node_modules/astro/bin/astro.mjs");
const run = spawnSync(process.execPath, [astro, "build", "--silent"], {
  cwd: root,
  stdio: "inherit",
  env: { ...process.env, RAILSIEVE_OUT: scratch, RAILSIEVE_DATA: dataDir, ASTRO_TELEMETRY_DISABLED: "1" },
});
if (run.status !== 0) {
  rmSync(scratch, { recursive: true, force: true });
  console.error("railsieve: the site build failed; the previous site in dist/ is unchanged");
  process.exit(run.status ?? 1);
}
rmSync(old, { recursive: true, force: true });
if (existsSync(outDir)) renameSync(outDir, old);
renameSync(scratch, outDir);
rmSync(old, { recursive: true, force: true });
console.log(`railsieve: site built in ${outDir}`);
