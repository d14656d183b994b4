// Topology `rectify-and-sign` (SPEC §6–§7): divider, follower buffer, sign
// comparator, two-op-amp precision rectifier, optional charge-pumped V−.
// Diodes are settled first so every amplifier is checked against the rail and
// the diode drops it will really get.
import { forwardCurrent } from "../../rules/forward-current.ts";
import { inputCommonMode } from "../../rules/input-common-mode.ts";
import { lateSign } from "../../rules/late-sign.ts";
import { leakage } from "../../rules/leakage.ts";
import { clampLeakage } from "../../rules/clamp-leakage.ts";
import { logicHigh } from "../../rules/logic-high.ts";
import { logicLow } from "../../rules/logic-low.ts";
import { offset } from "../../rules/offset.ts";
import { bandwidth } from "../../rules/bandwidth.ts";
import { adcSettling } from "../../rules/adc-settling.ts";
import { inputFault } from "../../rules/input-fault.ts";
import { baseEmitterReverse } from "../../rules/base-emitter-reverse.ts";
import { differentialInput } from "../../rules/differential-input.ts";
import { outputCurrent } from "../../rules/output-current.ts";
import { overloadRecoveryRule } from "../../rules/overload-recovery.ts";
import { riseTime } from "../../rules/rise-time.ts";
import { propagationDelay } from "../../rules/propagation-delay.ts";
import { recovery } from "../../rules/recovery.ts";
import { reverseVoltage } from "../../rules/reverse-voltage.ts";
import { signDeadBand } from "../../rules/sign-dead-band.ts";
import { supplyRange } from "../../rules/supply-range.ts";
import { zeroCrossing } from "../../rules/zero-crossing.ts";
import {
  budgetTerm,
  type BudgetTerm,
  type Conversion,
  type NoiseFigure,
  type RoleTerm,
} from "../core/engine/budget.ts";
import type { Catalogue } from "../core/catalogue-index.ts";
import { enobOf, sinadDb, stageNoise } from "../core/math/noise.ts";
import { ratioSpread } from "../core/math/rectifier-ratios.ts";
import type { OpAmp } from "../core/schemas/op-amp.ts";
import { isFitResult } from "../core/engine/evaluate-part.ts";
import type { Derived, DiodeUse, DisplayGroup, DisplayRow, RoleResult } from "../core/engine/result.ts";
import { metaOf, rolesOf } from "./meta.ts";
import { defineTopology, type TopologyEvaluation, type TopologyRun } from "../core/engine/topology.ts";
import { forwardVoltage } from "../core/math/diode.ts";
import { endPhrase, forwardVoltageAt } from "../core/math/temperature.ts";
import { loadedRatioDeviation, sourceRatioDeviation, type Divider } from "../core/math/divider.ts";
import { NPN_VBE_ON_V } from "../core/math/npn-inverter.ts";
import type { DiodeStage, OpAmpStage, PumpOnRail, Rails, SignStage } from "../core/rule-kit/index.ts";
import type { Design } from "../core/schemas/design.ts";
import type { Diode } from "../core/schemas/diode.ts";
import { formatSI, formatVolts } from "../core/units.ts";
import {
  pinTerms,
  driveDisplay,
  DRIVE_FIELDS,
  drivingPin,
  faultPath,
  rulesFor,
  seriesInOhm,
  singleEndedOnly,
  notSingleEnded,
} from "./converter-drive.ts";
import { railRows, ratio, si } from "./display.ts";
import { rectifyAndSignChain } from "./rectify-and-sign-sim.ts";
import { converterTerms } from "./converter-terms.ts";
import { frontEnd, heldDividerFits } from "./front-end.ts";
import { OP_AMP_STAGE_RULES } from "./op-amp-stage.ts";
import { TIMING_ROLE_TERMS } from "./rectify-and-sign-timing.ts";
import { loadSum, settlePumpedRail } from "./rectify-and-sign-pump.ts";
import { pumpLoad as pumpLoadRule } from "../../rules/pump-load.ts";
import { conductionCurrent, pumpLoad, type SupplyDraw } from "../core/math/pump-load.ts";
import { railAt } from "../core/math/pump-rail.ts";

/** Used only when the catalogue has no diode at all, so rails can still be computed. */
const NOMINAL_SILICON: Diode = {
  kind: "diode",
  id: "nominal-silicon",
  name: "Nominal silicon diode (assumed)",
  status: "listed",
  cost_band: undefined,
  tags: [],
  notes: "",
  type: "silicon",
  vf_1ma_v: 0.65,
  vf_10ma_v: 0.75,
  ir_na: 25,
  vr_max_v: 75,
  trr_ns: 4,
  cj_pf: 2,
  if_max_ma: 200,
};

// The buffer's input is the one a fault on the signal reaches; the rectifier's summer drives the converter.
const BUFFER_RULES = [...OP_AMP_STAGE_RULES, pumpLoadRule, inputFault];
const RECTIFIER_RULES = [...OP_AMP_STAGE_RULES, zeroCrossing, pumpLoadRule, adcSettling];

