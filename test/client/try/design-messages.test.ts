// The try page reads a design with zod/mini alone; the CLI also loads full zod,
// which installs zod's English messages. Every problem the design schema reports
// must be worded by us, so the page says exactly what `railsieve check` says.
// The page's engine is bundled as the browser gets it (zod's unused parts and
// side effects shaken out) and run in a bare context, against the CLI's reader
// in this process, over a table of bad values at every field.
import { runInNewContext } from "node:vm";
import { resolve } from "node:path";
import { build } from "esbuild";
import { describe, expect, it } from "vitest";
import { parseDesignValue } from "../../../src/engine.ts";
import { DEFAULT_INPUT } from "../../../src/client/try/defaults.ts";
import { TOPOLOGY_META } from "../../../src/topologies/meta.ts";

const ROOT = resolve(import.meta.dirname, "../../..");

type Page = { ready: Promise<void>; parse: (raw: unknown) => unknown };

async function pageReader(): Promise<Page> {
  const entry = `
    import "./src/client/try/zod-setup.ts";
    import { loadTopologies, parseDesignValue } from "./src/client/try/engine.ts";
    export const ready = loadTopologies(${JSON.stringify(TOPOLOGY_META.map((t) => t.id))});
    export const parse = (raw) => parseDesignValue("form", raw);`;
  const out = await build({
    stdin: { contents: entry, resolveDir: ROOT, loader: "ts", sourcefile: "page-entry.ts" },
    bundle: true,
    platform: "browser",
    format: "iife",
    globalName: "page",
    write: false,
    logLevel: "error",
  });
  const sandbox: Record<string, unknown> = {};
  runInNewContext(`${out.outputFiles[0]?.text ?? ""}\nglobalThis.page = page;`, sandbox, { timeout: 10_000 });
  const page = sandbox.page as Page;
  await page.ready;
  return page;
}

// Number.POSITIVE_INFINITY stands for a 1e400 that JSON.parse turned into Infinity.
const BAD_VALUES: unknown[] = [
  null,
  true,
  [],
  {},
  "",
  "x",
  -1,
  0,
  Number.POSITIVE_INFINITY,
  "1e400",
  [1],
  { kind: "x" },
  2.5,
];

/** Every dot path of a plain object's leaves and objects. */
function paths(value: unknown, prefix = ""): string[] {
  if (typeof value !== "object" || value === null || Array.isArray(value)) return [];
  return Object.entries(value).flatMap(([k, v]) => {
    const p = prefix ? `${prefix}.${k}` : k;
    return [p, ...paths(v, p)];
  });
}

function withValue(raw: unknown, path: string, value: unknown): unknown {
  const copy = structuredClone(raw) as Record<string, unknown>;
  const keys = path.split(".");
  let node = copy;
  for (const k of keys.slice(0, -1)) node = node[k] as Record<string, unknown>;
  node[keys[keys.length - 1] as string] = value;
  return copy;
}

describe("the try page's design messages", () => {
  const base = { ...DEFAULT_INPUT, bom: { buffer: "oa-x" }, policy: { offset_share: 0.3, allow_unrated: true } };
  const cases: [string, unknown][] = [
    ["the whole design null", null],
    ["the whole design a list", []],
    ["the whole design a number", 5],
    ["an unknown key", { ...base, extra: 1 }],
    ["an unknown nested key", withValue(base, "signal.peek_v", 3)],
    ["an unknown topology", { ...base, topology: "rectify" }],
    ["an unknown role", withValue(base, "bom.bufer", "oa-x")],
    ["a BOM entry that is not an id", withValue(base, "bom.buffer", 5)],
    ...paths(base).flatMap((p) =>
      BAD_VALUES.map((v): [string, unknown] => [`${p} = ${JSON.stringify(v)}`, withValue(base, p, v)]),
    ),
  ];

  it("reads the same problems as the CLI for every bad value, none in zod's default words", async () => {
    const page = await pageReader();
    expect(cases.length).toBeGreaterThan(300);
    for (const [what, raw] of cases) {
      const theirs = parseDesignValue("form", raw);
      const mine = page.parse(raw) as typeof theirs;
      expect(JSON.parse(JSON.stringify(mine)), what).toEqual(JSON.parse(JSON.stringify(theirs)));
      for (const p of theirs.problems) expect(p.message, what).not.toMatch(/^Invalid|^Expected|^Unrecognized/);
    }
  });
});
