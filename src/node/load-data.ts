// Reads a data folder from disk (Node only): the three catalogue files and
// data/designs/*.json, with every problem collected before anything is used.
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { basename, join, relative } from "node:path";
import {
  buildCatalogue,
  KINDS,
  parseCatalogueText,
  type Catalogue,
  type ParsedFile,
  type PartKind,
} from "../core/catalogue.ts";
import { checkDesignSet, type DesignFile } from "../core/designs.ts";
import { evaluateDesign, parseDesignText } from "../engine.ts";
import type { Evaluation } from "../core/engine/result.ts";
import type { Design } from "../core/schemas/design.ts";
import type { Problem } from "../core/problems.ts";
import { decodeUtf8 } from "../core/text-decoding.ts";

export type EvaluatedDesign = { file: string; design: Design; evaluation: Evaluation };

/** A data folder; `evaluated` holds each design's evaluation when the files themselves are clean. */
export type DataSet = {
  catalogue: Catalogue;
  /** Kinds whose file the folder leaves out: no parts of that kind. */
  empty: PartKind[];
  designs: DesignFile[];
  problems: Problem[];
  evaluated: EvaluatedDesign[];
};

const MAX_FILE_BYTES = 20 * 1024 * 1024;

/** Names files relative to the folder the user ran from, as an editor would show them. */
export function displayPath(path: string): string {
  const rel = relative(process.cwd(), path);
  return rel.startsWith("..") || rel === "" ? path : rel;
}

// The system's error codes, said the way a user would fix them.
const READ_ERRORS: Readonly<Record<string, string>> = {
  ENOENT: "file not found (expected it to exist)",
  EISDIR: "is a folder (expected a file)",
  ENOTDIR: "a part of this path is a file, not a folder (expected --data to name a folder)",
  EACCES: "cannot be read (permission denied; expected a readable file)",
};

export function readText(path: string): { text?: string; problem?: Problem } {
  const file = displayPath(path);
  let bytes: Uint8Array;
  try {
    if (statSync(path).size > MAX_FILE_BYTES)
      return {
        problem: {
          file,
          message: `file is larger than ${MAX_FILE_BYTES / 1024 / 1024} MB (expected a catalogue or design file)`,
        },
      };
    bytes = readFileSync(path);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return { problem: { file, message: READ_ERRORS[code ?? ""] ?? `cannot be read (${code ?? "unknown error"})` } };
  }
  const decoded = decodeUtf8(bytes, file);
  return decoded.ok ? { text: decoded.text } : { problem: decoded.problem };
}

/**
 * The catalogue files of a folder. A kind whose file is absent is an empty
 * kind (listed in `empty`), not a problem; a folder with no catalogue file at
 * all is one, as it is more likely a wrong --data than a catalogue.
 */
export function loadCatalogue(dir: string): { catalogue: Catalogue; problems: Problem[]; empty: PartKind[] } {
  const files: ParsedFile[] = [];
  const problems: Problem[] = [];
  const empty: PartKind[] = [];
  const absent: Problem[] = [];
  for (const spec of KINDS) {
    const path = join(dir, spec.file);
    if (!existsSync(path)) {
      empty.push(spec.kind);
      absent.push({ file: displayPath(path), message: READ_ERRORS["ENOENT"] ?? "file not found" });
      continue;
    }
    const { text, problem } = readText(path);
    if (problem) {
      problems.push(problem);
      continue;
    }
    files.push(parseCatalogueText(spec.kind, displayPath(path), text ?? ""));
  }
  if (empty.length === KINDS.length) {
    return { catalogue: buildCatalogue([]).value, problems: [...absent, ...problems], empty: [] };
  }
  const built = buildCatalogue(files);
  return { catalogue: built.value, problems: [...problems, ...built.problems], empty };
}

export function loadDesignFiles(paths: string[]): { designs: DesignFile[]; problems: Problem[] } {
  const designs: DesignFile[] = [];
  for (const path of paths) {
    const file = displayPath(path);
    const { text, problem } = readText(path);
    designs.push(problem ? { file, problems: [problem] } : parseDesignText(file, text ?? ""));
  }
  const problems = [...designs.flatMap((d) => d.problems), ...checkDesignSet(designs)];
  return { designs, problems };
}

export function designPathsIn(dir: string): string[] {
  const folder = join(dir, "designs");
  try {
    return readdirSync(folder)
      .filter((f) => f.endsWith(".json"))
      .sort()
      .map((f) => join(folder, f));
  } catch {
    return [];
  }
}

/** The whole data folder; design files must be named after their id. */
export function loadDataSet(dir: string): DataSet {
  const { catalogue, problems: catalogueProblems, empty } = loadCatalogue(dir);
  const { designs, problems: designProblems } = loadDesignFiles(designPathsIn(dir));
  const nameProblems: Problem[] = [];
  for (const d of designs) {
    if (d.design && basename(d.file, ".json") !== d.design.id) {
      nameProblems.push({
        file: d.file,
        path: "id",
        message: `id does not match the file name (got '${d.design.id}', expected '${basename(d.file, ".json")}')`,
      });
    }
  }
  const problems = [...catalogueProblems, ...designProblems, ...nameProblems];
  // Only a clean set is worth evaluating: a row left out for its own problem would
  // show up again as "BOM names no part".
  if (problems.length > 0) return { catalogue, empty, designs, problems, evaluated: [] };
  const evaluated = evaluateAll(designs, catalogue);
  return { catalogue, empty, designs, problems: designProblemsOf(evaluated), evaluated };
}

function evaluateAll(designs: readonly DesignFile[], catalogue: Catalogue): EvaluatedDesign[] {
  return designs.flatMap((d) =>
    d.design ? [{ file: d.file, design: d.design, evaluation: evaluateDesign(d.design, catalogue) }] : [],
  );
}

/**
 * What only the engine can see in otherwise valid files (a BOM id naming no part
 * or the wrong kind, a charge pump past collapse): `check` stops on these, so
 * `validate` and the site build must too (issue 8: the build stops before dist/).
 */
function designProblemsOf(evaluated: readonly EvaluatedDesign[]): Problem[] {
  return evaluated.flatMap(({ file, evaluation }) =>
    evaluation.ok ? [] : evaluation.problems.map((p) => ({ file, path: p.path, message: p.message })),
  );
}
