// Row order for the catalogue tables (pure, shared by the browser script and
// its tests): a chosen column wins, then search relevance, then file order.

export type SortDirection = "ascending" | "descending";

/** A cell's sort key as the page stores it in data-sort: a number, text, or missing. */
export function parseSortKey(raw: string | undefined | null): number | string | null {
  if (raw === undefined || raw === null || raw === "") return null;
  const n = Number(raw);
  return Number.isFinite(n) && raw.trim() !== "" && /^[-+0-9.eE]+$/.test(raw.trim()) ? n : raw.toLowerCase();
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
