// Reads design files (SPEC §5): JSON text → Design, with every problem named by
// its JSON path ("designs/x.json: signal.peak_v: …").
import type { z } from "zod";
import { closest, type Problem } from "./problems.ts";
import { shown, type Design, type DesignSchema } from "./schemas/design.ts";

export type DesignFile = { file: string; design?: Design; problems: Problem[] };

export type DesignReader = {
  parseDesignText(file: string, text: string): DesignFile;
  parseDesignValue(file: string, raw: unknown): DesignFile;
};

/** The readers of design files for one design schema (src/engine.ts builds it from the registries). */
export function designReader(schema: DesignSchema): DesignReader {
  const parseDesignValue = (file: string, raw: unknown): DesignFile => {
    const result = schema.safeParse(raw);
    if (result.success) return { file, design: result.data, problems: [] };
    return { file, problems: issuesToProblems(file, result.error.issues, raw, schema) };
  };
  const parseDesignText = (file: string, text: string): DesignFile => {
    let raw: unknown;
    try {
      raw = JSON.parse(text.startsWith("\uFEFF") ? text.slice(1) : text);
    } catch (e) {
      return { file, problems: [jsonProblem(file, text, e)] };
    }
    return parseDesignValue(file, raw);
  };
  return { parseDesignText, parseDesignValue };
}

function issuesToProblems(
  file: string,
  issues: readonly z.core.$ZodIssue[],
  raw: unknown,
  schema: DesignSchema,
): Problem[] {
  const problems: Problem[] = [];
  for (const issue of issues) {
    const path = issue.path.map(String);
    if (issue.code === "unrecognized_keys") {
      const known = knownKeysAt(schema, path, raw);
      for (const key of issue.keys) {
        const guess = closest(key, known);
        const expected = guess
          ? `'${guess}'`
          : known.length > 0
            ? `one of ${known.map((k) => `'${k}'`).join(", ")}`
            : "no other key here";
        problems.push({
          file,
          path: [...path, key].join("."),
          message: `unknown key (got '${key}', expected ${expected})`,
        });
      }
      continue;
    }
    if (issue.code === "invalid_key") {
      // A record key's own message (e.g. an unknown BOM role) sits one level down.
      problems.push({ file, path: path.join("."), message: issue.issues.map((i) => i.message).join("; ") });
      continue;
    }
    if (issue.code === "invalid_type") {
      const value = valueAt(raw, path);
      const what = value === undefined ? "required value is missing" : "wrong type";
      problems.push({
        file,
        path: path.join("."),
        message: `${what} (got ${shown(value)}, expected ${expectedName(issue.expected)})`,
      });
      continue;
    }
    problems.push({ file, path: path.join("."), message: issue.message });
  }
  return problems;
}

function expectedName(expected: string): string {
  if (expected === "object") return "an object { … }";
  if (expected === "record") return "an object of role: part id";
  if (expected === "boolean") return "true or false";
  return expected;
}

function valueAt(raw: unknown, path: string[]): unknown {
  let v: unknown = raw;
  for (const key of path) {
    if (typeof v !== "object" || v === null) return undefined;
    v = (v as Record<string, unknown>)[key];
  }
  return v;
}

// Walks the schema's shape to list the keys allowed at a path, for suggestions.
// The raw value rides along so a union (the negative supply) picks its variant by `kind`.
function knownKeysAt(designSchema: DesignSchema, path: string[], raw: unknown): string[] {
  let schema: unknown = designSchema;
  for (const [i, key] of path.entries()) {
    const shape = shapeOf(schema, valueAt(raw, path.slice(0, i)));
    if (!shape) return [];
    schema = shape[key];
  }
  return Object.keys(shapeOf(schema, valueAt(raw, path)) ?? {});
}

type SchemaNode = {
  shape?: Record<string, unknown>;
  def?: { innerType?: unknown; in?: unknown; out?: unknown; options?: unknown[]; values?: unknown[] };
};

function shapeOf(schema: unknown, value: unknown): Record<string, unknown> | undefined {
  let s = schema as SchemaNode | undefined;
  for (let i = 0; i < 6 && s; i++) {
    if (s.shape) return s.shape;
    if (s.def?.options) {
      const kind = (value as { kind?: unknown } | undefined)?.kind;
      const options = s.def.options as SchemaNode[];
      const match = options.find((o) => (o.shape?.kind as SchemaNode | undefined)?.def?.values?.includes(kind));
      return match?.shape ?? Object.assign({}, ...options.map((o) => o.shape ?? {}));
    }
    const inner = (s.def?.innerType ?? s.def?.in) as SchemaNode | undefined;
    // A pipe from z.unknown() keeps its structure on the output side.
    s =
      inner?.shape || inner?.def?.innerType || inner?.def?.in || inner?.def?.options
        ? inner
        : ((s.def?.out as SchemaNode | undefined) ?? inner);
  }
  return undefined;
}

function jsonProblem(file: string, text: string, e: unknown): Problem {
  const message = e instanceof Error ? e.message : String(e);
  const at = /position (\d+)/.exec(message);
  const lineCol = /line (\d+) column (\d+)/.exec(message);
  let line: number | undefined;
  if (lineCol) line = Number(lineCol[1]);
  else if (at) line = text.slice(0, Number(at[1])).split("\n").length;
  const reason = message
    .replace(/^JSON\.parse: /, "")
    .replace(/ in JSON at position \d+.*$/, "")
    .replace(/ \(line \d+ column \d+\)$/, "");
  return {
    file,
    ...(line !== undefined ? { line } : {}),
    message: `not valid JSON: ${reason.length > 120 ? `${reason.slice(0, 117)}…` : reason} (expected a design object as in SPEC §5)`,
  };
}

/** Cross-file checks: design ids are unique. */
export function checkDesignSet(files: DesignFile[]): Problem[] {
  const seen = new Map<string, string>();
  const problems: Problem[] = [];
  for (const f of files) {
    if (!f.design) continue;
    const first = seen.get(f.design.id);
    if (first !== undefined) {
      problems.push({
        file: f.file,
        path: "id",
        message: `duplicate design id (got '${f.design.id}', expected an id not already used in ${first})`,
      });
    } else seen.set(f.design.id, f.file);
  }
  return problems;
}
