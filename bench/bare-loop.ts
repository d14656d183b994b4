// The arithmetic limit the engine is measured against: the same margins and
// verdicts as the rules, as plain loops over typed arrays, with no findings, no
// reason text, no ranking and no objects per part. Design-level values (stages,
// rails, the chosen clamp diode) come from one engine run beforehand, as they
// do not grow with the catalogue; test/bench/bare-loop.test.ts checks that this
// loop and the engine agree on every margin.
import type { Catalogue, Part } from "../src/core/catalogue.ts";
import type { PumpOnRail, Rails, Stage } from "../src/core/rule-kit/index.ts";
import type { Derived } from "../src/core/engine/result.ts";
import { railAt } from "../src/core/math/pump-rail.ts";
import { ROLES_ON_RAIL } from "../src/topologies/rectify-and-sign-pump.ts";
import { forwardVoltage } from "../src/core/math/diode.ts";
import { CLAMP_CURRENT_MAX_A, CLAMP_SAFE_V } from "../src/core/math/input-difference.ts";
import {
  baseDriveCurrent,
  baseReverse,
  NPN_STORAGE_DEFAULT_S,
  NPN_VEBO_DEFAULT_V,
  REVERSE_DERATING,
} from "../src/core/math/npn-inverter.ts";
import { clampSourceCurrent } from "../src/core/math/output-current.ts";
import { loadSiemens } from "../src/core/math/stage-load.ts";
import { DEFAULT_PIN_CAP_F, pullUpEdge } from "../src/core/math/rc-edge.ts";
import { signTimeLimit } from "../rules/sign-path.ts";
import { LOAD_SAME } from "../rules/output-load.ts";
import { peakOf } from "../rules/stage-output-current.ts";
import { OUTPUT_CURRENT_FLOOR_A } from "../rules/output-current.ts";
import type { Design } from "../src/core/schemas/design.ts";
import { ALL_TOPOLOGIES, engine, evaluateDesign } from "../src/engine.ts";
import type { RuleId } from "../rules/index.ts";

/**
 * Rules this loop leaves out, each with its reason. Every other rule of the
 * registry must have a case in runRule: the `never` in its default branch
 * fails the type check when a rule is added without one, and
 * test/bench/bare-loop.test.ts checks the same at run time.
 */
export const NOT_BENCHMARKED = [] as const satisfies readonly { id: RuleId; why: string }[];

type Benchmarked = Exclude<RuleId, (typeof NOT_BENCHMARKED)[number]["id"]>;

/** Whether the loop has its own implementation of a rule. */
export function hasBareLoop(id: string): boolean {
  return (BENCHMARKED as readonly string[]).includes(id);
}

/** One role of one topology: what the loop needs besides the part columns. */
export type RolePlan = {
  topology: string;
  role: string;
  /** Every stage's rules in turn (the engine's finding order). */
  rules: readonly Benchmarked[];
  /** Each stage of the role with its rules (the two-stage rectifier has two). */
  checks: readonly { stage: Stage; rules: readonly Benchmarked[] }[];
  rails: Rails;
  design: Design;
  table: Table;
};

/** A candidate list as columns; NaN marks an empty cell. */
export type Table = {
  ids: readonly string[];
  n: number;
  col: Record<string, Float64Array>;
};

const COLUMNS = [
  "supply_min_v",
  "supply_max_v",
  "icm_neg_headroom_v",
  "icm_pos_headroom_v",
  "out_neg_headroom_v",
  "out_pos_headroom_v",
  "out_load_ohm",
  "vos_max_mv",
  "vos_drift_uv_per_c",
  "ib_max_na",
  "gbw_mhz",
  "slew_v_per_us",
  "tpd_ns",
  "tpd_overdrive_mv",
  "hysteresis_mv",
  "vf_1ma_v",
  "vf_10ma_v",
  "ir_na",
  "vr_max_v",
  "trr_ns",
  "if_max_ma",
  "vdiff_max_v",
  "overload_recovery_us",
  "iout_max_ma",
  "iq_ma",
  "channels",
] as const;

