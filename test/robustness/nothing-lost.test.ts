// Nothing lost (issue 8 §4): a build that fails on bad data leaves the last good
// site byte for byte as it was, and the CLI never writes into the data folder.
import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import {
  appendFileSync,
  cpSync,
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmdirSync,
  rmSync,
  statSync,
  writeFileSync,
} from "node:fs";
import { tmpdir } from "node:os";
import { join, relative, resolve } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runCli } from "./cli.ts";

const ROOT = resolve(import.meta.dirname, "../..");
// The project pins Node 24 (Astro 7 needs it); the machine's own node may be older.
const NODE = existsSync(resolve(ROOT, "node_modules/.bin/node"))
  ? resolve(ROOT, "node_modules/.bin/node")
  : process.execPath;

type Entry = { path: string; size: number; mtimeMs: number; sha256: string | null };

/** Every file and folder under dir, with its size, modification time and (for files) hash. */
function snapshot(dir: string): Entry[] {
  const out: Entry[] = [];
  const walk = (d: string) => {
    for (const e of readdirSync(d, { withFileTypes: true }).sort((a, b) => a.name.localeCompare(b.name))) {
      const p = join(d, e.name);
      const st = statSync(p);
      out.push({
        path: relative(dir, p),
        size: e.isFile() ? st.size : 0,
        mtimeMs: st.mtimeMs,
        sha256: e.isFile() ? createHash("sha256").update(readFileSync(p)).digest("hex") : null,
      });
      if (e.isDirectory()) walk(p);
    }
  };
  walk(dir);
  return out;
}

function build(env: Record<string, string>) {
  const run = spawnSync(NODE, [resolve(ROOT, "scripts/build.ts")], {
    cwd: ROOT,
    env: { ...process.env, ...env, RAILSIEVE_BASE: "/" },
    encoding: "utf8",
    timeout: 170_000,
  });
  return { code: run.status, out: run.stdout, err: run.stderr };
}

// Astro keeps its prerender chunks in <root>/.astro/ when the output folder lies
// outside the project, where a second build running at the same time can delete
// them; inside the project they stay in the output folder, private to this build.
const SCRATCH = resolve(ROOT, ".build-tmp");

let tmp: string;
let site: string;
beforeAll(() => {
  tmp = mkdtempSync(join(tmpdir(), "railsieve-nothing-lost-"));
  mkdirSync(SCRATCH, { recursive: true });
  site = mkdtempSync(join(SCRATCH, "nothing-lost-"));
});
afterAll(() => {
  rmSync(tmp, { recursive: true, force: true });
  rmSync(site, { recursive: true, force: true });
  if (readdirSync(SCRATCH).length === 0) rmdirSync(SCRATCH);
});

describe("a failed build", () => {
  it("stops with exit 2 and leaves the previous site byte for byte unchanged", { timeout: 180_000 }, () => {
    const dist = join(site, "dist");
    const first = build({ RAILSIEVE_DIST: dist });
    expect(first.err).toBe("");
    expect(first.code).toBe(0);
    const before = snapshot(dist);
    expect(before.filter((e) => e.path.endsWith(".html")).length).toBeGreaterThan(1);

    // A hand-edited row a spreadsheet might produce: a word where a number belongs.
    const broken = join(tmp, "broken-data");
    cpSync(resolve(ROOT, "data"), broken, { recursive: true });
    const csv = readFileSync(join(broken, "op-amps.csv"), "utf8").trimEnd();
    const lines = csv.split("\n").length;
    const header = csv.split("\n")[0] ?? "";
    const row = header
      .split(",")
      .map((c) => (c === "id" ? "oa-midnight-edit" : c === "name" ? "Midnight edit" : c === "gbw_mhz" ? "fast" : ""));
    writeFileSync(join(broken, "op-amps.csv"), `${csv}\n${row.join(",")}\n`);

    const second = build({ RAILSIEVE_DIST: dist, RAILSIEVE_DATA: broken });
    expect(second.code).toBe(2);
    expect(second.out).toBe("");
    const messages = second.err.trimEnd().split("\n");
    // Each missing or wrong cell of the new row is named with its file and line.
    for (const m of messages.slice(0, -1)) expect(m).toMatch(new RegExp(`op-amps\\.csv:${lines + 1}: column '\\w+': `));
    expect(messages.join("\n")).toContain(`op-amps.csv:${lines + 1}: column 'gbw_mhz': not a number (got 'fast'`);
    expect(messages.at(-1)).toMatch(
      /^railsieve: build stopped: \d+ problems? in .*broken-data; the previous site in dist\/ is unchanged$/,
    );

    expect(snapshot(dist)).toEqual(before);

    // A defect only the engine sees (a BOM id naming no part) stops the build the same way.
    const bom = build({ RAILSIEVE_DIST: dist, RAILSIEVE_DATA: resolve(ROOT, ".fixtures/bad/bom-names-no-part") });
    expect(bom.code).toBe(2);
    expect(bom.err).toContain(
      "audio-1v5-20k.json: bom.buffer: names no part in the catalogue (got 'oa-jfet-precision'",
    );
    expect(snapshot(dist)).toEqual(before);
    // No half-built scratch folder is left beside it either.
    expect(readdirSync(site)).toEqual(["dist"]);
  });
});

describe("the CLI", () => {
  it("never writes into the data folder, whether the data is good or bad", async () => {
    const data = join(tmp, "cli-data");
    cpSync(resolve(ROOT, "data"), data, { recursive: true });
    const designs = readdirSync(join(data, "designs"))
      .filter((f) => f.endsWith(".json"))
      .map((f) => join(data, "designs", f));
    const [first] = designs;
    if (first === undefined) throw new Error("the demo data has no designs");
    const before = snapshot(data);
    const beside = readdirSync(tmp).sort();

    const codes: number[] = [];
    for (const argv of [
      ["validate", "--data", data],
      ["check", ...designs, "--data", data],
      ["check", ...designs, "--data", data, "--format", "json"],
      ["check", ...designs, "--data", data, "--format", "csv"],
      ["explain", "oa-bip-gs-dual", first, "--data", data],
    ]) {
      codes.push((await runCli(argv)).code);
    }
    expect(codes.every((c) => c === 0 || c === 1)).toBe(true);
    expect(snapshot(data)).toEqual(before);

    // And with a broken catalogue: messages, but still nothing written.
    appendFileSync(join(data, "diodes.csv"), "d-broken,Broken\n");
    const brokenBefore = snapshot(data);
    expect((await runCli(["validate", "--data", data])).code).toBe(2);
    expect((await runCli(["check", ...designs, "--data", data])).code).toBe(2);
    expect(snapshot(data)).toEqual(brokenBefore);
    expect(readdirSync(tmp).sort()).toEqual(beside);
  });
});
