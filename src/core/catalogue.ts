// Loads the three catalogue CSV files into typed parts, collecting every
// problem of every file at once (SPEC §4). Pure: callers pass text, not paths.
import Papa from "papaparse";
import type { z } from "zod";
import { indexCatalogue, type Catalogue, type Part, type PartKind } from "./catalogue-index.ts";
import { KIND_ROWS } from "./kind-rows.ts";
import { KINDS as KIND_REGISTRY, type KindSpec } from "./kinds.ts";
import { closest, type Problem } from "./problems.ts";
import { readerFor } from "./schemas/row.ts";

export type { Catalogue, Part, PartKind };

/** A kind of the registry (kinds.ts) with its row schema and columns (kind-rows.ts). */
export type CatalogueKind = KindSpec & {
  kind: PartKind;
  /** Plural noun, as in "3 op amps". */
  plural: string;
  columns: Record<string, z.ZodType>;
  row: z.ZodType;
};

/** Every kind the loader reads, in registry order. */
export const KINDS: readonly CatalogueKind[] = KIND_REGISTRY.map((k) => ({
  ...k,
  plural: k.words.many,
  ...KIND_ROWS[k.kind],
}));

export type Loaded<T> = { value: T; problems: Problem[] };

export type ParsedFile = { kind: PartKind; file: string; parts: Part[]; lines: number[]; problems: Problem[] };

type RowSchema = z.ZodType<Part, Record<string, string | undefined>>;

const MAX_LINE_CHARS = 20_000;

/** Parses one catalogue file's text. Rows with problems are left out of `parts`. */
export function parseCatalogueText(kind: PartKind, file: string, text: string): ParsedFile {
  const { value, problems, lines } = parseRows(kind, file, text);
  return { kind, file, parts: value, lines, problems };
}

function parseRows(kind: PartKind, file: string, text: string): Loaded<Part[]> & { lines: number[] } {
  const lines: number[] = [];
  const spec = KINDS.find((k) => k.kind === kind);
  if (!spec) throw new Error(`unknown kind ${kind}`);
  const known = Object.keys(spec.columns);
  const problems: Problem[] = [];
  // Lone CR line ends (old spreadsheet exports) would otherwise put every row on "line 1".
  const unmarked = text.startsWith("\uFEFF") ? text.slice(1) : text;
  const body = unmarked.includes("\r") ? unmarked.replace(/\r\n?/g, "\n") : unmarked;

  if (body.trim() === "") {
    return {
      value: [],
      lines,
      problems: [{ file, message: `file is empty (expected a header row: ${known.join(",")})` }],
    };
  }
  const longLine = findLongLine(body);
  if (longLine) {
    problems.push({
      file,
      line: longLine.line,
      message: `line is ${longLine.length} characters long (expected at most ${MAX_LINE_CHARS}; is this really a catalogue file?)`,
    });
    return { value: [], lines, problems };
  }

  // Blank rows are dropped here rather than by papaparse's skipEmptyLines: "greedy",
  // which joins every row into a new string to test it. Same rows, same error indices
  // (papaparse numbers errors before it drops rows). The body has no CR left, so
  // naming the line end only spares papaparse guessing it.
  const parsed = Papa.parse<string[]>(body, { delimiter: ",", newline: "\n", skipEmptyLines: false });
  parsed.data = parsed.data.filter((cells) => !isBlankRow(cells));
  const lineOf = lineStarts(body);
  const rowLines = rowLineNumbers(parsed.data, body, lineOf);

  for (const e of parsed.errors) {
    if (e.type === "Quotes") {
      const line = e.row !== undefined ? (rowLines[e.row] ?? 1) : 1;
      problems.push({ file, line, message: "a quoted cell is never closed (expected a closing '\"')" });
    }
  }
  if (problems.length > 0) return { value: [], lines, problems };

  const [header, ...rows] = parsed.data;
  if (!header) return { value: [], lines, problems: [{ file, message: "file has no header row" }] };
  const columns = header.map((h) => h.trim());
  // The header is line 1 unless blank lines come before it.
  const headerLine = rowLines[0] ?? 1;

  // A spreadsheet's "text" export uses tabs, a European one semicolons.
  const separator = columns.length === 1 ? [";", "\t"].find((s) => (columns[0] ?? "").includes(s)) : undefined;
  if (separator !== undefined) {
    return {
      value: [],
      lines,
      problems: [
        {
          file,
          line: headerLine,
          message: `header looks ${separator === ";" ? "semicolon" : "tab"}-separated (got '${shorten(columns[0] ?? "")}', expected comma-separated columns; export the sheet as CSV with commas)`,
        },
      ],
    };
  }

  let headerOk = true;
  columns.forEach((c, i) => {
    if (known.includes(c)) {
      if (columns.indexOf(c) !== i) {
        problems.push({
          file,
          line: headerLine,
          column: c,
          message: "column appears twice (expected each column once)",
        });
        headerOk = false;
      }
      return;
    }
    const guess = closest(c, known);
    problems.push({
      file,
      line: headerLine,
      column: c,
      message: `unknown column (got '${shorten(c)}', expected ${guess ? `'${guess}'` : `one of ${known.join(", ")}`})`,
    });
    headerOk = false;
  });
  for (const required of requiredColumns(spec.columns)) {
    if (!columns.includes(required)) {
      problems.push({
        file,
        line: headerLine,
        column: required,
        message: "required column is missing (expected it in the header)",
      });
      headerOk = false;
    }
  }
  if (!headerOk) return { value: [], lines, problems };

  const schema = spec.row as unknown as RowSchema;
  const read = readerFor(schema, columns);
  const parts: Part[] = [];
  for (let index = 0; index < rows.length; index++) {
    const cells = rows[index] ?? [];
    const line = rowLines[index + 1] ?? index + 2;
    if (cells.length > columns.length) {
      problems.push({
        file,
        line,
        message: `row has ${cells.length} cells (got ${cells.length - columns.length} more than the header, expected ${columns.length}; is there an unquoted comma?)`,
      });
      continue;
    }
    const fast = read?.(cells);
    if (fast !== undefined) {
      parts.push(fast);
      lines.push(line);
      continue;
    }
    const record: Record<string, string> = {};
    columns.forEach((c, i) => {
      record[c] = cells[i] ?? "";
    });
    const result = schema.safeParse(record);
    if (result.success) {
      parts.push(result.data);
      lines.push(line);
      continue;
    }
    for (const issue of result.error.issues) {
      const column = issue.path.length > 0 ? String(issue.path[0]) : undefined;
      problems.push({ file, line, ...(column !== undefined ? { column } : {}), message: issue.message });
    }
  }
  return { value: parts, lines, problems };
}

