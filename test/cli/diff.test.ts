// `railsieve diff`: what a change to the data does, checked against the
// verdicts `check` itself prints for each side (an oracle independent of the
// comparison code), with the arithmetic of the changed reasons worked by hand.
import { execFileSync } from "node:child_process";
import { readdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { describe, expect, it } from "vitest";
import type { DiffReport } from "../../src/cli/diff/compare.ts";
import { copyDataFolder, editDesign, setCell } from "../helpers/data-copy.ts";
import { run } from "./run.ts";

type CheckJson = { designs: { id: string; roles: { role: string; fits: Verdicted[]; rejected: Verdicted[] }[] }[] };
type Verdicted = { part: string; verdict: string };

/** design|role|part → verdict, as `check --format json` reports the data folder. */
async function verdicts(dir: string): Promise<Map<string, string>> {
  const designs = readdirSync(join(dir, "designs")).map((f) => join(dir, "designs", f));
  const { out, code } = await run("check", ...designs, "--data", dir, "--format", "json");
  expect(code).toBeLessThan(2);
  const map = new Map<string, string>();
  for (const d of (JSON.parse(out) as CheckJson).designs)
    for (const r of d.roles)
      for (const p of [...r.fits, ...r.rejected]) map.set(`${d.id}|${r.role}|${p.part}`, p.verdict);
  return map;
}

/** The design|role pairs where some part's verdict differs between two folders. */
async function rolesThatChange(before: string, after: string): Promise<string[]> {
  const [b, a] = [await verdicts(before), await verdicts(after)];
  const keys = new Set([...b.keys(), ...a.keys()]);
  const roles = [...keys].filter((k) => b.get(k) !== a.get(k)).map((k) => k.split("|").slice(0, 2).join("|"));
  return [...new Set(roles)].sort();
}

async function diffJson(...args: string[]): Promise<{ code: number; report: DiffReport; err: string }> {
  const { code, out, err } = await run("diff", ...args, "--format", "json");
  return { code, err, report: (code < 2 ? JSON.parse(out) : undefined) as DiffReport };
}

const listedRoles = (r: DiffReport) =>
  r.changed.flatMap((d) => d.roles.filter((x) => x.parts.length > 0).map((x) => `${d.id}|${x.role}`)).sort();

describe("diff between two data folders", () => {
  // Acceptance (issue 20): one op amp's out_pos_headroom_v changed in a copy of data/.
  it("lists exactly the designs and roles whose verdicts change, with reasons before and after", async () => {
    const after = copyDataFolder();
    setCell(after, "op-amps.csv", "oa-cmos-rrio-3m", "out_pos_headroom_v", "1.6");
    const expected = await rolesThatChange("data", after);
    expect(expected.length).toBeGreaterThan(0);

    const { code, report } = await diffJson("data", after);
    expect(listedRoles(report)).toEqual(expected);
    expect(report.changed.map((d) => d.id)).toEqual([...new Set(expected.map((k) => k.split("|")[0]))]);
    // Only the edited part moves, and only through the rules that read the edited column.
    const parts = report.changed.flatMap((d) => d.roles.flatMap((r) => r.parts));
    expect(new Set(parts.map((p) => p.part))).toEqual(new Set(["oa-cmos-rrio-3m"]));
    for (const p of parts) {
      expect(p.change).toBe("fit-lost");
      expect(p.rules.map((x) => x.rule).every((rule) => ["output-swing", "logic-high"].includes(rule))).toBe(true);
      for (const x of p.rules) {
        expect(x.before?.reason).toMatch(/\d/);
        expect(x.after?.verdict).toBe("fail");
      }
    }
    // The buffer on ±2.5 V rails: the follower must reach +W = +1.50 V; with 1.6 V of
    // headroom below V+ = 2.50 V the output reaches 2.50 − 1.60 = 0.90 V, 0.60 V short
    // (SPEC §4 headroom convention; hand arithmetic).
    const buffer = report.changed
      .find((d) => d.id === "vibration-2v-split-2v5")
      ?.roles.find((r) => r.role === "buffer")
      ?.parts.find((p) => p.part === "oa-cmos-rrio-3m");
    expect(buffer?.rules.find((x) => x.rule === "output-swing")?.after?.reason).toContain(
      "+0.90 V (1.60 V headroom): 0.60 V short",
    );
    expect(code).toBe(0);
  });

  it("says so in words, part by part", async () => {
    const after = copyDataFolder();
    // The vibration design's best buffer (its 2 kΩ rating covers the rectifier's R/2 load, output-load).
    setCell(after, "op-amps.csv", "oa-cmos-rrio-10m", "out_pos_headroom_v", "1.6");
    const { code, out } = await run("diff", "data", after);
    expect(code).toBe(0);
    const text = out.replaceAll(after, "AFTER");
    const designs = readdirSync("data/designs").length;
    expect(text.split("\n").slice(0, 2)).toEqual([
      "railsieve diff: data → AFTER",
      `  1 design changes, ${designs - 1} designs unchanged`,
    ]);
    expect(text).toContain("best part: oa-cmos-rrio-10m → oa-low-noise-cmos");
    expect(text).toContain("result: no design stops holding and no BOM part stops fitting");
  });

  it("exits 1 when a BOM part stops fitting, naming the design, the part and the role", async () => {
    const after = copyDataFolder();
    // thermoelectric-3v-on-3v3 names oa-cmos-rrio-16v for its buffer.
    setCell(after, "op-amps.csv", "oa-cmos-rrio-16v", "out_pos_headroom_v", "2.5");
    const { code, report } = await diffJson("data", after);
    expect(code).toBe(1);
    expect(report.regressions).toContain(
      "thermoelectric-3v-on-3v3: BOM part oa-cmos-rrio-16v stops fitting the buffer",
    );
    const role = report.changed
      .find((d) => d.id === "thermoelectric-3v-on-3v3")
      ?.roles.find((r) => r.role === "buffer");
    expect(role?.bom).toEqual({
      before: "oa-cmos-rrio-16v",
      after: "oa-cmos-rrio-16v",
      fitsBefore: true,
      fitsAfter: false,
      stopsFitting: true,
    });
  });

  it("exits 1 when a design goes from holding to failing, with the reasons after", async () => {
    // The same design asked for 1 V (any budget of a ±10 V front end fits) and then for
    // 1 mV, under a tenth of one 10-bit step at the input (5 V / 1024 / k ≈ 20 mV).
    const require = (volts: number) => {
      const dir = copyDataFolder();
      editDesign(dir, "bridge-10v-5v-adc", (d) => ((d.accuracy as { required_v: number }).required_v = volts));
      return dir;
    };
    const { code, report } = await diffJson(require(1), require(0.001));
    expect(code).toBe(1);
    const d = report.changed.find((x) => x.id === "bridge-10v-5v-adc");
    expect(d?.state.before?.state).toBe("holds");
    expect(d?.state.after?.state).toBe("fails");
    // At 1 mV no sign part fits either (dead band, and since issue 21 the last candidates'
    // input clamps and overload recovery), so the budget may be incomplete rather than failing.
    expect(d?.state.after?.reasons.join(" ")).toMatch(/accuracy budget (fails|incomplete)/);
    expect(["fail", "incomplete", undefined]).toContain(d?.budget?.after.verdict);
    expect(report.regressions).toContain("bridge-10v-5v-adc went from holding to failing");
  });

  it("lists a new and a removed design, and a new design that fails is a regression", async () => {
    const after = copyDataFolder();
    editDesign(after, "bus-48v", (d) => {
      d.id = "bus-48v-tight";
      (d.accuracy as { required_v: number }).required_v = 0.001;
    });
    const { renameSync } = await import("node:fs");
    renameSync(join(after, "designs/bus-48v.json"), join(after, "designs/bus-48v-tight.json"));
    const { code, report } = await diffJson("data", after);
    expect(report.changed.map((d) => [d.id, d.presence])).toEqual([
      ["bus-48v", "removed"],
      ["bus-48v-tight", "added"],
    ]);
    expect(report.regressions).toEqual(["bus-48v-tight is a new design and fails"]);
    expect(code).toBe(1);
  });

  it("finds nothing between a folder and itself", async () => {
    const { code, report } = await diffJson("data", "data");
    expect(code).toBe(0);
    expect(report.changed).toEqual([]);
    expect(report.unchanged).toHaveLength(readdirSync("data/designs").length);
  });

  it("stops with the file and line of a problem on either side (exit 2)", async () => {
    const after = copyDataFolder();
    setCell(after, "op-amps.csv", "oa-cmos-rrio-3m", "gbw_mhz", "fast");
    const { code, err } = await run("diff", "data", after);
    expect(code).toBe(2);
    expect(err).toMatch(/op-amps\.csv:13: column 'gbw_mhz': .*'fast'/);
  });
});

describe("diff against a git revision", () => {
  function repoWithData(): string {
    const data = copyDataFolder();
    const root = dirname(data);
    const git = (...args: string[]) => execFileSync("git", args, { cwd: root, stdio: "pipe" });
    git("init", "-q");
    git("add", "data");
    git("-c", "user.name=t", "-c", "user.email=t@example.invalid", "commit", "-qm", "data");
    return data;
  }

  it("reads the --data folder as committed, without touching the work tree", async () => {
    const data = repoWithData();
    setCell(data, "op-amps.csv", "oa-cmos-rrio-3m", "out_pos_headroom_v", "1.6");
    const { code, report } = await diffJson("git:HEAD", "--data", data);
    expect(code).toBe(0);
    expect(listedRoles(report)).toEqual(await rolesThatChange("data", data));
    expect(report.before).toMatch(/^git:HEAD \(/);
    // The work tree still holds the edit.
    const status = execFileSync("git", ["status", "--porcelain"], { cwd: data }).toString();
    expect(status).toContain("op-amps.csv");
  });

  it("names a problem in the revision by revision and path", async () => {
    const data = repoWithData();
    const root = dirname(data);
    setCell(data, "op-amps.csv", "oa-cmos-rrio-3m", "gbw_mhz", "fast");
    execFileSync("git", ["-c", "user.name=t", "-c", "user.email=t@example.invalid", "commit", "-qam", "bad"], {
      cwd: root,
    });
    setCell(data, "op-amps.csv", "oa-cmos-rrio-3m", "gbw_mhz", "3");
    const { code, err } = await run("diff", "git:HEAD", "--data", data);
    expect(code).toBe(2);
    expect(err).toMatch(/^HEAD:data\/op-amps\.csv:13: column 'gbw_mhz'/m);
  });

  it.each([
    [
      "an unknown revision",
      ["git:no-such-branch"],
      /unknown revision 'no-such-branch' \(expected a commit, branch or tag/,
    ],
    ["an empty revision", ["git:"], /git: needs a revision/],
  ])("refuses %s with a clear message (exit 2)", async (_name, args, message) => {
    const data = repoWithData();
    const { code, err } = await run("diff", ...args, "--data", data);
    expect(code).toBe(2);
    expect(err).toMatch(message);
  });

  it("says when the data folder is not in a git repository", async () => {
    const data = copyDataFolder();
    const { code, err } = await run("diff", "git:HEAD", "--data", data);
    expect(code).toBe(2);
    expect(err).toMatch(/is not inside a git repository/);
  });
});
