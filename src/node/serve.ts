// Serves a built guide from this machine only (127.0.0.1), on sirv, a
// maintained static-file handler: directory index, content types, ETags,
// no path outside the folder. Two things are ours: a folder asked for without
// its trailing slash is redirected to it (the pages' links are relative to
// it), and a path that matches nothing gets the guide's own 404 page.
import { existsSync, readFileSync, statSync } from "node:fs";
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { join, normalize, sep } from "node:path";
import sirv from "sirv";

export const LOOPBACK = "127.0.0.1";

export type RunningServer = { url: string; port: number; close: () => Promise<void> };

/** The folder inside `root` a URL path names, when it is one and lacks its slash. */
function folderWithoutSlash(root: string, pathname: string): boolean {
  if (pathname.endsWith("/")) return false;
  let path: string;
  try {
    path = normalize(join(root, decodeURIComponent(pathname)));
  } catch {
    return false;
  }
  if (path !== root && !path.startsWith(root + sep)) return false;
  try {
    return statSync(path).isDirectory();
  } catch {
    return false;
  }
}

export function startServer(root: string, port: number): Promise<RunningServer> {
  const notFound = join(root, "404.html");
  const files = sirv(root, {
    dev: false,
    etag: true,
    dotfiles: false,
    setHeaders: (res) => res.setHeader("X-Content-Type-Options", "nosniff"),
    onNoMatch: (_req, res) => {
      res.statusCode = 404;
      if (existsSync(notFound)) {
        res.setHeader("Content-Type", "text/html; charset=utf-8");
        res.end(readFileSync(notFound));
      } else res.end("not found\n");
    },
  });
  const server: Server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", `http://${LOOPBACK}`);
    if (folderWithoutSlash(root, url.pathname)) {
      res.writeHead(301, { Location: `${url.pathname}/${url.search}` }).end();
      return;
    }
    files(req, res);
  });
  return new Promise((ok, fail) => {
    server.once("error", fail);
    server.listen(port, LOOPBACK, () => {
      const actual = (server.address() as AddressInfo).port;
      ok({
        url: `http://${LOOPBACK}:${actual}/`,
        port: actual,
        close: () =>
          new Promise<void>((done) => {
            server.close(() => done());
            server.closeAllConnections();
          }),
      });
    });
  });
}
