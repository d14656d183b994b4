// Runs the project's Astro with its usage-data collection off: `astro preview`
// and `astro dev` otherwise print a notice and switch it on for the whole
// machine. Usage: node scripts/astro.ts preview|dev|check [args…]
import { spawnSync } from "node:child_process";
import { dirname, resolve } from "node:path";
import { fileURLToPath } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const astro = resolve(root, "node_modules/astro/bin/astro.mjs");
const run = spawnSync(process.execPath, [astro, ...process.argv.slice(2)], {
  cwd: root,
  stdio: "inherit",
  env: { ...process.env, ASTRO_TELEMETRY_DISABLED: "1" },
});
process.exit(run.status ?? 1);
