// The row reader (src/core/schemas/row.ts) must give exactly the part the zod row
// schema gives, and give up on exactly the rows the schema refuses, so that the
// catalogue's problems still come from the schema alone. fast-check generates
// rows near the valid ones (the property arbitraries), then spoils cells, leaves
// columns out and reorders the header.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { z } from "zod";
import { KINDS } from "../../../src/core/catalogue.ts";
import { cellReader } from "../../../src/core/schemas/cells.ts";
import { readerFor } from "../../../src/core/schemas/row.ts";
import { BASE_CELLS } from "../../helpers/catalogue.ts";
import { comparatorCells, diodeCells, opAmpCells } from "../../property/arbitraries.ts";

type Spec = (typeof KINDS)[number];

const CELLS = { "op-amp": opAmpCells, comparator: comparatorCells, diode: diodeCells } as const;

/** Texts that sit on the edge of some cell's rule: blanks, bounds, prefixes, words of other columns. */
const TRICKY = [
  "",
  " ",
  "0",
  "-0",
  "-1",
  "1",
  "5",
  "6",
  "8",
  "9",
  "1.5",
  " 2.2k ",
  "1e999",
  "10µ",
  "1 k",
  "NaN",
  "0x10",
  "yes",
  "No",
  "maybe",
  "push-pull",
  "open-drain",
  "schottky",
  "stocked",
  "Listed",
  "oa-x",
  "OA-X",
  "-bad",
  "a;;b; c",
  "x".repeat(2001),
  "a".repeat(81),
];

const spoiled = (cells: fc.Arbitrary<Record<string, string>>) =>
  fc
    .tuple(
      cells,
      fc.array(fc.tuple(fc.nat(), fc.oneof(fc.constantFrom(...TRICKY), fc.string({ maxLength: 8 }))), {
        maxLength: 3,
      }),
      fc.array(fc.nat(), { maxLength: 3 }),
      fc.array(fc.nat()),
    )
    .map(([record, changes, dropped, order]) => {
      const names = Object.keys(record);
      const cells: Record<string, string> = { ...record };
      for (const [at, value] of changes) cells[names[at % names.length] ?? "id"] = value;
      for (const at of dropped) delete cells[names[at % names.length] ?? "id"];
      const header = Object.keys(cells);
      // A seeded shuffle: columns may come in any order in a file.
      for (let i = header.length - 1; i > 0; i--) {
        const j = (order[i % Math.max(order.length, 1)] ?? i) % (i + 1);
        [header[i], header[j]] = [header[j] ?? "", header[i] ?? ""];
      }
      return { header, cells };
    });

function agree(spec: Spec, header: string[], cells: Record<string, string>): void {
  const schema: z.ZodType = spec.row;
  const read = readerFor(schema, header);
  expect(read).toBeTypeOf("function");
  const fast = read?.(header.map((c) => cells[c] ?? ""));
  const zod = schema.safeParse(cells);
  expect(fast !== undefined, JSON.stringify(cells)).toBe(zod.success);
  if (zod.success) {
    expect(fast).toStrictEqual(zod.data);
    // Same key order too, as JSON output and table columns follow it.
    expect(Object.keys(fast as object)).toEqual(Object.keys(zod.data as object));
  }
}

describe("row reader", () => {
  it.each(KINDS.map((k) => [k.kind, k] as const))("%s: every column has a cell reader", (_kind, spec) => {
    for (const [name, schema] of Object.entries(spec.columns)) expect(cellReader(schema), name).toBeDefined();
  });

  it.each(KINDS.map((k) => [k.kind, k] as const))("%s: the base row reads as the schema reads it", (kind, spec) => {
    const cells = BASE_CELLS[kind];
    agree(spec, Object.keys(cells), cells);
    expect(readerFor(spec.row as z.ZodType, Object.keys(cells))?.(Object.values(cells))).toBeDefined();
  });

  it.each(KINDS.map((k) => [k.kind, k] as const))(
    "%s: agrees with the schema on generated, spoiled and reordered rows",
    (kind, spec) => {
      fc.assert(
        fc.property(spoiled(CELLS[kind]), ({ header, cells }) => agree(spec, header, cells)),
        { numRuns: 400 },
      );
    },
  );

  it("agrees when a column the reader fills by itself is absent (status, tags, notes, optional numbers)", () => {
    for (const spec of KINDS) {
      const cells: Record<string, string> = { ...BASE_CELLS[spec.kind] };
      for (const optional of ["status", "tags", "notes", "cost_band", "trr_ns", "hysteresis_mv", "phase_reversal"])
        delete cells[optional];
      agree(spec, Object.keys(cells), cells);
    }
  });

  it("leaves a header with unknown or repeated columns to the schema", () => {
    const schema: z.ZodType = KINDS[2]!.row;
    const names = Object.keys(BASE_CELLS.diode);
    const cells = Object.values(BASE_CELLS.diode);
    expect(readerFor(schema, [...names, "colour"])?.([...cells, "red"])).toBeUndefined();
    expect(readerFor(schema, [...names, "notes"])?.([...cells, ""])).toBeUndefined();
  });
});
