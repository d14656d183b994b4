// Catalogue row schemas, and beside each a reader that gives the schema's own part
// for a valid row without zod, which took about 85 % of the time a large catalogue
// took to load. The reader runs the same cell conversions and row checks as the
// schema and gives up at the first issue, so the schema alone still words every
// problem (test/core/schemas/row.test.ts holds the two to agreeing).
import { z } from "zod";
import { cellReader, type CellReader } from "./cells.ts";

type Ctx = { addIssue: (issue: { code: "custom"; path?: string[]; message: string }) => void };

/** A check across the columns of a parsed row, adding an issue per problem. */
export type RowCheck<Row> = (row: Row, ctx: Ctx) => void;

/** Reads one row's cells, in header order; undefined when the schema would refuse the row. */
export type RowReader<T> = (cells: readonly string[]) => T | undefined;

type Flat<T> = { [K in keyof T]: T[K] };

const readerFactories = new WeakMap<object, (header: readonly string[]) => RowReader<unknown>>();

/**
 * A strict row of `columns`, checked by `checks` in order, tagged with its kind.
 * Rows are read without zod only when every column was built by cells.ts.
 */
export function partRow<const K extends string, const S extends z.core.$ZodLooseShape>(
  kind: K,
  columns: S,
  ...checks: RowCheck<z.output<z.ZodObject<S, z.core.$strict>>>[]
) {
  let object = z.strictObject(columns);
  for (const check of checks) object = object.superRefine(check);
  const tag = (row: z.output<typeof object>): Flat<{ kind: K } & z.output<typeof object>> => ({ kind, ...row });
  const schema = object.transform(tag);
  readerFactories.set(schema, (header) =>
    rowReader<z.output<typeof schema>>(kind, columns, header, checks as RowCheck<unknown>[]),
  );
  return schema;
}

/** A reader for rows laid out as `header`; undefined for a schema not made by partRow. */
export function readerFor<T>(schema: z.ZodType<T>, header: readonly string[]): RowReader<T> | undefined {
  return readerFactories.get(schema)?.(header) as RowReader<T> | undefined;
}

type Slot = { name: string; index: number; read: CellReader["read"] };

function rowReader<T>(
  kind: string,
  columns: z.core.$ZodLooseShape,
  header: readonly string[],
  checks: readonly RowCheck<unknown>[],
): RowReader<T> {
  const never: RowReader<T> = () => undefined;
  // Unknown or repeated names are problems only the schema words.
  const known = Object.keys(columns);
  if (new Set(header).size !== header.length || header.some((h) => !known.includes(h))) return never;
  let refused = false;
  const ctx: Ctx = {
    addIssue: () => {
      refused = true;
    },
  };
  const keys: Record<string, unknown> = { kind };
  const slots: Slot[] = [];
  for (const [name, schema] of Object.entries(columns)) {
    const index = header.indexOf(name);
    const cell = cellReader(schema as z.ZodType);
    // A column not built by cells.ts, or a required one missing, is left to the schema.
    if (!cell || (index < 0 && !cell.optional)) return never;
    // zod keeps an absent optional key only if its cell makes a value of nothing;
    // cells are pure, so that is known once per header.
    if (index < 0 && cell.read(undefined, ctx) === undefined) continue;
    keys[name] = undefined;
    slots.push({ name, index, read: cell.read });
  }
  if (refused) return never;
  // Every part is a copy of this template, so it has all its keys, in the schema's
  // order, from the start: V8 turns an object that gains two dozen keys one computed
  // name at a time into a slow dictionary, which cost ten times the copy. Spreading
  // `keys` once gives the template itself fast properties.
  const template = { ...keys };
  return (cells) => {
    refused = false;
    const part: Record<string, unknown> = { ...template };
    for (const { name, index, read } of slots) {
      part[name] = read(index < 0 ? undefined : (cells[index] ?? ""), ctx);
      if (refused) return undefined;
    }
    // The checks read columns only, so the `kind` they see here changes nothing.
    for (const check of checks) check(part, ctx);
    return refused ? undefined : (part as T);
  };
}
