// The browser's copy of each rule and topology module loses the rules page's
// text (src/build/strip-docs.ts) and nothing else: run on the real sources, the
// stripped module still defines the same rule, with the same id, kinds, needs,
// measure and describe, and only those keys read the stub.
import { readdirSync, readFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { DOC_STUB, stripDocs } from "../../src/build/strip-docs.ts";

const ROOT = resolve(import.meta.dirname, "../..");
const sources = (dir: string) =>
  readdirSync(join(ROOT, dir))
    .filter((f) => f.endsWith(".ts"))
    .map((f) => [`${dir}/${f}`, readFileSync(join(ROOT, dir, f), "utf8")] as const);

const STUB = JSON.stringify(DOC_STUB);

/** How many times `key` holds the stub (prettier may put a long value on the next line). */
const stubbed = (out: string, key: string) =>
  out.split(new RegExp(`\\b${key}:\\s*${STUB.replace(/[()]/g, "\\$&")}`)).length - 1;

/** Whether `out` is `code` with some spans replaced by the stub: every text between stubs is in `code`, in order. */
function keptAround(code: string, out: string): boolean {
  const kept = out.split(STUB);
  let at = 0;
  for (const [i, piece] of kept.entries()) {
    const found = i === 0 ? (code.startsWith(piece) ? 0 : -1) : code.indexOf(piece, at);
    if (found < 0) return false;
    at = found + piece.length;
  }
  return at === code.length;
}

describe("stripDocs", () => {
  it("replaces a rule's checks, formula and source, whatever their form, and leaves the rest", () => {
    const code = `import { defineRule } from "x";
const note = "kept";
export const r = defineRule({
  id: "r",
  checks: "what it checks",
  formula: \`V = \${1 + 1}\`,
  source: "a book, " + "p. 5",
  policy: "offset_share",
  describe() { return { checks: "a finding's own key" }; },
});
const other = { checks: "not a rule" };`;
    expect(stripDocs(code)).toBe(`import { defineRule } from "x";
const note = "kept";
export const r = defineRule({
  id: "r",
  checks: ${STUB},
  formula: ${STUB},
  source: ${STUB},
  policy: "offset_share",
  describe() { return { checks: "a finding's own key" }; },
});
const other = { checks: "not a rule" };`);
  });

  it("replaces a topology's description and reading only", () => {
    const code = `export const t = defineTopology({ id: "t", title: "T", description: "long", reading: "volts = code", fields: [] });`;
    expect(stripDocs(code)).toBe(
      `export const t = defineTopology({ id: "t", title: "T", description: ${STUB}, reading: ${STUB}, fields: [] });`,
    );
  });

  const rules = sources("rules").filter(([, code]) => code.includes("defineRule({"));
  it.each(rules)("%s: every rule loses its three texts and keeps its code", (_file, code) => {
    const out = stripDocs(code);
    const defined = code.split("defineRule({").length - 1;
    expect(stubbed(out, "checks")).toBe(defined);
    expect(stubbed(out, "formula")).toBe(defined);
    expect(stubbed(out, "source")).toBe(defined);
    expect(keptAround(code, out)).toBe(true);
  });

  const topologies = sources("src/topologies").filter(([, code]) => code.includes("defineTopology({"));
  it("finds every topology module", () => {
    expect(topologies.length).toBeGreaterThanOrEqual(4);
  });
  it.each(topologies)("%s: description and reading become the stub", (_file, code) => {
    const out = stripDocs(code);
    expect(stubbed(out, "description")).toBe(1);
    expect(stubbed(out, "reading")).toBe(1);
    expect(out.length).toBeLessThan(code.length);
    expect(keptAround(code, out)).toBe(true);
  });
});