function requiredColumns(columns: Record<string, z.ZodType>): string[] {
  return Object.entries(columns)
    .filter(([, schema]) => !schema.safeParse(undefined).success)
    .map(([name]) => name);
}

function shorten(s: string): string {
  return s.length > 40 ? `${s.slice(0, 37)}…` : s;
}

/** Whether papaparse's "greedy" test would call the row empty: nothing but white space. */
function isBlankRow(cells: readonly string[]): boolean {
  for (const cell of cells) if (cell.trim() !== "") return false;
  return true;
}

// indexOf rather than a loop over characters: it scans a long text many times faster.
function findLongLine(text: string): { line: number; length: number } | undefined {
  let line = 1;
  let start = 0;
  for (;;) {
    const nl = text.indexOf("\n", start);
    const end = nl < 0 ? text.length : nl;
    if (end - start > MAX_LINE_CHARS) return { line, length: end - start };
    if (nl < 0) return undefined;
    line++;
    start = nl + 1;
  }
}

function lineStarts(text: string): number[] {
  const starts = [0];
  for (let nl = text.indexOf("\n"); nl >= 0; nl = text.indexOf("\n", nl + 1)) starts.push(nl + 1);
  return starts;
}

/**
 * Line number (1-based) where each parsed row starts. Blank lines are skipped by
 * the parser and quoted cells may span lines, so rows are located by walking the
 * text past each row's cells rather than by counting rows.
 */
function rowLineNumbers(rows: string[][], text: string, starts: number[]): number[] {
  const lines: number[] = [];
  let pos = 0;
  const lineAt = (offset: number) => {
    let lo = 0;
    let hi = starts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if ((starts[mid] ?? 0) <= offset) lo = mid;
      else hi = mid - 1;
    }
    return lo + 1;
  };
  // The next quote and line end are found with indexOf and only looked up again once
  // passed: a loop over every character cost more than parsing the rows.
  let quote = text.indexOf('"');
  let newline = text.indexOf("\n");
  // Moves past one CSV record starting at `from`, honouring quotes.
  const skipRow = (from: number): number => {
    let i = from;
    for (;;) {
      if (quote >= 0 && quote < i) quote = text.indexOf('"', i);
      if (newline >= 0 && newline < i) newline = text.indexOf("\n", i);
      if (quote < 0 || (newline >= 0 && newline < quote)) return newline < 0 ? text.length : newline + 1;
      // Inside a quoted cell "" stands for one quote; a lone quote ends the cell.
      let close = text.indexOf('"', quote + 1);
      while (close >= 0 && text.charCodeAt(close + 1) === 34) close = text.indexOf('"', close + 2);
      if (close < 0) return text.length;
      i = close + 1;
    }
  };
  for (let r = 0; r < rows.length; r++) {
    while (pos < text.length && (text[pos] === "\n" || text[pos] === "\r" || isBlankLine(text, pos))) {
      pos = skipLine(text, pos);
    }
    lines.push(lineAt(pos));
    pos = skipRow(pos);
  }
  return lines;
}

function isBlankLine(text: string, pos: number): boolean {
  if (pos > 0 && text[pos - 1] !== "\n") return false;
  let i = pos;
  while (i < text.length && (text[i] === " " || text[i] === "\t" || text[i] === ",")) i++;
  return i < text.length ? text[i] === "\n" || text[i] === "\r" : i > pos;
}

function skipLine(text: string, pos: number): number {
  const nl = text.indexOf("\n", pos);
  return nl < 0 ? text.length : nl + 1;
}

/** Joins the three kinds, adding cross-file checks (ids unique across all files). */
export function buildCatalogue(
  files: (Pick<ParsedFile, "file" | "parts" | "problems"> & { lines?: number[] })[],
): Loaded<Catalogue> {
  const problems: Problem[] = files.flatMap((f) => f.problems);
  const kept: Part[] = [];
  const seenIn = new Map<string, string>();
  for (const f of files) {
    for (const [index, p] of f.parts.entries()) {
      const first = seenIn.get(p.id);
      const line = f.lines?.[index];
      if (first !== undefined) {
        problems.push({
          file: f.file,
          ...(line !== undefined ? { line } : {}),
          column: "id",
          message: `duplicate id (got '${p.id}', expected an id not already used in ${first})`,
        });
        continue;
      }
      seenIn.set(p.id, f.file);
      kept.push(p);
    }
  }
  return { value: indexCatalogue(kept), problems };
}

export function catalogueFromParts(parts: Part[]): Catalogue {
  return buildCatalogue([{ file: "parts", parts, problems: [] }]).value;
}
