// A tiny static file server for the built site, bound to 127.0.0.1 on a free
// port, so the browser tests load pages exactly as a team's plain web server
// would (directory index, trailing-slash redirect, 404 page) and nothing else.
import { createReadStream, existsSync, statSync } from "node:fs";
import { createServer, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import { extname, join, normalize, sep } from "node:path";

export type StaticServer = {
  /** "http://127.0.0.1:PORT" */
  origin: string;
  /** origin + base path, ending in "/": where the site's home page is. */
  home: string;
  close(): Promise<void>;
};

const TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".mjs": "text/javascript; charset=utf-8",
  ".json": "application/json; charset=utf-8",
  ".svg": "image/svg+xml",
  ".png": "image/png",
  ".ico": "image/x-icon",
  ".txt": "text/plain; charset=utf-8",
  ".csv": "text/csv; charset=utf-8",
  ".webmanifest": "application/manifest+json",
  ".woff2": "font/woff2",
};

/** Maps a URL path under `base` to a file inside `root`, or undefined when it would leave the folder. */
export function resolveRequestPath(root: string, base: string, urlPath: string): string | undefined {
  let path: string;
  try {
    path = decodeURIComponent(urlPath);
  } catch {
    return undefined;
  }
  if (!path.startsWith(base) || path.includes("\0")) return undefined;
  const file = normalize(join(root, path.slice(base.length)));
  return file === root || file.startsWith(root.endsWith(sep) ? root : root + sep) ? file : undefined;
}

function send(res: ServerResponse, status: number, file: string | undefined, headOnly: boolean): void {
  const type = file ? (TYPES[extname(file)] ?? "application/octet-stream") : "text/plain; charset=utf-8";
  res.writeHead(status, { "content-type": type, "cache-control": "no-store", "x-content-type-options": "nosniff" });
  if (headOnly || !file) {
    res.end(file ? undefined : `${status}\n`);
    return;
  }
  createReadStream(file).pipe(res);
}

export async function serveFolder(root: string, base = "/"): Promise<StaticServer> {
  const server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://127.0.0.1");
    if (req.method !== "GET" && req.method !== "HEAD") {
      res.writeHead(405, { allow: "GET, HEAD" }).end();
      return;
    }
    const headOnly = req.method === "HEAD";
    const file = resolveRequestPath(normalize(root), base, url.pathname);
    const notFound = join(root, "404.html");
    if (!file || !existsSync(file)) {
      send(res, 404, existsSync(notFound) ? notFound : undefined, headOnly);
      return;
    }
    if (statSync(file).isDirectory()) {
      if (!url.pathname.endsWith("/")) {
        res.writeHead(301, { location: `${url.pathname}/${url.search}` }).end();
        return;
      }
      const index = join(file, "index.html");
      send(res, existsSync(index) ? 200 : 404, existsSync(index) ? index : undefined, headOnly);
      return;
    }
    send(res, 200, file, headOnly);
  });
  await new Promise<void>((ok, fail) => {
    server.once("error", fail);
    server.listen(0, "127.0.0.1", ok);
  });
  const { port } = server.address() as AddressInfo;
  const origin = `http://127.0.0.1:${port}`;
  return {
    origin,
    home: `${origin}${base}`,
    close: () =>
      new Promise<void>((ok) => {
        server.close(() => ok());
        // Chromium keeps connections alive; without this close() waits for them to time out.
        server.closeAllConnections();
      }),
  };
}
