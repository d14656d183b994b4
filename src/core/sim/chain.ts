// The chain a simulation runs: plain data, built by each topology from the
// parts a design uses (SPEC §13). Every value is SI (V, A, Ω, s, Hz, V/s).
//
// Signals are named nodes: "input" (the source's open-circuit voltage), "front"
// (after the passive network) and one node per stage id; a half-wave stage also
// exposes "<id>.amp", its op amp's own output. A stage reads only nodes named
// before it, so one pass in list order advances the whole chain.

/** An op amp as the simulator sees it: the single-pole (integrator) model of Fiore ch. 5. */
export type OpAmpModel = {
  /** Gain-bandwidth product, Hz (Infinity for an ideal amplifier). */
  gbw_hz: number;
  /** Slew rate, V/s (Infinity when it never limits). */
  slew_v_per_s: number;
  /** The output's reachable range at this design's rails, V. */
  out_low_v: number;
  out_high_v: number;
  /** Input offset, V, with its sign: it appears at the output times the noise gain. */
  vos_v: number;
};

/** A diode by its two rated points: Vf(I) = vf_1ma + (vf_10ma − vf_1ma)·log10(I / 1 mA). */
export type DiodeModel = { vf_1ma_v: number; vf_10ma_v: number };

/** Closed-loop stage: output → Σ weightᵢ·inputᵢ + offset_v (+ noise_gain·Vos), single pole at GBW / noise gain. */
export type LinearStage = {
  kind: "linear";
  id: string;
  inputs: readonly { from: string; weight: number }[];
  /** Fixed output offset from the network (a level shift's b), V. */
  offset_v: number;
  noise_gain: number;
  amp: OpAmpModel;
};

/** A first-order RC low-pass (an RC at a converter pin), time constant tau_s. */
export type RcStage = { kind: "rc"; id: string; from: string; tau_s: number };

/**
 * Stage 1 of the two-op-amp full-wave rectifier (Sedra & Smith, precision
 * rectifiers): input through r_in to the inverting node, r_feedback from the
 * output node back to it, D1 from the op amp's output to the inverting node,
 * D2 from the output node to the op amp's output. For a positive input the
 * output node is −(r_feedback/r_in)·input; for a negative one it rests at 0.
 * `load_ohm` is what the output node drives to ground (the summer's input
 * resistor to its virtual ground; Infinity when unloaded).
 */
export type HalfWaveStage = {
  kind: "half-wave";
  id: string;
  from: string;
  r_in_ohm: number;
  r_feedback_ohm: number;
  load_ohm: number;
  amp: OpAmpModel;
  diode: DiodeModel;
};

export type Stage = LinearStage | RcStage | HalfWaveStage;

/** The sign comparator: its output is +1 above the threshold, −1 below. */
export type ComparatorModel = {
  from: string;
  offset_v: number;
  hysteresis_v: number;
  /** Overdrive at which the delay is rated: the output moves delay_s after the input passes it. */
  overdrive_v: number;
  delay_s: number;
};

export type ConverterModel = {
  from: string;
  bits: number;
  reference_v: number;
  /** Conversions per second; null converts continuously (every simulated point). */
  sample_rate_hz: number | null;
};

/** The firmware's reading: sign·(code + 0.5)·volts_per_code − offset_v (sign is +1 when unsigned). */
export type ReadingModel = { volts_per_code: number; offset_v: number; signed: boolean };

export type Chain = {
  /** Sine source of this peak, behind source_ohm (already inside the front network's gain). */
  source: { peak_v: number; source_ohm: number };
  /** The passive network from source to the first stage: front = gain·input + offset_v. */
  front: { gain: number; offset_v: number };
  stages: readonly Stage[];
  sign: ComparatorModel | null;
  adc: ConverterModel;
  reading: ReadingModel;
};

/** What a topology hands the simulator: its chain, or why it cannot build one. */
export type ChainBuild = { ok: true; chain: Chain; parts: Record<string, string> } | { ok: false; reason: string };
