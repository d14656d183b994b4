// Budget terms of rectify-and-sign that come from timing (SPEC §11.3–§11.4): the
// rectifier's dead time at each crossing and the late sign decision. Each
// rule's `available` is already the input-referred error, 2·2π·f·peak·t.
import { lateSign } from "../../rules/late-sign.ts";
import { zeroCrossing } from "../../rules/zero-crossing.ts";
import type { RoleTerm } from "../core/engine/budget.ts";

export const TIMING_ROLE_TERMS: readonly RoleTerm[] = [
  {
    name: "rectifier-dead-time",
    label: "rectifier dead time at the crossings",
    role: "rectifier",
    rule: zeroCrossing.id,
  },
  { name: "late-sign", label: "late sign decision at the crossings", role: "sign", rule: lateSign.id },
];
