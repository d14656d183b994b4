import { readdirSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { buildCatalogue, catalogueFromParts, KINDS, parseCatalogueText } from "../../src/core/catalogue.ts";
import { formatProblem } from "../../src/core/problems.ts";
import { displayPath, loadCatalogue } from "../../src/node/load-data.ts";
import { textProblems } from "../helpers/catalogue.ts";
import { comparator, csvLine, csvText, diode, DIODE_CELLS, opAmp, OP_AMP_CELLS } from "../helpers/parts.ts";

// Each case's own files over test/fixtures/base/, laid out by test/helpers/fixtures.ts.
const FIXTURES = join(import.meta.dirname, "../../.fixtures/catalogue");
const BASE = join(import.meta.dirname, "../../.fixtures/base");
const VALID_FOLDERS = ["bom-crlf-trailing-blank", "kind-left-out"];

/** Problems of one fixture folder, with the folder prefix cut so the snapshot reads "file:line: …". */
function folderProblems(folder: string): string[] {
  const prefix = `${displayPath(join(FIXTURES, folder))}/`;
  return loadCatalogue(join(FIXTURES, folder)).problems.map((p) => formatProblem(p).replaceAll(prefix, ""));
}

const header = (base: Record<string, string>) => csvLine(Object.keys(base));
const row = (base: Record<string, string>, o: Record<string, string> = {}) =>
  csvLine(Object.keys(base).map((c) => o[c] ?? base[c] ?? ""));

describe("fixture folders (one defect each, test/fixtures/catalogue/)", () => {
  const folders = readdirSync(FIXTURES).sort();

  it("kind-left-out: a folder without diodes.csv has no diodes, said as an empty kind, not a problem", () => {
    const { catalogue, problems, empty } = loadCatalogue(join(FIXTURES, "kind-left-out"));
    expect(problems).toEqual([]);
    expect(empty).toEqual(["diode"]);
    expect([catalogue.opAmps.length, catalogue.comparators.length, catalogue.diodes.length]).toEqual([4, 3, 0]);
  });

  it("the base every case starts from loads clean: four op amps, three comparators, four diodes", () => {
    const { catalogue, problems, empty } = loadCatalogue(BASE);
    expect(problems).toEqual([]);
    expect(empty).toEqual([]);
    expect([catalogue.opAmps.length, catalogue.comparators.length, catalogue.diodes.length]).toEqual([4, 3, 4]);
  });

  it("a folder with no catalogue file at all is a problem (more likely a wrong --data than a catalogue)", () => {
    const { problems } = loadCatalogue(join(FIXTURES, "no-such-folder"));
    expect(problems.map((p) => p.message)).toEqual(KINDS.map(() => "file not found (expected it to exist)"));
  });

  it.each(VALID_FOLDERS.filter((f) => f !== "kind-left-out"))("%s loads clean: two parts of each kind", (folder) => {
    const { catalogue, problems } = loadCatalogue(join(FIXTURES, folder));
    expect(problems).toEqual([]);
    expect([catalogue.opAmps.length, catalogue.comparators.length, catalogue.diodes.length]).toEqual([2, 2, 2]);
  });

  it.each(folders.filter((f) => !VALID_FOLDERS.includes(f)))(
    "%s reports its defect, in one file, with the file named",
    (folder) => {
      const problems = loadCatalogue(join(FIXTURES, folder)).problems;
      expect(problems.length).toBeGreaterThan(0);
      expect(new Set(problems.map((p) => p.file)).size).toBe(1);
      expect(problems[0]?.file).toMatch(new RegExp(`${folder}/(op-amps|comparators|diodes)\\.csv$`));
    },
  );

  it("each defect gives exactly these messages", () => {
    const all = Object.fromEntries(
      folders.filter((f) => !VALID_FOLDERS.includes(f)).map((f) => [f, folderProblems(f)]),
    );
    expect(all).toMatchInlineSnapshot(`
      {
        "bad-yes-no": [
          "op-amps.csv:2: column 'unity_gain_stable': not yes or no (got 'y', expected 'yes' or 'no')",
        ],
        "column-twice": [
          "diodes.csv:1: column 'notes': column appears twice (expected each column once)",
        ],
        "duplicate-id-across-files": [
          "diodes.csv:3: column 'id': duplicate id (got 'oa-cmos-rrio-16v', expected an id not already used in op-amps.csv)",
        ],
        "duplicate-id-in-file": [
          "comparators.csv:3: column 'id': duplicate id (got 'cmp-od-gp', expected an id not already used in comparators.csv)",
        ],
        "empty-file": [
          "comparators.csv: file is empty (expected a header row: id,name,status,cost_band,tags,notes,channels,supply_min_v,supply_max_v,icm_neg_headroom_v,icm_pos_headroom_v,output,out_neg_headroom_v,out_pos_headroom_v,vos_max_mv,tpd_ns,tpd_overdrive_mv,hysteresis_mv,iq_ma,vdiff_max_v,iout_max_ma)",
        ],
        "extra-cells": [
          "diodes.csv:3: row has 15 cells (got 1 more than the header, expected 14; is there an unquoted comma?)",
        ],
        "forward-voltage-falls": [
          "diodes.csv:3: column 'vf_10ma_v': forward voltage falls as current rises (got 0.3 V at 10 mA below 0.4 V at 1 mA, expected vf_10ma_v ≥ vf_1ma_v)",
        ],
        "headroom-leaves-no-room": [
          "comparators.csv:3: column 'icm_pos_headroom_v': input headroom leaves no room inside the supply (got 3 V + 2.5 V = 5.5 V, expected less than supply_max_v 5.5 V)",
        ],
        "infinity-cell": [
          "op-amps.csv:3: column 'slew_v_per_us': not a number (got 'Infinity', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        ],
        "line-numbers-blank-and-multiline": [
          "diodes.csv:7: column 'vr_max_v': not a number (got 'thirty', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        ],
        "missing-required-cell": [
          "diodes.csv:3: column 'vr_max_v': required value is missing (got '', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        ],
        "missing-required-column": [
          "comparators.csv:1: column 'tpd_ns': required column is missing (expected it in the header)",
        ],
        "nan-cell": [
          "op-amps.csv:2: column 'vos_max_mv': not a number (got 'NaN', expected a number such as 0.5, 500m or 2.2k, at least 0)",
        ],
        "negative-bias-current": [
          "op-amps.csv:2: column 'ib_max_na': must not be negative (got '-250', expected a number such as 0.5, 500m or 2.2k, at least 0)",
        ],
        "negative-gbw": [
          "op-amps.csv:2: column 'gbw_mhz': must not be negative (got '-1', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        ],
        "negative-slew": [
          "op-amps.csv:3: column 'slew_v_per_us': must not be negative (got '-1.5', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        ],
        "not-a-number": [
          "op-amps.csv:3: column 'gbw_mhz': not a number (got 'fast', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        ],
        "not-utf8": [
          "diodes.csv:3: bytes that are not UTF-8 (got byte 0xb5 at byte 270, expected UTF-8 text; re-save the file as UTF-8)",
        ],
        "push-pull-without-levels": [
          "comparators.csv:3: column 'out_neg_headroom_v': required value is missing for a push-pull output (got '', expected a number such as 0.5, 500m or 2.2k)",
          "comparators.csv:3: column 'out_pos_headroom_v': required value is missing for a push-pull output (got '', expected a number such as 0.5, 500m or 2.2k)",
        ],
        "semicolon-delimited": [
          "diodes.csv:1: header looks semicolon-separated (got 'id;name;status;cost_band;tags;notes;t…', expected comma-separated columns; export the sheet as CSV with commas)",
        ],
        "supply-min-above-max": [
          "op-amps.csv:3: column 'supply_min_v': minimum supply is above the maximum (got 5.5 V > 1.8 V, expected supply_min_v ≤ supply_max_v)",
        ],
        "unknown-column": [
          "op-amps.csv:1: column 'gbw_mz': unknown column (got 'gbw_mz', expected 'gbw_mhz')",
          "op-amps.csv:1: column 'gbw_mhz': required column is missing (expected it in the header)",
        ],
        "unknown-output": [
          "comparators.csv:3: column 'output': unknown value (got 'totem-pole', expected 'push-pull' or 'open-drain')",
        ],
        "unknown-status": [
          "diodes.csv:2: column 'status': unknown value (got 'in-stock', expected 'stocked' or 'approved' or 'listed')",
        ],
        "unterminated-quote": [
          "op-amps.csv:3: a quoted cell is never closed (expected a closing '"')",
        ],
        "utf16-file": [
          "op-amps.csv:1: file is saved as UTF-16 (expected UTF-8; save or export it as 'CSV UTF-8')",
        ],
      }
    `);
  });
});

describe("parseCatalogueText", () => {
  it("accepts a UTF-8 BOM, CRLF line ends and trailing blank lines", () => {
    const text = `\uFEFF${csvText(DIODE_CELLS, [{ id: "d-a" }, { id: "d-b" }], "\r\n")}\r\n\r\n  \r\n,,,\r\n`;
    const parsed = parseCatalogueText("diode", "diodes.csv", text);
    expect(parsed.problems).toEqual([]);
    expect(parsed.parts.map((p) => [p.id, p.name])).toEqual([
      ["d-a", "Test diode"],
      ["d-b", "Test diode"],
    ]);
    expect(parsed.lines).toEqual([2, 3]);
  });

  it("a header with no rows is a valid, empty file", () => {
    expect(parseCatalogueText("op-amp", "op-amps.csv", `${header(OP_AMP_CELLS)}\n`)).toMatchObject({
      parts: [],
      problems: [],
    });
  });

  it("counts lines as an editor does: header = 1, blank lines and lines inside quoted cells included", () => {
    const text = [
      header(DIODE_CELLS),
      row(DIODE_CELLS, { id: "d-a", notes: "first\nsecond\nthird" }), // lines 2–4
      "", // 5
      "   ", // 6
      row(DIODE_CELLS, { id: "d-b" }), // 7
      row(DIODE_CELLS, { id: "d-c", name: 'a "quoted"\r\nname', vr_max_v: "x" }), // 8–9
      "", // 10
      row(DIODE_CELLS, { id: "d-d", ir_na: "-1" }), // 11
    ].join("\n");
    const parsed = parseCatalogueText("diode", "diodes.csv", text);
    expect(parsed.lines).toEqual([2, 7]);
    expect(parsed.problems.map(formatProblem)).toMatchInlineSnapshot(`
      [
        "diodes.csv:8: column 'vr_max_v': not a number (got 'x', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        "diodes.csv:11: column 'ir_na': must not be negative (got '-1', expected a number such as 0.5, 500m or 2.2k, at least 0)",
      ]
    `);
  });

  it("names the header's real line when blank lines come first", () => {
    expect(textProblems("diode", `\n\n${header(DIODE_CELLS).replace("ir_na", "ir_nA")}\n${row(DIODE_CELLS)}\n`))
      .toMatchInlineSnapshot(`
      [
        "diodes.csv:3: column 'ir_nA': unknown column (got 'ir_nA', expected 'ir_na')",
        "diodes.csv:3: column 'ir_na': required column is missing (expected it in the header)",
      ]
    `);
  });

  it("reports unknown, duplicate and missing columns together, suggesting the closest known name", () => {
    const cols = Object.keys(OP_AMP_CELLS);
    const renamed = cols.map(
      (c) => ({ slew_v_per_us: "slew_v_us", supply_max_v: "Supply_Max_V", notes: "remarks" })[c] ?? c,
    );
    const text = `${[...renamed.filter((c) => c !== "gbw_mhz"), "tags", "colour"].join(",")}\n`;
    expect(textProblems("op-amp", text)).toMatchInlineSnapshot(`
      [
        "op-amps.csv:1: column 'remarks': unknown column (got 'remarks', expected one of id, name, status, cost_band, tags, notes, channels, supply_min_v, supply_max_v, icm_neg_headroom_v, icm_pos_headroom_v, out_neg_headroom_v, out_pos_headroom_v, out_load_ohm, vos_max_mv, vos_drift_uv_per_c, ib_max_na, gbw_mhz, slew_v_per_us, iq_ma, noise_nv_rthz, unity_gain_stable, phase_reversal, input_fet, vdiff_max_v, overload_recovery_us, iout_max_ma, in_pa_rthz)",
        "op-amps.csv:1: column 'Supply_Max_V': unknown column (got 'Supply_Max_V', expected 'supply_max_v')",
        "op-amps.csv:1: column 'slew_v_us': unknown column (got 'slew_v_us', expected 'slew_v_per_us')",
        "op-amps.csv:1: column 'tags': column appears twice (expected each column once)",
        "op-amps.csv:1: column 'colour': unknown column (got 'colour', expected one of id, name, status, cost_band, tags, notes, channels, supply_min_v, supply_max_v, icm_neg_headroom_v, icm_pos_headroom_v, out_neg_headroom_v, out_pos_headroom_v, out_load_ohm, vos_max_mv, vos_drift_uv_per_c, ib_max_na, gbw_mhz, slew_v_per_us, iq_ma, noise_nv_rthz, unity_gain_stable, phase_reversal, input_fet, vdiff_max_v, overload_recovery_us, iout_max_ma, in_pa_rthz)",
        "op-amps.csv:1: column 'supply_max_v': required column is missing (expected it in the header)",
        "op-amps.csv:1: column 'gbw_mhz': required column is missing (expected it in the header)",
        "op-amps.csv:1: column 'slew_v_per_us': required column is missing (expected it in the header)",
      ]
    `);
  });

  it("reports file-level defects clearly", () => {
    const d = DIODE_CELLS;
    expect({
      empty: textProblems("diode", ""),
      blank: textProblems("diode", "\n \r\n\n"),
      "only a BOM": textProblems("diode", "\uFEFF"),
      semicolons: textProblems("diode", `${Object.keys(d).join(";")}\n${Object.values(d).join(";")}\n`),
      tabs: textProblems("diode", `${Object.keys(d).join("\t")}\n${Object.values(d).join("\t")}\n`),
      "lone CR line ends, bad cell on line 3": textProblems(
        "diode",
        `${header(d)}\r${row(d)}\r${row(d, { id: "d-b", ir_na: "x" })}\r`,
      ),
      "unterminated quote on the last row": textProblems(
        "diode",
        `${header(d)}\n${row(d)}\n${row(d, { id: "d-b" }).replace("Test diode", '"Test diode')}\n`,
      ),
      "extra cells": textProblems("diode", `${header(d)}\n${row(d)},0.1,0.2\n`),
      "fewer cells": textProblems("diode", `${header(d)}\n${row(d).split(",").slice(0, 9).join(",")}\n`),
    }).toMatchInlineSnapshot(`
      {
        "blank": [
          "diodes.csv: file is empty (expected a header row: id,name,status,cost_band,tags,notes,type,vf_1ma_v,vf_10ma_v,ir_na,vr_max_v,trr_ns,cj_pf,if_max_ma)",
        ],
        "empty": [
          "diodes.csv: file is empty (expected a header row: id,name,status,cost_band,tags,notes,type,vf_1ma_v,vf_10ma_v,ir_na,vr_max_v,trr_ns,cj_pf,if_max_ma)",
        ],
        "extra cells": [
          "diodes.csv:2: row has 16 cells (got 2 more than the header, expected 14; is there an unquoted comma?)",
        ],
        "fewer cells": [
          "diodes.csv:2: column 'ir_na': required value is missing (got '', expected a number such as 0.5, 500m or 2.2k, at least 0)",
          "diodes.csv:2: column 'vr_max_v': required value is missing (got '', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
          "diodes.csv:2: column 'if_max_ma': required value is missing (got '', expected a number such as 0.5, 500m or 2.2k, greater than 0)",
        ],
        "lone CR line ends, bad cell on line 3": [
          "diodes.csv:3: column 'ir_na': not a number (got 'x', expected a number such as 0.5, 500m or 2.2k, at least 0)",
        ],
        "only a BOM": [
          "diodes.csv: file is empty (expected a header row: id,name,status,cost_band,tags,notes,type,vf_1ma_v,vf_10ma_v,ir_na,vr_max_v,trr_ns,cj_pf,if_max_ma)",
        ],
        "semicolons": [
          "diodes.csv:1: header looks semicolon-separated (got 'id;name;status;cost_band;tags;notes;t…', expected comma-separated columns; export the sheet as CSV with commas)",
        ],
        "tabs": [
          "diodes.csv:1: header looks tab-separated (got 'id\\tname\\tstatus\\tcost_band\\ttags\\tnotes\\tt…', expected comma-separated columns; export the sheet as CSV with commas)",
        ],
        "unterminated quote on the last row": [
          "diodes.csv:3: a quoted cell is never closed (expected a closing '"')",
        ],
      }
    `);
  });

  it("refuses a 100 kB line instead of parsing it", () => {
    const text = `${header(DIODE_CELLS)}\n${row(DIODE_CELLS)}\n${row(DIODE_CELLS, { notes: "x".repeat(100_000) })}\n`;
    const start = performance.now();
    expect(textProblems("diode", text)).toMatchInlineSnapshot(`
      [
        "diodes.csv:3: line is 100061 characters long (expected at most 20000; is this really a catalogue file?)",
      ]
    `);
    expect(performance.now() - start).toBeLessThan(1000);
  });

  it("keeps the good rows of a file that has bad ones, and reports each bad row", () => {
    const parsed = parseCatalogueText(
      "diode",
      "diodes.csv",
      csvText(DIODE_CELLS, [{ id: "d-a" }, { id: "d-b", vf_1ma_v: "x" }, { id: "d-c" }, { id: "d-d", type: "zener" }]),
    );
    expect(parsed.parts.map((p) => p.id)).toEqual(["d-a", "d-c"]);
    expect(parsed.lines).toEqual([2, 4]);
    expect(parsed.problems.map((p) => [p.line, p.column])).toEqual([
      [3, "vf_1ma_v"],
      [5, "type"],
    ]);
  });
});

// The line numbering as first written: papaparse dropping blank rows itself, and a
// walk over the text one character at a time. parseCatalogueText now gets there
// with indexOf and its own blank-row filter, and must name the same lines.
function referenceLines(text: string): { rows: number[]; ids: string[]; quoteErrors: number[] } {
  const body = text.replace(/\r\n?/g, "\n");
  const parsed = Papa.parse<string[]>(body, { delimiter: ",", skipEmptyLines: "greedy" });
  const starts = [0];
  for (let i = 0; i < body.length; i++) if (body[i] === "\n") starts.push(i + 1);
  const lineAt = (offset: number) => starts.filter((s) => s <= offset).length;
  const isBlankLine = (pos: number) => {
    if (pos > 0 && body[pos - 1] !== "\n") return false;
    let i = pos;
    while (i < body.length && (body[i] === " " || body[i] === "\t" || body[i] === ",")) i++;
    return i < body.length ? body[i] === "\n" : i > pos;
  };
  const rows: number[] = [];
  let pos = 0;
  for (let r = 0; r < parsed.data.length; r++) {
    while (pos < body.length && (body[pos] === "\n" || isBlankLine(pos))) {
      const nl = body.indexOf("\n", pos);
      pos = nl < 0 ? body.length : nl + 1;
    }
    rows.push(lineAt(pos));
    let inQuotes = false;
    for (; pos < body.length; pos++) {
      if (body[pos] === '"') {
        if (inQuotes && body[pos + 1] === '"') pos++;
        else inQuotes = !inQuotes;
      } else if (body[pos] === "\n" && !inQuotes) {
        pos++;
        break;
      }
    }
  }
  const quoteErrors = parsed.errors
    .filter((e) => e.type === "Quotes")
    .map((e) => (e.row !== undefined ? (rows[e.row] ?? 1) : 1));
  return { rows, ids: parsed.data.map((cells) => (cells[0] ?? "").trim()), quoteErrors };
}

describe("line numbers", () => {
  const notes = fc.oneof(
    fc.constantFrom("", "plain", "a, b", 'say "hi"', "two\nlines", "three\r\nlines\nhere", '""', ",\n,"),
    fc.string({ unit: fc.constantFrom("a", " ", ",", '"', "\n", "\r"), maxLength: 8 }),
  );
  // Lines as they may sit in a file: rows (notes quoted as a spreadsheet writes them,
  // or raw, stray quotes and all), blank and comma-only lines.
  const row = (id: string, notes: string) =>
    Object.keys(DIODE_CELLS).map((c) => (c === "id" ? id : c === "notes" ? notes : (DIODE_CELLS[c] ?? "")));
  // Lines as they may sit in a file: rows (notes quoted as a spreadsheet writes them,
  // or raw, stray quotes and all), blank and comma-only lines. Ids tell the rows apart.
  const line = (id: string) =>
    fc.oneof(
      notes.map((n) => csvLine(row(id, n))),
      notes.map((n) => row(id, n).join(",")),
      fc.constantFrom("", "   ", ",,,", " , ,"),
    );

  it("names the same line for every row as a character-by-character walk", () => {
    const lines = fc.array(fc.nat(), { maxLength: 8 }).chain((ns) => fc.tuple(...ns.map((_, i) => line(`d-${i}`))));
    fc.assert(
      fc.property(lines, fc.constantFrom("\n", "\r\n", "\r"), (rows, eol) => {
        const text = [csvLine(Object.keys(DIODE_CELLS)), ...rows].join(eol);
        const parsed = parseCatalogueText("diode", "diodes.csv", text);
        const reference = referenceLines(text);
        if (reference.quoteErrors.length > 0) {
          expect(parsed.problems.map((p) => p.line)).toEqual(reference.quoteErrors);
          return;
        }
        expect(parsed.lines).toEqual(parsed.parts.map((p) => reference.rows[reference.ids.indexOf(p.id)]));
        for (const p of parsed.problems) expect(reference.rows).toContain(p.line);
      }),
      { numRuns: 500 },
    );
  });
});

describe("buildCatalogue", () => {
  const file = (kind: (typeof KINDS)[number]["kind"], text: string) =>
    parseCatalogueText(kind, KINDS.find((k) => k.kind === kind)?.file ?? "", text);

  it("joins the three kinds and indexes parts by id", () => {
    const { value, problems } = buildCatalogue([
      file("op-amp", csvText(OP_AMP_CELLS, [{ id: "oa-a" }, { id: "oa-b" }])),
      file("diode", csvText(DIODE_CELLS, [{ id: "d-a" }])),
    ]);
    expect(problems).toEqual([]);
    expect(value.parts.map((p) => `${p.kind}:${p.id}`)).toEqual(["op-amp:oa-a", "op-amp:oa-b", "diode:d-a"]);
    expect([value.opAmps.length, value.comparators.length, value.diodes.length]).toEqual([2, 0, 1]);
    expect(value.byId.get("d-a")?.kind).toBe("diode");
  });

  it("reports an id used twice, across files or within one, at the second use's line; the first use stays", () => {
    const { value, problems } = buildCatalogue([
      file("op-amp", csvText(OP_AMP_CELLS, [{ id: "x-1" }, { id: "oa-b" }])),
      file("diode", csvText(DIODE_CELLS, [{ id: "d-a" }, { id: "x-1" }, { id: "d-a" }])),
    ]);
    expect(problems.map(formatProblem)).toMatchInlineSnapshot(`
      [
        "diodes.csv:3: column 'id': duplicate id (got 'x-1', expected an id not already used in op-amps.csv)",
        "diodes.csv:4: column 'id': duplicate id (got 'd-a', expected an id not already used in diodes.csv)",
      ]
    `);
    expect(value.byId.get("x-1")?.kind).toBe("op-amp");
    expect(value.parts).toHaveLength(3);
  });

  it("carries every file's own problems along", () => {
    const { problems } = buildCatalogue([file("diode", ""), file("op-amp", "id\n")]);
    expect(problems.map((p) => p.file)).toEqual(["diodes.csv", ...Array(problems.length - 1).fill("op-amps.csv")]);
  });

  it("catalogueFromParts builds the same shape from parts in hand", () => {
    const c = catalogueFromParts([opAmp({ id: "oa-1" }), comparator({ id: "c-1" }), diode({ id: "d-1" })]);
    expect([c.opAmps[0]?.id, c.comparators[0]?.id, c.diodes[0]?.id, c.byId.size]).toEqual(["oa-1", "c-1", "d-1", 3]);
  });
});

describe("the demo catalogue in data/", () => {
  // Issue 2: at least 24 op amps, 10 comparators and 12 diodes, and it validates.
  it("loads clean with the issue's minimum counts", () => {
    const { catalogue, problems } = loadCatalogue(join(import.meta.dirname, "../../data"));
    expect(problems.map(formatProblem)).toEqual([]);
    expect(catalogue.opAmps.length).toBeGreaterThanOrEqual(24);
    expect(catalogue.comparators.length).toBeGreaterThanOrEqual(10);
    expect(catalogue.diodes.length).toBeGreaterThanOrEqual(12);
  });
});
