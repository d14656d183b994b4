// Columns shared by every part kind (SPEC §4).
import {
  defaultedEnum,
  idCell,
  optionalNumber,
  optionalText,
  requiredNumber,
  requiredText,
  tagsCell,
} from "./cells.ts";

export const STATUSES = ["stocked", "approved", "listed"] as const;
export type Status = (typeof STATUSES)[number];

export const commonColumns = {
  id: idCell({ unit: "", label: "Id" }),
  name: requiredText({ unit: "", label: "Name" }),
  status: defaultedEnum(STATUSES, "listed", { unit: "", label: "Status" }),
  cost_band: optionalNumber({ unit: "1–5", label: "Cost band" }, { integer: true, min: 1, max: 5 }),
  tags: tagsCell({ unit: "", label: "Tags" }),
  notes: optionalText({ unit: "", label: "Notes" }),
};

/** Package and supply columns shared by op amps and comparators. */
export const amplifierColumns = {
  channels: requiredNumber({ unit: "", label: "Channels" }, { integer: true, min: 1, max: 8 }),
  supply_min_v: requiredNumber({ unit: "V", label: "Supply min" }, { above: 0 }),
  supply_max_v: requiredNumber({ unit: "V", label: "Supply max" }, { above: 0 }),
  icm_neg_headroom_v: requiredNumber({ unit: "V", label: "Input headroom to V−" }),
  icm_pos_headroom_v: requiredNumber({ unit: "V", label: "Input headroom to V+" }),
};
