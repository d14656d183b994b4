// Fuzzy search over the catalogue (issue 4): typos and spacing must not hide a
// class, and a query must not drag in unrelated ones.
import { describe, expect, it } from "vitest";
import { loadCatalogue } from "../../src/node/load-data.ts";
import { buildSearchIndex, normalize, type SearchDoc } from "../../src/view/search-index.ts";

const NOTE = "Values typical of the class; check the datasheet of the part you buy.";
const doc = (id: string, name: string, tags: string[], notes = NOTE, kind = "op-amp"): SearchDoc => ({
  id,
  kind,
  name,
  tags,
  notes,
});

const DOCS: SearchDoc[] = [
  doc("oa-rrio", "CMOS rail-to-rail I/O, 1 MHz", ["rail-to-rail", "rrio", "cmos"]),
  doc("oa-rro", "Precision bipolar, rail-to-rail output", ["precision", "bipolar", "rail-to-rail", "rro"]),
  doc("oa-gs", "Ground-sensing bipolar, dual", ["ground-sensing", "bipolar", "single-supply"]),
  doc(
    "oa-jfet",
    "JFET input, general purpose",
    ["jfet", "fet-input", "phase-reversal"],
    "The output reverses phase when the input nears V−.",
  ),
  doc("oa-zd", "Zero-drift CMOS rail-to-rail I/O", ["zero-drift", "chopper", "precision", "rail-to-rail"]),
  doc("cmp-od", "Open-drain general purpose, quad", ["open-drain", "open-collector", "quad"], NOTE, "comparator"),
  doc("d-schottky", "Small-signal Schottky, 30 V", ["schottky", "low-vf"], NOTE, "diode"),
  doc("d-pico", "Low-leakage junction, picoamp", ["low-leakage", "picoamp", "precision"], NOTE, "diode"),
];

describe("normalize", () => {
  it.each([
    ["Rail-to-Rail", "rail to rail"],
    ["  rail_to / rail;;x ", "rail to rail x"],
    ["Zero-drift, CMOS", "zero drift cmos"],
  ])("%j → %j", (input, expected) => expect(normalize(input)).toBe(expected));
});

describe("buildSearchIndex", () => {
  const index = buildSearchIndex(DOCS);
  const ids = (q: string) =>
    index
      .search(q)
      .map((h) => h.id)
      .sort();

  it.each<[string, string[]]>([
    // Typos: letters swapped, missing, doubled; spaces where the tag has hyphens.
    ["rial to rial", ["oa-rrio", "oa-rro", "oa-zd"]],
    ["rail to rail", ["oa-rrio", "oa-rro", "oa-zd"]],
    ["Rail-To-Rail", ["oa-rrio", "oa-rro", "oa-zd"]],
    ["schotky", ["d-schottky"]],
    ["shottky", ["d-schottky"]],
    ["jfett", ["oa-jfet"]],
    ["zero drfit", ["oa-zd"]],
    ["open drian", ["cmp-od"]],
    ["ground sensng", ["oa-gs"]],
    ["picoamp", ["d-pico"]],
    ["precison", ["d-pico", "oa-rro", "oa-zd"]],
    // The id, and the notes.
    ["cmp-od", ["cmp-od"]],
    ["reverses phase", ["oa-jfet"]],
    // Nothing like it.
    ["xyzzy", []],
    ["mosfet driver", []],
  ])("%j finds %j", (query, expected) => {
    expect(ids(query)).toEqual(expected);
  });

  it("returns every class, unscored, for an empty query", () => {
    expect(index.search("   ")).toEqual(DOCS.map((d) => ({ id: d.id, score: 0 })));
  });

  it("ranks an exact tag above a fuzzy one", () => {
    const hits = index.search("schottky");
    expect(hits[0]?.id).toBe("d-schottky");
    expect(hits[0]?.score).toBeLessThan(index.search("schotky")[0]?.score ?? 0);
  });
});

describe("search over the demo catalogue", () => {
  const { catalogue } = loadCatalogue("data");
  const index = buildSearchIndex(catalogue.parts);

  it('"rial to rial" finds exactly the classes tagged rail-to-rail (issue 4 acceptance)', () => {
    const tagged = catalogue.parts
      .filter((p) => p.tags.includes("rail-to-rail"))
      .map((p) => p.id)
      .sort();
    expect(tagged.length).toBeGreaterThan(10);
    expect(
      index
        .search("rial to rial")
        .map((h) => h.id)
        .sort(),
    ).toEqual(tagged);
  });

  it.each([
    ["comparator", (p: { kind: string }) => p.kind === "comparator"],
    ["diode", (p: { kind: string }) => p.kind === "diode"],
    ["op amp", (p: { kind: string }) => p.kind === "op-amp"],
    ["Comparators", (p: { kind: string }) => p.kind === "comparator"],
  ] as const)('the kind word "%s" finds exactly the classes of that kind', (query, isKind) => {
    const expected = catalogue.parts.filter(isKind).map((p) => p.id);
    expect(expected.length).toBeGreaterThan(5);
    expect(
      index
        .search(query)
        .map((h) => h.id)
        .sort(),
    ).toEqual([...expected].sort());
  });

  it('kind, status and other words combine: "stocked schottky diode"', () => {
    const expected = catalogue.parts
      .filter((p) => p.kind === "diode" && p.status === "stocked" && p.type === "schottky")
      .map((p) => p.id);
    expect(expected.length).toBeGreaterThan(0);
    expect(
      index
        .search("stocked schottky diode")
        .map((h) => h.id)
        .sort(),
    ).toEqual([...expected].sort());
  });

  it('the status word "stocked" finds exactly the stocked classes', () => {
    const stocked = catalogue.parts.filter((p) => p.status === "stocked").map((p) => p.id);
    expect(stocked.length).toBeGreaterThan(5);
    expect(
      index
        .search("stocked")
        .map((h) => h.id)
        .sort(),
    ).toEqual([...stocked].sort());
  });

  it('"schotky" finds only the Schottky diodes', () => {
    const schottky = catalogue.parts
      .filter((p) => p.kind === "diode" && p.type === "schottky")
      .map((p) => p.id)
      .sort();
    expect(
      index
        .search("schotky")
        .map((h) => h.id)
        .sort(),
    ).toEqual(schottky);
  });
});
