// The rule kit's data: findings, verdicts, stages (what a role asks of a
// part) and the shape of a rule. Rules and the engine both read these.
import type { PartKind, PartOf } from "../catalogue-index.ts";
import type { LoadBranch } from "../math/stage-load.ts";
import type { PumpOnRail } from "../math/pump-rail.ts";

export type { PumpOnRail };
import type { Design, Policy, Role } from "../schemas/design.ts";

/** In order of severity: verdict.ts ranks by this index. */
export const VERDICTS = ["pass", "marginal", "unrated", "fail"] as const;
export type Verdict = (typeof VERDICTS)[number];

/** One line of arithmetic, for `explain` and the site's detail view. */
export type Step = { label: string; value: number; unit: string };

export type Finding = {
  rule: string;
  verdict: Verdict;
  /** What the role needs (a level, a limit, a rate), in SI units; null when unknowable. */
  needed: number | null;
  /** What the part reaches or contributes, in SI units; null when not rated. */
  available: number | null;
  /** Signed distance from failing, in `unit`: negative fails. */
  margin: number | null;
  unit: string;
  /** Scale for ranking by relative margin (margin / limit); absent for yes/no rules. */
  limit?: number;
  reason: string;
  steps: Step[];
  /** Which stage of a role of several stages the finding is about (absent for a one-stage role). */
  stage?: string;
};

/** A voltage range a stage needs to handle, in volts. */
export type Range = { low: number; high: number };

/** What an op-amp stage asks of its part; the same rules serve every topology. */
export type OpAmpStage = {
  stage: "op-amp";
  /** Phrase naming the stage in reasons ("the buffer"). */
  label: string;
  input: Range;
  output: Range;
  /** Noise gain (1 for a follower). */
  noise_gain: number;
  /** Output offset = vos_multiplier · Vos + Ib · bias_ohm. */
  vos_multiplier: number;
  bias_ohm: number;
  /** Output error is divided by this to refer it to the signal input. */
  output_per_input: number;
  /** Peak signal amplitude at the stage input that the bandwidth error scales with (input-referred volts). */
  bandwidth_peak_v: number;
  /** Peak output swing to slew through, volts. */
  slew_amplitude_v: number;
  /** Extra output jump at each zero crossing (two diode drops), when the stage has one. */
  zero_crossing_v?: number;
  /** What a fault on the signal input puts at this stage's input pins (input-fault rule, SPEC §12.4). */
  fault?: FaultPath;
  /**
   * Peak of the signal driving the stage at its crossing, volts; the larger end of `input` when absent.
   * An inverting stage's input pins sit at 0 V while the signal reaches it through its input resistor.
   */
  zero_crossing_signal_v?: number;
  /** Input-referred peak the crossing error scales with; `bandwidth_peak_v` when absent. */
  zero_crossing_peak_v?: number;
  /** Feedback factor β while the diodes are off (SPEC §11.3); ½ (the inverting half-wave stage) when absent. */
  zero_crossing_beta?: number;
  /**
   * What the reading does while the stage is dead: "inverts" (−x for +x, off by 2x) or "clips" (the
   * output would go below 0 V and the single-supply converter reads 0, off by x). "inverts" when absent.
   */
  zero_crossing_error?: "inverts" | "clips";
  /** Where the jump's diode drops are taken, for the reason ("at −20 °C (the cold end)"). */
  zero_crossing_at?: string;
  /** What the output drives (SPEC §11.8); absent, the output-load rule cannot judge the stage and says unrated. */
  load?: StageLoad;
};

/**
 * The resistive load an op-amp stage's output drives: each branch to the node
 * it returns to (a virtual ground, ground, an input held by feedback) and that
 * node's voltage, all in parallel; `left_out` names a load the design does not state (the converter
 * pin's sampling draw without its fields), for the reason.
 */
export type StageLoad = {
  branches: LoadBranch[];
  left_out?: string;
  /**
   * The level the branches hang from, when a diode stands between it and the op amp's output (the
   * half-wave stage: the node sits one drop inside the output); the stage's output when absent.
   */
  node_v?: Range;
  /** Why the current the output delivers is no larger than the branches give (a path they do not show), for the reason. */
  note?: string;
};

/**
 * The Thévenin source a fault meets at a stage's input pins, as a function of
 * the signal input: V_th = gain·V_in + offset_v behind `ohm` (SPEC §12.4).
 */
export type FaultPath = { gain: number; offset_v: number; ohm: number; what: string };

