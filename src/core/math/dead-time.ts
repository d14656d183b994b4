// Dead time of a precision-rectifier stage at the zero crossing (SPEC §11.3).
// While its diodes are off the op amp runs open loop, and beyond its open-loop
// pole it is an integrator, A(s) ≈ ωt/s with ωt = 2π·GBW (textbook single-pole
// model, Fiore ch. 5). Near a crossing the error at its inputs grows as
// β·S·t (S = 2π·f·W, the input's slope at zero), so the output moves at
//   dv/dt = min(ωt·β·S·t, SR):
// a parabola v = ωt·β·S·t²/2 until the rate reaches the slew rate at
// t₁ = SR/(ωt·β·S), a straight line at SR after that. The dead time is the time
// to cross ΔV = 2·Vf, taken exactly from the piecewise law.

export type DeadTimeInput = {
  gbw_hz: number;
  slew_v_per_s: number;
  /** Feedback factor β of the stage (½ for the inverting half-wave stage). */
  beta: number;
  /** Slope of the stage's input at the crossing, S = 2π·f·W, V/s. */
  input_slope_v_per_s: number;
  /** Output jump to cross, ΔV = 2·Vf, volts. */
  jump_v: number;
};

export type DeadTime = {
  seconds: number;
  /** "gain-bandwidth" when the parabola crosses ΔV before the rate reaches SR; else "gain-bandwidth-then-slew". */
  regime: "gain-bandwidth" | "gain-bandwidth-then-slew";
  /** ωt·β·S, the output's acceleration in the integrator regime, V/s². */
  acceleration_v_per_s2: number;
  /** t₁ = SR/(ωt·β·S): when the output rate reaches the slew rate. */
  slew_onset_s: number;
  /** v(t₁) = SR·t₁/2: the output already moved when slewing starts. */
  slew_onset_v: number;
  /** √(2ΔV/(ωt·β·S)): the time had the op amp no slew limit. */
  gbw_only_s: number;
  /** ΔV/SR: the time had the op amp no gain-bandwidth limit (the old estimate). */
  slew_only_s: number;
};

export function deadTime(p: DeadTimeInput): DeadTime {
  const accel = 2 * Math.PI * p.gbw_hz * p.beta * p.input_slope_v_per_s;
  const sr = p.slew_v_per_s;
  const onset = sr / accel;
  const onsetV = (sr * onset) / 2;
  const gbwOnly = Math.sqrt((2 * p.jump_v) / accel);
  const slewOnly = p.jump_v / sr;
  const parabola = p.jump_v <= onsetV;
  return {
    seconds: parabola ? gbwOnly : onset + (p.jump_v - onsetV) / sr,
    regime: parabola ? "gain-bandwidth" : "gain-bandwidth-then-slew",
    acceleration_v_per_s2: accel,
    slew_onset_s: onset,
    slew_onset_v: onsetV,
    gbw_only_s: gbwOnly,
    slew_only_s: slewOnly,
  };
}

/**
 * Input-referred error while the sign of a reading is wrong for `seconds` after
 * a crossing: the input has reached 2π·f·peak·t (its slope at zero times t) and
 * the reading is off by twice that (−x instead of +x); by once that where the
 * output only clips at 0 V instead of inverting (SPEC §11.3–§11.4).
 */
export function crossingError(
  frequencyHz: number,
  peakV: number,
  seconds: number,
  mode: "inverts" | "clips" = "inverts",
): number {
  const reached = 2 * Math.PI * frequencyHz * peakV * seconds;
  return mode === "inverts" ? 2 * reached : reached;
}

/** The longest time the sign (or a stage) may be late for `crossingError` to stay inside `limitV`. */
export function timeForError(
  frequencyHz: number,
  peakV: number,
  limitV: number,
  mode: "inverts" | "clips" = "inverts",
): number {
  return limitV / crossingError(frequencyHz, peakV, 1, mode);
}
