// The two-op-amp full-wave rectifier's gains from its five resistors (SPEC
// §11.2; S. Franco, Design with Operational Amplifiers and Analog Integrated
// Circuits, precision-rectifier section; Sedra & Smith, precision rectifiers).
//
// Stage 1 (inverting half-wave, input resistor Ri1, feedback Rf1) gives
// s1 = −x·Rf1/Ri1 for x > 0 and 0 for x < 0. Stage 2 (inverting summer,
// input Ra from x, Rb from s1, feedback Rf2) gives out = −Rf2·(x/Ra + s1/Rb).
// Positive half: g+ = Rf2·(Rf1/(Ri1·Rb) − 1/Ra); negative half: g− = Rf2/Ra.
// With Ri1 = Rf1 = Ra = Rf2 = R and Rb = R/2 both are 1.

export type RectifierResistors = { ri1: number; rf1: number; ra: number; rb: number; rf2: number };

/** The usual values: every resistor R, the summer's input from stage 1 R/2. */
export function nominalResistors(r: number): RectifierResistors {
  return { ri1: r, rf1: r, ra: r, rb: r / 2, rf2: r };
}

export function halfWaveGains(x: RectifierResistors): { positive: number; negative: number } {
  return { positive: x.rf2 * (x.rf1 / (x.ri1 * x.rb) - 1 / x.ra), negative: x.rf2 / x.ra };
}

export type RatioSpread = {
  /** Largest |g+ − 1| and |g− − 1| over the corners. */
  positive: number;
  negative: number;
  /** Largest |(g+ + g−)/2 − 1|: the part both halves share, which a one-point gain calibration removes. */
  common: number;
  /** Largest |g+ − g−|: after a one-point calibration on one half, the other half is off by this. */
  difference: number;
};

const KEYS = ["ri1", "rf1", "ra", "rb", "rf2"] as const;

/**
 * Worst case over all 32 corners of the five resistors at ±t. Each gain is
 * monotonic in every resistor, so its extremes lie at corners; the common
 * part and the difference are too (sums of monotonic functions of disjoint
 * sign patterns are checked at every corner, not assumed).
 */
export function ratioSpread(r: number, t: number): RatioSpread {
  const nominal = nominalResistors(r);
  const out: RatioSpread = { positive: 0, negative: 0, common: 0, difference: 0 };
  for (let mask = 0; mask < 32; mask++) {
    const x = { ...nominal };
    KEYS.forEach((k, i) => {
      x[k] = nominal[k] * (mask & (1 << i) ? 1 + t : 1 - t);
    });
    const g = halfWaveGains(x);
    out.positive = Math.max(out.positive, Math.abs(g.positive - 1));
    out.negative = Math.max(out.negative, Math.abs(g.negative - 1));
    out.common = Math.max(out.common, Math.abs((g.positive + g.negative) / 2 - 1));
    out.difference = Math.max(out.difference, Math.abs(g.positive - g.negative));
  }
  return out;
}
