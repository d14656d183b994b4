// Runs the CLI in-process, the way bin/railsieve.ts does, and keeps what it printed.
import { readdirSync } from "node:fs";
import { join } from "node:path";
import { main } from "../../src/cli/main.ts";

export type CliRun = { code: number; out: string; err: string };

export async function runCli(argv: string[]): Promise<CliRun> {
  let out = "";
  let err = "";
  const code = await main(argv, { out: (t) => (out += t), err: (t) => (err += t), color: false });
  return { code, out, err };
}

/**
 * The corpus laid out as whole data folders (test/helpers/fixtures.ts: each case's
 * own files over test/fixtures/base/), relative to the repository root (vitest's
 * cwd), as messages print it.
 */
export const BAD = ".fixtures/bad";

export function corpusFolders(): string[] {
  return readdirSync(BAD, { withFileTypes: true })
    .filter((e) => e.isDirectory())
    .map((e) => e.name)
    .sort();
}

export function designFiles(dir: string): string[] {
  return readdirSync(join(dir, "designs"))
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((f) => join(dir, "designs", f));
}

export const validate = (dir: string) => runCli(["validate", "--data", dir]);
export const check = (dir: string, format = "text") =>
  runCli(["check", ...designFiles(dir), "--data", dir, "--format", format]);

/** Text that only an uncaught exception would print. */
export const STACK_TRACE = [/^\s+at /m, /^\w*Error:/m, /\.ts:\d+:\d+/, /\bnode:internal\b/];
