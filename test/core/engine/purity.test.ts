// SPEC §3: src/core and rules/ import nothing from Astro, Node or the DOM, so the same
// engine runs at build time, in the CLI and in the browser. Two checks: every import
// of every engine file stays inside the engine or names an allowed package, and the
// engine, bundled on its own for a platform-neutral target, evaluates a design inside
// a bare JavaScript context that has no Node or browser globals at all.
import { readdirSync, readFileSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { runInNewContext } from "node:vm";
import { build } from "esbuild";
import { describe, expect, it } from "vitest";
import { buildCatalogue, parseCatalogueText } from "../../../src/core/catalogue.ts";
import { parseDesignValue } from "../../../src/engine.ts";
import { evaluateDesign } from "../../../src/engine.ts";

const ROOT = resolve(import.meta.dirname, "../../..");
const ENGINE_DIRS = ["src/core", "rules", "src/topologies"];
// zod/mini for the design schema, which the try page ships (src/core/schemas/design.ts).
const ALLOWED_PACKAGES = ["zod", "zod/mini", "papaparse"];

function filesUnder(dir: string): string[] {
  return readdirSync(join(ROOT, dir), { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? filesUnder(join(dir, e.name)) : e.name.endsWith(".ts") ? [join(dir, e.name)] : [],
  );
}

const SPECIFIER =
  /(?:^|[\s;])(?:import|export)\s[^;]*?\sfrom\s*["']([^"']+)["']|(?:^|[\s;])import\s*["']([^"']+)["']|\bimport\s*\(\s*["']([^"']+)["']\s*\)|\brequire\s*\(\s*["']([^"']+)["']\s*\)/g;

function specifiers(code: string): string[] {
  return [...code.matchAll(SPECIFIER)].map((m) => m[1] ?? m[2] ?? m[3] ?? m[4] ?? "");
}

// Comments and string contents hold prose ("the 2.5 V window."), not code.
function codeOnly(source: string): string {
  return source
    .replace(/\/\*[\s\S]*?\*\//g, "")
    .replace(/(^|[^:\\])\/\/.*$/gm, "$1")
    .replace(/"(?:[^"\\\n]|\\.)*"|'(?:[^'\\\n]|\\.)*'|`(?:[^`\\]|\\.)*`/g, '""');
}

// src/engine.ts hands the registries to the engine: pure too.
const files = [...ENGINE_DIRS.flatMap(filesUnder), "src/engine.ts"].sort();

/** Every part of every role, with its verdict and each finding's verdict, margin and reason. Self-contained: it is also sent into the bare context as text. */
function summary(result: { roles: { role: string; fits: PartLike[]; rejected: PartLike[] }[] }): string[] {
  return result.roles.flatMap((r) =>
    [...r.fits, ...r.rejected].flatMap((p) => [
      `${r.role} ${p.part.id} ${p.verdict}`,
      ...p.findings.map((f) => `  ${f.rule} ${f.verdict} ${f.margin} ${f.reason}`),
    ]),
  );
}
type PartLike = {
  part: { id: string };
  verdict: string;
  findings: { rule: string; verdict: string; margin: number | null; reason: string }[];
};

describe("the engine is pure", () => {
  it("has files to check", () => {
    expect(files.length).toBeGreaterThan(30);
    expect(files).toContain("src/core/engine/engine.ts");
    expect(files).toContain("src/topologies/index.ts");
  });

  it.each(files)("%s imports only engine files, zod and papaparse", (file) => {
    const source = readFileSync(join(ROOT, file), "utf8");
    for (const spec of specifiers(source)) {
      if (spec.startsWith(".")) {
        const target = relative(ROOT, resolve(dirname(join(ROOT, file)), spec));
        expect(
          ENGINE_DIRS.some((d) => target.startsWith(`${d}/`)) || target === "src/engine.ts",
          `${file} imports ${spec}`,
        ).toBe(true);
      } else {
        expect(ALLOWED_PACKAGES, `${file} imports ${spec}`).toContain(spec);
      }
    }
  });

  // Issue 14: core ← rules ← topologies ← src/engine.ts. The engine runs the
  // topologies and rules it is given, so src/core names neither.
  const ALLOWED_DIRECTIONS: [string, readonly string[]][] = [
    ["src/core/", ["src/core/"]],
    ["rules/", ["src/core/", "rules/"]],
    ["src/topologies/", ["src/core/", "rules/", "src/topologies/"]],
  ];
  it.each(files.filter((f) => !f.startsWith("src/engine")))("%s imports only in the allowed directions", (file) => {
    const allowed = ALLOWED_DIRECTIONS.find(([dir]) => file.startsWith(dir))?.[1] ?? [];
    const source = readFileSync(join(ROOT, file), "utf8");
    for (const spec of specifiers(source).filter((x) => x.startsWith("."))) {
      const target = relative(ROOT, resolve(dirname(join(ROOT, file)), spec));
      expect(
        allowed.some((d) => target.startsWith(d)),
        `${file} imports ${target}`,
      ).toBe(true);
    }
  });

  it("rules/ reaches src/core through the rule kit and pure helpers only, never the engine", () => {
    const offenders = files
      .filter((f) => f.startsWith("rules/"))
      .flatMap((f) =>
        specifiers(readFileSync(join(ROOT, f), "utf8"))
          .filter((x) => x.includes("core/engine/"))
          .map((x) => `${f} imports ${x}`),
      );
    expect(offenders).toEqual([]);
  });

  it.each(files)("%s touches no Node or browser global", (file) => {
    const code = codeOnly(readFileSync(join(ROOT, file), "utf8"));
    const found = code.match(
      /\b(?:process|require|Buffer|__dirname|__filename|window|document|navigator|localStorage|sessionStorage|location|fetch|XMLHttpRequest)\b/g,
    );
    expect(found ?? [], file).toEqual([]);
  });

  it("the import scanner sees every form of import", () => {
    const sample = `import { a } from "./a.ts";\nimport type { B } from "../b.ts";\nexport { c } from "./c.ts";\nimport "./d.ts";\nconst e = await import("node:fs");\nexport * from "zod";`;
    expect(specifiers(sample)).toEqual(["./a.ts", "../b.ts", "./c.ts", "./d.ts", "node:fs", "zod"]);
  });

  it("bundles for a neutral platform and evaluates a design in a bare context", async () => {
    const entry = `
      import { parseCatalogueText, buildCatalogue } from "./src/core/catalogue.ts";
      import { evaluateDesign, parseDesignValue } from "./src/engine.ts";
      export function run(csv, raw) {
        const catalogue = buildCatalogue([parseCatalogueText("op-amp", "op-amps.csv", csv)]).value;
        const d = parseDesignValue("d.json", raw);
        if (!d.design) return d.problems;
        const e = evaluateDesign(d.design, catalogue);
        if (!e.ok) return e.problems;
        return summary(e.result);
      }
      ${summary.toString()}`;
    const out = await build({
      stdin: { contents: entry, resolveDir: ROOT, loader: "ts", sourcefile: "engine-entry.ts" },
      bundle: true,
      platform: "neutral",
      format: "iife",
      globalName: "engine",
      mainFields: ["module", "main"],
      // papaparse keeps a Node stream reader behind require("stream"); it only runs when
      // handed a Node stream, and the bare context below has no require to call it with.
      external: ["stream"],
      write: false,
      logLevel: "error",
    });
    const code = out.outputFiles[0]?.text ?? "";
    expect(code).not.toMatch(/\bfrom\s*["']node:|require\(["']node:/);

    // Only the ECMAScript built-ins: no process, require, window, document, TextDecoder, console.
    const sandbox: Record<string, unknown> = {};
    runInNewContext(`${code}\nglobalThis.engine = engine;`, sandbox, { timeout: 10_000 });
    const run = (sandbox.engine as { run: (csv: string, raw: unknown) => string[] }).run;
    const csv = readFileSync(join(ROOT, "test/fixtures/base/op-amps.csv"), "utf8");
    const raw = JSON.parse(readFileSync(join(ROOT, "test/fixtures/designs/valid/bench-10v.json"), "utf8"));
    const bare = run(csv, raw);
    // The same evaluation in this (Node) process must give the same verdicts, margins and reasons.
    const catalogue = buildCatalogue([parseCatalogueText("op-amp", "op-amps.csv", csv)]).value;
    const d = parseDesignValue("d.json", raw).design;
    const e = d && evaluateDesign(d, catalogue);
    expect(e?.ok).toBe(true);
    expect(bare).toEqual(e?.ok ? summary(e.result) : []);
    // Every op amp of the file is weighed for the buffer.
    expect(bare.filter((l) => l.startsWith("buffer ")).length).toBe(csv.trim().split("\n").length - 1);
  });
});
