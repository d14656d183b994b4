// Astro integration: finishes the built guide (src/build/finish-guide.ts) and
// serves the classic scripts on the dev server, where Astro does not build them.
import { fileURLToPath } from "node:url";
import type { AstroIntegration } from "astro";
import { classicScriptText } from "./classic-scripts.ts";
import { finishGuide } from "./finish-guide.ts";

export function offlineGuide(): AstroIntegration {
  let base = "/";
  let root = process.cwd();
  return {
    name: "railsieve-offline-guide",
    hooks: {
      "astro:config:done": ({ config }) => {
        base = config.base;
        root = fileURLToPath(config.root);
      },
      "astro:server:setup": ({ server }) => {
        server.middlewares.use((req, res, next) => {
          const path = new URL(req.url ?? "/", "http://localhost").pathname;
          const b = base.endsWith("/") ? base : `${base}/`;
          if (!path.startsWith(b)) return next();
          classicScriptText(root, path.slice(b.length)).then(
            (text) => {
              if (text === undefined) return next();
              res.setHeader("Content-Type", "text/javascript; charset=utf-8");
              res.end(text);
            },
            (e: unknown) => next(e),
          );
        });
      },
      "astro:build:done": async ({ dir, logger }) => {
        const { pages, reports } = await finishGuide(root, fileURLToPath(dir), base);
        logger.info(`${pages} pages made relative; ${reports} one-file design reports`);
      },
    },
  };
}
