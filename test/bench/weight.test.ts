// The try page's weight: the first answer counts the scripts the page loads,
// their static imports, and the chunks named as fetched for the default design
// (with their static imports); all chunks adds every dynamic import. Each file
// once, nothing else.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import { afterAll, describe, expect, it } from "vitest";
import { defaultDesignChunks, tryPageFiles, tryPageWeight } from "../../bench/weight.ts";

const dist = mkdtempSync(join(tmpdir(), "railsieve-weight-"));
afterAll(() => rmSync(dist, { recursive: true, force: true }));

const files: Record<string, string> = {
  "try/index.html": `<html><script type="module" src="/_astro/page.js"></script></html>`,
  "_astro/page.js": `import{a}from"./shared.js";const l=()=>import("./lazy.js"),t=()=>import(\`./topo-x.Ab1.js\`);console.log(a,l,t,"${"x".repeat(500)}");`,
  "_astro/shared.js": `import{b}from"./page.js";export const a=1;`,
  "_astro/lazy.js": `export default 2;`,
  "_astro/topo-x.Ab1.js": `import{c}from"./rules.js";export const x=c;`,
  "_astro/rules.js": `export const c="${"r".repeat(300)}";`,
  "_astro/other-page.js": `export const unrelated = "${"y".repeat(5000)}";`,
  "data/catalogue.json": JSON.stringify({ parts: [{ id: "oa-1" }] }),
};
for (const [path, text] of Object.entries(files)) {
  mkdirSync(join(dist, path, ".."), { recursive: true });
  writeFileSync(join(dist, path), text);
}
const gz = (...paths: string[]) => paths.reduce((n, p) => n + gzipSync(files[p] ?? "", { level: 9 }).length, 0);
const ALL = ["_astro/lazy.js", "_astro/page.js", "_astro/rules.js", "_astro/shared.js", "_astro/topo-x.Ab1.js"];

describe("tryPageWeight", () => {
  it("first answer: the page script and its static imports; all chunks: every import, each once", () => {
    expect(tryPageFiles(dist)).toEqual({ firstAnswer: ["_astro/page.js", "_astro/shared.js"], all: ALL });
    expect(tryPageWeight(dist)).toEqual({
      try_js_first_answer_gzip_bytes: gz("_astro/page.js", "_astro/shared.js"),
      try_js_gzip_bytes: gz(...ALL),
      catalogue_json_gzip_bytes: gz("data/catalogue.json"),
    });
  });

  it("counts a chunk the default design fetches, with its static imports, in the first answer", () => {
    expect(tryPageFiles(dist, ["topo-x"]).firstAnswer).toEqual([
      "_astro/page.js",
      "_astro/rules.js",
      "_astro/shared.js",
      "_astro/topo-x.Ab1.js",
    ]);
    expect(tryPageWeight(dist, ["topo-x"]).try_js_first_answer_gzip_bytes).toBe(
      gz("_astro/page.js", "_astro/shared.js", "_astro/topo-x.Ab1.js", "_astro/rules.js"),
    );
  });

  it("adds no chunk for the default design, whose topology comes with the page's script", () => {
    expect(defaultDesignChunks()).toEqual([]);
  });

  it("refuses a chunk name the page does not import, rather than leave it out of the figure", () => {
    expect(() => tryPageFiles(dist, ["topo-y"])).toThrow("no chunk named topo-y among the try page's scripts");
  });
});