export function tableOf(parts: readonly Part[]): Table {
  const n = parts.length;
  const col: Record<string, Float64Array> = {};
  for (const c of [
    ...COLUMNS,
    "is_op_amp",
    "open_drain",
    "unity_gain_stable",
    "phase_reversal",
    "schottky",
    "input_fet",
    "status_cost",
  ]) {
    col[c] = new Float64Array(n).fill(NaN);
  }
  parts.forEach((p, i) => {
    const cells = p as Record<string, unknown>;
    for (const c of COLUMNS) if (typeof cells[c] === "number") (col[c] as Float64Array)[i] = cells[c] as number;
    (col.is_op_amp as Float64Array)[i] = p.kind === "op-amp" ? 1 : 0;
    (col.open_drain as Float64Array)[i] = p.kind === "comparator" && p.output === "open-drain" ? 1 : 0;
    if (p.kind === "op-amp") {
      (col.unity_gain_stable as Float64Array)[i] = p.unity_gain_stable ? 1 : 0;
      if (p.phase_reversal !== undefined) (col.phase_reversal as Float64Array)[i] = p.phase_reversal ? 1 : 0;
      (col.input_fet as Float64Array)[i] = p.input_fet === true ? 1 : 0;
    }
    if (p.kind === "diode") (col.schottky as Float64Array)[i] = p.type === "schottky" ? 1 : 0;
    // The ranking's middle keys (SPEC §7) folded as the engine folds them: status, then cost band (none last).
    const status = p.status === "stocked" ? 0 : p.status === "approved" ? 1 : p.status === "listed" ? 2 : 3;
    (col.status_cost as Float64Array)[i] = status * 8 + (p.cost_band ?? 6);
  });
  return { ids: parts.map((p) => p.id), n, col };
}

/** Every role of every topology the design is evaluated in (both for "all"). */
export function planOf(design: Design, catalogue: Catalogue): RolePlan[] {
  const tables = new Map<string, Table>();
  const table = (key: string, parts: readonly Part[]) => {
    let t = tables.get(key);
    if (!t) tables.set(key, (t = tableOf(parts)));
    return t;
  };
  const topologies = design.topology === ALL_TOPOLOGIES ? engine.topologies.map((t) => t.id) : [design.topology];
  return topologies.flatMap((topology) => {
    const e = evaluateDesign(design, catalogue, topology);
    if (!e.ok) return [];
    return e.result.roles.map((r) => ({
      topology,
      role: r.role,
      rules: r.stages.flatMap((s) => s.rules) as Benchmarked[],
      checks: r.stages.map((s) => ({ stage: s.stage, rules: s.rules as Benchmarked[] })),
      rails: railsOfRole(design, catalogue, e.result.derived, r.role),
      design,
      // The engine's candidates for the role: the kinds that can fill it, in file order.
      table: table(
        r.kinds.join("+"),
        catalogue.parts.filter((p) => r.kinds.includes(p.kind)),
      ),
    }));
  });
}

/** The rails a role was checked on: with the pumped rail's other load, as rectify-and-sign hands it (SPEC §11.5). */
function railsOfRole(design: Design, catalogue: Catalogue, derived: Derived, role: string): Rails {
  const n = derived.negative;
  const neg = design.supply.negative;
  const on = ROLES_ON_RAIL.find((x) => x.role === role);
  if (n.kind !== "charge-pump" || neg.kind !== "charge-pump" || !n.load || !on) return derived.rails;
  const diode = catalogue.byId.get(n.diode.id);
  if (!diode || diode.kind !== "diode") return derived.rails;
  const own = n.load.draws.filter((d) => d.role === role).reduce((a, d) => a + d.amps, 0);
  const pump: PumpOnRail = {
    drive_v: neg.drive_v,
    frequency_hz: neg.frequency_hz,
    flying_cap_f: neg.flying_cap_f,
    reservoir_cap_f: neg.reservoir_cap_f,
    drive_ohm: neg.drive_ohm ?? 0,
    diode,
    cold_c: design.temperature.min_c,
    other_a: n.load.total_a - own,
    channels: on.channels,
    assumed_a: own,
  };
  return { ...derived.rails, pump };
}

/** What the loop leaves per role: each part's worst severity (0 pass … 3 fail), least relative margin, and every margin. */
export type RoleOutput = { severity: Uint8Array; relative: Float64Array; margins: Float64Array[] };

export function outputsFor(plans: readonly RolePlan[]): RoleOutput[] {
  return plans.map((p) => ({
    severity: new Uint8Array(p.table.n),
    relative: new Float64Array(p.table.n),
    margins: p.rules.map(() => new Float64Array(p.table.n)),
  }));
}

const PASS = 0;
const MARGINAL = 1;
const UNRATED = 2;
const FAIL = 3;

