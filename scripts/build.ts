// `npm run build`: validate the data first, build into a scratch folder, and
// only then swap it in for dist/, so a failed build never touches the last
// good site (issue: nothing lost). Astro builds in this process, so the pages
// reuse the data set validation has read and evaluated (src/node/site-data.ts).
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from "node:fs";
import { resolve } from "node:path";
import { formatProblem } from "../src/core/problems.ts";
import { loadDataSet } from "../src/node/load-data.ts";
import { LOADED_DATA } from "../src/node/site-data.ts";

const root = resolve(import.meta.dirname, "..");
const dataDir = resolve(process.env.RAILSIEVE_DATA ?? resolve(root, "data"));
const outDir = resolve(root, process.env.RAILSIEVE_DIST ?? "dist");
const scratch = `${outDir}.building`;
const old = `${outDir}.old`;

const set = loadDataSet(dataDir);
const { problems } = set;
if (problems.length > 0) {
  for (const p of problems) console.error(formatProblem(p));
  console.error(
    `railsieve: build stopped: ${problems.length} problem${problems.length === 1 ? "" : "s"} in ${dataDir}; ${existsSync(outDir) ? "the previous site in dist/ is unchanged" : "nothing was written"}`,
  );
  process.exit(2);
}

rmSync(scratch, { recursive: true, force: true });
// Astro keeps intermediate files in the project's .astro/ whatever the output
// folder, so two builds at once (tests build several sites) must take turns.
const release = acquireLock(resolve(root, ".astro/railsieve-build.lock"));
// astro.config.mjs reads these when the build loads it.
Object.assign(process.env, { RAILSIEVE_OUT: scratch, RAILSIEVE_DATA: dataDir, ASTRO_TELEMETRY_DISABLED: "1" });
(globalThis as { [LOADED_DATA]?: unknown })[LOADED_DATA] = { dataDir, set };
let failure: unknown;
try {
  const { build } = await import("astro");
  await build({ root, logLevel: "silent" });
} catch (e) {
  failure = e;
}
release();
if (failure !== undefined) {
  rmSync(scratch, { recursive: true, force: true });
  console.error(failure instanceof Error ? failure.message : String(failure));
  console.error("railsieve: the site build failed; the previous site in dist/ is unchanged");
  process.exit(1);
}
rmSync(old, { recursive: true, force: true });
if (existsSync(outDir)) renameSync(outDir, old);
renameSync(scratch, outDir);
rmSync(old, { recursive: true, force: true });
console.log(`railsieve: site built in ${outDir}`);
// Astro's build can leave handles open (its file watchers); the work is done.
process.exit(0);

/** A lock folder holding the owner's pid; a lock whose owner has died is taken over. */
function acquireLock(lock: string): () => void {
  const deadline = Date.now() + 10 * 60_000;
  const pause = new Int32Array(new SharedArrayBuffer(4));
  mkdirSync(resolve(lock, ".."), { recursive: true });
  for (;;) {
    try {
      mkdirSync(lock);
      writeFileSync(resolve(lock, "pid"), String(process.pid));
      return () => rmSync(lock, { recursive: true, force: true });
    } catch {
      if (!ownerAlive(lock)) {
        rmSync(lock, { recursive: true, force: true });
        continue;
      }
      if (Date.now() > deadline) {
        console.error(`railsieve: another build holds ${lock}; remove it if no build is running`);
        process.exit(1);
      }
      Atomics.wait(pause, 0, 0, 200);
    }
  }
}

function ownerAlive(lock: string): boolean {
  let pid: number;
  try {
    pid = Number(readFileSync(resolve(lock, "pid"), "utf8"));
  } catch {
    return true; // just created, pid not written yet
  }
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}
