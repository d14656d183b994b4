// `railsieve serve [DIR]`: the built guide over HTTP on this machine only, for
// the try page (browsers run its module script and fetch its data only from a
// server) and for a quick look. Stops on Ctrl+C.
import { existsSync, statSync } from "node:fs";
import { join, resolve } from "node:path";
import { InputError } from "../core/problems.ts";
import { displayPath } from "../node/load-data.ts";
import { startServer, type RunningServer } from "../node/serve.ts";
import { flag, UsageError, type ParsedArgs } from "./args.ts";
import type { Io } from "./io.ts";

export const DEFAULT_PORT = 4800;

function port(args: ParsedArgs): number {
  const text = flag(args, "port");
  if (text === undefined) return DEFAULT_PORT;
  const n = Number(text);
  if (!/^\d+$/.test(text) || n > 65535)
    throw new UsageError(`--port must be a whole number from 0 to 65535 (got '${text}')`);
  return n;
}

export function guideFolder(args: ParsedArgs): string {
  const [dir = "dist", ...extra] = args.positional;
  if (extra.length > 0) throw new UsageError(`serve takes one folder (got '${extra[0]}' too)`);
  const root = resolve(dir);
  if (!existsSync(root) || !statSync(root).isDirectory())
    throw new InputError([
      { file: displayPath(root), message: "folder not found (expected a built guide: run npm run build)" },
    ]);
  if (!existsSync(join(root, "index.html")))
    throw new InputError([
      { file: displayPath(root), message: "has no index.html (expected a built guide: run npm run build)" },
    ]);
  return root;
}

/** Starts the server; resolves when it stops (on `stop`, or SIGINT/SIGTERM by default). */
export async function runServe(
  args: ParsedArgs,
  io: Io,
  stop: (server: RunningServer) => Promise<void> = untilSignal,
): Promise<number> {
  const wanted = port(args);
  const root = guideFolder(args);
  let server: RunningServer;
  try {
    server = await startServer(root, wanted);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === "EADDRINUSE")
      throw new UsageError(`port ${wanted} is in use on 127.0.0.1 (choose another with --port N)`);
    throw e;
  }
  io.out(`railsieve: serving ${displayPath(root)} at ${server.url} (this machine only; Ctrl+C stops)\n`);
  await stop(server);
  return 0;
}

function untilSignal(server: RunningServer): Promise<void> {
  return new Promise((done) => {
    const end = () => {
      process.off("SIGINT", end);
      process.off("SIGTERM", end);
      void server.close().then(done);
    };
    process.on("SIGINT", end);
    process.on("SIGTERM", end);
  });
}
