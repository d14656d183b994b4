// The series clamp diode between the sign comparator and the logic input, with a
// pull-down from the input to ground (SPEC §11.6). With the comparator low, below
// ground, the diode is reverse-biased; its leakage flows out of the logic node
// towards the comparator, so the pull-down holds the node below ground:
//   V_node = −ir(T) · R_pd.

export type ClampLow = {
  /** The logic input's level with the comparator low. */
  level_v: number;
  /** True when the comparator's low level is below ground and the diode blocks. */
  reverse_biased: boolean;
};

/**
 * `comparatorLowV` is the comparator's low output level. At or above ground the
 * diode does not block; the node then sits no higher than that level (the
 * diode's drop only lowers it), which is what a V_IL check must take.
 */
export function clampLowLevel(comparatorLowV: number, leakageA: number, pullDownOhm: number): ClampLow {
  if (comparatorLowV < 0) return { level_v: -leakageA * pullDownOhm, reverse_biased: true };
  return { level_v: comparatorLowV, reverse_biased: false };
}

/** The usual lower limit of a logic input: 0.3 V below its ground (common practice [M], REFERENCES.md). */
export const PIN_MIN_DEFAULT_V = -0.3;
