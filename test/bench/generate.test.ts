// Synthetic catalogues are seeded (the same seed gives the same parts), keep the
// demo classes so the demo designs still name parts, mix the kinds as the demo
// catalogue does, and read back through the real CSV loader without a problem.
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { catalogueCsv, syntheticCatalogue, syntheticDesigns } from "../../bench/generate.ts";
import { buildCatalogue, KINDS, parseCatalogueText } from "../../src/core/catalogue.ts";
import { loadDataSet } from "../../src/node/load-data.ts";

const demo = loadDataSet(resolve(import.meta.dirname, "../../data"));
const designs = demo.designs.flatMap((d) => (d.design ? [d.design] : []));

describe("syntheticCatalogue", () => {
  const a = syntheticCatalogue(demo.catalogue, 3000, 1);

  it("is the same for the same seed and differs for another", () => {
    expect(syntheticCatalogue(demo.catalogue, 3000, 1).parts).toEqual(a.parts);
    expect(syntheticCatalogue(demo.catalogue, 3000, 2).parts).not.toEqual(a.parts);
  });

  it("keeps every demo class first and mixes the kinds about as the demo does (52 : 21 : 27 %)", () => {
    expect(a.parts.length).toBe(3000);
    expect(a.parts.slice(0, demo.catalogue.parts.length).map((p) => p.id)).toEqual(
      demo.catalogue.parts.map((p) => p.id),
    );
    const share = (n: number) => n / a.parts.length;
    expect(share(a.opAmps.length)).toBeCloseTo(0.52, 1);
    expect(share(a.comparators.length)).toBeCloseTo(0.21, 1);
    expect(share(a.diodes.length)).toBeCloseTo(0.27, 1);
  });

  it("reads back through the CSV loader with no problem and the same values", () => {
    const files = catalogueCsv(a);
    const { value, problems } = buildCatalogue(KINDS.map((k) => parseCatalogueText(k.kind, k.file, files[k.file]!)));
    expect(problems).toEqual([]);
    expect(value.parts.length).toBe(3000);
    const p = a.opAmps[500]!;
    expect(value.byId.get(p.id)).toMatchObject({ gbw_mhz: p.gbw_mhz, vos_max_mv: p.vos_max_mv });
  });
});

describe("syntheticDesigns", () => {
  it("keeps the demo designs and adds seeded variants with their own ids", () => {
    const ten = syntheticDesigns(designs, 10, 1);
    expect(ten.map((d) => d.id).slice(0, designs.length)).toEqual(designs.map((d) => d.id));
    expect(new Set(ten.map((d) => d.id)).size).toBe(10);
    expect(syntheticDesigns(designs, 10, 1)).toEqual(ten);
  });
});
