// SPEC §9 and §12.4: where the input can carry more than extra-low voltage —
// the signal itself or a stated fault — every surface shows the usual caution.
import type { Design } from "./schemas/design.ts";

/** The level above which the guide shows its caution (the project's extra-low-voltage line). */
export const HIGH_VOLTAGE_V = 30;

/** The largest voltage the design says its input may see: the signal's peak or the stated fault. */
export function highestInputV(design: Design): number {
  return Math.max(design.signal.peak_v, design.signal.fault_v ?? 0);
}

export function needsCaution(design: Design): boolean {
  return highestInputV(design) > HIGH_VOLTAGE_V;
}
