// What one catalogue table cell shows and stores (pure: the pages render it,
// the unit tests check it against the browser script's reading of it).
import { parseSortKey, textSortKey } from "./catalogue-order.ts";
import { formatCell, formatParameter, sortKey, type Column } from "./parameters.ts";

export type CatalogueCell = {
  /** The visible text; empty when not rated. */
  text: string;
  /** What a screen reader and a search by eye read in an empty cell ("not rated"). */
  spoken: string;
  rated: boolean;
  /** data-sort, only where the text alone would sort differently (see textSortKey). */
  sort?: string;
};

export function catalogueCell(column: Column, value: unknown): CatalogueCell {
  const text = formatCell(value);
  if (text === "") return { text, spoken: formatParameter(column, value), rated: false };
  const key = sortKey(value);
  const stored = key === null ? undefined : String(key);
  const same = parseSortKey(stored) === textSortKey(text, column.key);
  return { text, spoken: text, rated: true, ...(same || stored === undefined ? {} : { sort: stored }) };
}

/** Columns whose cells read left to right as words; the rest are numbers, set right. */
const TEXT_COLUMNS = new Set(["id", "status", "output", "type", "unity_gain_stable", "phase_reversal", "input_fet"]);

export function isTextColumn(key: string): boolean {
  return TEXT_COLUMNS.has(key) || key === "name" || key === "tags";
}
