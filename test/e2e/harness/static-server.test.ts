// The tiny static server the browser tests serve the built site from: it must
// answer like a plain web server (index files, trailing-slash redirect, 404
// page) and never hand out a file outside the site folder.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { resolveRequestPath, serveFolder, type StaticServer } from "./static-server.ts";

describe("resolveRequestPath", () => {
  it.each([
    ["/sub/parts/x/", "/site/parts/x/"],
    ["/sub/a%20b.css", "/site/a b.css"],
    ["/sub/../etc/passwd", undefined],
    ["/sub/..%2f..%2fetc/passwd", undefined],
    ["/sub/%2e%2e/secret", undefined],
    ["/other/file", undefined],
    ["/sub/%E0%A4%A", undefined],
    ["/sub/a%00b", undefined],
  ])("%s → %s", (url, file) => {
    expect(resolveRequestPath("/site", "/sub/", url)).toBe(file);
  });
});

describe("serveFolder", () => {
  let dir: string;
  let server: StaticServer;

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), "railsieve-static-"));
    mkdirSync(join(dir, "parts", "x"), { recursive: true });
    writeFileSync(join(dir, "index.html"), "<h1>home</h1>");
    writeFileSync(join(dir, "parts", "x", "index.html"), "<h1>x</h1>");
    writeFileSync(join(dir, "404.html"), "<h1>not here</h1>");
    writeFileSync(join(dir, "site.css"), "body{}");
    server = await serveFolder(dir, "/base/");
  });
  afterAll(async () => {
    await server?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  const get = async (path: string) => {
    const r = await fetch(`${server.origin}${path}`, { redirect: "manual" });
    return {
      status: r.status,
      type: r.headers.get("content-type"),
      location: r.headers.get("location"),
      body: await r.text(),
    };
  };

  it.each([
    ["/base/", { status: 200, type: "text/html; charset=utf-8", body: "<h1>home</h1>" }],
    ["/base/parts/x/", { status: 200, body: "<h1>x</h1>" }],
    ["/base/parts/x?q=1", { status: 301, location: "/base/parts/x/?q=1" }],
    ["/base/site.css", { status: 200, type: "text/css; charset=utf-8" }],
    ["/base/missing/", { status: 404, body: "<h1>not here</h1>" }],
    ["/", { status: 404 }],
    // The client resolves the dots first (WHATWG URL): this asks for /index.html, outside the base.
    ["/base/../index.html", { status: 404 }],
  ])("GET %s", async (path, expected) => {
    expect(await get(path)).toMatchObject(expected);
  });

  it("binds to 127.0.0.1 only and serves the home at the base path", () => {
    expect(server.origin).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
    expect(server.home).toBe(`${server.origin}/base/`);
  });
});
