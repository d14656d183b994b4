// Bad-input fixtures hold only the file they break (issue 14): one base data
// set, test/fixtures/base/, and per case the files that differ. A case's folder
// may also hold fixture.json, { "without": ["diodes.csv"] }, to leave base files
// out. Before the unit tests run, materializeFixtures() lays every case out as a
// whole data folder under .fixtures/ (git-ignored), so the loader and the CLI
// read a real folder, and messages name `.fixtures/<group>/<case>/<file>`.
import { copyFileSync, existsSync, mkdirSync, readdirSync, readFileSync, rmSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";

const ROOT = resolve(import.meta.dirname, "../..");
const SOURCE = join(ROOT, "test/fixtures");
const BASE = join(SOURCE, "base");
/** Where the whole folders are laid out, relative to the repository root (vitest's cwd). */
export const BUILT = ".fixtures";
/** Case groups that take the base's files where they hold none. */
const GROUPS = ["bad", "catalogue"];
const NOT_DATA = new Set(["fixture.json", "README.md"]);

function filesUnder(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? filesUnder(join(dir, e.name)).map((f) => join(e.name, f)) : [e.name],
  );
}

function layOut(caseDir: string, target: string): void {
  const without = existsSync(join(caseDir, "fixture.json"))
    ? ((JSON.parse(readFileSync(join(caseDir, "fixture.json"), "utf8")) as { without?: string[] }).without ?? [])
    : [];
  const own = filesUnder(caseDir).filter((f) => !NOT_DATA.has(f));
  const fromBase = filesUnder(BASE).filter((f) => !own.includes(f) && !without.includes(f));
  for (const [from, file] of [...fromBase.map((f) => [BASE, f] as const), ...own.map((f) => [caseDir, f] as const)]) {
    mkdirSync(dirname(join(target, file)), { recursive: true });
    copyFileSync(join(from, file), join(target, file));
  }
}

/** Lays out every case of every group afresh (vitest's global setup for the unit tests). */
export function materializeFixtures(): void {
  const out = join(ROOT, BUILT);
  rmSync(out, { recursive: true, force: true });
  for (const group of GROUPS) {
    for (const name of readdirSync(join(SOURCE, group))) {
      const caseDir = join(SOURCE, group, name);
      if (statSync(caseDir).isDirectory()) layOut(caseDir, join(out, group, name));
    }
  }
  layOut(BASE, join(out, "base"));
}

/** The laid-out folder of one case ("bad/csv-zero-gbw"), relative to the repository root. */
export function fixtureDir(name: string): string {
  const dir = join(BUILT, name);
  if (!existsSync(join(ROOT, dir))) throw new Error(`no fixture ${name} (is the unit project's global setup on?)`);
  return relative(ROOT, join(ROOT, dir));
}

export default function setup(): void {
  materializeFixtures();
}
