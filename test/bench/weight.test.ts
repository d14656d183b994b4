// The try page's weight counts the scripts the page loads and every chunk they
// import (statically or dynamically), once each, and nothing else.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import { afterAll, describe, expect, it } from "vitest";
import { tryPageWeight } from "../../bench/weight.ts";

const dist = mkdtempSync(join(tmpdir(), "railsieve-weight-"));
afterAll(() => rmSync(dist, { recursive: true, force: true }));

const files: Record<string, string> = {
  "try/index.html": `<html><script type="module" src="/_astro/page.js"></script></html>`,
  "_astro/page.js": `import{a}from"./shared.js";const l=()=>import("./lazy.js");console.log(a,l,"${"x".repeat(500)}");`,
  "_astro/shared.js": `import{b}from"./page.js";export const a=1;`,
  "_astro/lazy.js": `export default 2;`,
  "_astro/other-page.js": `export const unrelated = "${"y".repeat(5000)}";`,
  "data/catalogue.json": JSON.stringify({ parts: [{ id: "oa-1" }] }),
};
for (const [path, text] of Object.entries(files)) {
  mkdirSync(join(dist, path, ".."), { recursive: true });
  writeFileSync(join(dist, path), text);
}
const gz = (path: string) => gzipSync(files[path] ?? "", { level: 9 }).length;

describe("tryPageWeight", () => {
  it("sums the gzipped page script and the chunks it imports, each once", () => {
    expect(tryPageWeight(dist)).toEqual({
      try_js_gzip_bytes: gz("_astro/page.js") + gz("_astro/shared.js") + gz("_astro/lazy.js"),
      catalogue_json_gzip_bytes: gz("data/catalogue.json"),
    });
  });
});