/** Runs every role's rules over its table, writing into `out` (made once by outputsFor). */
export function bareLoop(plans: readonly RolePlan[], out: readonly RoleOutput[]): void {
  for (let r = 0; r < plans.length; r++) {
    const plan = plans[r] as RolePlan;
    const o = out[r] as RoleOutput;
    o.severity.fill(PASS);
    o.relative.fill(Infinity);
    let k = 0;
    for (const check of plan.checks) {
      for (const rule of check.rules) {
        runRule(plan, check.stage, rule, o.margins[k] as Float64Array, o.severity, o.relative);
        k++;
      }
    }
    const allowUnrated = plan.design.policy.allow_unrated;
    for (let i = 0; i < plan.table.n; i++) {
      if (allowUnrated && o.severity[i] === UNRATED) o.severity[i] = MARGINAL;
      if (o.relative[i] === Infinity) o.relative[i] = 0;
    }
  }
}

/**
 * The bare loop, then each role's fits ranked as SPEC §7 ranks them (verdict,
 * status, cost band, least relative margin, then list order) and its
 * rejections kept in list order: the least work that gives what a page reads.
 */
export function bareLoopSorted(plans: readonly RolePlan[], out: readonly RoleOutput[]): Uint32Array[] {
  bareLoop(plans, out);
  return plans.map((plan, r) => {
    const o = out[r] as RoleOutput;
    const key = plan.table.col.status_cost as Float64Array;
    const fits: number[] = [];
    for (let i = 0; i < plan.table.n; i++) if ((o.severity[i] as number) <= MARGINAL) fits.push(i);
    const major = (i: number) => (o.severity[i] as number) * 64 + (key[i] as number);
    fits.sort((a, b) => major(a) - major(b) || (o.relative[b] as number) - (o.relative[a] as number) || a - b);
    return Uint32Array.from(fits);
  });
}

