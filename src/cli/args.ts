// Command-line parsing: positional words and --flags, with clear usage errors.
export type ParsedArgs = {
  command?: string;
  positional: string[];
  flags: Map<string, string | true>;
  /** Every value of a flag that may be given more than once (--part), in order. */
  repeated?: Map<string, string[]>;
};

export class UsageError extends Error {}

const VALUE_FLAGS = new Set(["data", "format", "role", "topology", "part", "guide-url", "port"]);
const REPEATABLE_FLAGS = new Set(["part"]);
const BOOLEAN_FLAGS = new Set(["help", "no-color", "strict"]);

export function parseArgs(argv: readonly string[]): ParsedArgs {
  const positional: string[] = [];
  const flags = new Map<string, string | true>();
  const repeated = new Map<string, string[]>();
  for (let i = 0; i < argv.length; i++) {
    const word = argv[i] ?? "";
    if (word === "-h") {
      flags.set("help", true);
      continue;
    }
    if (!word.startsWith("--")) {
      positional.push(word);
      continue;
    }
    const [name = "", inline] = word.slice(2).split(/=(.*)/s, 2);
    if (BOOLEAN_FLAGS.has(name)) flags.set(name, true);
    else if (VALUE_FLAGS.has(name)) {
      const value = inline ?? argv[++i];
      if (value === undefined || value === "") throw new UsageError(`option --${name} needs a value`);
      flags.set(name, value);
      if (REPEATABLE_FLAGS.has(name)) repeated.set(name, [...(repeated.get(name) ?? []), value]);
    } else throw new UsageError(`unknown option --${name}`);
  }
  const [command, ...rest] = positional;
  return { ...(command !== undefined ? { command } : {}), positional: rest, flags, repeated };
}

export function flagValues(args: ParsedArgs, name: string): string[] {
  return args.repeated?.get(name) ?? [];
}

export function flag(args: ParsedArgs, name: string): string | undefined {
  const v = args.flags.get(name);
  return typeof v === "string" ? v : undefined;
}

import { KINDS } from "../core/kinds.ts";
import { TOPOLOGY_IDS } from "../engine.ts";

const FILES = [...KINDS.map((k) => k.file), "designs/"].join(", ");
const TOPOLOGY_CHOICES = `${TOPOLOGY_IDS.slice(0, -1).join(", ")}, or ${TOPOLOGY_IDS.at(-1) ?? "all"} (side by side)`;

export const USAGE = `railsieve — shortlist op amps, comparators and diodes for a bipolar-to-ADC front end

Usage:
  railsieve validate [--data DIR]
  railsieve check DESIGN.json… [--data DIR] [--format text|json|csv|markdown|junit] [--topology NAME]
  railsieve diff BEFORE [AFTER] [--data DIR] [--format text|json|markdown]
  railsieve explain PART-ID DESIGN.json [--role ROLE] [--data DIR]
  railsieve simulate DESIGN.json [--part ROLE=ID]… [--topology NAME] [--format text|json|csv] [--data DIR]
  railsieve serve [DIR] [--port N]           (DIR: the built guide, default dist)

  --data DIR       catalogue folder (${FILES}); default ./data
  --format F       output of check: text (default), json, csv, markdown or junit;
                   of diff: text, json or markdown; of simulate: text, json or csv
  --guide-url URL  markdown links into the published guide at URL
  --strict         check, junit and diff: a marginal design counts as failing (check exits 1)
  --topology NAME  evaluate as ${TOPOLOGY_CHOICES}
  --role ROLE      explain one role only
  --part ROLE=ID   simulate with this part in this role (as if the design's bom named it)
  --port N         serve: the port on 127.0.0.1 (default 4800)
  BEFORE, AFTER    diff: data folders, or git:REV for the --data folder at a git
                   revision (AFTER defaults to the --data folder as it is now)

Exit status: 0 when everything asked holds, 1 when a BOM part fails or a role has no fit
(diff: when a design goes from holding to failing or a BOM part stops fitting;
simulate: when a simulation could not run or went beyond the static worst case),
2 on invalid input.
`;