function evaluate(run: TopologyRun): TopologyEvaluation {
  const notSingle = singleEndedOnly(run.design);
  if (notSingle !== null) {
    return { ok: false, problems: [notSingleEnded("rectify-and-sign")] };
  }
  return settlePumpedRail(run, evaluateWith);
}

function evaluateWith({ design, catalogue, role }: TopologyRun, draws: readonly SupplyDraw[]): TopologyEvaluation {
  const fe = frontEnd(design);
  if (!fe.ok) return fe;
  const { divider, ratio: k, window_v: W, thevenin_ohm, target_ratio } = fe;
  const notes: string[] = [];
  const policy = design.policy;
  const A = design.accuracy.required_v;
  const positive = design.supply.positive_v;
  const neg = design.supply.negative;

  // Diode choice for a role: the BOM part, else the best fit, else the least bad.
  const settleDiode = (r: RoleResult, what: string): Diode => {
    const pick = r.chosen ?? r.rejected[0]?.part.id;
    const found = pick === undefined ? undefined : catalogue.byId.get(pick);
    if (found && found.kind === "diode") {
      if (!isFitResult(r.resultOf(found.id))) {
        notes.push(`The ${what} ${found.id} does not fit its role; values that depend on it use it anyway.`);
      }
      return found;
    }
    notes.push(`The catalogue has no diodes; the ${what} is taken as a nominal silicon diode (0.65 V at 1 mA).`);
    return NOMINAL_SILICON;
  };
  const use = (d: Diode, current: number, r: RoleResult | undefined): DiodeUse => ({
    id: d.id,
    vf_v: forwardVoltage(d, current),
    current_a: current,
    fits: r ? isFitResult(r.resultOf(d.id)) : false,
  });

  // 1. The negative rail, with the pump diode settled first.
  let pumpOn: ((role: string, channels: number) => PumpOnRail) | undefined;
  let negative_v: number;
  // The deepest the rail goes (no load, or the ripple's trough), for reverse stress on the NPN's base.
  let deepest_v: number;
  let negativeDerived: Derived["negative"];
  const noRails: Rails = { positive_v: positive, negative_v: 0 };
  if (neg.kind === "charge-pump") {
    const stage: DiodeStage = {
      stage: "diode",
      label: "the pump diode",
      // Each diode of the two-diode inverter blocks drive − Vf (SPEC §11.12); the smallest drop, at the hot end, is the worst.
      reverse_v: neg.drive_v,
      reverse_what: `the ${formatVolts(neg.drive_v)} drive`,
      reverse_vf: {
        sign: -1,
        current_a: 2 * neg.load_a,
        temp_c: design.temperature.max_c,
        at: endPhrase("hot", design.temperature.max_c),
      },
      recovery_limit_s: policy.timing_fraction / (2 * neg.frequency_hz),
      recovery_what: `${policy.timing_fraction * 100} % of the pump's ${formatSI(1 / (2 * neg.frequency_hz), "s")} half period`,
      forward_a: 2 * neg.load_a,
    };
    const r = role("pump-diode", stage, noRails);
    const diode = settleDiode(r, "pump diode");
    // The rail carries the stated load and every part on it (SPEC §11.5); diode drops at their
    // conduction current and the cold end, where they are largest.
    const load = pumpLoad(neg.load_a, draws);
    const onRail = {
      drive_v: neg.drive_v,
      frequency_hz: neg.frequency_hz,
      flying_cap_f: neg.flying_cap_f,
      reservoir_cap_f: neg.reservoir_cap_f,
      drive_ohm: neg.drive_ohm ?? 0,
      diode,
      cold_c: design.temperature.min_c,
    };
    const pumpDiode: DiodeUse = {
      ...use(diode, conductionCurrent(load.total_a), r),
      vf_v: forwardVoltageAt(diode, conductionCurrent(load.total_a), design.temperature.min_c),
    };
    const rail = railAt(onRail, load.total_a);
    pumpOn = (roleId, channels) => {
      const own = draws.filter((d) => d.role === roleId).reduce((a, d) => a + d.amps, 0);
      return { ...onRail, other_a: load.total_a - own, channels, assumed_a: own };
    };
    // A drive below two diode drops makes no rail at any load; "collapse current 0 A" would hide why.
    if (rail.collapse_a === 0) {
      return {
        ok: false,
        problems: [
          {
            path: "supply.negative.drive_v",
            message: `pump drive cannot make a negative rail (got ${formatVolts(neg.drive_v)}, expected more than two diode drops, 2 × ${formatVolts(pumpDiode.vf_v)} = ${formatVolts(rail.diode_drop_v)} with diode ${diode.id}); raise the drive or use a diode with a lower forward voltage`,
          },
        ],
      };
    }
    if (load.total_a >= rail.collapse_a) {
      return {
        ok: false,
        problems: [
          {
            path: "supply.negative.load_a",
            message: `load is at or past the pump's collapse current (got ${loadSum(load)}, expected less than (drive − 2·Vf)·f·C = ${formatSI(rail.collapse_a, "A")} with diode ${diode.id}); raise the frequency or the flying capacitor, or lower the load`,
          },
        ],
      };
    }
    // Below collapse the mean rail is negative, but ripple can still lift its worst
    // case to 0 V or above; every check then sees no negative rail, and says so.
    if (rail.worst_v >= 0) {
      notes.push(
        `Ripple of ${formatSI(rail.ripple_v, "V")} p-p lifts the pumped rail to ${formatVolts(rail.worst_v, { signed: true })} at its worst: there is no negative rail. A larger reservoir capacitor or a lighter load would restore it.`,
      );
    }
    negative_v = rail.worst_v;
    deepest_v = Math.min(rail.no_load_v, rail.dc_v - rail.ripple_v / 2);
    negativeDerived = { kind: "charge-pump", diode: pumpDiode, ...rail, load, vf_c: design.temperature.min_c };
  } else if (neg.kind === "fixed") {
    negative_v = neg.v;
    deepest_v = neg.v;
    negativeDerived = { kind: "fixed" };
  } else {
    negative_v = 0;
    deepest_v = 0;
    negativeDerived = { kind: "ground" };
  }
  const rails: Rails = { positive_v: positive, negative_v };

  // 2. The rectifier's diodes, at the current the full window drives through stage 1's loads.
  // Stage 1's conducting diode carries the current into its feedback resistor R and into the summer's
  // R/2 input, both ending at a virtual ground: 3·W/R at the peak (SPEC §11.2).
  const rectCurrent = (3 * W) / design.front_end.rectifier_load_ohm;
  const rectDiodeRole = role(
    "rectifier-diode",
    {
      stage: "diode",
      label: "the rectifier diode",
      // The off diode sits between the stage output (W + Vf) and the virtual ground (SPEC §11.12); largest drop at the cold end.
      reverse_v: W,
      reverse_what: `the ${formatVolts(W)} window`,
      reverse_vf: {
        sign: 1,
        current_a: rectCurrent,
        temp_c: design.temperature.min_c,
        at: endPhrase("cold", design.temperature.min_c),
      },
      recovery_limit_s: policy.timing_fraction / design.signal.max_frequency_hz,
      recovery_what: `${policy.timing_fraction * 100} % of the signal period`,
      leakage_ohm: design.front_end.rectifier_load_ohm,
      leakage_limit_v: policy.offset_share * A,
      leakage_per_input: k,
      leakage_what: "offset share of the required accuracy, input-referred",
    },
    rails,
  );
  const rectDiodePart = settleDiode(rectDiodeRole, "rectifier diode");
  const rectDiode = use(rectDiodePart, rectCurrent, rectDiodeRole);
  const vf = rectDiode.vf_v;
  // The dead time's jump is largest where the drops are: at the cold end (−2 mV/°C, SPEC §11.7).
  const cold = design.temperature.min_c;
  const vfCold = forwardVoltageAt(rectDiodePart, rectCurrent, cold);

  // 3. The clamp diode, when the level shift uses one.
  let clamp: SignStage["clamp"];
  let clampUse: DiodeUse | undefined;
  if (design.logic.level_shift === "diode-clamp") {
    const clampRole = role(
      "clamp-diode",
      {
        stage: "diode",
        label: "the clamp diode",
        // Stress at the rail's deepest point (no load, or the ripple's trough), not its loaded DC level.
        reverse_v: Math.max(0, -deepest_v),
        reverse_what: "|V−| at its deepest, when the comparator output sits low",
        // The comparator's low output goes no lower than the rail's deepest point (no load, or ripple's trough).
        floor_v: Math.min(0, deepest_v),
        leakage_ohm: design.logic.pull_down_ohm,
        leakage_limit_v: design.logic.vil_v,
        leakage_what: "V_IL of the logic input",
      },
      rails,
    );
    const d = settleDiode(clampRole, "clamp diode");
    clamp = { id: d.id, vf_1ma_v: d.vf_1ma_v, vf_10ma_v: d.vf_10ma_v, ir_na: d.ir_na };
    clampUse = use(d, positive / design.logic.pull_down_ohm, clampRole);
  }

  // 3b. The NPN inverter's base clamp, when the design asks for one (issue 21).
  let baseClamp: SignStage["base_clamp"];
  if (design.logic.level_shift === "npn-inverter" && design.logic.npn_base_clamp === true) {
    const rb = design.logic.npn_base_ohm;
    const clampRole = role(
      "base-clamp-diode",
      {
        stage: "diode",
        label: "the NPN's base clamp",
        reverse_v: NPN_VBE_ON_V,
        reverse_what: "the NPN's V_BE while it is on",
        forward_a: rb === undefined ? 0 : Math.max(0, -deepest_v) / rb,
        forward_what:
          rb === undefined
            ? "unknown: the design gives no logic.npn_base_ohm"
            : "at most |V−| / npn_base_ohm, with the sign output low",
      },
      rails,
    );
    const d = settleDiode(clampRole, "base clamp diode");
    baseClamp = { id: d.id, vf_1ma_v: d.vf_1ma_v, vf_10ma_v: d.vf_10ma_v, ir_na: d.ir_na };
  }

  // 4. The amplifiers. Every load they drive returns to a virtual ground, held at 0 V by feedback.
  const ZERO = { low: 0, high: 0 };
  const buffer: OpAmpStage = {
    stage: "op-amp",
    label: "the buffer",
    input: { low: -W, high: W },
    output: { low: -W, high: W },
    noise_gain: 1,
    vos_multiplier: 1,
    bias_ohm: thevenin_ohm,
    output_per_input: k,
    bandwidth_peak_v: design.signal.peak_v,
    slew_amplitude_v: W,
    load: { branches: [] },
  };
  // The two-op-amp full-wave rectifier (SPEC §11.2): both stages are inverting
  // with the + input grounded, so both inputs sit at 0 V. Stage 1's output errors
  // reach the converter at the summer's weight 2: its output_per_input is k/2 and
  // its bandwidth error scales with twice the peak.
  const R = design.front_end.rectifier_load_ohm;
  const peak = design.signal.peak_v;
  // The buffer drives stage 1's input R and the summer's input R, both into virtual grounds; the sign
  // comparator's input draws nothing.
  buffer.load = {
    branches: [
      { what: "stage 1's input R to its virtual ground", ohm: R, return_v: ZERO },
      { what: "the summer's input R to its virtual ground", ohm: R, return_v: ZERO },
    ],
  };
  const halfWave: OpAmpStage = {
    stage: "op-amp",
    label: "the rectifier's stage 1 (half-wave)",
    input: { low: 0, high: 0 },
    // Its op amp's output is one diode drop beyond the stage output: −(W + Vf) for a positive input, +Vf for a negative one.
    output: { low: -(W + vf), high: vf },
    noise_gain: 2,
    vos_multiplier: 2,
    bias_ohm: R,
    output_per_input: k / 2,
    bandwidth_peak_v: 2 * peak,
    slew_amplitude_v: W + vf,
    zero_crossing_v: 2 * vfCold,
    zero_crossing_at: endPhrase("cold", cold),
    // The buffer's ±W reaches stage 1 through its input resistor; the reading's error is input-referred at the peak.
    zero_crossing_signal_v: W,
    zero_crossing_peak_v: peak,
    // While stage 1 is dead the summer's output is −x, below 0 V, and the single-supply converter reads 0: off by x.
    zero_crossing_error: "clips",
    // Through the conducting diode the output drives the feedback R and the summer's R/2, both into virtual
    // grounds: R/3, the 3·W/R the diode carries. Those branches hang from the stage output beyond the diode,
    // −W … 0, not from the op amp's −(W + Vf) … +Vf (node_v). On the other half-cycle the op amp's output
    // carries only the input resistor's W/R through the other diode, a third of that.
    load: {
      branches: [
        { what: "feedback R (through the diode) to the virtual ground", ohm: R, return_v: ZERO },
        { what: "the summer's input R/2 to its virtual ground", ohm: R / 2, return_v: ZERO },
      ],
      node_v: { low: -W, high: 0 },
      note: "on the other half-cycle it carries only the input R's W/R, through the other diode",
    },
  };
  const summer: OpAmpStage = {
    stage: "op-amp",
    label: "the rectifier's stage 2 (summer)",
    input: { low: 0, high: 0 },
    output: { low: 0, high: W },
    // Inputs R (from the buffer) and R/2 (from stage 1), feedback R: 1 + R/(R ‖ R/2) = 4.
    noise_gain: 4,
    vos_multiplier: 4,
    bias_ohm: R,
    output_per_input: k,
    bandwidth_peak_v: peak,
    slew_amplitude_v: W,
    load: drivingPin(design, [{ what: "feedback R to the virtual ground", ohm: R, return_v: ZERO }]),
  };
  const sign: SignStage = {
    stage: "sign",
    label: "the sign comparator",
    input: { low: -W, high: W },
    output_per_input: k,
    ...(clamp ? { clamp } : {}),
    ...(baseClamp ? { base_clamp: baseClamp } : {}),
    deepest_negative_v: deepest_v,
  };
  // Each amplifier role sees the rail with its own pick's draw, and what another candidate's would do (pump-load).
  const railsOf = (id: string, channels: number): Rails => (pumpOn ? { ...rails, pump: pumpOn(id, channels) } : rails);
  // A fault reaches the buffer through the divider, the source and any series resistor in its top leg.
  const top = (divider ? divider.top_ohm : 0) + seriesInOhm(design);
  buffer.fault = divider
    ? faultPath(
        divider.bottom_ohm / (top + divider.bottom_ohm),
        0,
        (top * divider.bottom_ohm) / (top + divider.bottom_ohm),
        "the buffer's input",
      )
    : faultPath(1, 0, top, "the buffer's input");
  const bufferRole = role(
    "buffer",
    [{ stage: buffer, rules: rulesFor(design, [...OP_AMP_STAGE_RULES, pumpLoadRule, inputFault]) }],
    railsOf("buffer", 1),
  );
  // The summer drives the converter: it is the stage whose settling counts.
  const rectifierRole = role(
    "rectifier",
    [
      { id: RECTIFIER_STAGES[0], stage: halfWave, rules: [...OP_AMP_STAGE_RULES, zeroCrossing, pumpLoadRule] },
      { id: RECTIFIER_STAGES[1], stage: summer, rules: rulesFor(design, [...OP_AMP_STAGE_RULES, adcSettling]) },
    ],
    railsOf("rectifier", 2),
  );
  role("sign", sign, railsOf("sign", 1));

  const noise = chainNoise(design, catalogue, k, thevenin_ohm, bufferRole, rectifierRole);
  if (noise.unrated.length > 0) {
    notes.push(
      `No voltage noise rating (noise_nv_rthz) for ${noise.unrated.join(", ")}: the noise term leaves that part's own noise out.`,
    );
  }

  const derived: Derived = {
    rails,
    negative: negativeDerived,
    target_ratio,
    divider,
    ratio: k,
    window_v: W,
    thevenin_ohm,
    adc_step_at_input_v: design.adc.reference_v / 2 ** design.adc.bits / k,
    rectifier_diode: rectDiode,
    ...(clampUse ? { clamp_diode: clampUse } : {}),
  };
  return {
    ok: true,
    outcome: {
      derived,
      notes,
      terms: [...fixedTerms(design, k, divider), ...noise.terms, ...pinTerms(design)],
      noise: noise.figure,
      codesSpannedBits: design.adc.bits + Math.log2(W / design.adc.reference_v) + 1,
      conversion: conversion(design, k),
      display: [...display(design, derived), driveDisplay(design)],
    },
  };
}

