// The series clamp diode between the sign comparator and the logic input, with a
// pull-down from the input to ground (SPEC §11.6). With the comparator low, below
// ground, the diode is reverse-biased; its leakage flows out of the logic node
// towards the comparator, so the pull-down holds the node below ground:
//   V_node = −ir(T) · R_pd,
// but never below the comparator's low level: the leakage flows only while the
// diode is reverse-biased, and at zero bias a diode carries no current (Shockley,
// I = Is·(e^(V/nV_T) − 1) = 0 at V = 0), so the node cannot be pulled past the
// level at the diode's other end. ir is rated at a reverse voltage far above that,
// so −ir·R_pd beyond the low level is a constant-current figure the diode cannot
// deliver there, not a place the node can reach.

export type ClampLow = {
  /** The logic input's level with the comparator low. */
  level_v: number;
  /** True when the comparator's low level is below ground and the diode blocks. */
  reverse_biased: boolean;
  /** −ir·R_pd, what the leakage would do as a constant current (reverse-biased only). */
  pulled_v?: number;
  /** The lowest level the node can reach: the comparator's lowest low level (reverse-biased only). */
  floor_v?: number;
  /** True when −ir·R_pd lies below the floor and the level is the floor. */
  clipped?: boolean;
};

/**
 * `comparatorLowV` is the comparator's low output level. At or above ground the
 * diode does not block; the node then sits no higher than that level (the
 * diode's drop only lowers it), which is what a V_IL check must take. Below
 * ground the node sits at −ir·R_pd, clipped at `floorV`: the lowest the low
 * level itself goes (the deepest V−, ripple's trough included), `comparatorLowV`
 * when not given.
 */
export function clampLowLevel(
  comparatorLowV: number,
  leakageA: number,
  pullDownOhm: number,
  floorV = comparatorLowV,
): ClampLow {
  if (!(comparatorLowV < 0)) return { level_v: comparatorLowV, reverse_biased: false };
  const pulled = -leakageA * pullDownOhm;
  // The deeper of the two: a floor above the low level would hide how low the node can go.
  const floor = Math.min(floorV, comparatorLowV);
  const clipped = pulled < floor;
  return { level_v: clipped ? floor : pulled, reverse_biased: true, pulled_v: pulled, floor_v: floor, clipped };
}

/** The usual lower limit of a logic input: 0.3 V below its ground (common practice [M], REFERENCES.md). */
export const PIN_MIN_DEFAULT_V = -0.3;
