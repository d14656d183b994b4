// Text that is not text (issue 18): control characters and bidirectional
// controls are refused in every catalogue text cell and design text field, and
// the CLI prints no terminal escape it did not write itself.
// Code points from The Unicode Standard: U+001B ESC (C0 controls, ISO/IEC 6429),
// U+202E RIGHT-TO-LEFT OVERRIDE and U+2066–U+2069 isolates (Unicode Bidirectional
// Algorithm, UAX #9, explicit formatting characters).
import { cpSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { paint, terminalSafe } from "../../src/cli/io.ts";
import { parseDesignText } from "../../src/engine.ts";
import { formatProblem } from "../../src/core/problems.ts";
import { codePointName, firstUnsafe, visibleText } from "../../src/core/text-safety.ts";
import { rowProblems } from "../helpers/catalogue.ts";
import { designInput } from "../helpers/designs.ts";
import { run } from "../cli/run.ts";

describe("firstUnsafe", () => {
  it.each([
    ["plain text, µ and −", "CMOS rail-to-rail, 1 µA, −40 °C", undefined],
    ["ESC", "name\u001b[2J", { code: 0x1b, position: 5 }],
    ["right-to-left override", "abc\u202Edef", { code: 0x202e, position: 4 }],
    ["first strong isolate", "\u2068x", { code: 0x2068, position: 1 }],
    ["DEL", "a\u007f", { code: 0x7f, position: 2 }],
    ["C1 control (CSI)", "a\u009b", { code: 0x9b, position: 2 }],
    ["a line break in notes is text", "line one\nline two", undefined],
  ])("%s", (_label, text, expected) => {
    expect(firstUnsafe(text)).toEqual(expected);
  });

  it("names what it found", () => {
    expect(codePointName(0x202e)).toBe("U+202E right-to-left override");
    expect(codePointName(0x1b)).toBe("U+001B ESC");
    expect(codePointName(0x07)).toBe("U+0007 control character");
  });

  it("shows every such character as an escape", () => {
    expect(visibleText("a\u001b[31mb\u202Ec\n")).toBe("a\\u001b[31mb\\u202ec\\n");
  });
});

describe("catalogue cells", () => {
  it.each([
    ["name", "Op amp \u202Edual"],
    ["notes", "fine\u001b[2J"],
    ["tags", "cmos;\u2066rail"],
  ])("column '%s' refuses a control or bidirectional character, with file, line and column", (column, value) => {
    expect(rowProblems("op-amp", { [column]: value })).toEqual([
      expect.stringMatching(new RegExp(`^op-amps\\.csv:2: column '${column}': text holds U\\+`)),
    ]);
  });

  it("words the problem in the house pattern", () => {
    expect(rowProblems("op-amp", { name: "Op amp \u202Edual" })).toMatchInlineSnapshot(`
      [
        "op-amps.csv:2: column 'name': text holds U+202E right-to-left override at character 8 (expected printable text without control characters or bidirectional overrides)",
      ]
    `);
  });
});

describe("design text", () => {
  it("refuses a title with a right-to-left override", () => {
    const text = JSON.stringify(designInput({ title: "Bench \u202Eprobe" }));
    const parsed = parseDesignText("designs/x.json", text);
    expect(parsed.problems.map(formatProblem)).toMatchInlineSnapshot(`
      [
        "designs/x.json: title: not a valid title: text holds U+202E right-to-left override at character 7 (expected printable text without control characters or bidirectional overrides)",
      ]
    `);
  });
});

describe("railsieve validate", () => {
  it.each([
    ["U+202E", "\u202E"],
    ["ESC", "\u001b[2J"],
  ])("exits 2 and names file, line and column for a cell holding %s", async (_label, bad) => {
    const dir = mkdtempSync(join(tmpdir(), "railsieve-text-"));
    cpSync("data", dir, { recursive: true });
    const file = join(dir, "diodes.csv");
    const text = readFileSync(file, "utf8");
    // Line 4 of the demo diodes: "Silicon switching, low capacitance".
    writeFileSync(
      file,
      text.replace('"Silicon switching, low capacitance"', `"Silicon switching, ${bad}low capacitance"`),
    );
    const { code, err, out } = await run("validate", "--data", dir);
    expect(code).toBe(2);
    expect(out).toBe("");
    expect(err).toContain(`diodes.csv:4: column 'name': text holds`);
    // Nothing of the character itself reaches the terminal.
    expect(err.includes("\u001b") || err.includes("\u202e")).toBe(false);
  });
});

describe("terminal output", () => {
  it("keeps the colours the program paints and makes every other escape visible", () => {
    const painted = paint({ color: true }, "fail", "fail");
    const out = terminalSafe(`${painted} part \u001b[2J\u202Ename\n`);
    expect(out).toBe("\u001b[31mfail\u001b[0m part \\u001b[2J\\u202ename\n");
  });

  it("keeps CRLF line ends (CSV) but shows a lone carriage return", () => {
    expect(terminalSafe("a,b\r\nc\rd\r\n")).toBe("a,b\r\nc\\rd\r\n");
  });

  it("writes no escape at all without colour", () => {
    expect(terminalSafe(paint({ color: false }, "pass", "pass"))).toBe("pass");
  });
});
