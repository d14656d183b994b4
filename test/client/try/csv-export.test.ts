import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import "./all-topologies.ts";
import { catalogueFromParts, type Part } from "../../../src/core/catalogue.ts";
import { evaluateDesign } from "../../../src/engine.ts";
import type { DesignResult } from "../../../src/core/engine/result.ts";
import { loadCatalogue } from "../../../src/node/load-data.ts";
import { CSV_HEADER, shortlistCsv, shortlistCsvName } from "../../../src/client/try/csv-export.ts";
import { DEFAULT_DRAFT } from "../../../src/client/try/defaults.ts";
import { checkDraft } from "../../../src/client/try/draft.ts";

const { catalogue } = loadCatalogue("data");

// Formula-injection starters per OWASP "CSV Injection": = + - @ tab and carriage return.
const NAMES: [label: string, name: string, cell: string][] = [
  ["equals", '=HYPERLINK("http://example.invalid","x")', `'=HYPERLINK("http://example.invalid","x")`],
  ["plus", "+1+2", "'+1+2"],
  ["minus", "-2+3", "'-2+3"],
  ["at", "@SUM(A1:A9)", "'@SUM(A1:A9)"],
  ["tab", "\t=1+1", "'\t=1+1"],
  ["carriage return", "\r=1+1", "'\r=1+1"],
  ["comma and quotes", 'Op amp, "fast"', 'Op amp, "fast"'],
  ["markup", "<img src=x onerror=alert(1)>", "<img src=x onerror=alert(1)>"],
  ["minus inside", "CMOS rail-to-rail", "CMOS rail-to-rail"],
];

function resultWith(names: typeof NAMES): DesignResult {
  const template = catalogue.opAmps[0] as Part;
  const hostile = names.map(([label, name], i): Part => ({ ...template, id: `oa-hostile-${i}`, name, notes: label }));
  const design = checkDraft(DEFAULT_DRAFT).design;
  if (!design) throw new Error("default design does not validate");
  const e = evaluateDesign(design, catalogueFromParts([...catalogue.parts, ...hostile]));
  if (!e.ok) throw new Error("default design does not evaluate");
  return e.result;
}

describe("shortlistCsv", () => {
  const result = resultWith(NAMES);
  const text = shortlistCsv(result);
  const rows = Papa.parse<Record<string, string>>(text.slice(1), { header: true, skipEmptyLines: true }).data;

  it.each(NAMES.map(([label, name, cell], i) => [label, name, cell, i] as const))(
    "neutralises a name starting with %s",
    (_label, _name, cell, i) => {
      const mine = rows.filter((r) => r["part"] === `oa-hostile-${i}`);
      // The op amp is a candidate for the buffer, the rectifier and the sign roles.
      expect(mine.map((r) => r["role"])).toEqual(["buffer", "rectifier", "sign"]);
      for (const r of mine) expect(r["name"]).toBe(cell);
    },
  );

  it("quotes the neutralised cell in the file itself", () => {
    expect(text).toContain(`,"'=HYPERLINK(""http://example.invalid"",""x"")",`);
    expect(text).toContain(`,"'\r=1+1",`);
  });

  it("writes a byte-order mark, the header and CRLF line ends, one row per part and role", () => {
    expect(text.startsWith(`\uFEFF${CSV_HEADER.join(",")}\r\n`)).toBe(true);
    expect(text.endsWith("\r\n")).toBe(true);
    const count = result.roles.reduce((n, r) => n + r.fits.length + r.rejected.length, 0);
    expect(rows.length).toBe(count);
  });

  it("gives each rejected part its failing rules and their reasons with numbers", () => {
    const rejected = rows.find((r) => r["list"] === "rejected" && r["role"] === "buffer");
    expect(rejected?.["verdict"]).toMatch(/^(fail|unrated)$/);
    expect(rejected?.["rules_not_passed"]).not.toBe("");
    expect(rejected?.["reasons"]).toMatch(/\d/);
    const fit = rows.find((r) => r["list"] === "fit");
    expect(fit?.["verdict"]).toMatch(/^(pass|marginal)$/);
    expect(fit?.["rank"]).toBe("1");
  });

  it("no cell of the whole sheet starts with a formula character", () => {
    const cells = Papa.parse<string[]>(text.slice(1), { skipEmptyLines: true }).data.flat();
    expect(cells.filter((c) => /^[=+\-@\t\r]/.test(c))).toEqual([]);
  });

  it("with topology 'all' gives every compared topology's rows, each named in the topology column", () => {
    const design = checkDraft({ ...DEFAULT_DRAFT, topology: "all" }).design;
    if (!design) throw new Error("default design with topology all does not validate");
    const e = evaluateDesign(design, catalogue);
    if (!e.ok || !e.result.comparison) throw new Error("no comparison");
    const sheet = Papa.parse<Record<string, string>>(shortlistCsv(e.result).slice(1), {
      header: true,
      skipEmptyLines: true,
    }).data;
    const expected = e.result.comparison.results.map((r) => r.topology);
    expect(expected.length).toBeGreaterThan(1);
    expect([...new Set(sheet.map((r) => r["topology"]))]).toEqual(expected);
    const perTopology = e.result.comparison.results.map((r) =>
      r.roles.reduce((n, role) => n + role.fits.length + role.rejected.length, 0),
    );
    expect(sheet.length).toBe(perTopology.reduce((a, b) => a + b, 0));
  });

  it("names the file after the design", () => {
    expect(shortlistCsvName(result)).toBe("new-design-parts.csv");
  });
});
