// Writing CSV cells for spreadsheets: quote when needed, and neutralise cells a
// spreadsheet would run as a formula (OWASP "CSV injection": = + - @ tab CR).
const FORMULA_START = /^[=+\-@\t\r]/;

export function csvCell(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return "";
  let text = typeof value === "number" ? (Number.isFinite(value) ? String(value) : "") : String(value);
  // Numbers are data, not formulas: only text gets the quote prefix.
  if (typeof value !== "number" && FORMULA_START.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) || text !== text.trim() ? `"${text.replace(/"/g, '""')}"` : text;
}

export function csvLine(cells: readonly (string | number | boolean | null | undefined)[]): string {
  return cells.map(csvCell).join(",");
}
