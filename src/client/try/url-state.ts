// The design in the page address: one query parameter per field, named by its
// JSON path ("?supply.positive_v=5&signal.peak_v=10"), holding the text the
// visitor typed. Reading a link never throws: whatever is wrong becomes a
// problem, the unusable fields fall back to the defaults, and if that still
// does not give a valid design the whole default design is used.
import { closest, editDistance, type Problem } from "../../core/problems.ts";
import type { DesignProblem } from "../../core/engine/result.ts";
import type { Design } from "../../core/schemas/design.ts";
import { checkDraft } from "./draft.ts";
import { applies, FIELD_BY_PATH, FIELDS, type Draft } from "./fields.ts";

/** Problems found in a link are reported against this name. */
export const LINK = "link";

/** Far above any real design (about 1 kB); longer is not a link this page wrote. */
export const MAX_QUERY_CHARS = 8000;

/** The query string (without "?") for a draft: fields in file order, unused and empty ones left out. */
export function encodeDraft(draft: Readonly<Draft>): string {
  const params = new URLSearchParams();
  for (const f of FIELDS) {
    const text = draft[f.path] ?? "";
    if (text !== "" && applies(f, draft)) params.append(f.path, text);
  }
  return params.toString();
}

export type DecodedQuery = { values: Draft; problems: Problem[] };

/** The fields a query string names, and a problem for anything else in it. */
export function decodeQuery(search: string): DecodedQuery {
  const query = search.replace(/^[?#]/, "");
  const values: Draft = {};
  const problems: Problem[] = [];
  if (query.length > MAX_QUERY_CHARS) {
    problems.push({
      file: LINK,
      message: `link is ${query.length} characters long (expected at most ${MAX_QUERY_CHARS}; was it cut or pasted twice?)`,
    });
    return { values, problems };
  }
  const params = new URLSearchParams(query);
  const known = FIELDS.map((f) => f.path);
  const seen = new Set<string>();
  for (const [key, value] of params) {
    if (seen.has(key)) continue;
    seen.add(key);
    if (!FIELD_BY_PATH.has(key)) {
      // closest() is generous with short names; a link key is worth a guess only when it is a near miss.
      const near = closest(key, known);
      const guess =
        near !== undefined && editDistance(key, near) <= Math.max(2, Math.floor(key.length / 4)) ? near : undefined;
      const shownKey = key.length > 40 ? `${key.slice(0, 37)}…` : key;
      problems.push({
        file: LINK,
        path: shownKey,
        message: `unknown field (got '${shownKey}', expected ${guess ? `'${guess}'` : "a design field such as 'signal.peak_v'"}); it was ignored`,
      });
      continue;
    }
    const count = params.getAll(key).length;
    if (count > 1)
      problems.push({
        file: LINK,
        path: key,
        message: `field appears ${count} times (expected once); the first value was used`,
      });
    values[key] = value;
  }
  return { values, problems };
}

export type UrlState = {
  draft: Draft;
  design: Design;
  /** Everything wrong with the link, empty for a good one. */
  problems: Problem[];
  /** "fields": the fields in `replaced` took their default; "defaults": the whole link was unusable. */
  fallback: "none" | "fields" | "defaults";
  replaced: string[];
  /** Fields a short link leaves out, which take their defaults: a choice, not a problem. */
  defaulted: string[];
};

/** Design-level checks that need the catalogue (BOM ids, pump collapse), run after the schema. */
export type DesignCheck = (design: Design) => readonly DesignProblem[];

/**
 * The page state a link stands for. `defaults` must be a valid draft; fields a
 * link leaves out are empty (and reported) when the design needs them, and
 * taken from the defaults when it does not.
 */
export function stateFromUrl(search: string, defaults: Readonly<Draft>, check: DesignCheck = () => []): UrlState {
  const fallback = (problems: Problem[]): UrlState => {
    const design = checkDraft(defaults).design;
    if (!design) throw new Error("the default design does not validate");
    return {
      draft: { ...defaults },
      design,
      problems,
      fallback: problems.length > 0 ? "defaults" : "none",
      replaced: [],
      defaulted: [],
    };
  };
  if (search.replace(/^[?#]/, "").trim() === "") return fallback([]);

  const decoded = decodeQuery(search);
  const problems = [...decoded.problems];
  if (Object.keys(decoded.values).length === 0) {
    if (problems.length === 0)
      problems.push({ file: LINK, message: "link names no design field (expected fields such as 'signal.peak_v=10')" });
    return fallback(problems);
  }
  const completed = completeDraft(decoded.values, defaults);
  let draft = completed.draft;
  // A short link (`?signal.peak_v=3`) is a valid way to start from the defaults.
  const defaulted = completed.missing;
  const replaced: string[] = [];
  // Each pass resets the fields the schema or the engine objects to; a cross-field
  // check can blame a field only once the fields it compares with are valid.
  for (let pass = 0; pass < 4; pass++) {
    const found = problemsOf(draft, check);
    if (found.length === 0) {
      const design = checkDraft(draft).design;
      if (design)
        return { draft, design, problems, fallback: replaced.length > 0 ? "fields" : "none", replaced, defaulted };
    }
    problems.push(...found.filter((p) => !problems.some((q) => q.path === p.path && q.message === p.message)));
    const reset = fieldsAt(found);
    if (reset === "all" || reset.every((path) => draft[path] === defaults[path])) return fallback(problems);
    draft = { ...draft };
    for (const path of reset) {
      draft[path] = defaults[path] ?? "";
      if (!replaced.includes(path)) replaced.push(path);
    }
  }
  return fallback(problems);
}

/**
 * Fields a link leaves out take their default, so a hand-written short link
 * works; a list of "required value is missing" would bury whatever is wrong.
 */
function completeDraft(values: Readonly<Draft>, defaults: Readonly<Draft>): { draft: Draft; missing: string[] } {
  const draft: Draft = {};
  for (const f of FIELDS) draft[f.path] = values[f.path] ?? (f.optional ? "" : (defaults[f.path] ?? ""));
  const missing = FIELDS.filter((f) => !f.optional && !(f.path in values) && applies(f, draft)).map((f) => f.path);
  return { draft, missing };
}

function problemsOf(draft: Readonly<Draft>, check: DesignCheck): Problem[] {
  const checked = checkDraft(draft, LINK);
  if (!checked.design) return checked.problems;
  return check(checked.design).map((p) => ({ file: LINK, path: p.path, message: p.message }));
}

/** The fields a set of problems points at; "all" when one points at no field. */
function fieldsAt(problems: readonly Problem[]): string[] | "all" {
  const paths = new Set<string>();
  for (const p of problems) {
    const path = p.path ?? "";
    const hit = FIELDS.filter((f) => path !== "" && (f.path === path || f.path.startsWith(`${path}.`)));
    if (hit.length === 0) return "all";
    for (const f of hit) paths.add(f.path);
  }
  return [...paths];
}
