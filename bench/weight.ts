// What the try page costs to download, gzipped: the catalogue JSON, and its
// JavaScript counted two ways, both reported so nothing is hidden:
// - first answer: what the page fetches before it shows its first answer on the
//   default design: the module scripts the page loads, every chunk they import
//   statically, and the chunks of the default design's topologies that do not
//   come with the page (each with its own static imports). The 60 KB target is
//   about this figure.
// - all chunks: every chunk the page can ever fetch, static and dynamic imports
//   alike (other topologies, the simulation, the download buttons).
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { basename, dirname, join, relative, resolve } from "node:path";
import { gzipSync } from "node:zlib";
import { DEFAULT_INPUT } from "../src/client/try/defaults.ts";
import { BUNDLED_TOPOLOGY, topologiesFor } from "../src/client/try/engine.ts";

function gzipBytes(path: string): number {
  return gzipSync(readFileSync(path), { level: 9 }).length;
}

/** A site-absolute or relative URL in `from` (a file under `dist`) to a file path. */
function fileOf(dist: string, from: string, url: string): string {
  return url.startsWith("/") ? join(dist, url) : resolve(dirname(from), url);
}

const STATIC_IMPORT = /(?:\bfrom|\bimport)\s*["'`](\.{1,2}\/[^"'`]+|\/[^"'`]+)["'`]/g;
const DYNAMIC_IMPORT = /\bimport\s*\(\s*["'`](\.{1,2}\/[^"'`]+|\/[^"'`]+)["'`]\s*\)/g;

/** The files `roots` load, following static imports, and dynamic ones too when asked. */
function closure(dist: string, roots: readonly string[], dynamic: boolean): Set<string> {
  const seen = new Set<string>();
  const pending = [...roots];
  while (pending.length > 0) {
    const file = pending.pop() as string;
    if (seen.has(file) || !existsSync(file)) continue;
    seen.add(file);
    const code = readFileSync(file, "utf8");
    for (const m of code.matchAll(STATIC_IMPORT)) pending.push(fileOf(dist, file, m[1] ?? ""));
    if (dynamic) for (const m of code.matchAll(DYNAMIC_IMPORT)) pending.push(fileOf(dist, file, m[1] ?? ""));
  }
  return seen;
}

/** The chunks the page fetches for the default design besides its script: its topologies not bundled with the page. */
export function defaultDesignChunks(): string[] {
  return topologiesFor(DEFAULT_INPUT.topology).filter((id) => id !== BUNDLED_TOPOLOGY.id);
}

export type TryPageFiles = { firstAnswer: string[]; all: string[] };

/**
 * The try page's JavaScript files, as paths under `dist`. `firstAnswerChunks`
 * names the chunks (`<name>.<hash>.js`) the page fetches for its first answer
 * besides its scripts' static imports: the default design's topologies that
 * are not bundled with the page. A name with no such chunk is an error, so a
 * renamed chunk cannot drop out of the figure unseen.
 */
export function tryPageFiles(dist: string, firstAnswerChunks: readonly string[] = []): TryPageFiles {
  const page = join(dist, "try/index.html");
  const html = readFileSync(page, "utf8");
  const scripts = [...html.matchAll(/<script[^>]*\bsrc="([^"]+)"/g)].map((m) => fileOf(dist, page, m[1] ?? ""));
  if (scripts.length === 0) throw new Error(`bench: ${page} loads no script`);
  const all = closure(dist, scripts, true);
  const chunks = firstAnswerChunks.map((name) => {
    const file = [...all].find((f) => basename(f).startsWith(`${name}.`));
    if (!file) throw new Error(`bench: no chunk named ${name} among the try page's scripts`);
    return file;
  });
  const first = closure(dist, [...scripts, ...chunks], false);
  const rel = (files: Set<string>) => [...files].map((f) => relative(dist, f)).sort();
  return { firstAnswer: rel(first), all: rel(all) };
}

export type TryPageWeight = {
  /** What the page fetches for its first answer on the default design (the target's figure). */
  try_js_first_answer_gzip_bytes: number;
  /** Every chunk the page can fetch. */
  try_js_gzip_bytes: number;
  catalogue_json_gzip_bytes: number;
};

export function tryPageWeight(dist: string, firstAnswerChunks: readonly string[] = []): TryPageWeight {
  const files = tryPageFiles(dist, firstAnswerChunks);
  const sum = (list: string[]) => list.reduce((n, f) => n + gzipBytes(join(dist, f)), 0);
  return {
    try_js_first_answer_gzip_bytes: sum(files.firstAnswer),
    try_js_gzip_bytes: sum(files.all),
    catalogue_json_gzip_bytes: gzipBytes(join(dist, "data/catalogue.json")),
  };
}

/** The whole built site on disk (issue 18): every file's bytes, and the largest HTML page. */
export function siteWeight(dist: string): { total_bytes: number; largest_page_bytes: number; largest_page: string } {
  let total = 0;
  let largest = { bytes: 0, path: "" };
  for (const entry of readdirSync(dist, { withFileTypes: true, recursive: true })) {
    if (!entry.isFile()) continue;
    const path = join(entry.parentPath, entry.name);
    const bytes = statSync(path).size;
    total += bytes;
    if (entry.name.endsWith(".html") && bytes > largest.bytes) largest = { bytes, path: relative(dist, path) };
  }
  return { total_bytes: total, largest_page_bytes: largest.bytes, largest_page: largest.path };
}