/** The rectifier role's two stages (SPEC §11.2); findings and budget terms name them. */
export const RECTIFIER_STAGES = ["stage-1", "stage-2"] as const;

const ROLE_TERMS: readonly RoleTerm[] = [
  // The buffer's offset shifts the reading like a true offset (the sign follows the shifted signal): a
  // two-point calibration removes it. The rectifier's adds to the magnitude of both halves alike, which
  // no linear calibration of a signed reading removes.
  {
    name: "buffer-offset",
    label: "buffer offset and bias current",
    role: "buffer",
    rule: offset.id,
    removed_by: "two-point",
  },
  {
    name: "rectifier-1-offset",
    label: "rectifier stage 1 offset and bias current, through the summer's weight 2",
    role: "rectifier",
    rule: offset.id,
    stage: "stage-1",
  },
  {
    name: "rectifier-2-offset",
    label: "rectifier stage 2 (summer) offset and bias current",
    role: "rectifier",
    rule: offset.id,
    stage: "stage-2",
  },
  { name: "buffer-bandwidth", label: "buffer gain error at f max", role: "buffer", rule: bandwidth.id },
  {
    name: "rectifier-1-bandwidth",
    label: "rectifier stage 1 gain error at f max, through the summer's weight 2",
    role: "rectifier",
    rule: bandwidth.id,
    stage: "stage-1",
  },
  {
    name: "rectifier-2-bandwidth",
    label: "rectifier stage 2 (summer) gain error at f max",
    role: "rectifier",
    rule: bandwidth.id,
    stage: "stage-2",
  },
  { name: "sign-dead-band", label: "comparator dead band", role: "sign", rule: signDeadBand.id },
  { name: "rectifier-diode-leakage", label: "rectifier diode leakage", role: "rectifier-diode", rule: leakage.id },
  ...TIMING_ROLE_TERMS,
];

