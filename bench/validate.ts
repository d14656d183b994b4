// CSV parse and validation throughput: the three catalogue files of a seeded
// synthetic catalogue, parsed and checked the way `railsieve validate` does.
import { buildCatalogue, KINDS, parseCatalogueText, type Catalogue } from "../src/core/catalogue.ts";
import { catalogueCsv, syntheticCatalogue } from "./generate.ts";
import { median } from "./stats.ts";

export function measureValidation(base: Catalogue, parts: number, runs: number): { rows: number; rows_per_s: number } {
  const files = catalogueCsv(syntheticCatalogue(base, parts, 2));
  const once = () => {
    const parsed = KINDS.map((k) => parseCatalogueText(k.kind, k.file, files[k.file] ?? ""));
    const { value, problems } = buildCatalogue(parsed);
    if (problems.length > 0) {
      throw new Error(`bench: the generated catalogue does not validate: ${JSON.stringify(problems.slice(0, 3))}`);
    }
    return value.parts.length;
  };
  const rows = once();
  const rates: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    once();
    rates.push(rows / ((performance.now() - t0) / 1000));
  }
  return { rows, rows_per_s: median(rates) };
}
