// Fuzzy search over catalogue classes (id, name, tags, notes). Pure, so the
// catalogue page's browser script and the unit tests build the same index.
import Fuse, { type IFuseOptions } from "fuse.js";

/** What the search sees of one class; built from a Part at build time. */
export type SearchDoc = { id: string; kind: string; name: string; tags: readonly string[]; notes: string };

type Indexed = { doc: SearchDoc; id: string; name: string; tags: string; notes: string };

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
      return fuse.search(q).map((r) => ({ id: r.item.doc.id, score: r.score ?? 0 }));
    },
  };
}
