// Columns shared by every part kind (SPEC §4).
import { idCell, optionalEnum, optionalNumber, optionalText, requiredText, tagsCell } from "./cells.ts";

export const STATUSES = ["stocked", "approved", "listed"] as const;
export type Status = (typeof STATUSES)[number];

export const commonColumns = {
  id: idCell({ unit: "", label: "Id" }),
  name: requiredText({ unit: "", label: "Name" }),
  // .meta() again on the outer schema: a transform wraps the cell, hiding the inner metadata.
  status: optionalEnum(STATUSES, { unit: "", label: "Status" })
    .transform((s): Status => s ?? "listed")
    .meta({ unit: "", label: "Status" }),
  cost_band: optionalNumber({ unit: "1–5", label: "Cost band" }, { integer: true, min: 1, max: 5 }),
  tags: tagsCell({ unit: "", label: "Tags" }),
  notes: optionalText({ unit: "", label: "Notes" }),
};
