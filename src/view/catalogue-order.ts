// Row order for the catalogue tables (pure, shared by the browser script and
// its tests): a chosen column wins, then search relevance, then file order.

export type SortDirection = "ascending" | "descending";

/** A cell's sort key as the page stores it in data-sort: a number, text, or missing. */
export function parseSortKey(raw: string | undefined | null): number | string | null {
  if (raw === undefined || raw === null || raw === "") return null;
  const n = Number(raw);
  return Number.isFinite(n) && raw.trim() !== "" && /^[-+0-9.eE]+$/.test(raw.trim()) ? n : raw.toLowerCase();
}

/**
 * A cell's sort key read from its own text, so most cells need no data-sort
 * (the catalogue's bytes are mostly cells): numbers as printed (true minus
 * sign), "yes"/"no" as 1/0, text lower-cased, a tags cell's ", " as the
 * space its key joins tags with. The page writes data-sort only where this
 * would give another key than the value's own (more digits than printed, a
 * text that reads as a number), so the order is the same either way.
 */
export function textSortKey(text: string, column: string): number | string | null {
  const t = text.trim();
  if (t === "") return null;
  if (t === "yes") return 1;
  if (t === "no") return 0;
  const n = t.replace(/^\u2212/, "-");
  if (/^-?[0-9]+(\.[0-9]+)?$/.test(n)) return Number(n);
  const lower = t.toLowerCase();
  return column === "tags" ? lower.replace(/, /g, " ") : lower;
}

/** The key a cell sorts by: its data-sort when it has one, else its text's (none when not rated). */
export function cellSortKey(
  cell: { sort?: string | undefined; text: string; rated: boolean },
  column: string,
): number | string | null {
  if (!cell.rated) return null;
  return cell.sort === undefined ? textSortKey(cell.text, column) : parseSortKey(cell.sort);
}

/** Empty cells ("not rated") go last in either direction; numbers before text. */
export function compareKeys(a: number | string | null, b: number | string | null, direction: SortDirection): number {
  if (a === null || b === null) return a === b ? 0 : a === null ? 1 : -1;
  const sign = direction === "ascending" ? 1 : -1;
  if (typeof a === "number" && typeof b === "number") return sign * (a - b);
  if (typeof a === "number") return -1;
  if (typeof b === "number") return 1;
  return sign * a.localeCompare(b, "en", { numeric: true });
}

export type OrderInput<T> = {
  items: readonly T[];
  /** Original position of each item (file order). */
  position: (item: T) => number;
  /** Sort key of the chosen column, when a column is chosen. */
  key?: (item: T) => number | string | null;
  direction?: SortDirection;
  /** Search score (0 = best), when a query is active. */
  score?: (item: T) => number | undefined;
};

export function orderRows<T>({ items, position, key, direction = "ascending", score }: OrderInput<T>): T[] {
  return [...items].sort((a, b) => {
    if (key) {
      const byKey = compareKeys(key(a), key(b), direction);
      if (byKey !== 0) return byKey;
    } else if (score) {
      const d = (score(a) ?? Infinity) - (score(b) ?? Infinity);
      if (d !== 0 && !Number.isNaN(d)) return d;
    }
    return position(a) - position(b);
  });
}
