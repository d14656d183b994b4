// Runs CSV text through the real catalogue parser and returns the house sentences.
import { parseCatalogueText, type PartKind } from "../../src/core/catalogue.ts";
import { formatProblem } from "../../src/core/problems.ts";
import { COMPARATOR_CELLS, csvText, DIODE_CELLS, OP_AMP_CELLS, type Cells } from "./parts.ts";

export const BASE_CELLS: Record<PartKind, Record<string, string>> = {
  "op-amp": OP_AMP_CELLS,
  comparator: COMPARATOR_CELLS,
  diode: DIODE_CELLS,
};

export const FILE_OF: Record<PartKind, string> = {
  "op-amp": "op-amps.csv",
  comparator: "comparators.csv",
  diode: "diodes.csv",
};

/** Problems of a file whose only row is the base part with these cells changed. */
export function rowProblems(kind: PartKind, overrides: Cells): string[] {
  return textProblems(kind, csvText(BASE_CELLS[kind], [overrides]));
}

export function textProblems(kind: PartKind, text: string): string[] {
  return parseCatalogueText(kind, FILE_OF[kind], text).problems.map(formatProblem);
}
