// Fuzzy search over catalogue classes (id, name, tags, notes, kind and status words). Pure, so the
// catalogue page's browser script and the unit tests build the same index.
import Fuse, { type IFuseOptions } from "fuse.js";
import { KINDS, type KindWords } from "../core/kinds.ts";

/** What the search sees of one class; built from a Part at build time. */
export type SearchDoc = {
  id: string;
  kind: string;
  name: string;
  tags: readonly string[];
  notes: string;
  status?: string;
};

type Indexed = { doc: SearchDoc; id: string; name: string; tags: string; notes: string };

/**
 * Kind and status words filter exactly rather than fuzzily: "comparator" should
 * list the comparators, not every class whose notes look a bit like it.
 */
const KIND_WORDS: Readonly<Record<string, string>> = Object.fromEntries(
  KINDS.flatMap((k) =>
    [k.words.one, k.words.many, ...((k.words as KindWords).also ?? [])].map((w) => [w.toLowerCase(), k.kind]),
  ),
);
const STATUS_WORDS: readonly string[] = ["stocked", "approved", "listed"];

type Filters = { kind?: string; status?: string; rest: string };

/** Takes the kind and status words out of a normalized query. */
function filtersOf(query: string): Filters {
  const filters: Filters = { rest: query };
  let rest = ` ${query} `;
  for (const [words, kind] of Object.entries(KIND_WORDS)) {
    if (rest.includes(` ${words} `)) {
      filters.kind = kind;
      rest = rest.replace(` ${words} `, " ");
    }
  }
  for (const status of STATUS_WORDS) {
    if (rest.includes(` ${status} `)) {
      filters.status = status;
      rest = rest.replace(` ${status} `, " ");
    }
  }
  filters.rest = rest.trim();
  return filters;
}

/**
 * Hyphens, slashes and underscores become spaces on both sides, so a query
 * typed with spaces ("rail to rail") lines up character for character with a
 * tag written with hyphens ("rail-to-rail") and a typo costs only its own edits.
 */
export function normalize(text: string): string {
  return text
    .toLowerCase()
    .replace(/[-_/;,]+/g, " ")
    .replace(/\s+/g, " ")
    .trim();
}

const OPTIONS: IFuseOptions<Indexed> = {
  keys: [
    { name: "id", weight: 2 },
    { name: "name", weight: 3 },
    { name: "tags", weight: 3 },
    { name: "notes", weight: 1 },
  ],
  // Words may sit anywhere in a name or note; distance from the start means nothing here.
  ignoreLocation: true,
  ignoreDiacritics: true,
  includeScore: true,
  threshold: 0.34,
  minMatchCharLength: 2,
};

export type SearchIndex = { search(query: string): SearchHit[] };
export type SearchHit = { id: string; score: number };

export function buildSearchIndex(docs: readonly SearchDoc[]): SearchIndex {
  const items: Indexed[] = docs.map((doc) => ({
    doc,
    id: normalize(doc.id),
    name: normalize(doc.name),
    tags: doc.tags.map(normalize).join(" "),
    notes: normalize(doc.notes),
  }));
  const fuse = new Fuse(items, OPTIONS);
  return {
    search(query) {
      const q = normalize(query);
      if (q === "") return docs.map((d) => ({ id: d.id, score: 0 }));
      const { kind, status, rest } = filtersOf(q);
      const keep = (d: SearchDoc) =>
        (kind === undefined || d.kind === kind) && (status === undefined || d.status === status);
      if (rest === "") return docs.filter(keep).map((d) => ({ id: d.id, score: 0 }));
      return fuse
        .search(rest)
        .filter((r) => keep(r.item.doc))
        .map((r) => ({ id: r.item.doc.id, score: r.score ?? 0 }));
    },
  };
}
