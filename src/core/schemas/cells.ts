// Zod builders for one CSV cell each. Every cell arrives as a string (papaparse
// gives text); each builder turns it into its typed value or adds one issue whose
// message follows the house pattern: "what is wrong (got 'value', expected …)".
// Column metadata (unit, label) rides on the schema via .meta() so the site and
// the validator read it from one place.
import { z } from "zod";
import { parseSI } from "../units.ts";

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

function toNumber(raw: string, ctx: Issues, o: NumberOptions): number | typeof z.NEVER {
  const expected = describeRange(o);
  const parsed = parseSI(raw);
  if (!parsed.ok) {
    ctx.addIssue({ code: "custom", message: cellMessage("not a number", raw, expected) });
    return z.NEVER;
  }
  const v = parsed.value;
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
  return z
    .string()
    .transform((raw, ctx) => (requireText(raw, ctx, describeRange(o)) ? toNumber(raw, ctx, o) : z.NEVER))
    .meta(meta);
}

/** An optional number cell: empty means "not rated" (undefined). */
export function optionalNumber(meta: ColumnMeta, o: NumberOptions = {}) {
  return z
    .string()
    .optional()
    .transform((raw, ctx) => (raw === undefined || raw.trim() === "" ? undefined : toNumber(raw, ctx, o)))
    .meta(meta);
}

function quoteList(values: readonly string[]): string {
  return values.map((v) => `'${v}'`).join(" or ");
}

export function requiredEnum<const T extends readonly [string, ...string[]]>(values: T, meta: ColumnMeta) {
  return z
    .string()
    .transform((raw, ctx): T[number] => {
      if (!requireText(raw, ctx, quoteList(values))) return z.NEVER;
      const v = raw.trim();
      if ((values as readonly string[]).includes(v)) return v as T[number];
      ctx.addIssue({ code: "custom", message: cellMessage("unknown value", raw, quoteList(values)) });
      return z.NEVER;
    })
    .meta(meta);
}

export function optionalEnum<const T extends readonly [string, ...string[]]>(values: T, meta: ColumnMeta) {
  return z
    .string()
    .optional()
    .transform((raw, ctx): T[number] | undefined => {
      if (raw === undefined || raw.trim() === "") return undefined;
      const v = raw.trim();
      if ((values as readonly string[]).includes(v)) return v as T[number];
      ctx.addIssue({ code: "custom", message: cellMessage("unknown value", raw, quoteList(values)) });
      return z.NEVER;
    })
    .meta(meta);
}

function toYesNo(raw: string, ctx: Issues): boolean | typeof z.NEVER {
  const v = raw.trim().toLowerCase();
  if (v === "yes") return true;
  if (v === "no") return false;
  ctx.addIssue({ code: "custom", message: cellMessage("not yes or no", raw, "'yes' or 'no'") });
  return z.NEVER;
}

export function requiredYesNo(meta: ColumnMeta) {
  return z
    .string()
    .transform((raw, ctx) => (requireText(raw, ctx, "'yes' or 'no'") ? toYesNo(raw, ctx) : z.NEVER))
    .meta(meta);
}

export function optionalYesNo(meta: ColumnMeta) {
  return z
    .string()
    .optional()
    .transform((raw, ctx) => (raw === undefined || raw.trim() === "" ? undefined : toYesNo(raw, ctx)))
    .meta(meta);
}

export const MAX_TEXT_LENGTH = 2000;

export function requiredText(meta: ColumnMeta) {
  return z
    .string()
    .transform((raw, ctx) => {
      if (!requireText(raw, ctx, "some text")) return z.NEVER;
      return checkLength(raw.trim(), ctx);
    })
    .meta(meta);
}

export function optionalText(meta: ColumnMeta) {
  return z
    .string()
    .optional()
    .transform((raw, ctx) => checkLength((raw ?? "").trim(), ctx))
    .meta(meta);
}

function checkLength(text: string, ctx: Issues): string {
  if (text.length <= MAX_TEXT_LENGTH) return text;
  ctx.addIssue({
    code: "custom",
    message: `text is ${text.length} characters long (expected at most ${MAX_TEXT_LENGTH})`,
  });
  return z.NEVER;
}

export const ID_PATTERN = /^[a-z0-9][a-z0-9-]*$/;

export function idCell(meta: ColumnMeta) {
  return z
    .string()
    .transform((raw, ctx) => {
      const expected = "lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters";
      if (!requireText(raw, ctx, expected)) return z.NEVER;
      const v = raw.trim();
      if (ID_PATTERN.test(v) && v.length <= 80) return v;
      ctx.addIssue({ code: "custom", message: cellMessage("not a valid id", raw, expected) });
      return z.NEVER;
    })
    .meta(meta);
}

/** ";"-separated search words; blanks dropped. */
export function tagsCell(meta: ColumnMeta) {
  return z
    .string()
    .optional()
    .transform((raw, ctx) => {
      const text = checkLength((raw ?? "").trim(), ctx);
      if (typeof text !== "string") return z.NEVER;
      return text
        .split(";")
        .map((t) => t.trim())
        .filter((t) => t !== "");
    })
    .meta(meta);
}
