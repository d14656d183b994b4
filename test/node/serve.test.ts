// `railsieve serve`: the guide over HTTP on 127.0.0.1 only, on sirv. Status
// codes per RFC 9110 (§15.4.2 301 Moved Permanently, §15.5.5 404 Not Found).
import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { request } from "node:http";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { runServe } from "../../src/cli/serve.ts";
import { parseArgs } from "../../src/cli/args.ts";
import { startServer } from "../../src/node/serve.ts";
import { run } from "../cli/run.ts";

function guide(): string {
  const dir = mkdtempSync(join(tmpdir(), "railsieve-serve-"));
  mkdirSync(join(dir, "designs/a"), { recursive: true });
  writeFileSync(join(dir, "index.html"), "<!doctype html><title>home</title>");
  writeFileSync(join(dir, "designs/a/index.html"), "<!doctype html><title>a</title>");
  writeFileSync(join(dir, "404.html"), "<!doctype html><title>not here</title>");
  writeFileSync(join(dir, "secret.txt"), "inside");
  return dir;
}

/** A raw GET, so the path reaches the server exactly as written (no client-side normalizing). */
function get(port: number, path: string): Promise<{ status: number; location?: string; body: string }> {
  return new Promise((ok, fail) => {
    const req = request({ host: "127.0.0.1", port, path, method: "GET" }, (res) => {
      let body = "";
      res.on("data", (c: Buffer) => (body += c.toString()));
      res.on("end", () => ok({ status: res.statusCode ?? 0, location: res.headers.location, body }));
    });
    req.on("error", fail);
    req.end();
  });
}

describe("startServer", () => {
  it("serves pages and folders, redirects a folder to its slash, and answers 404 with the guide's page", async () => {
    const server = await startServer(guide(), 0);
    try {
      expect(server.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/$/);
      expect((await get(server.port, "/")).body).toContain("<title>home</title>");
      expect((await get(server.port, "/designs/a/")).body).toContain("<title>a</title>");
      expect(await get(server.port, "/designs/a")).toMatchObject({ status: 301, location: "/designs/a/" });
      const missing = await get(server.port, "/designs/b/");
      expect(missing.status).toBe(404);
      expect(missing.body).toContain("not here");
    } finally {
      await server.close();
    }
  });

  it.each(["/../../../etc/passwd", "/%2e%2e/%2e%2e/etc/passwd", "/designs/..%2f..%2f..%2fetc/passwd"])(
    "never leaves the folder: %s",
    async (path) => {
      const server = await startServer(guide(), 0);
      try {
        const r = await get(server.port, path);
        expect(r.status).toBe(404);
        expect(r.body).not.toContain("root:");
      } finally {
        await server.close();
      }
    },
  );
});

describe("railsieve serve", () => {
  it("prints the local address and stops when asked", async () => {
    let out = "";
    const code = await runServe(
      parseArgs(["serve", guide(), "--port", "0"]),
      { out: (t) => (out += t), err: () => {}, color: false },
      async (s) => {
        expect((await get(s.port, "/")).status).toBe(200);
        await s.close();
      },
    );
    expect(code).toBe(0);
    expect(out).toMatch(
      /^railsieve: serving .+ at http:\/\/127\.0\.0\.1:\d+\/ \(this machine only; Ctrl\+C stops\)\n$/,
    );
  });

  it.each([
    [["serve", "no-such-folder"], /no-such-folder: folder not found \(expected a built guide: run npm run build\)/],
    [["serve", "data"], /data: has no index\.html \(expected a built guide/],
    [["serve", "dist", "--port", "http"], /--port must be a whole number from 0 to 65535 \(got 'http'\)/],
  ])("refuses %j with a clear message (exit 2)", async (argv, message) => {
    const { code, err } = await run(...argv);
    expect(code).toBe(2);
    expect(err).toMatch(message);
  });
});
