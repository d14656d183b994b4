// The JSON asset the try page fetches: the catalogue's parts, already checked
// and cleaned at build time, and the demo designs as their files hold them.
// Written once by src/pages/data/catalogue.json.ts; read here in the browser.
import type { Part } from "../../core/catalogue-index.ts";
import { KIND_IDS } from "../../core/kinds.ts";

export type DemoDesign = { id: string; title: string; input: unknown };

export type TryData = { parts: Part[]; designs: DemoDesign[] };

/** Path of the asset below the site's base. */
export const TRY_DATA_PATH = "data/catalogue.json";

const KINDS = new Set<string>(KIND_IDS);

/** A shape check of the fetched asset, so a stale or cut file is reported instead of crashing the page. */
export function readTryData(json: unknown): TryData | string {
  if (typeof json !== "object" || json === null) return "the catalogue file is not a JSON object";
  const { parts, designs } = json as { parts?: unknown; designs?: unknown };
  if (!Array.isArray(parts) || !Array.isArray(designs)) return "the catalogue file has no parts or designs list";
  for (const p of parts) {
    const part = p as { id?: unknown; kind?: unknown; name?: unknown } | null;
    if (typeof part?.id !== "string" || typeof part.name !== "string" || !KINDS.has(String(part.kind))) {
      return "the catalogue file holds an entry that is not a part";
    }
  }
  for (const d of designs) {
    const design = d as { id?: unknown; title?: unknown } | null;
    if (typeof design?.id !== "string" || typeof design.title !== "string")
      return "the catalogue file holds a demo design without an id or title";
  }
  return { parts: parts as Part[], designs: designs as DemoDesign[] };
}
