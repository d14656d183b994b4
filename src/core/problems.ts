// One input problem, as data first; formatProblem gives the house sentence
// "file:line: column 'name': what is wrong (got 'value', expected …)".

import { visibleText } from "./text-safety.ts";

export type Problem = {
  file: string;
  /** Line as counted in a text editor (header = 1). */
  line?: number;
  /** CSV column name. */
  column?: string;
  /** JSON path such as "signal.peak_v". */
  path?: string;
  message: string;
};

export function formatProblem(p: Problem): string {
  const where = p.line === undefined ? p.file : `${p.file}:${p.line}`;
  const what =
    p.column !== undefined ? ` column '${p.column}':` : p.path !== undefined && p.path !== "" ? ` ${p.path}:` : "";
  // Quoted cells may hold line breaks, terminal escapes or bidirectional
  // overrides; shown raw they would split one problem over several lines,
  // repaint the user's terminal or reverse the message.
  return visibleText(`${where}:${what} ${p.message}`);
}

/** Raised for input that cannot be used; carries every problem found, never a stack. */
export class InputError extends Error {
  readonly problems: readonly Problem[];
  constructor(problems: readonly Problem[]) {
    super(problems.map(formatProblem).join("\n"));
    this.name = "InputError";
    this.problems = problems;
  }
}

/** Damerau-free Levenshtein distance, for "did you mean" suggestions. */
export function editDistance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, i) => i);
  for (let i = 1; i <= a.length; i++) {
    let prev = row[0] ?? 0;
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const tmp = row[j] ?? 0;
      row[j] = Math.min((row[j] ?? 0) + 1, (row[j - 1] ?? 0) + 1, prev + (a[i - 1] === b[j - 1] ? 0 : 1));
      prev = tmp;
    }
  }
  return row[b.length] ?? 0;
}

export function closest(name: string, known: readonly string[]): string | undefined {
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const k of known) {
    const d = editDistance(name.toLowerCase(), k);
    if (d < bestDistance) {
      best = k;
      bestDistance = d;
    }
  }
  return bestDistance <= Math.max(3, Math.floor(name.length / 2)) ? best : undefined;
}