function runRule(
  plan: RolePlan,
  stage: Stage,
  rule: Benchmarked,
  margin: Float64Array,
  sev: Uint8Array,
  rel: Float64Array,
): void {
  const { design, rails, table } = plan;
  const c = table.col as Record<(typeof COLUMNS)[number] | "is_op_amp" | "open_drain", Float64Array> &
    Record<"unity_gain_stable" | "phase_reversal" | "schottky" | "input_fet", Float64Array>;
  const n = table.n;
  const policy = design.policy;
  const headroom = policy.headroom_margin_v;
  const fraction = policy.marginal_fraction;
  const A = design.accuracy.required_v;
  const f = design.signal.max_frequency_hz;
  const P = rails.positive_v;
  const N = rails.negative_v;
  // Verdict and ranking key for one margin; a "voltage" rule is marginal within headroom_margin_v.
  const voltage = (i: number, m: number, limit: number) => {
    margin[i] = m;
    const s = m < 0 ? FAIL : m < headroom ? MARGINAL : PASS;
    if (s > (sev[i] as number)) sev[i] = s;
    if (limit > 0 && m / limit < (rel[i] as number)) rel[i] = m / limit;
  };
  const share = (i: number, m: number, limit: number) => {
    margin[i] = m;
    const s = m < 0 ? FAIL : m < fraction * Math.abs(limit) ? MARGINAL : PASS;
    if (s > (sev[i] as number)) sev[i] = s;
    if (limit > 0 && m / limit < (rel[i] as number)) rel[i] = m / limit;
  };
  // A rule that words its own verdict (the sign-path rules of issue 21): its margin, limit and severity as they are.
  const put = (i: number, m: number, limit: number, s: number) => {
    margin[i] = m;
    if (s > (sev[i] as number)) sev[i] = s;
    if (limit > 0 && m / limit < (rel[i] as number)) rel[i] = m / limit;
  };
  const unrated = (i: number) => {
    margin[i] = NaN;
    if ((sev[i] as number) < UNRATED) sev[i] = UNRATED;
  };
  const range = stage.stage === "diode" ? { low: 0, high: 0 } : stage.input;
  // The sign stage's own delay (rules/sign-delay.ts): tpd + V_od/S + (Vh/2)/S, or an op amp's integrator-then-slew transition.
  const slope = 2 * Math.PI * f * Math.max(Math.abs(range.low), Math.abs(range.high));
  const stageDelayAt = (i: number): { seconds: number; budget: number; assumed: boolean } => {
    if (c.is_op_amp[i] === 1) {
      const swing = Math.max(0, P - (c.out_pos_headroom_v[i] as number) - (N + (c.out_neg_headroom_v[i] as number)));
      const accel = 2 * Math.PI * (c.gbw_mhz[i] as number) * 1e6 * slope;
      const sr = (c.slew_v_per_us[i] as number) * 1e6;
      const onset = sr / accel;
      const onsetV = (sr * onset) / 2;
      const t = swing <= onsetV ? Math.sqrt((2 * swing) / accel) : onset + (swing - onsetV) / sr;
      return { seconds: t, budget: t, assumed: false };
    }
    const od = c.tpd_overdrive_mv[i] as number;
    const vh = c.hysteresis_mv[i] as number;
    const own = (c.tpd_ns[i] as number) * 1e-9 + (od === od ? od * 1e-3 : 0.1) / slope;
    const hyst = vh === vh && vh > 0 ? (vh * 1e-3) / 2 / slope : 0;
    return { seconds: own + hyst, budget: own, assumed: od !== od };
  };
  // The edge the level shift makes at the logic pin (rules/sign-path.ts signEdge); NaN when no pull-up is given.
  const edgeAt = (i: number): number => {
    const { logic } = design;
    const cap = logic.pin_cap_f ?? DEFAULT_PIN_CAP_F;
    const clamp = stage.stage === "sign" ? stage.clamp : undefined;
    const outPos = c.out_pos_headroom_v[i] as number;
    const outNeg = c.out_neg_headroom_v[i] as number;
    const high = c.open_drain[i] === 1 ? null : P - (outPos === outPos ? outPos : 0);
    if (logic.level_shift === "diode-clamp") {
      if (high === null || !(high > 0)) return 0;
      const vf = clamp ? forwardVoltage(clamp, clampSourceCurrent(high, logic.pull_down_ohm, clamp)) : 0;
      return pullUpEdge(logic.pull_down_ohm, cap, Math.max(0, high - vf), 0, logic.vil_v).seconds;
    }
    if (logic.level_shift === "pull-up" && high !== null) return 0;
    if (logic.pull_up_ohm === undefined) return NaN;
    if (logic.level_shift === "npn-inverter") {
      return (
        (logic.npn_storage_s ?? NPN_STORAGE_DEFAULT_S) +
        pullUpEdge(logic.pull_up_ohm, cap, 0.2, logic.vdd_v, logic.vih_v).seconds
      );
    }
    const low = N + (outNeg === outNeg ? outNeg : 0);
    return pullUpEdge(logic.pull_up_ohm, cap, low, logic.vdd_v, logic.vih_v).seconds;
  };

  switch (rule) {
    case "supply-range": {
      const vs = P - N;
      for (let i = 0; i < n; i++) {
        voltage(i, Math.min(vs - (c.supply_min_v[i] as number), (c.supply_max_v[i] as number) - vs), vs);
      }
      return;
    }
    case "input-common-mode":
    case "output-swing": {
      const want = rule === "output-swing" && stage.stage === "op-amp" ? stage.output : range;
      const neg = rule === "output-swing" ? c.out_neg_headroom_v : c.icm_neg_headroom_v;
      const pos = rule === "output-swing" ? c.out_pos_headroom_v : c.icm_pos_headroom_v;
      for (let i = 0; i < n; i++) {
        const low = want.low - (N + (neg[i] as number));
        const high = P - (pos[i] as number) - want.high;
        const needed = low <= high ? want.low : want.high;
        voltage(i, Math.min(low, high), Math.max(Math.abs(needed), headroom));
      }
      return;
    }
    case "output-load": {
      if (stage.stage !== "op-amp") return;
      // rules/output-load.ts: Σ 1/R against 1/out_load_ohm; marginal when heavier, never fail.
      const g = stage.load === undefined ? NaN : loadSiemens(stage.load.branches);
      for (let i = 0; i < n; i++) {
        const allowed = 1 / (c.out_load_ohm[i] as number);
        if (allowed !== allowed) unrated(i);
        else if (g !== g) put(i, 0, 0, UNRATED);
        else put(i, allowed - g, 0, g <= allowed * (1 + LOAD_SAME) ? PASS : MARGINAL);
      }
      return;
    }
    case "stage-output-current": {
      if (stage.stage !== "op-amp") return;
      // rules/stage-output-current.ts: the stage's peak current (no part figure) against iout_max_ma, 100 µA floor.
      const peak = stage.load === undefined ? NaN : peakOf(stage, rails).amps;
      for (let i = 0; i < n; i++) {
        const rated = (c.iout_max_ma[i] as number) * 1e-3;
        if (peak !== peak) put(i, 0, 0, UNRATED);
        else if (rated !== rated) {
          const m = OUTPUT_CURRENT_FLOOR_A - peak;
          put(i, m, OUTPUT_CURRENT_FLOOR_A, m >= 0 ? PASS : UNRATED);
        } else share(i, rated - peak, rated);
      }
      return;
    }
    case "unity-gain-stable":
      for (let i = 0; i < n; i++) {
        const stable = c.unity_gain_stable[i] === 1;
        margin[i] = stable ? 0 : -1;
        if (!stable) sev[i] = FAIL;
      }
      return;
    case "phase-reversal":
      for (let i = 0; i < n; i++) {
        const flag = c.phase_reversal[i] as number;
        if (flag !== flag) {
          unrated(i);
          continue;
        }
        const m = Math.min(
          range.low - (N + (c.icm_neg_headroom_v[i] as number)),
          P - (c.icm_pos_headroom_v[i] as number) - range.high,
        );
        const reverses = flag === 1;
        margin[i] = reverses ? m : Math.max(0, m);
        const s = !reverses ? PASS : m < 0 ? FAIL : MARGINAL;
        if (s > (sev[i] as number)) sev[i] = s;
      }
      return;
    case "offset": {
      if (stage.stage !== "op-amp") return;
      const span = Math.max(Math.abs(design.temperature.min_c - 25), Math.abs(design.temperature.max_c - 25));
      const fetScale = 2 ** (Math.max(0, design.temperature.max_c - 25) / 10);
      const limit = policy.offset_share * A;
      for (let i = 0; i < n; i++) {
        const drift = c.vos_drift_uv_per_c[i] as number;
        const vos = (c.vos_max_mv[i] as number) * 1e-3 + (drift === drift ? drift * 1e-6 * span : 0);
        const ib = (c.ib_max_na[i] as number) * 1e-9 * (c.input_fet[i] === 1 ? fetScale : 1);
        const error = (stage.vos_multiplier * vos + ib * stage.bias_ohm) / stage.output_per_input;
        share(i, limit - error, limit);
      }
      return;
    }
    case "adc-settling": {
      if (stage.stage !== "op-amp") return;
      const adc = design.adc;
      const cs = adc.sample_cap_f ?? 0;
      const cp = adc.pin_c_f ?? 0;
      const step = (adc.reference_v * cs) / (cs + cp);
      const half = adc.reference_v / 2 ** (adc.bits + 1);
      const nTau = step > half ? Math.log(step / half) : 0;
      const tauNet = (adc.pin_r_ohm ?? 0) * (cp + cs) + (adc.switch_ohm ?? 0) * cs;
      const acq = adc.acquisition_s ?? 0;
      for (let i = 0; i < n; i++) {
        const tau = stage.noise_gain / (2 * Math.PI * (c.gbw_mhz[i] as number) * 1e6) + tauNet;
        share(i, acq - nTau * tau, acq);
      }
      return;
    }
    case "input-fault": {
      if (stage.stage === "diode") return;
      const path = stage.fault;
      const fault = design.signal.fault_v ?? 0;
      const limit = design.logic.injection_ma === undefined ? 5e-3 : design.logic.injection_ma * 1e-3;
      let current = 0;
      if (path) {
        for (const v of [fault, -fault]) {
          const vth = path.gain * v + path.offset_v;
          const excess = Math.max(vth - (P + 0.3), N - 0.3 - vth, 0);
          current = Math.max(current, path.ohm > 0 ? excess / path.ohm : excess > 0 ? Infinity : 0);
        }
      }
      for (let i = 0; i < n; i++) share(i, limit - current, limit);
      return;
    }
    case "bandwidth": {
      if (stage.stage !== "op-amp") return;
      const limit = policy.speed_share * A;
      for (let i = 0; i < n; i++) {
        const x = f / (((c.gbw_mhz[i] as number) * 1e6) / stage.noise_gain);
        const s = Math.sqrt(1 + x * x);
        share(i, limit - ((x * x) / (s * (s + 1))) * stage.bandwidth_peak_v, limit);
      }
      return;
    }
    case "slew-rate": {
      if (stage.stage !== "op-amp") return;
      const needed = 2 * Math.PI * f * stage.slew_amplitude_v;
      for (let i = 0; i < n; i++) share(i, (c.slew_v_per_us[i] as number) * 1e6 - needed, needed);
      return;
    }
    case "zero-crossing": {
      if (stage.stage !== "op-amp") return;
      const jump = stage.zero_crossing_v ?? 0;
      const beta = stage.zero_crossing_beta ?? 0.5;
      const slope =
        2 *
        Math.PI *
        f *
        (stage.zero_crossing_signal_v ?? Math.max(Math.abs(stage.input.low), Math.abs(stage.input.high)));
      const perSecond =
        (stage.zero_crossing_error === "clips" ? 1 : 2) *
        2 *
        Math.PI *
        f *
        (stage.zero_crossing_peak_v ?? stage.bandwidth_peak_v);
      const limit = policy.timing_share * A;
      for (let i = 0; i < n; i++) {
        const accel = 2 * Math.PI * (c.gbw_mhz[i] as number) * 1e6 * beta * slope;
        const sr = (c.slew_v_per_us[i] as number) * 1e6;
        const onset = sr / accel;
        const onsetV = (sr * onset) / 2;
        const t = jump <= onsetV ? Math.sqrt((2 * jump) / accel) : onset + (jump - onsetV) / sr;
        share(i, limit - perSecond * t, limit);
      }
      return;
    }
    case "logic-high": {
      const { vih_v: vih, vdd_v: vdd, level_shift: shift, pull_down_ohm: pull } = design.logic;
      const clamp = shift === "diode-clamp" && stage.stage === "sign" ? stage.clamp : undefined;
      const top = vdd + 0.3;
      for (let i = 0; i < n; i++) {
        const outNeg = c.out_neg_headroom_v[i] as number;
        const outPos = c.out_pos_headroom_v[i] as number;
        if (shift === "npn-inverter") {
          const low = N + (outNeg === outNeg ? outNeg : 0);
          voltage(i, Math.min(0.4 - low, vdd - vih), vih);
        } else if (c.open_drain[i] === 1) {
          if (shift === "pull-up") voltage(i, vdd - vih, vih);
          else voltage(i, -vih, vih);
        } else {
          const high = P - (outPos === outPos ? outPos : 0);
          const vf = clamp ? forwardVoltage(clamp, Math.max(0, high) / pull) : 0;
          const level = high - vf;
          voltage(i, Math.min(level - vih, top - level), vih);
        }
      }
      return;
    }
    case "logic-low": {
      const { vil_v: vil, level_shift: shift, pull_down_ohm: pull } = design.logic;
      for (let i = 0; i < n; i++) {
        if (shift === "diode-clamp") {
          const ir = stage.stage === "sign" && stage.clamp ? stage.clamp.ir_na * 1e-9 : 0;
          voltage(i, vil - ir * pull, vil);
        } else if (shift === "npn-inverter") {
          if (c.open_drain[i] === 1) voltage(i, -1.0, vil);
          else {
            const outPos = c.out_pos_headroom_v[i] as number;
            voltage(i, Math.min(P - (outPos === outPos ? outPos : 0) - 1.0, vil - 0.2), vil);
          }
        } else {
          const outNeg = c.out_neg_headroom_v[i] as number;
          const low = N + (outNeg === outNeg ? outNeg : 0);
          voltage(i, Math.min(vil - low, low + 0.3), vil);
        }
      }
      return;
    }
    case "propagation-delay": {
      const limit = signTimeLimit({ design, policy });
      for (let i = 0; i < n; i++) {
        const d = stageDelayAt(i);
        share(i, limit - d.seconds, limit);
        // An op amp's saturated transition and an assumed overdrive are estimates: at best marginal.
        if ((c.is_op_amp[i] === 1 || d.assumed) && sev[i] === PASS) sev[i] = MARGINAL;
      }
      return;
    }
    case "sign-dead-band": {
      const k = stage.stage === "sign" ? stage.output_per_input : 1;
      const limit = policy.sign_share * A;
      for (let i = 0; i < n; i++) {
        const vh = c.is_op_amp[i] === 1 ? 0 : (c.hysteresis_mv[i] as number);
        share(i, limit - (2 * (c.vos_max_mv[i] as number) * 1e-3 + (vh === vh ? vh * 1e-3 : 0)) / k, limit);
      }
      return;
    }
    case "reverse-voltage": {
      if (stage.stage !== "diode") return;
      const rv = stage.reverse_vf;
      for (let i = 0; i < n; i++) {
        let needed = stage.reverse_v;
        if (rv !== undefined) {
          const d = { vf_1ma_v: c.vf_1ma_v[i] as number, vf_10ma_v: c.vf_10ma_v[i] as number };
          const at25 = forwardVoltage(d, rv.current_a);
          const vf = at25 === 0 ? 0 : Math.max(0, at25 - 2e-3 * (rv.temp_c - 25));
          needed = Math.max(0, stage.reverse_v + rv.sign * vf);
        }
        voltage(i, (c.vr_max_v[i] as number) - needed, needed);
      }
      return;
    }
    case "recovery": {
      if (stage.stage !== "diode" || stage.recovery_limit_s === undefined) return;
      const limit = stage.recovery_limit_s;
      for (let i = 0; i < n; i++) {
        const trr = c.trr_ns[i] as number;
        if (trr !== trr) unrated(i);
        else share(i, limit - trr * 1e-9, limit);
      }
      return;
    }
    case "leakage": {
      if (stage.stage !== "diode" || stage.leakage_ohm === undefined || stage.leakage_limit_v === undefined) return;
      const rise = Math.max(0, design.temperature.max_c - 25);
      const schottkyScale = 10 ** (rise / 25);
      const junctionScale = 2 ** (rise / 10);
      const ohmPerInput = stage.leakage_ohm / (stage.leakage_per_input ?? 1);
      const limit = stage.leakage_limit_v;
      for (let i = 0; i < n; i++) {
        const ir = (c.ir_na[i] as number) * 1e-9 * (c.schottky[i] === 1 ? schottkyScale : junctionScale);
        share(i, limit - ir * ohmPerInput, limit);
      }
      return;
    }
    case "clamp-leakage": {
      if (stage.stage !== "diode") return;
      const rise = Math.max(0, design.temperature.max_c - 25);
      const schottkyScale = 10 ** (rise / 25);
      const junctionScale = 2 ** (rise / 10);
      const limit = -(design.logic.pin_min_v ?? -0.3);
      const blocks = -stage.reverse_v < 0;
      // The pin goes no lower than the comparator's lowest low level (math/clamp-leakage.ts).
      const deepest = Math.max(stage.reverse_v, -(stage.floor_v ?? -stage.reverse_v));
      for (let i = 0; i < n; i++) {
        const ir = (c.ir_na[i] as number) * 1e-9 * (c.schottky[i] === 1 ? schottkyScale : junctionScale);
        share(i, limit - (blocks ? Math.min(ir * design.logic.pull_down_ohm, deepest) : 0), limit);
      }
      return;
    }
    case "pump-load": {
      const p = rails.pump;
      if (p === undefined) {
        for (let i = 0; i < n; i++) put(i, 0, 0, PASS);
        return;
      }
      const depth = -N;
      for (let i = 0; i < n; i++) {
        const per = Math.max(1, c.channels[i] as number);
        const total = p.other_a + Math.ceil(p.channels / per) * per * (c.iq_ma[i] as number) * 1e-3;
        const rail = railAt(p, total);
        if (total >= rail.collapse_a || rail.worst_v >= 0) put(i, -depth, depth, FAIL);
        else {
          const shallower = rail.worst_v - N;
          put(i, -shallower, depth, shallower > 1e-12 ? MARGINAL : PASS);
        }
      }
      return;
    }
    case "differential-input": {
      const d = Math.max(Math.abs(range.low), Math.abs(range.high));
      const series = design.front_end.sign_series_ohm;
      for (let i = 0; i < n; i++) {
        const rated = c.vdiff_max_v[i] as number;
        if (rated !== rated) {
          const m = CLAMP_SAFE_V - d;
          put(i, m, CLAMP_SAFE_V, m >= 0 ? PASS : UNRATED);
        } else if (rated >= d || series === undefined) voltage(i, rated - d, rated);
        else {
          const tolerated = rated + CLAMP_CURRENT_MAX_A * series;
          put(i, tolerated - d, tolerated, tolerated < d ? FAIL : MARGINAL);
        }
      }
      return;
    }
    case "overload-recovery": {
      const limit = signTimeLimit({ design, policy });
      for (let i = 0; i < n; i++) {
        const t = c.is_op_amp[i] === 1 ? (c.overload_recovery_us[i] as number) * 1e-6 : 0;
        if (t !== t) unrated(i);
        else share(i, limit - t, limit);
      }
      return;
    }
    case "rise-time": {
      const limit = signTimeLimit({ design, policy });
      for (let i = 0; i < n; i++) {
        const t = edgeAt(i);
        if (t !== t) put(i, limit, limit, UNRATED);
        else if (t === Infinity) put(i, -limit, limit, FAIL);
        else share(i, limit - t, limit);
      }
      return;
    }
    case "late-sign": {
      const limit = policy.timing_share * A;
      const perSecond = 2 * 2 * Math.PI * f * design.signal.peak_v;
      for (let i = 0; i < n; i++) {
        const own = stageDelayAt(i);
        const edge = edgeAt(i);
        const rec = c.is_op_amp[i] === 1 ? (c.overload_recovery_us[i] as number) * 1e-6 : 0;
        const unknown = own.assumed || edge !== edge || rec !== rec;
        if (edge === Infinity) {
          put(i, -limit, limit, FAIL);
          continue;
        }
        const t = own.budget + (edge === edge ? edge : 0) + (rec === rec ? rec : 0);
        share(i, limit - perSecond * t, limit);
        if (unknown && sev[i] === PASS) sev[i] = MARGINAL;
      }
      return;
    }
    case "output-current": {
      const { logic } = design;
      const clamp = stage.stage === "sign" ? stage.clamp : undefined;
      const baseClamp = stage.stage === "sign" && logic.npn_base_clamp === true ? stage.base_clamp : undefined;
      for (let i = 0; i < n; i++) {
        const outPos = c.out_pos_headroom_v[i] as number;
        const outNeg = c.out_neg_headroom_v[i] as number;
        const high = c.open_drain[i] === 1 ? null : P - (outPos === outPos ? outPos : 0);
        const low = N + (outNeg === outNeg ? outNeg : 0);
        let current: number;
        if (logic.level_shift === "diode-clamp") {
          current =
            high === null || !(high > 0)
              ? 0
              : clampSourceCurrent(high, logic.pull_down_ohm, clamp ?? { vf_1ma_v: 0, vf_10ma_v: 0 });
        } else if (logic.level_shift === "pull-up") {
          const r = logic.pull_up_ohm;
          if (r === undefined) {
            put(i, 0, 0, UNRATED);
            continue;
          }
          current = Math.max(
            Math.max(0, logic.vdd_v - low) / r,
            high === null ? 0 : Math.max(0, high - logic.vdd_v) / r,
          );
        } else {
          const r = logic.npn_base_ohm;
          if (r === undefined) {
            put(i, 0, 0, UNRATED);
            continue;
          }
          const base = high === null ? 0 : baseDriveCurrent(high, r);
          const sink = baseClamp ? baseReverse(low, { diode: baseClamp, base_ohm: r }).clamp_current_a : 0;
          current = Math.max(base, sink);
        }
        const rated = (c.iout_max_ma[i] as number) * 1e-3;
        if (rated !== rated) {
          const m = 100e-6 - current;
          put(i, m, 100e-6, m >= 0 ? PASS : UNRATED);
        } else share(i, rated - current, rated);
      }
      return;
    }
    case "base-emitter-reverse": {
      const { logic } = design;
      const vebo = logic.npn_vebo_v ?? NPN_VEBO_DEFAULT_V;
      const npn = logic.level_shift === "npn-inverter";
      const noResistor = npn && logic.npn_base_clamp === true && logic.npn_base_ohm === undefined;
      const deepest = Math.min(stage.stage === "sign" ? (stage.deepest_negative_v ?? N) : N, N);
      const diode = stage.stage === "sign" && logic.npn_base_clamp === true ? stage.base_clamp : undefined;
      const rb = logic.npn_base_ohm;
      const clamp = diode && rb !== undefined ? { diode, base_ohm: rb } : undefined;
      for (let i = 0; i < n; i++) {
        if (!npn || noResistor) {
          put(i, vebo, vebo, npn ? UNRATED : PASS);
          continue;
        }
        const outNeg = c.out_neg_headroom_v[i] as number;
        const reverse = baseReverse(deepest + (outNeg === outNeg ? outNeg : 0), clamp).reverse_v;
        const m = vebo - reverse;
        put(i, m, vebo, m < 0 ? FAIL : reverse > REVERSE_DERATING * vebo || m < headroom ? MARGINAL : PASS);
      }
      return;
    }
    case "forward-current": {
      if (stage.stage !== "diode" || stage.forward_a === undefined) return;
      const needed = stage.forward_a;
      for (let i = 0; i < n; i++) share(i, (c.if_max_ma[i] as number) * 1e-3 - needed, needed);
      return;
    }
    default: {
      const missing: never = rule;
      throw new Error(
        `rule ${String(missing)} has no bare-loop counterpart (add a case, or list it in NOT_BENCHMARKED)`,
      );
    }
  }
}

/** Every rule with a case above; a Record over the union, so a missing key fails the type check. */
const CASES: Record<Benchmarked, true> = {
  "adc-settling": true,
  "input-fault": true,
  "supply-range": true,
  "input-common-mode": true,
  "output-swing": true,
  "output-load": true,
  "stage-output-current": true,
  "unity-gain-stable": true,
  "phase-reversal": true,
  offset: true,
  bandwidth: true,
  "slew-rate": true,
  "zero-crossing": true,
  "logic-high": true,
  "logic-low": true,
  "propagation-delay": true,
  "late-sign": true,
  "sign-dead-band": true,
  "reverse-voltage": true,
  recovery: true,
  leakage: true,
  "clamp-leakage": true,
  "pump-load": true,
  "forward-current": true,
  "differential-input": true,
  "overload-recovery": true,
  "rise-time": true,
  "output-current": true,
  "base-emitter-reverse": true,
};
const BENCHMARKED = Object.keys(CASES);
