// Zod builders for one CSV cell each. Every cell arrives as a string (papaparse
// gives text); each builder turns it into its typed value or adds one issue whose
// message follows the house pattern: "what is wrong (got 'value', expected …)".
// Column metadata (unit, label) rides on the schema via .meta() so the site and
// the validator read it from one place.
import { z } from "zod";
import { firstUnsafe, unsafeTextMessage } from "../text-safety.ts";
import { siValue } from "../units.ts";

export type ColumnMeta = {
  /** Unit as printed in table headers ("V", "nA", "MHz"); "" for none. */
  unit: string;
  /** Short human label for headers and part pages. */
  label: string;
  /** Scale from the cell's unit to base SI (nA → 1e-9). */
  toSI?: number;
};

export const NUMBER_EXAMPLES = "a number such as 0.5, 500m or 2.2k";

function got(raw: string): string {
  const shown = raw.length > 40 ? `${raw.slice(0, 37)}…` : raw;
  return `got '${shown}'`;
}

/** Builds the message for a value that is not what the column expects. */
export function cellMessage(what: string, raw: string, expected: string): string {
  return `${what} (${got(raw)}, expected ${expected})`;
}

type Issues = { addIssue: (issue: { code: "custom"; message: string }) => void };

/**
 * The conversion inside a cell schema, kept beside it so schemas/row.ts can read a
 * valid row without running zod per cell. An added issue means the cell is refused.
 */
export type CellReader = { optional: boolean; read: (raw: string | undefined, ctx: Issues) => unknown };

const readers = new WeakMap<z.ZodType, CellReader>();

/** How a cell schema built here converts its text; undefined for a schema built elsewhere. */
export function cellReader(schema: z.ZodType): CellReader | undefined {
  return readers.get(schema);
}

function requiredCell<T>(convert: (raw: string, ctx: Issues) => T, meta: ColumnMeta) {
  const schema = z.string().transform(convert).meta(meta);
  readers.set(schema, { optional: false, read: convert as CellReader["read"] });
  return schema;
}

function optionalCell<T>(convert: (raw: string | undefined, ctx: Issues) => T, meta: ColumnMeta) {
  const schema = z.string().optional().transform(convert).meta(meta);
  readers.set(schema, { optional: true, read: convert });
  return schema;
}

function requireText(raw: string, ctx: Issues, expected: string): boolean {
  if (raw.trim() !== "") return true;
  ctx.addIssue({ code: "custom", message: cellMessage("required value is missing", raw, expected) });
  return false;
}

type NumberOptions = { min?: number; above?: number; integer?: boolean; max?: number };

function describeRange(o: NumberOptions): string {
  const bounds: string[] = [];
  if (o.above !== undefined) bounds.push(`greater than ${o.above}`);
  if (o.min !== undefined) bounds.push(`at least ${o.min}`);
  if (o.max !== undefined) bounds.push(`at most ${o.max}`);
  // The comma keeps the bound from reading as part of the example ("2.2k greater than 0").
  const what = o.integer ? "a whole number" : NUMBER_EXAMPLES;
  return bounds.length === 0 ? what : `${what}, ${bounds.join(" and ")}`;
}

/** Checks `v`, the number read from `raw` (undefined if it is none), against the column's bounds. */
function toNumber(
  raw: string,
  v: number | undefined,
  ctx: Issues,
  o: NumberOptions,
  expected: string,
): number | typeof z.NEVER {
  if (v === undefined) {
    ctx.addIssue({ code: "custom", message: cellMessage("not a number", raw, expected) });
    return z.NEVER;
  }
  const wrong =
    (o.integer && !Number.isInteger(v)) ||
    (o.min !== undefined && v < o.min) ||
    (o.above !== undefined && v <= o.above) ||
    (o.max !== undefined && v > o.max);
  if (wrong) {
    const what =
      (o.min === 0 || o.above === 0) && v < 0
        ? "must not be negative"
        : o.integer && !Number.isInteger(v)
          ? "not a whole number"
          : "out of range";
    ctx.addIssue({ code: "custom", message: cellMessage(what, raw, expected) });
    return z.NEVER;
  }
  return v;
}

/** A required number cell with SI prefixes allowed. */
export function requiredNumber(meta: ColumnMeta, o: NumberOptions = {}) {
  const expected = describeRange(o);
  return requiredCell((raw, ctx) => {
    // Read before the blank test: blank text is never a number, so a number spares trimming twice.
    const v = siValue(raw);
    if (v === undefined && !requireText(raw, ctx, expected)) return z.NEVER;
    return toNumber(raw, v, ctx, o, expected);
  }, meta);
}

