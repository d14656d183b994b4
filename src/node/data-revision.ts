// A data folder as it was at a git revision, read blob by blob with
// `git show REV:path` (no checkout; the work tree is not touched). The files go
// to a scratch folder so the one loader (load-data.ts) reads them with every
// check it makes of a folder on disk; problems are then named after the
// revision ("main:data/op-amps.csv:4: …"), never after the scratch folder.
import { execFileSync } from "node:child_process";
import { existsSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, sep } from "node:path";
import type { Problem } from "../core/problems.ts";
import { displayPath, loadDataSet, type DataSet } from "./load-data.ts";

export class RevisionError extends Error {}

function git(cwd: string, args: string[]): Buffer {
  try {
    return execFileSync("git", args, { cwd, maxBuffer: 256 * 1024 * 1024, stdio: ["ignore", "pipe", "pipe"] });
  } catch (e) {
    const err = e as NodeJS.ErrnoException & { stderr?: Buffer };
    // spawn says ENOENT both for a missing program and for a missing working folder.
    if (err.code === "ENOENT" || err.code === "ENOTDIR") {
      throw new RevisionError(
        existsSync(cwd)
          ? "git is not installed (expected the git command on the PATH)"
          : `${displayPath(cwd)}: folder not found (expected the data folder of a git work tree)`,
      );
    }
    const said = err.stderr?.toString("utf8").trim().split("\n")[0] ?? err.message;
    throw new RevisionError(said);
  }
}

/** Which files of a data folder matter: the catalogue files at its top and the design files. */
export function isDataFile(path: string): boolean {
  return /^[^/]+\.csv$/.test(path) || /^designs\/[^/]+\.json$/.test(path);
}

/** Writes the data folder `dir` as of `rev` into `into`; the paths written, relative to it. */
export function extractRevision(dir: string, rev: string, into: string): string[] {
  try {
    git(dir, ["rev-parse", "--is-inside-work-tree"]);
  } catch (e) {
    throw new RevisionError(
      `${displayPath(dir)} is not inside a git repository (expected the data folder of a git work tree): ${(e as Error).message}`,
    );
  }
  try {
    git(dir, ["rev-parse", "--verify", "--quiet", `${rev}^{commit}`]);
  } catch {
    throw new RevisionError(`unknown revision '${rev}' (expected a commit, branch or tag of this repository)`);
  }
  // Paths come back relative to the data folder and limited to it (ls-tree runs in it).
  const listed = git(dir, ["ls-tree", "-r", "-z", "--name-only", rev])
    .toString("utf8")
    .split("\0")
    .filter((p) => p !== "" && isDataFile(p));
  if (listed.length === 0) {
    throw new RevisionError(
      `revision '${rev}' has no data files in ${displayPath(dir)} (expected *.csv and designs/*.json)`,
    );
  }
  for (const path of listed) {
    const target = join(into, path);
    mkdirSync(dirname(target), { recursive: true });
    writeFileSync(target, git(dir, ["show", `${rev}:./${path}`]));
  }
  return listed;
}

/** Names a file of the scratch folder as the revision's file ("main:data/op-amps.csv"). */
function renamer(scratch: string, name: string): (file: string) => string {
  const prefixes = [...new Set([scratch, displayPath(scratch)])].map((p) => p + sep);
  return (file) => {
    const prefix = prefixes.find((p) => file.startsWith(p));
    return prefix === undefined ? file : `${name}/${file.slice(prefix.length).split(sep).join("/")}`;
  };
}

/** Loads the data folder `dir` as of `rev`; every problem names `REV:path/file`. */
export function loadDataRevision(dir: string, rev: string): DataSet {
  const scratch = mkdtempSync(join(tmpdir(), "railsieve-rev-"));
  try {
    extractRevision(dir, rev, scratch);
    const inRepo = git(dir, ["rev-parse", "--show-prefix"]).toString("utf8").trim().replace(/\/$/, "");
    const rename = renamer(scratch, `${rev}:${inRepo === "" ? "." : inRepo}`);
    const set = loadDataSet(scratch);
    const named = (p: Problem): Problem => ({ ...p, file: rename(p.file) });
    const designs = set.designs.map((d) => ({ ...d, file: rename(d.file), problems: d.problems.map(named) }));
    const evaluated = set.evaluated.map((e) => ({ ...e, file: rename(e.file) }));
    const problems = set.problems.map(named);
    return { ...set, problems, designs, evaluated };
  } finally {
    rmSync(scratch, { recursive: true, force: true });
  }
}
