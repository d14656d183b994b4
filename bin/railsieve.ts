#!/usr/bin/env node
// `npx railsieve …`: runs on the project's pinned Node 24, which strips the
// TypeScript types itself (erasable syntax only, imports with .ts extensions).
import { main } from "../src/cli/main.ts";

// `railsieve check … | head` closes the pipe early; that is the reader's
// choice, not an error worth a stack trace.
for (const stream of [process.stdout, process.stderr]) {
  stream.on("error", (e: NodeJS.ErrnoException) => {
    if (e.code === "EPIPE") process.exit(process.exitCode ?? 0);
    throw e;
  });
}

process.exitCode = await main(process.argv.slice(2), {
  out: (text) => process.stdout.write(text),
  err: (text) => process.stderr.write(text),
  color: Boolean(process.stdout.isTTY) && !process.env.NO_COLOR,
});
