// Scratch copies of a data folder, edited one cell at a time, for tests of
// what a change to the catalogue does.
import { cpSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import Papa from "papaparse";

export function copyDataFolder(from = "data"): string {
  const dir = join(mkdtempSync(join(tmpdir(), "railsieve-data-")), "data");
  cpSync(from, dir, { recursive: true });
  return dir;
}

/** Sets one cell of the row with this id; fails loudly when the row or column is missing. */
export function setCell(dir: string, file: string, id: string, column: string, value: string): void {
  const path = join(dir, file);
  const rows = Papa.parse<string[]>(readFileSync(path, "utf8"), { skipEmptyLines: true }).data;
  const [header = []] = rows;
  const col = header.indexOf(column);
  const row = rows.find((r) => r[0] === id);
  if (col < 0 || !row) throw new Error(`setCell: no column ${column} or row ${id} in ${file}`);
  row[col] = value;
  writeFileSync(path, `${Papa.unparse(rows, { newline: "\n" })}\n`);
}

/** Edits a design file of the folder as JSON. */
export function editDesign(dir: string, id: string, edit: (d: Record<string, unknown>) => void): void {
  const path = join(dir, "designs", `${id}.json`);
  const d = JSON.parse(readFileSync(path, "utf8")) as Record<string, unknown>;
  edit(d);
  writeFileSync(path, `${JSON.stringify(d, null, 2)}\n`);
}
