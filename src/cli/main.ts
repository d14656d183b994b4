// The railsieve command line. Pure rendering lives in render-*.ts; this file
// only dispatches, and turns every input error into messages and exit 2.
import { InputError } from "../core/problems.ts";
import { flag, parseArgs, UsageError, USAGE } from "./args.ts";
import { runCheck } from "./check.ts";
import { runDiff } from "./diff.ts";
import { runExplain } from "./explain.ts";
import { safeIo, type Io } from "./io.ts";
import { runServe } from "./serve.ts";
import { dataDir, renderProblems } from "./load.ts";
import { runSimulate } from "./simulate.ts";
import { runValidate } from "./validate.ts";

export async function main(argv: readonly string[], rawIo: Io): Promise<number> {
  let io = safeIo(rawIo);
  try {
    const args = parseArgs(argv);
    if (args.flags.has("no-color")) io = safeIo({ ...rawIo, color: false });
    if (args.flags.has("help") || args.command === "help") {
      io.out(USAGE);
      return 0;
    }
    const data = dataDir(flag(args, "data"));
    switch (args.command) {
      case "validate":
        if (args.positional.length > 0)
          throw new UsageError(`validate takes no file names (got '${args.positional[0]}'); use --data DIR`);
        return runValidate(data, io);
      case "check":
        return runCheck(args, data, io);
      case "diff":
        return runDiff(args, data, io);
      case "explain":
        return runExplain(args, data, io);
      case "simulate":
        return runSimulate(args, data, io);
      case "serve":
        return await runServe(args, io);
      case undefined:
        io.err(USAGE);
        return 2;
      default:
        throw new UsageError(
          `unknown command '${args.command}' (expected validate, check, diff, explain, simulate or serve)`,
        );
    }
  } catch (e) {
    if (e instanceof UsageError) {
      io.err(`railsieve: ${e.message}\n\n${USAGE}`);
      return 2;
    }
    if (e instanceof InputError) {
      io.err(renderProblems(e.problems));
      return 2;
    }
    // A bug, not bad input: say so plainly, and keep the trace for a bug report.
    const message = e instanceof Error ? e.message : String(e);
    io.err(
      `railsieve: internal error: ${message}\nPlease report this with the files you ran it on.${process.env.RAILSIEVE_DEBUG && e instanceof Error ? `\n${e.stack}` : " (set RAILSIEVE_DEBUG=1 for details)"}\n`,
    );
    return 70;
  }
}
