// Each part kind's CSV row schema and columns (the loader's half of the kind
// registry in kinds.ts). The Part type is derived from these schemas.
import type { z } from "zod";
import type { PartKind } from "./kinds.ts";
import { comparatorColumns, comparatorRow } from "./schemas/comparator.ts";
import { diodeColumns, diodeRow } from "./schemas/diode.ts";
import { opAmpColumns, opAmpRow } from "./schemas/op-amp.ts";

export const KIND_ROWS = {
  "op-amp": { columns: opAmpColumns, row: opAmpRow },
  comparator: { columns: comparatorColumns, row: comparatorRow },
  diode: { columns: diodeColumns, row: diodeRow },
} as const satisfies Record<PartKind, { columns: Record<string, z.ZodType>; row: z.ZodType }>;

/** One catalogue row, tagged with its kind. */
export type Part = z.output<(typeof KIND_ROWS)[PartKind]["row"]>;

/** The row type of one kind. */
export type PartOf<K extends PartKind> = Extract<Part, { kind: K }>;