/** Terms that do not depend on the parts: the ADC, its reference, the divider and the source. */
export function fixedTerms(design: Design, k: number, divider: Divider | null): BudgetTerm[] {
  const peak = design.signal.peak_v;
  const terms = converterTerms(design, k, peak);
  if (divider) terms.push(...dividerTerms(design, divider));
  terms.push(...rectifierRatioTerms(design));
  return terms;
}

/**
 * The rectifier's five resistors at their tolerance, over all 32 corners (SPEC
 * §11.2): the part of the half-wave gains both halves share (a one-point gain
 * calibration removes it) and the difference between the halves (nothing
 * removes it: after a calibration on one half the other is off by all of it).
 */
export function rectifierRatioTerms(design: Design): BudgetTerm[] {
  const t = design.front_end.rectifier_tolerance ?? design.front_end.resistor_tolerance;
  const peak = design.signal.peak_v;
  const s = ratioSpread(design.front_end.rectifier_load_ohm, t);
  const head = `g+ = Rf2·(Rf1/(Ri1·Rb) − 1/Ra), g− = Rf2/Ra, 5 resistors ± ${pct(t)}, 32 corners: |g+ − 1| ≤ ${pct(s.positive)}, |g− − 1| ≤ ${pct(s.negative)}`;
  return [
    budgetTerm(
      "rectifier-ratio-common",
      "rectifier resistor ratios, common to both halves",
      s.common * peak,
      `${head}; common part |(g+ + g−)/2 − 1| ≤ ${pct(s.common)} × ${formatSI(peak, "V")} = ${formatSI(s.common * peak, "V")}`,
      "one-point",
    ),
    budgetTerm(
      "rectifier-ratio-difference",
      "rectifier resistor ratios, difference between the halves",
      s.difference * peak,
      `${head}; |g+ − g−| ≤ ${pct(s.difference)} × ${formatSI(peak, "V")} = ${formatSI(s.difference * peak, "V")}`,
      "none",
    ),
  ];
}

