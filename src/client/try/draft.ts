// The form's text ↔ a design object as a file would hold it. The draft keeps
// what the visitor typed ("4.7u"); the design schema does all the checking, so
// a draft turns into a raw object and never into a Design on its own.
import { parseDesignValue } from "./engine.ts";
import type { Problem } from "../../core/problems.ts";
import type { Design } from "../../core/schemas/design.ts";
import { parseSI } from "../../core/units.ts";
import { applies, FIELDS, type Draft, type NumberStyle } from "./fields.ts";

const PREFIXES = [
  { exponent: 9, symbol: "G" },
  { exponent: 6, symbol: "M" },
  { exponent: 3, symbol: "k" },
  { exponent: -3, symbol: "m" },
  { exponent: -6, symbol: "u" },
  { exponent: -9, symbol: "n" },
  { exponent: -12, symbol: "p" },
] as const;

/**
 * A number as an engineer would type it: 1e-6 → "1u", 4.7e-6 → "4.7u",
 * 200000 → "200k", 0.8 → "0.8". Only a text that parses back to exactly the
 * same number is used, so the form never changes a value by showing it.
 * ASCII "u" rather than "µ" keeps links short and typeable.
 */
export function siText(value: number, style: NumberStyle = "si"): string {
  const magnitude = Math.abs(value);
  if (style === "si" && magnitude !== 0 && (magnitude >= 1000 || magnitude < 0.1)) {
    for (const p of PREFIXES) {
      if (magnitude < 10 ** p.exponent) continue;
      const mantissa = Number((value / 10 ** p.exponent).toPrecision(12));
      const text = `${mantissa}${p.symbol}`;
      const back = parseSI(text);
      if (back.ok && back.value === value) return text;
      break;
    }
  }
  return String(value);
}

function valueAt(raw: unknown, path: string): unknown {
  let v: unknown = raw;
  for (const key of path.split(".")) {
    if (typeof v !== "object" || v === null || Array.isArray(v) || !Object.hasOwn(v, key)) return undefined;
    v = (v as Record<string, unknown>)[key];
  }
  return v;
}

function textOf(value: unknown, style: NumberStyle): string {
  if (typeof value === "number") return siText(value, style);
  if (typeof value === "string") return value;
  if (typeof value === "boolean") return String(value);
  return "";
}

/**
 * The draft of a design as written in a file (numbers or SI strings). Fields
 * the design does not use (a pump's capacitors on a fixed rail) come from
 * `fallback`, so switching the rail kind shows sensible values.
 */
export function draftFromInput(raw: unknown, fallback?: Readonly<Draft>): Draft {
  const draft: Draft = {};
  for (const f of FIELDS) draft[f.path] = textOf(valueAt(raw, f.path), f.type === "number" ? f.style : "plain");
  if (fallback) {
    for (const f of FIELDS) {
      if (!applies(f, draft) && draft[f.path] === "") draft[f.path] = fallback[f.path] ?? "";
    }
  }
  return draft;
}

/**
 * The raw design object a draft stands for: only the fields that apply, empty
 * boxes left out (so the schema says "required value is missing"), numbers
 * still as typed for the schema to parse.
 */
export function rawFromDraft(draft: Readonly<Draft>): Record<string, unknown> {
  const raw: Record<string, unknown> = { policy: {} };
  for (const f of FIELDS) {
    if (!applies(f, draft)) continue;
    const text = draft[f.path] ?? "";
    if (text.trim() === "") continue;
    const value = f.boolean && (text === "true" || text === "false") ? text === "true" : text;
    setAt(raw, f.path, value);
  }
  return raw;
}

function setAt(target: Record<string, unknown>, path: string, value: unknown): void {
  const keys = path.split(".");
  let node = target;
  for (const key of keys.slice(0, -1)) {
    const next = node[key];
    if (typeof next === "object" && next !== null) node = next as Record<string, unknown>;
    else {
      const created: Record<string, unknown> = {};
      node[key] = created;
      node = created;
    }
  }
  node[keys[keys.length - 1] as string] = value;
}

export type DraftCheck = { design: Design; problems: [] } | { design?: undefined; problems: Problem[] };

/** Runs a draft through the same design schema the files use. */
export function checkDraft(draft: Readonly<Draft>, file = "form"): DraftCheck {
  const parsed = parseDesignValue(file, rawFromDraft(draft));
  return parsed.design ? { design: parsed.design, problems: [] } : { problems: parsed.problems };
}

/** Policy keys the visitor set, which are the only ones a downloaded file repeats. */
export function policyOverrides(draft: Readonly<Draft>): string[] {
  return FIELDS.filter((f) => f.group === "policy" && (draft[f.path] ?? "").trim() !== "").map((f) =>
    f.path.slice("policy.".length),
  );
}
