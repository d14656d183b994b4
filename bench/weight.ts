// What the try page costs to download: its JavaScript (the module scripts the
// page loads and every chunk they import) and the catalogue JSON, gzipped.
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { gzipSync } from "node:zlib";

function gzipBytes(path: string): number {
  return gzipSync(readFileSync(path), { level: 9 }).length;
}

/** A site-absolute or relative URL in `from` (a file under `dist`) to a file path. */
function fileOf(dist: string, from: string, url: string): string {
  return url.startsWith("/") ? join(dist, url) : resolve(dirname(from), url);
}

export function tryPageWeight(dist: string): { try_js_gzip_bytes: number; catalogue_json_gzip_bytes: number } {
  const page = join(dist, "try/index.html");
  const html = readFileSync(page, "utf8");
  const pending = [...html.matchAll(/<script[^>]*\bsrc="([^"]+)"/g)].map((m) => fileOf(dist, page, m[1] ?? ""));
  if (pending.length === 0) throw new Error(`bench: ${page} loads no script`);
  const seen = new Set<string>();
  let js = 0;
  while (pending.length > 0) {
    const file = pending.pop() as string;
    if (seen.has(file) || !existsSync(file)) continue;
    seen.add(file);
    js += gzipBytes(file);
    const code = readFileSync(file, "utf8");
    // Static and dynamic imports of other chunks: both are fetched when the page runs.
    for (const m of code.matchAll(/(?:\bfrom|\bimport\s*\(?)\s*["'`](\.{1,2}\/[^"'`]+|\/[^"'`]+)["'`]/g)) {
      pending.push(fileOf(dist, file, m[1] ?? ""));
    }
  }
  return { try_js_gzip_bytes: js, catalogue_json_gzip_bytes: gzipBytes(join(dist, "data/catalogue.json")) };
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