const ROOM_K = 273.15;

/**
 * The chain's random noise (SPEC §11.9), input-referred: each op amp's
 * voltage noise, current noise where rated and the Johnson noise of the
 * resistance its inputs see, over its own noise bandwidth (π/2)·GBW/NG, times
 * its noise gain; stage 1 at the summer's weight 2; all through k to the
 * input and combined root-sum-square at the hottest end of the range. The
 * budget takes it at coverage factor 2 (JCGM 100:2008 §6).
 */
export function chainNoise(
  design: Design,
  catalogue: Catalogue,
  k: number,
  theveninOhm: number,
  buffer: RoleResult,
  rectifier: RoleResult,
): { terms: BudgetTerm[]; figure?: NoiseFigure; unrated: string[] } {
  const kelvin = design.temperature.max_c + ROOM_K;
  const R = design.front_end.rectifier_load_ohm;
  const opAmp = (r: RoleResult): OpAmp | undefined => {
    const p = r.chosen === undefined ? undefined : catalogue.byId.get(r.chosen);
    return p?.kind === "op-amp" ? p : undefined;
  };
  const b = opAmp(buffer);
  const rect = opAmp(rectifier);
  if (!b || !rect) return { terms: [], unrated: [] };
  const unrated = [...new Set([b, rect].filter((p) => p.noise_nv_rthz === undefined).map((p) => p.id))];
  const stages = [
    { what: "buffer", part: b, ng: 1, r: theveninOhm, weight: 1 },
    { what: "stage 1", part: rect, ng: 2, r: R / 2, weight: 2 },
    { what: "stage 2", part: rect, ng: 4, r: R / 4, weight: 1 },
  ].map((x) => {
    const n = stageNoise({
      en: (x.part.noise_nv_rthz ?? 0) * 1e-9,
      in: (x.part.in_pa_rthz ?? 0) * 1e-12,
      gbw_hz: x.part.gbw_mhz * 1e6,
      noise_gain: x.ng,
      r_ohm: x.r,
      kelvin,
    });
    return { ...x, n, input_v: (n.output_rms_v * x.weight) / k };
  });
  const rms = Math.sqrt(stages.reduce((a, x) => a + x.input_v ** 2, 0));
  const atAdc = rms * k;
  const sinad = sinadDb(design.adc.bits, design.adc.reference_v, atAdc);
  const parts = stages
    .map(
      (x) =>
        `${x.what} ${formatSI(x.n.density, "V")}/√Hz × NG ${x.ng} × √(π/2 · ${formatSI(x.n.fc_hz, "Hz")})${x.weight === 1 ? "" : ` × ${x.weight}`} ÷ ${ratio(k)} = ${formatSI(x.input_v, "V")}`,
    )
    .join("; ");
  return {
    terms: [
      budgetTerm(
        "noise",
        "random noise, coverage factor 2",
        2 * rms,
        `√(en² + (in·R)² + 4kTR) at ${Number(kelvin.toFixed(2))} K per stage: ${parts}; RSS ${formatSI(rms, "V")} rms × 2 = ${formatSI(2 * rms, "V")}`,
        "none",
      ),
    ],
    figure: { rms_v: rms, sinad_db: sinad, enob: enobOf(sinad), unrated },
    unrated,
  };
}

