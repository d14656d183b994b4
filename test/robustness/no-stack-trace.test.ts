// Whatever the user types, the CLI answers in sentences: no stack trace, even
// for a bug (issue 8 acceptance). The corpus runs are in corpus.test.ts; these
// are the command-line mistakes around them.
import { afterEach, describe, expect, it, vi } from "vitest";
import { runCli, STACK_TRACE } from "./cli.ts";

const DESIGN = ".fixtures/bad/bom-names-no-part/designs/bridge-10v-5v-adc.json";
const DATA = ".fixtures/bad/bom-names-no-part";

const MISTAKES: [string, string[], number][] = [
  ["no command", [], 2],
  ["unknown command", ["frobnicate"], 2],
  ["unknown option", ["validate", "--colour"], 2],
  ["option without its value", ["validate", "--data"], 2],
  ["validate given a file name", ["validate", DESIGN], 2],
  ["data folder that does not exist", ["validate", "--data", "test/fixtures/bad/no-such-folder"], 2],
  ["data folder that is a file", ["validate", "--data", DESIGN], 2],
  ["check without files", ["check", "--data", DATA], 2],
  ["check given a folder", ["check", `${DATA}/designs`, "--data", DATA], 2],
  ["check given a CSV file", ["check", `${DATA}/op-amps.csv`, "--data", DATA], 2],
  ["check given a missing file", ["check", `${DATA}/designs/nope.json`, "--data", DATA], 2],
  ["check with an unknown format", ["check", DESIGN, "--data", DATA, "--format", "xml"], 2],
  ["explain an unknown part", ["explain", "no-such-part", DESIGN, "--data", DATA], 2],
  ["explain with an unknown role", ["explain", "oa-jfet-prec", DESIGN, "--data", DATA, "--role", "nope"], 2],
  [
    "explain a part in a role it does not serve",
    ["explain", "oa-jfet-prec", DESIGN, "--data", DATA, "--role", "clamp-diode"],
    2,
  ],
  ["explain without a design", ["explain", "oa-jfet-prec", "--data", DATA], 2],
];

describe("command-line mistakes", () => {
  it.each(MISTAKES)("%s: exit %i, no stack trace", async (_name, argv, code) => {
    const run = await runCli(argv);
    expect(run.code).toBe(code);
    expect(run.err.length).toBeGreaterThan(0);
    for (const pattern of STACK_TRACE) expect(run.err).not.toMatch(pattern);
  });
});

describe("the stack-trace patterns", () => {
  it("recognise a real stack trace (so the checks above can fail)", () => {
    const stack = new Error("boom").stack ?? "";
    expect(STACK_TRACE.some((p) => p.test(stack))).toBe(true);
    expect(STACK_TRACE.filter((p) => p.test(stack)).length).toBeGreaterThanOrEqual(2);
  });
});

describe("a bug inside a command", () => {
  afterEach(() => {
    vi.doUnmock("../../src/cli/validate.ts");
    vi.resetModules();
    vi.unstubAllEnvs();
  });

  it("is reported as an internal error with exit 70 and no trace", async () => {
    vi.stubEnv("RAILSIEVE_DEBUG", "");
    vi.resetModules();
    vi.doMock("../../src/cli/validate.ts", () => ({
      runValidate: () => {
        throw new TypeError("Cannot read properties of undefined (reading 'x')");
      },
    }));
    const { main } = await import("../../src/cli/main.ts");
    let err = "";
    const code = await main(["validate", "--data", DATA], { out: () => {}, err: (t) => (err += t), color: false });
    expect(code).toBe(70);
    expect(err).toMatchInlineSnapshot(`
      "railsieve: internal error: Cannot read properties of undefined (reading 'x')
      Please report this with the files you ran it on. (set RAILSIEVE_DEBUG=1 for details)
      "
    `);
    for (const pattern of STACK_TRACE) expect(err).not.toMatch(pattern);
  });
});
