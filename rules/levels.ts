// Output levels of a part used to drive the sign line: shared by logic-high,
// logic-low and propagation-delay.
import type { PartOf, Rails } from "../src/core/rule-kit/index.ts";

/** The kinds that can drive the sign line. */
export type Driver = PartOf<"op-amp" | "comparator">;

/** Typical drops of a small NPN switch, common practice [M]: on at 0.7 V, saturated at 0.2 V. */
export const NPN_VBE_ON_V = 0.7;
export const NPN_VCE_SAT_V = 0.2;
/** A base below this keeps the NPN off (common practice [M]). */
export const NPN_OFF_BELOW_V = 0.4;
/** Logic inputs tolerate this far beyond their supply (common practice [M]). */
export const INPUT_CLAMP_V = 0.3;

/** The driven high level, or null for an open-drain output that cannot drive high. */
export function outputHigh(part: Driver, rails: Rails): number | null {
  if (part.kind === "comparator" && part.output === "open-drain") return null;
  const headroom = part.out_pos_headroom_v ?? 0;
  return rails.positive_v - headroom;
}

export function outputLow(part: Driver, rails: Rails): number {
  return rails.negative_v + (part.out_neg_headroom_v ?? 0);
}
