// `check --format markdown` and `--format junit`, read back by maintained
// parsers (marked; fast-xml-parser) and compared with what `check --format
// json` says of the same designs.
import { readdirSync } from "node:fs";
import { join } from "node:path";
import { XMLParser, XMLValidator } from "fast-xml-parser";
import { marked, type Tokens } from "marked";
import { describe, expect, it } from "vitest";
import { copyDataFolder, editDesign } from "../helpers/data-copy.ts";
import { run } from "./run.ts";

const demo = readdirSync("data/designs").map((f) => join("data/designs", f));
const hostileData = "test/fixtures/hostile";
const hostile = readdirSync(join(hostileData, "designs")).map((f) => join(hostileData, "designs", f));

type JsonRole = {
  role: string;
  chosen?: string;
  fits: { part: string; bom?: boolean }[];
  rejected: { part: string; bom?: boolean }[];
};
type JsonDesign = { id: string; title: string; holds: boolean; roles: JsonRole[]; budget: { verdict: string } };

async function checkJson(designs: string[], data = "data"): Promise<JsonDesign[]> {
  const { out } = await run("check", ...designs, "--data", data, "--format", "json");
  return (JSON.parse(out) as { designs: JsonDesign[] }).designs;
}

const bomParts = (d: JsonDesign) =>
  d.roles.flatMap((r) => [...r.fits, ...r.rejected].filter((p) => p.bom).map((p) => `${r.role}:${p.part}`));

type Case = { name: string; failure?: { message: string; "#text"?: string }; skipped?: unknown };
type Suite = { name: string; tests: string; failures: string; testcase: Case[] };

function parseJunit(xml: string): Suite[] {
  expect(XMLValidator.validate(xml)).toBe(true);
  const parser = new XMLParser({
    ignoreAttributes: false,
    attributeNamePrefix: "",
    isArray: (name) => name === "testsuite" || name === "testcase" || name === "property",
  });
  return (parser.parse(xml) as { testsuites: { testsuite: Suite[] } }).testsuites.testsuite;
}

describe("check --format junit", () => {
  it.each([
    ["the demo designs", demo, "data"],
    ["the hostile fixture (markup and control characters in free text)", hostile, hostileData],
  ])("parses, one suite per design and one case per role, BOM part and budget: %s", async (_n, designs, data) => {
    const { out, code } = await run("check", ...designs, "--data", data, "--format", "junit");
    expect(code).toBeLessThan(2);
    const suites = parseJunit(out);
    const json = await checkJson(designs, data);
    expect(suites.map((s) => s.name)).toEqual(json.map((d) => d.id));
    for (const [i, suite] of suites.entries()) {
      const d = json[i] as JsonDesign;
      const names = suite.testcase.map((c) => c.name);
      expect(names.filter((n) => n.startsWith("role "))).toHaveLength(d.roles.length);
      expect(names.filter((n) => n.startsWith("BOM part ")).sort()).toEqual(
        bomParts(d)
          .map((k) => `BOM part ${k.split(":")[1]} fits the ${k.split(":")[0]}`)
          .sort(),
      );
      expect(names.filter((n) => n.startsWith("accuracy budget"))).toHaveLength(1);
      expect(Number(suite.tests)).toBe(suite.testcase.length);
      expect(Number(suite.failures)).toBe(suite.testcase.filter((c) => c.failure).length);
      // A design that does not hold (a role without a fit, a BOM part that does not fit)
      // shows at least one failing case: never an all-green suite for a failing design.
      if (!d.holds) expect(suite.testcase.some((c) => c.failure)).toBe(true);
      if (d.budget.verdict === "fail")
        expect(suite.testcase.find((c) => c.name.startsWith("accuracy"))?.failure).toBeDefined();
    }
  });

  it("fails a BOM part's case with its deciding reason, numbers included", async () => {
    const data = copyDataFolder();
    // A 3 V-headroom class named for the buffer of a 3.3 V board cannot swing anywhere.
    editDesign(data, "thermoelectric-3v-on-3v3", (d) => ((d.bom as Record<string, string>).buffer = "oa-hv-60v"));
    const { out, code } = await run(
      "check",
      join(data, "designs/thermoelectric-3v-on-3v3.json"),
      "--data",
      data,
      "--format",
      "junit",
    );
    expect(code).toBe(1);
    const bom = parseJunit(out)[0]?.testcase.find((c) => c.name === "BOM part oa-hv-60v fits the buffer");
    expect(bom?.failure?.message).toMatch(/^fail: [a-z-]+: .*\d+\.\d+ V/);
    expect(bom?.failure?.["#text"]).toContain("output-swing: fail: ");
  });
});

