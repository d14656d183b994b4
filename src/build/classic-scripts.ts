// The page scripts that must also run from a folder opened in a browser.
// Chromium refuses module scripts from file:// (they need CORS, which file:
// URLs do not have), but runs classic ones; so these entries are bundled by
// esbuild as classic scripts (an IIFE each) instead of Vite's modules.
import { build } from "esbuild";

/** Output path in the site → entry module, relative to the project root. */
export const CLASSIC_SCRIPTS: Readonly<Record<string, string>> = {
  "scripts/catalogue.js": "src/client/catalogue-table.ts",
  "scripts/needs-server.js": "src/client/try/needs-server.ts",
};

async function bundle(root: string, entry: string, outfile?: string): Promise<string> {
  const result = await build({
    absWorkingDir: root,
    entryPoints: [entry],
    bundle: true,
    format: "iife",
    platform: "browser",
    target: "es2022",
    minify: true,
    legalComments: "none",
    logLevel: "silent",
    ...(outfile ? { outfile, write: true } : { write: false }),
  });
  return outfile ? "" : (result.outputFiles?.[0]?.text ?? "");
}

/** Writes every classic script into the built site at `dir`. */
export async function writeClassicScripts(root: string, dir: string): Promise<void> {
  await Promise.all(Object.entries(CLASSIC_SCRIPTS).map(([out, entry]) => bundle(root, entry, `${dir}/${out}`)));
}

/** One classic script's text for the dev server, or undefined when the path names none. */
export async function classicScriptText(root: string, sitePath: string): Promise<string | undefined> {
  const entry = CLASSIC_SCRIPTS[sitePath];
  return entry === undefined ? undefined : bundle(root, entry);
}
