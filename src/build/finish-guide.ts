// After Astro has written the site: the classic scripts, every page's links
// made relative (so the guide opens from a folder), and each design page's
// one-file report. A page left with a site-absolute link stops the build.
import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { reportPathOf, standaloneReport } from "../view/design-report.ts";
import { relativizePage } from "../view/relative-urls.ts";
import { writeClassicScripts } from "./classic-scripts.ts";

/** Served for any missing path at any depth, so its links stay site-absolute. */
const NOT_FOUND_PAGE = "404.html";

function htmlFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...htmlFiles(path));
    else if (name.endsWith(".html")) out.push(path);
  }
  return out;
}

export class GuideBuildError extends Error {}

export async function finishGuide(
  root: string,
  dir: string,
  base: string,
): Promise<{ pages: number; reports: number }> {
  await writeClassicScripts(root, dir);
  const sitePath = (path: string) => relative(dir, path).split(sep).join("/");
  // Thousands of pages name the same few files (styles, scripts): each is looked up once.
  const folders = new Map<string, boolean>();
  const isFolder = (p: string) => {
    let known = folders.get(p);
    if (known === undefined) {
      const path = join(dir, ...p.split("/"));
      known = existsSync(path) && statSync(path).isDirectory();
      folders.set(p, known);
    }
    return known;
  };
  const pages = htmlFiles(dir).filter((f) => sitePath(f) !== NOT_FOUND_PAGE);
  const left: string[] = [];
  for (const file of pages) {
    const page = sitePath(file);
    const { html, left: absolute } = relativizePage(readFileSync(file, "utf8"), page, base, isFolder);
    left.push(...absolute.map((u) => `${page}: ${u}`));
    writeFileSync(file, html);
  }
  if (left.length > 0)
    throw new GuideBuildError(
      `site-absolute links left after making them relative (expected none, so the guide opens from a folder):\n${left.slice(0, 20).join("\n")}`,
    );

  const read = (p: string) => {
    const path = join(dir, ...p.split("/"));
    return existsSync(path) ? readFileSync(path, "utf8") : undefined;
  };
  const sha256 = (text: string) => createHash("sha256").update(text, "utf8").digest("base64");
  const designPages = pages.map(sitePath).filter((p) => /^designs\/[^/]+\/index\.html$/.test(p));
  for (const page of designPages) {
    const html = read(page) ?? "";
    writeFileSync(join(dir, ...reportPathOf(page).split("/")), standaloneReport(html, { page, read, sha256 }));
  }
  return { pages: pages.length, reports: designPages.length };
}