describe("check --format markdown", () => {
  it.each([
    ["the demo designs", demo, "data"],
    ["the hostile fixture", hostile, hostileData],
  ])("parses into one table per design, a row per role: %s", async (_n, designs, data) => {
    const { out } = await run("check", ...designs, "--data", data, "--format", "markdown");
    const tokens = marked.lexer(out);
    const tables = tokens.filter((t): t is Tokens.Table => t.type === "table");
    const json = await checkJson(designs, data);
    expect(tables).toHaveLength(json.length);
    for (const [i, table] of tables.entries()) {
      expect(table.header.map((h) => h.text)).toEqual(["Role", "Part", "Verdict", "Fits", "Deciding finding"]);
      expect(table.rows.map((r) => r[0]?.text.replace(/`/g, ""))).toEqual(json[i]?.roles.map((r) => r.role));
    }
    // Free text stays text: no tag from a title or a note reaches the HTML.
    const html = marked.parse(out, { async: false });
    expect(html).not.toMatch(/<(img|script|svg|iframe)\b/i);
  });

  it("links designs, roles and parts into the guide when its address is given", async () => {
    const design = "data/designs/bridge-10v-5v-adc.json";
    const { out } = await run(
      "check",
      design,
      "--format",
      "markdown",
      "--guide-url",
      "https://guide.example.invalid/rs",
    );
    expect(out).toContain("(https://guide.example.invalid/rs/designs/bridge-10v-5v-adc/index.html)");
    expect(out).toContain("(https://guide.example.invalid/rs/designs/bridge-10v-5v-adc/index.html#role-buffer)");
    expect(out).toMatch(/\(https:\/\/guide\.example\.invalid\/rs\/parts\/[a-z0-9-]+\/index\.html\)/);
  });

  it("refuses a guide address that would run", async () => {
    const { code, err } = await run(
      "check",
      demo[0] ?? "",
      "--format",
      "markdown",
      "--guide-url",
      "javascript:alert(1)",
    );
    expect(code).toBe(2);
    expect(err).toContain("--guide-url must be an http(s) address or a relative path (got 'javascript:alert(1)')");
  });

  it("reads like this for one design", async () => {
    const { out } = await run("check", "data/designs/bridge-10v-5v-adc.json", "--format", "markdown");
    const shown = out.split("\n").filter((l) => /^(#|\| Role|\| `buffer`|Accuracy budget)/.test(l));
    expect(shown.join("\n")).toMatchInlineSnapshot(`
      "# railsieve check
      ## bridge-10v-5v-adc: marginal
      | Role | Part | Verdict | Fits | Deciding finding |
      | \`buffer\` | \`oa-cmos-rro-limited\` | marginal | 12 of 35 | \`output-load\` (marginal): drives stage 1's input R to its virtual ground (10.0 kΩ) ‖ the summer's input R to its virtual ground (10.0 kΩ) = 5.00 kΩ: heavier than the 10.0 kΩ its swing is rated at (2× its current at the same output), so the rated swing may not hold (an output's headroom grows with its current) |
      Accuracy budget: worst case 164 mV, root-sum-square 52.4 mV, required 100 mV: marginal (largest term: rectifier stage 1 offset and bias current, through the summer's weight 2 (oa-cmos-rrio-150m-12v))."
    `);
  });
});