/** The divider's ratio over its resistors' tolerance, and over the source's when the design gives one (SPEC §11.1). */
export function dividerTerms(design: Design, d: Divider): BudgetTerm[] {
  const peak = design.signal.peak_v;
  const t = design.front_end.resistor_tolerance;
  const dev = loadedRatioDeviation(d, t);
  const worst = Math.max(Math.abs(dev.high), Math.abs(dev.low));
  const kText = `k = ${si(d.bottom_ohm, "Ω")} / (${si(d.source_ohm, "Ω")} + ${si(d.top_ohm, "Ω")} + ${si(d.bottom_ohm, "Ω")}) = ${ratio(d.ratio)}`;
  const terms: BudgetTerm[] = [
    budgetTerm(
      "divider-ratio",
      "divider ratio, worst case of both tolerances",
      worst * peak,
      `${kText}; R1, R2 ± ${pct(t)} at the worst corners: k changes by +${pct(dev.high)} / −${pct(-dev.low)}; ${pct(worst)} × ${formatSI(peak, "V")} = ${formatSI(worst * peak, "V")}`,
      "one-point",
    ),
  ];
  const ts = design.signal.source_tolerance;
  const rs = design.signal.source_ohm;
  if (ts !== undefined && rs > 0) {
    const sdev = sourceRatioDeviation(d, ts, rs);
    const sworst = Math.max(Math.abs(sdev.high), Math.abs(sdev.low));
    terms.push(
      budgetTerm(
        "source-resistance",
        "source resistance tolerance, through the divider",
        sworst * peak,
        `${kText}; the source's ${si(rs, "Ω")} ± ${pct(ts)}: k changes by +${pct(sdev.high)} / −${pct(-sdev.low)}; ${pct(sworst)} × ${formatSI(peak, "V")} = ${formatSI(sworst * peak, "V")}`,
        "one-point",
      ),
    );
  }
  return terms;
}

