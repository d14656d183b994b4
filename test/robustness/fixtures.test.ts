// Issue 14: one base data set (test/fixtures/base/); each bad-input case holds
// only the files it breaks, never a byte-identical copy of a base file.
import { createHash } from "node:crypto";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const FIXTURES = "test/fixtures";

function filesUnder(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? filesUnder(join(dir, e.name)) : [join(dir, e.name)],
  );
}

const hash = (file: string) => createHash("sha256").update(readFileSync(file)).digest("hex");

describe("fixtures", () => {
  it("no case folder holds a byte-identical copy of a base file", () => {
    const base = new Map(filesUnder(join(FIXTURES, "base")).map((f) => [hash(f), f]));
    const copies = ["bad", "catalogue", "designs"]
      .flatMap((group) => filesUnder(join(FIXTURES, group)))
      .filter((f) => base.has(hash(f)));
    expect(copies).toEqual([]);
  });

  it("every laid-out case has the three catalogue files unless it leaves one out on purpose", () => {
    const cases = readdirSync(".fixtures/bad");
    expect(cases.length).toBeGreaterThan(30);
    for (const c of cases) {
      expect(readdirSync(join(".fixtures/bad", c)).sort(), c).toEqual(
        expect.arrayContaining(["comparators.csv", "designs", "diodes.csv", "op-amps.csv"]),
      );
    }
  });
});
