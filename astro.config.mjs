// @ts-check
import { defineConfig } from "astro/config";
import { offlineGuide } from "./src/build/offline-guide.ts";

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
  // No module preloading: its helper (1 KB gzipped on the try page) would preload the
  // chunks a topology imports from the site's root, which is wrong for a guide opened
  // under another path; each chunk's own imports fetch the same files a moment later.
  // (Astro sets its own modulePreload, so a plugin turns it off for the browser's build.)
  vite: {
    build: { assetsInlineLimit: 0 },
    plugins: [
      {
        name: "railsieve-no-module-preload",
        configEnvironment: (name) => (name === "client" ? { build: { modulePreload: false } } : undefined),
      },
    ],
  },
  telemetry: false,
  // Relative links (the guide opens from a folder), classic scripts, one-file design reports.
  integrations: [offlineGuide()],
});
