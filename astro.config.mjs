// @ts-check
import { defineConfig } from "astro/config";
import { offlineGuide } from "./src/build/offline-guide.ts";
import { noPreloadPlugin } from "./src/build/no-preload.ts";
import { stripDocsPlugin } from "./src/build/strip-docs.ts";

// RAILSIEVE_BASE serves the guide from a subfolder of a team server
// (e.g. RAILSIEVE_BASE=/tools/railsieve/); RAILSIEVE_OUT lets the build script
// build into a scratch folder and swap it in only when the build succeeds.
export default defineConfig({
  base: process.env.RAILSIEVE_BASE ?? "/",
  outDir: process.env.RAILSIEVE_OUT ?? "./dist",
  trailingSlash: "ignore",
  build: { format: "directory", inlineStylesheets: "never" },
  devToolbar: { enabled: false },
  // Small scripts would otherwise be inlined, and the site's CSP allows no inline script.
  vite: {
    build: { assetsInlineLimit: 0 },
    // The browser's scripts: no module preloading, and no rules-page text in the try page's download.
    plugins: [noPreloadPlugin(), stripDocsPlugin()],
  },
  telemetry: false,
  // Relative links (the guide opens from a folder), classic scripts, one-file design reports.
  integrations: [offlineGuide()],
});
