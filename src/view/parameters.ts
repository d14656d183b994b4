// Catalogue columns for display. Part pages show each value in SI with a
// prefix ("1.2 MHz", "250 nA"); catalogue tables keep the CSV's own unit in
// the header and plain numbers in the cells, so they sort and read like the
// file the team maintains. Labels and units come from the schemas' .meta().
import { KINDS, type Part, type PartKind } from "../core/catalogue.ts";
import type { ColumnMeta } from "../core/schemas/cells.ts";
import { formatSI } from "../core/units.ts";
import { trimZeros } from "./trim-zeros.ts";

export type Column = { key: string; label: string; unit: string };

const MINUS = "\u2212";

type WithMeta = { meta?: () => unknown; def?: { in?: unknown; innerType?: unknown } };

/** The column's .meta(); a schema wrapped by a later .transform() keeps it on its inner schema. */
export function columnMeta(schema: unknown): ColumnMeta {
  let s = schema as WithMeta | undefined;
  for (let depth = 0; depth < 4 && s; depth++) {
    const meta = s.meta?.() as ColumnMeta | undefined;
    if (meta && typeof meta.label === "string") return meta;
    s = (s.def?.in ?? s.def?.innerType) as WithMeta | undefined;
  }
  throw new Error("catalogue column without .meta({unit, label})");
}

export function columnsOf(kind: PartKind): Column[] {
  const spec = KINDS.find((k) => k.kind === kind);
  if (!spec) throw new Error(`unknown kind ${kind}`);
  return Object.entries(spec.columns).map(([key, schema]) => {
    const meta = columnMeta(schema);
    return { key, label: meta.label, unit: meta.unit };
  });
}

/** "Offset max (mV)"; no brackets for unit-less columns. */
export function headerText(column: Column): string {
  return column.unit === "" ? column.label : `${column.label} (${column.unit})`;
}

export function valueOf(part: Part, key: string): unknown {
  return (part as Record<string, unknown>)[key];
}

// CSV unit → scale to base SI and the base unit formatSI prefixes.
const TO_SI: Readonly<Record<string, { scale: number; unit: string }>> = {
  V: { scale: 1, unit: "V" },
  mV: { scale: 1e-3, unit: "V" },
  nA: { scale: 1e-9, unit: "A" },
  mA: { scale: 1e-3, unit: "A" },
  MHz: { scale: 1e6, unit: "Hz" },
  "V/µs": { scale: 1, unit: "V/µs" },
  ns: { scale: 1e-9, unit: "s" },
  pF: { scale: 1e-12, unit: "F" },
  Ω: { scale: 1, unit: "Ω" },
  "µV/°C": { scale: 1e-6, unit: "V/°C" },
  "nV/√Hz": { scale: 1e-9, unit: "V/√Hz" },
};

export { trimZeros };

/** A rated value in SI with a prefix, trailing zeros dropped. */
export function formatRated(value: number, unit: string): string {
  const si = TO_SI[unit];
  if (!si) return plainNumber(value) + (unit === "" ? "" : ` ${unit}`);
  // Volts stay in volts (a rail-level quantity, "0.7 V" not "700 mV"); V/µs is already the datasheet unit.
  const exponent = si.unit === "V" && unit === "V" ? 0 : si.unit === "V/µs" ? 0 : undefined;
  return trimZeros(formatSI(value * si.scale, si.unit, { digits: 3, ...(exponent !== undefined ? { exponent } : {}) }));
}

/** Headroom is measured inward from the rail; a negative value lets the part go beyond it. */
export function formatHeadroom(value: number): string {
  if (value === 0) return "0 V: reaches the rail";
  const text = formatRated(value, "V");
  return value < 0 ? `${text} beyond the rail` : `${text} inside the rail`;
}

const isHeadroom = (key: string) => key.endsWith("_headroom_v");

/** The value as a part page shows it. */
export function formatParameter(column: Column, value: unknown): string {
  if (value === undefined || value === null || value === "") {
    if (column.key === "notes") return "none";
    if (column.key === "phase_reversal") return "not stated";
    if (column.key === "cost_band") return "not given";
    return "not rated";
  }
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (Array.isArray(value)) return value.length === 0 ? "none" : value.join(", ");
  if (typeof value === "number") {
    if (column.key === "cost_band") return `${value} of 5`;
    if (isHeadroom(column.key)) return formatHeadroom(value);
    return formatRated(value, column.unit);
  }
  return String(value);
}

/** The value as a catalogue table cell, in the header's unit; "" when empty. */
export function formatCell(value: unknown): string {
  if (value === undefined || value === null) return "";
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (Array.isArray(value)) return value.join(", ");
  if (typeof value === "number") return plainNumber(value);
  return String(value);
}

/** Sort key for a table cell: numbers as numbers, booleans as 1/0, text lower-cased; null when empty. */
export function sortKey(value: unknown): number | string | null {
  if (value === undefined || value === null || value === "") return null;
  if (typeof value === "number") return value;
  if (typeof value === "boolean") return value ? 1 : 0;
  if (Array.isArray(value)) return value.length === 0 ? null : value.join(" ").toLowerCase();
  return String(value).toLowerCase();
}

const PLAIN = new Intl.NumberFormat("en", { maximumSignificantDigits: 6, useGrouping: false });

/** Up to six significant digits, never an exponent, with a true minus sign. */
export function plainNumber(value: number): string {
  return PLAIN.format(value).replace("-", MINUS);
}

/** The kind registry's words (src/core/kinds.ts), re-exported for the pages. */
export { KIND_WORDS } from "../core/kinds.ts";