const pct = (x: number) => `${Number((x * 100).toPrecision(4))} %`;

export function conversion(design: Design, k: number): Conversion {
  const perCode = design.adc.reference_v / 2 ** design.adc.bits / k;
  const positiveIsHigh = design.logic.level_shift !== "npn-inverter";
  return {
    volts_per_code: perCode,
    offset_v: 0,
    formula: `reading = sign × (code + 0.5) × ${perCode.toPrecision(6)} V`,
    sign: positiveIsHigh
      ? "sign = +1 when the sign input reads high, −1 when it reads low"
      : "sign = +1 when the sign input reads low (the NPN inverts), −1 when it reads high",
  };
}

/** The chosen total beside the one asked for, and how far apart they are. */
function totalAgainstAsk(got: number, asked: number): string {
  const times = got / asked;
  if (Math.abs(times - 1) < 0.005) return `${si(got, "Ω")}, as asked`;
  return `${si(got, "Ω")}, asked ${si(asked, "Ω")} (${Number(times.toPrecision(2))} × the ask)`;
}

/** Derived values as the design page, the try page and the CLI print them. */
function display(design: Design, d: Derived): DisplayGroup[] {
  const series = design.front_end.series;
  const held = d.divider?.chosen_by === "held";
  // Held resistors are the design's own values, not members of the series: say which, and why.
  const from = held ? "held" : series;
  const divider: DisplayRow[] = d.divider
    ? [
        { label: "Target ratio = window ÷ peak", value: ratio(d.target_ratio) },
        { label: `Top resistor R1 (${from})`, value: si(d.divider.top_ohm, "Ω") },
        { label: `Bottom resistor R2 (${from})`, value: si(d.divider.bottom_ohm, "Ω") },
        { label: "Source (and protection) resistance Rs, in series with R1", value: si(d.divider.source_ohm, "Ω") },
        { label: "Ratio k = R2 / (Rs + R1 + R2)", value: ratio(d.divider.ratio) },
        held
          ? { label: "Total R1 + R2", value: si(d.divider.total_ohm, "Ω") }
          : { label: "Total R1 + R2", value: totalAgainstAsk(d.divider.total_ohm, design.front_end.divider_total_ohm) },
        held
          ? {
              label: "Why these resistors",
              value: `held by the design (front_end.divider_r1_ohm and divider_r2_ohm): used as given, no search; the ${si(design.front_end.divider_total_ohm, "Ω")} total asked for is not used`,
            }
          : {
              label: "Why this total",
              value: `chosen by search: the ${series} pair with the largest ratio not above the target, among totals from half to twice the ${si(design.front_end.divider_total_ohm, "Ω")} asked for (a larger ratio uses more of the ADC, so it wins over a total nearer the ask; ties go to the nearer total)`,
            },
      ]
    : [{ label: "Divider", value: "none: the peak already fits the window (k = 1)" }];
  const signal: DisplayRow[] = [
    { label: "Window used W = k · peak", value: `±${formatVolts(d.window_v)}` },
    { label: "Resistance seen by the buffer (Rs + R1) ‖ R2", value: si(d.thevenin_ohm, "Ω") },
    { label: "One ADC step at the input", value: si(d.adc_step_at_input_v, "V") },
  ];
  const diodes: DisplayRow[] = [];
  if (d.rectifier_diode) {
    diodes.push({
      label: "Rectifier diode drop",
      value: `${d.rectifier_diode.id}, ${formatVolts(d.rectifier_diode.vf_v)} at ${si(d.rectifier_diode.current_a, "A")}`,
      partId: d.rectifier_diode.id,
      role: "rectifier-diode",
    });
  }
  if (d.clamp_diode) {
    diodes.push({
      label: "Clamp diode drop",
      value: `${d.clamp_diode.id}, ${formatVolts(d.clamp_diode.vf_v)} at ${si(d.clamp_diode.current_a, "A")}`,
      partId: d.clamp_diode.id,
      role: "clamp-diode",
    });
  }
  const groups: DisplayGroup[] = [
    { title: "Rails", rows: railRows(d) },
    { title: "Divider", rows: divider },
    { title: "Signal at the ADC side", rows: signal },
  ];
  if (diodes.length > 0) groups.push({ title: "Diode drops in the signal chain", rows: diodes });
  return groups;
}