/** What the sign decision asks of a comparator (or an op amp used as one). */
export type SignStage = {
  stage: "sign";
  label: string;
  input: Range;
  /** Divider ratio k, to refer the dead band to the input. */
  output_per_input: number;
  clamp?: ClampDiode;
  /** NPN inverter with a base clamp: the diode across base and emitter. */
  base_clamp?: ClampDiode;
  /** The deepest V− the output can see (no load, ripple trough), for reverse stress; the worst-case rail when absent. */
  deepest_negative_v?: number;
  /** What a fault on the signal input puts at the sign input (input-fault rule). */
  fault?: FaultPath;
};

export type ClampDiode = { id: string; vf_1ma_v: number; vf_10ma_v: number; ir_na: number };

/** What a diode role asks. */
export type DiodeStage = {
  stage: "diode";
  label: string;
  reverse_v: number;
  /** Phrase for where the reverse voltage comes from ("2 × drive 5.00 V"). */
  reverse_what?: string;
  /**
   * When the reverse voltage moves with the part's own drop (SPEC §11.12): needed = reverse_v + sign·Vf,
   * Vf at `current_a` and `temp_c` (the end that makes it largest, named by `at`).
   */
  reverse_vf?: { sign: 1 | -1; current_a: number; temp_c: number; at: string };
  /** Recovery time limit, seconds. */
  recovery_limit_s?: number;
  recovery_what?: string;
  /** Forward current the diode must carry, amps. */
  forward_a?: number;
  /** Where that current comes from; "twice the load" (the pump) when absent. */
  forward_what?: string;
  /** Leakage turns into an error across this resistance … */
  leakage_ohm?: number;
  /** … which must stay under this voltage at the point where it appears. */
  leakage_limit_v?: number;
  /** Divisor that refers the leakage error to the input (1 when it is compared as is). */
  leakage_per_input?: number;
  leakage_what?: string;
  /**
   * The lowest level the other end of a blocking diode reaches (the clamp: the comparator's low
   * output at the deepest V−). Leakage cannot pull the node past it; clamp-leakage clips there.
   */
  floor_v?: number;
};

export type Stage = OpAmpStage | SignStage | DiodeStage;

export type Rails = {
  positive_v: number;
  negative_v: number;
  /** A charge-pumped V− (SPEC §11.5): what a candidate's own supply current would do to it. */
  pump?: PumpOnRail;
};

/** What a rule sees of the role it checks a part for; the same for every candidate. */
export type RoleContext = {
  role: Role;
  stage: Stage;
  design: Design;
  policy: Policy;
  rails: Rails;
};

/**
 * The numbers a rule measures for one part: all the engine needs to judge and
 * rank it. The engine hands every rule the same record to fill, part after
 * part, so weighing a catalogue allocates nothing per part.
 */
export type Measured = {
  verdict: Verdict;
  needed: number;
  available: number;
  margin: number;
  /** Scale for ranking by relative margin; undefined for yes/no rules. */
  limit: number | undefined;
};

/** The sentence and the arithmetic of one finding. */
export type Explanation = { reason: string; steps: Step[] };

/** Column names of one kind, so a rule's `needs` cannot name a column the kind lacks. */
export type ColumnOf<K extends PartKind> = Exclude<keyof PartOf<K>, "kind"> & string;

export type RuleInfo<K extends PartKind = PartKind> = {
  id: string;
  /** One sentence: what the rule checks. */
  checks: string;
  /** The formula as shown on the rules page. */
  formula: string;
  /** Published source, or a note that the bound is common practice. */
  source: string;
  /** Unit of its needed/available/margin numbers (SI: V, V/s, s, A; "" for yes/no). */
  unit: string;
  /** Policy key that tunes it. */
  policy: keyof Policy | null;
  /** Part kinds it measures; the engine hands it parts of these kinds only. */
  kinds: readonly K[];
  /** Columns the rule cannot do without, per kind; an empty one makes the finding `unrated`. */
  needs: { readonly [Q in K]?: readonly ColumnOf<Q>[] };
};

/**
 * A rule over parts of kinds K: `measure` and `describe` receive exactly those
 * part types (no casts). Method syntax on purpose: a Rule<"diode"> then fits
 * where the engine keeps rules of any kind, and the engine's role check makes
 * sure it is only handed the kinds it declares.
 */
export type Rule<K extends PartKind = PartKind, Id extends string = string> = RuleInfo<K> & {
  id: Id;
  /** Pure arithmetic, no text, into `out` (see `record`): runs for every candidate on every evaluation. */
  measure(ctx: RoleContext, part: PartOf<K>, out: Measured): void;
  /** Words and steps for what `measure` wrote; runs only when a finding is read. */
  describe(m: Readonly<Measured>, ctx: RoleContext, part: PartOf<K>): Explanation;
};

/** A rule of any kind, as the engine and the registries hold it. */
export type AnyRule = Rule<PartKind, string>;