/** An optional number cell: empty means "not rated" (undefined). */
export function optionalNumber(meta: ColumnMeta, o: NumberOptions = {}) {
  const expected = describeRange(o);
  return optionalCell((raw, ctx) => {
    if (raw === undefined) return undefined;
    const v = siValue(raw);
    if (v === undefined && raw.trim() === "") return undefined;
    return toNumber(raw, v, ctx, o, expected);
  }, meta);
}

function quoteList(values: readonly string[]): string {
  return values.map((v) => `'${v}'`).join(" or ");
}

export function requiredEnum<const T extends readonly [string, ...string[]]>(values: T, meta: ColumnMeta) {
  const expected = quoteList(values);
  return requiredCell((raw, ctx): T[number] => {
    if (!requireText(raw, ctx, expected)) return z.NEVER;
    const v = raw.trim();
    if ((values as readonly string[]).includes(v)) return v as T[number];
    ctx.addIssue({ code: "custom", message: cellMessage("unknown value", raw, expected) });
    return z.NEVER;
  }, meta);
}

function readOptionalEnum<T extends readonly string[]>(values: T, raw: string | undefined, ctx: Issues) {
  if (raw === undefined || raw.trim() === "") return undefined;
  const v = raw.trim();
  if ((values as readonly string[]).includes(v)) return v as T[number];
  ctx.addIssue({ code: "custom", message: cellMessage("unknown value", raw, quoteList(values)) });
  return z.NEVER;
}

export function optionalEnum<const T extends readonly [string, ...string[]]>(values: T, meta: ColumnMeta) {
  return optionalCell((raw, ctx): T[number] | undefined => readOptionalEnum(values, raw, ctx), meta);
}

/** An optional enum cell that reads as `fallback` when empty. */
export function defaultedEnum<const T extends readonly [string, ...string[]]>(
  values: T,
  fallback: T[number],
  meta: ColumnMeta,
) {
  return optionalCell((raw, ctx): T[number] => readOptionalEnum(values, raw, ctx) ?? fallback, meta);
}

function toYesNo(raw: string, ctx: Issues): boolean | typeof z.NEVER {
  const v = raw.trim().toLowerCase();
  if (v === "yes") return true;
  if (v === "no") return false;
  ctx.addIssue({ code: "custom", message: cellMessage("not yes or no", raw, "'yes' or 'no'") });
  return z.NEVER;
}

export function requiredYesNo(meta: ColumnMeta) {
  return requiredCell((raw, ctx) => (requireText(raw, ctx, "'yes' or 'no'") ? toYesNo(raw, ctx) : z.NEVER), meta);
}

export function optionalYesNo(meta: ColumnMeta) {
  return optionalCell((raw, ctx) => (raw === undefined || raw.trim() === "" ? undefined : toYesNo(raw, ctx)), meta);
}

export const MAX_TEXT_LENGTH = 2000;

export function requiredText(meta: ColumnMeta) {
  return requiredCell((raw, ctx) => {
    if (!requireText(raw, ctx, "some text")) return z.NEVER;
    return checkLength(raw.trim(), ctx);
  }, meta);
}

export function optionalText(meta: ColumnMeta) {
  return optionalCell((raw, ctx) => checkLength((raw ?? "").trim(), ctx), meta);
}

/** Length and characters of a text cell: control characters and bidirectional overrides are refused. */
function checkLength(text: string, ctx: Issues): string {
  if (text.length > MAX_TEXT_LENGTH) {
    ctx.addIssue({
      code: "custom",
      message: `text is ${text.length} characters long (expected at most ${MAX_TEXT_LENGTH})`,
    });
    return z.NEVER;
  }
  const unsafe = firstUnsafe(text);
  if (unsafe === undefined) return text;
  ctx.addIssue({ code: "custom", message: unsafeTextMessage(unsafe) });
  return z.NEVER;
}

export const ID_PATTERN = /^[a-z0-9][a-z0-9-]*$/;

export function idCell(meta: ColumnMeta) {
  const expected = "lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters";
  return requiredCell((raw, ctx) => {
    if (!requireText(raw, ctx, expected)) return z.NEVER;
    const v = raw.trim();
    if (ID_PATTERN.test(v) && v.length <= 80) return v;
    ctx.addIssue({ code: "custom", message: cellMessage("not a valid id", raw, expected) });
    return z.NEVER;
  }, meta);
}

/** ";"-separated search words; blanks dropped. */
export function tagsCell(meta: ColumnMeta) {
  return optionalCell((raw, ctx) => {
    const text = checkLength((raw ?? "").trim(), ctx);
    if (typeof text !== "string") return z.NEVER;
    // indexOf and slice: String.split cost twice as much, on every row.
    const words: string[] = [];
    for (let start = 0; ;) {
      const end = text.indexOf(";", start);
      const word = (end < 0 ? text.slice(start) : text.slice(start, end)).trim();
      if (word !== "") words.push(word);
      if (end < 0) return words;
      start = end + 1;
    }
  }, meta);
}