const META = metaOf("rectify-and-sign");

export const rectifyAndSign = defineTopology({
  id: "rectify-and-sign",
  title: META.title,
  description:
    "A divider (top R1, bottom R2 from the named E-series, ratio k = R2/(Rs + R1 + R2), loaded by the source resistance Rs, as large as possible but not above window/peak) feeds a follower buffer; a comparator decides the sign; a two-op-amp precision rectifier folds the negative half up; an optional diode/capacitor charge pump makes V− = −(V_d − 2V_F) + I/(f·C_fly) + ripple/2, ripple = I/(f·C_res) (switched-capacitor resistance 1/(f·C)). Buffer in = out = ±W; rectifier stage 1 (inverting half-wave) out −(W + Vf) … +Vf at noise gain 2, stage 2 (inverting summer, inputs R and R/2, feedback R) out 0 … W at noise gain 4, both inputs at 0 V, stage 1 reaching the output at weight 2; W = k · peak.",
  reading: "volts = sign · (code + 0.5) · (V_ref/2^N)/k",
  fields: [
    "supply.positive_v",
    "supply.negative",
    "signal.peak_v",
    "signal.max_frequency_hz",
    "signal.source_ohm",
    "front_end.window_v",
    "front_end.divider_total_ohm",
    "front_end.divider_r1_ohm",
    "front_end.divider_r2_ohm",
    "front_end.resistor_tolerance",
    "front_end.series",
    "front_end.rectifier_load_ohm",
    "adc.bits",
    "adc.reference_v",
    "adc.reference_tolerance",
    "logic.vdd_v",
    "logic.vih_v",
    "logic.vil_v",
    "logic.level_shift",
    "logic.pull_down_ohm",
    "logic.pull_up_ohm",
    "logic.pin_cap_f",
    "logic.npn_base_ohm",
    "logic.npn_base_clamp",
    "logic.npn_vebo_v",
    "logic.npn_storage_s",
    "front_end.sign_series_ohm",
    "accuracy.required_v",
    "temperature.min_c",
    "temperature.max_c",
    ...DRIVE_FIELDS,
  ],
  roles: rolesOf(META, {
    buffer: {
      label: "follower after the divider (in = out = ±W)",
      rules: BUFFER_RULES,
    },
    rectifier: {
      label:
        "two-op-amp precision rectifier (a dual, or two singles): stage 1 a half-wave inverter (output −(W + Vf) … +Vf, noise gain 2), stage 2 a summer (output 0 … W, noise gain 4); both inputs at 0 V",
      rules: RECTIFIER_RULES,
    },
    sign: {
      label: "sign comparator driving a logic input (an op amp may stand in, at best marginal)",
      rules: [
        supplyRange,
        inputCommonMode,
        logicHigh,
        logicLow,
        propagationDelay,
        signDeadBand,
        differentialInput,
        overloadRecoveryRule,
        riseTime,
        lateSign,
        outputCurrent,
        baseEmitterReverse,
        pumpLoadRule,
      ],
    },
    "pump-diode": {
      label: "charge-pump diode (two per pump)",
      rules: [reverseVoltage, recovery, forwardCurrent],
    },
    "rectifier-diode": {
      label: "precision-rectifier feedback diode",
      rules: [reverseVoltage, leakage, recovery],
    },
    "clamp-diode": {
      label: "series diode from the comparator to the logic input",
      rules: [reverseVoltage, clampLeakage],
    },
    "base-clamp-diode": {
      label: "diode across the NPN's base and emitter, so a negative output cannot reverse-bias the base",
      rules: [reverseVoltage, forwardCurrent],
    },
  }),
  roleTerms: ROLE_TERMS,
  appliesTo: singleEndedOnly,
  checkDesign(d) {
    const held = heldDividerFits(d);
    if (d.front_end.window_v <= d.adc.reference_v) return held;
    return [
      {
        path: "front_end.window_v",
        message: `window is wider than the ADC range (got ${d.front_end.window_v} V, expected at most adc.reference_v ${d.adc.reference_v} V)`,
      },
      ...held,
    ];
  },
  evaluate,
  simulation: rectifyAndSignChain,
});
