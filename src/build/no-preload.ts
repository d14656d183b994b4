// A Vite plugin for the browser's build: no module preloading. Vite wraps
// every dynamic import (the try page's topologies, simulation and download
// code) in a helper that first adds <link rel=modulepreload> for the chunk's
// own imports, built from the site's root: wrong for a guide opened under
// another path, and 1 KB gzipped of the try page's first download. Without it
// each chunk's imports are fetched by the chunk itself, a moment later. Astro
// sets modulePreload itself, hence the per-environment setting; the helper
// that stays is replaced by one that only calls the import.
import type { Plugin } from "vite";

const HELPER = "\0vite/preload-helper.js";

// With modulePreload off Vite hands the helper only CSS files to preload; the
// pages' styles are plain stylesheets, so a list here would be a change to
// look at, not to ignore.
const PLAIN_HELPER = `export const __vitePreload = (load, deps) => {
  if (deps && deps.length > 0) throw new Error("railsieve: a script chunk asked to preload " + deps.join(", "));
  return load();
};`;

export function noPreloadPlugin(): Plugin {
  return {
    name: "railsieve-no-preload",
    enforce: "pre",
    configEnvironment: (name) => (name === "client" ? { build: { modulePreload: false } } : undefined),
    load(id) {
      return id === HELPER && this.environment.name === "client" ? PLAIN_HELPER : undefined;
    },
  };
}
