// Builds the site for one data folder into a temporary folder through the same
// script as `npm run build`, so the browser tests see what users get.
import { spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { resolve } from "node:path";

export const ROOT = resolve(import.meta.dirname, "../../..");

/** The project pins Node 24 as a dev dependency; the machine's own node may be older. */
export function projectNode(): string {
  const pinned = resolve(ROOT, "node_modules/.bin/node");
  return existsSync(pinned) ? pinned : process.execPath;
}

export type SiteBuild = { dataDir: string; outDir: string; base: string };

export async function buildSite({ dataDir, outDir, base }: SiteBuild): Promise<void> {
  const child = spawn(projectNode(), [resolve(ROOT, "scripts/build.ts")], {
    cwd: ROOT,
    env: { ...process.env, RAILSIEVE_DATA: dataDir, RAILSIEVE_DIST: outDir, RAILSIEVE_BASE: base },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let output = "";
  child.stdout.on("data", (chunk: Buffer) => (output += chunk.toString()));
  child.stderr.on("data", (chunk: Buffer) => (output += chunk.toString()));
  const code = await new Promise<number | null>((ok, fail) => {
    child.once("error", fail);
    child.once("close", ok);
  });
  if (code !== 0) {
    throw new Error(`browser tests: building the site from ${dataDir} failed (exit ${code}):\n${output}`);
  }
}
