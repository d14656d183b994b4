// Topology `offset-to-mid-rail`: a three-resistor network (Millman) scales the
// bipolar signal and centres it on half the ADC reference; one op amp follows
// it on a single positive rail, so the ADC sees the whole signal with no
// negative supply and no comparator. An optional op amp buffers the reference.
import { adcSettling } from "../../rules/adc-settling.ts";
import { bandwidth } from "../../rules/bandwidth.ts";
import { inputFault } from "../../rules/input-fault.ts";
import { inputCommonMode } from "../../rules/input-common-mode.ts";
import { offset } from "../../rules/offset.ts";
import { outputLoad } from "../../rules/output-load.ts";
import { outputSwing } from "../../rules/output-swing.ts";
import { stageOutputCurrent } from "../../rules/stage-output-current.ts";
import { supplyRange } from "../../rules/supply-range.ts";
import { unityGainStable } from "../../rules/unity-gain-stable.ts";
import { budgetTerm, type BudgetTerm, type Conversion, type RoleTerm } from "../core/engine/budget.ts";
import type { Derived, DisplayGroup } from "../core/engine/result.ts";
import { metaOf, rolesOf } from "./meta.ts";
import { defineTopology, type TopologyEvaluation, type TopologyRun } from "../core/engine/topology.ts";
import {
  chooseLevelShift,
  networkToleranceError,
  sourceToleranceError,
  type LevelShiftNetwork,
} from "../core/math/level-shift.ts";
import type { OpAmpStage, Rails } from "../core/rule-kit/index.ts";
import type { Design } from "../core/schemas/design.ts";
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
import { formatSI, formatVolts } from "../core/units.ts";
import { converterTerms } from "./converter-terms.ts";
import { sourceNetworkTerms } from "./source-term.ts";
import { railRows, ratio, si } from "./display.ts";
import { offsetToMidRailChain } from "./offset-to-mid-rail-sim.ts";
import { OP_AMP_STAGE_RULES } from "./op-amp-stage.ts";
import { noHeldDivider } from "./front-end.ts";

const LEVEL_SHIFT_RULES = [...OP_AMP_STAGE_RULES, adcSettling, inputFault];

function evaluate({ design, role }: TopologyRun): TopologyEvaluation {
  const notSingle = singleEndedOnly(design);
  if (notSingle !== null) {
    return { ok: false, problems: [notSingleEnded("offset-to-mid-rail")] };
  }
  const vref = design.adc.reference_v;
  const peak = design.signal.peak_v;
  const margin = design.policy.headroom_margin_v;
  // The source (and any protection resistor) is in series with R1: the network is sized and read with it.
  const network = chooseLevelShift(
    peak,
    vref,
    margin,
    design.front_end.divider_total_ohm,
    design.front_end.series,
    seriesInOhm(design),
  );
  if (!network) {
    return {
      ok: false,
      problems: [
        {
          path: "adc.reference_v",
          message: `no ${design.front_end.series} level-shift network maps ±${formatVolts(peak)} into the ADC range (got a ${formatVolts(vref)} reference, expected one wider than twice the ${formatVolts(margin)} margin)`,
        },
      ],
    };
  }
  const a = network.gain;
  const b = network.offset_v;
  const low = b - a * peak;
  const high = b + a * peak;
  const rails: Rails = { positive_v: design.supply.positive_v, negative_v: 0 };
  const notes = [
    "This topology runs on the positive rail alone: the design's negative supply, sign comparator and level shift are not used.",
  ];
  if (a >= 0.5 - 1e-9 && (vref / 2 - margin) / peak > 0.5) {
    notes.push(
      `The signal is small enough to need gain; this network offers at most a = 1/2 (R1 = R2), so the signal spans only ${formatVolts(high - low)} of the ${formatVolts(vref)} ADC range.`,
    );
  }
  const levelShift: OpAmpStage = {
    stage: "op-amp",
    label: "the level shifter",
    input: { low, high },
    output: { low, high },
    noise_gain: 1,
    vos_multiplier: 1,
    // (R1 + Rs) ‖ R2 ‖ R3: the signal source sits in series with R1.
    bias_ohm: network.parallel_ohm,
    output_per_input: a,
    bandwidth_peak_v: peak,
    slew_amplitude_v: a * peak,
    // A follower: its output drives the converter pin alone.
    load: drivingPin(design, []),
  };
  // A fault reaches the follower's input through R1 with the source and any series resistor in front of it.
  levelShift.fault = faultPath(network.gain, network.offset_v, network.parallel_ohm, "the level shifter's input");
  const referenceBuffer: OpAmpStage = {
    stage: "op-amp",
    label: "the reference buffer",
    input: { low: vref, high: vref },
    output: { low: vref, high: vref },
    noise_gain: 1,
    // Its offset moves the node by G/R2 of itself, then /a to the input.
    vos_multiplier: network.parallel_ohm / network.r2_ohm,
    bias_ohm: 0,
    output_per_input: a,
    bandwidth_peak_v: 0,
    slew_amplitude_v: 0,
    // It drives R2 into the node, and from there R1 to the signal and R3 to ground; the follower's input
    // draws nothing. Seen from R2, R1 and R3 are one source (Thévenin): R1 ‖ R3 at V_in·R3/(R1 + R3), which
    // spans ±peak scaled so. The signal's own resistance would only lighten the load and is left out.
    load: {
      branches: [
        {
          what: "R2 + R1 ‖ R3 of the level-shift network",
          ohm: referenceLoadOhm(network),
          return_v: referenceReturn(network, peak),
        },
      ],
    },
  };
  role("level-shift", [{ stage: levelShift, rules: rulesFor(design, LEVEL_SHIFT_RULES) }], rails);
  role("reference-buffer", referenceBuffer, rails);
  const derived: Derived = {
    rails,
    negative: { kind: "ground" },
    target_ratio: Math.min(0.5, (vref / 2 - margin) / peak),
    divider: null,
    ratio: a,
    window_v: a * peak,
    thevenin_ohm: network.parallel_ohm,
    adc_step_at_input_v: vref / 2 ** design.adc.bits / a,
    level_shift: { ...network, output_low_v: low, output_high_v: high },
  };
  const tol = design.front_end.resistor_tolerance;
  const netErr = networkToleranceError(network, tol, peak, vref);
  const fixed: BudgetTerm[] = [
    ...converterTerms(design, a, peak),
    // R2 and R3 move b as well as a: the gain part goes with a one-point calibration, the shift of the zero does not.
    budgetTerm(
      "network-ratio",
      "level-shift network gain, worst case of the three tolerances",
      netErr.gain_v,
      `R1, R2, R3 ± ${pct(tol)} at the worst corner: |Δa|/a × ${formatVolts(peak)} = ${formatSI(netErr.gain_v, "V")}`,
      "one-point",
    ),
    budgetTerm(
      "network-zero",
      "level-shift network zero shift, worst case of the three tolerances",
      netErr.offset_v,
      `R1, R2, R3 ± ${pct(tol)} at the worst corner: |Δb|/a = ${formatSI(netErr.offset_v, "V")}`,
      "two-point",
    ),
  ];
  fixed.push(
    ...sourceNetworkTerms(design, network.source_ohm, (ts) => sourceToleranceError(network, ts, peak, vref), {
      gain: "|Δa|/a",
      zero: "|Δb|/a",
    }),
  );
  fixed.push(...pinTerms(design));
  return {
    ok: true,
    outcome: {
      derived,
      notes,
      terms: fixed,
      codesSpannedBits: design.adc.bits + Math.log2((high - low) / vref),
      conversion: conversion(design, a, b),
      display: [...display(derived, network, low, high), driveDisplay(design)],
    },
  };
}

/**
 * Where the reference buffer's load returns: R1 to the signal (±peak) and R3 to ground as one Thévenin
 * source, V_in·R3/(R1 + R3) (the signal itself without R3). Leaving out the source's resistance, as
 * referenceLoadOhm does, overstates both this swing and the current, never understates them.
 */
export function referenceReturn(n: LevelShiftNetwork, peak: number): { low: number; high: number } {
  const share = n.r3_ohm === null ? 1 : n.r3_ohm / (n.r1_ohm + n.r3_ohm);
  return { low: -peak * share, high: peak * share };
}

/** What the reference buffer drives: R2 in series with R1 ‖ R3 (R1 alone when there is no R3). */
export function referenceLoadOhm(n: LevelShiftNetwork): number {
  const rest = n.r3_ohm === null ? n.r1_ohm : (n.r1_ohm * n.r3_ohm) / (n.r1_ohm + n.r3_ohm);
  return n.r2_ohm + rest;
}

const pct = (x: number) => `${Number((x * 100).toPrecision(4))} %`;

const ROLE_TERMS: readonly RoleTerm[] = [
  // Both offsets move the mid point the reading is taken from: true offsets, which a two-point calibration removes.
  {
    name: "level-shift-offset",
    label: "level shifter offset and bias current",
    role: "level-shift",
    rule: offset.id,
    removed_by: "two-point",
  },
  {
    name: "level-shift-bandwidth",
    label: "level shifter gain error at f max",
    role: "level-shift",
    rule: bandwidth.id,
  },
  {
    name: "reference-buffer-offset",
    label: "reference buffer offset",
    role: "reference-buffer",
    rule: offset.id,
    removed_by: "two-point",
  },
];

/** Derived values as the design page, the try page and the CLI print them: the network, its gain and offset, no divider and no buffer. */
function display(d: Derived, n: LevelShiftNetwork, low: number, high: number): DisplayGroup[] {
  return [
    { title: "Rails", rows: railRows(d) },
    {
      title: "Level-shift network",
      rows: [
        { label: "R1 from the signal", value: si(n.r1_ohm, "Ω") },
        { label: "In series with R1: source and protection resistance Rs", value: si(n.source_ohm, "Ω") },
        { label: "R2 from the ADC reference", value: si(n.r2_ohm, "Ω") },
        { label: "R3 to ground", value: n.r3_ohm === null ? "none (a = 1/2)" : si(n.r3_ohm, "Ω") },
        { label: "Gain a = G / (R1 + Rs), G = (R1 + Rs) ‖ R2 ‖ R3 (Millman)", value: ratio(n.gain) },
        { label: "Output at zero signal b = V_ref · G / R2", value: formatVolts(n.offset_v) },
        { label: "Output span for ±peak", value: `${formatVolts(low)} … ${formatVolts(high)}` },
      ],
    },
    {
      title: "Signal at the ADC side",
      rows: [
        { label: "Swing about mid-rail a · peak", value: `±${formatVolts(d.window_v)}` },
        { label: "Resistance seen by the level shifter (R1 + Rs) ‖ R2 ‖ R3", value: si(d.thevenin_ohm, "Ω") },
        { label: "One ADC step at the input", value: si(d.adc_step_at_input_v, "V") },
      ],
    },
  ];
}

function conversion(design: Design, a: number, b: number): Conversion {
  const perCode = design.adc.reference_v / 2 ** design.adc.bits / a;
  const offset = b / a;
  return {
    volts_per_code: perCode,
    offset_v: offset,
    formula: `reading = (code + 0.5) × ${perCode.toPrecision(6)} V − ${offset.toPrecision(6)} V`,
    sign: `the sign is in the reading: codes below ${Math.round((b / design.adc.reference_v) * 2 ** design.adc.bits - 0.5)} read negative`,
  };
}

const META = metaOf("offset-to-mid-rail");

export const offsetToMidRail = defineTopology({
  id: "offset-to-mid-rail",
  title: META.title,
  description:
    "The signal through R1, the ADC reference through R2 and R3 to ground meet at a follower's input. By Millman's theorem (Proc. IRE 28(9), 1940) the node is V = (Vin/R1 + V_ref/R2)/(1/R1 + 1/R2 + 1/R3) = a·Vin + b, with G = R1‖R2‖R3, a = G/R1, b = V_ref·G/R2; the source's resistance (and any protection resistor) sits in series with R1 and is counted in it (Thevenin), so a and b are those of R1 + Rs. R1, R2 and R3 are chosen from the E-series so that −peak … +peak lands inside [m, V_ref − m] (m = headroom_margin_v) with the largest a and b nearest V_ref/2; a ≤ 1/2, so a small signal uses only part of the ADC range. One op amp on V+ and ground; no negative rail, no comparator. The level shifter needs b ± a·peak at its input and output; the optional reference buffer needs V_ref at both.",
  reading: "volts = (code + 0.5) · (V_ref/2^N)/a − b/a",
  fields: [
    "supply.positive_v",
    "signal.peak_v",
    "signal.max_frequency_hz",
    "signal.source_ohm",
    "signal.source_tolerance",
    "front_end.divider_total_ohm",
    "front_end.resistor_tolerance",
    "front_end.series",
    "adc.bits",
    "adc.reference_v",
    "adc.reference_tolerance",
    "accuracy.required_v",
    "temperature.min_c",
    "temperature.max_c",
    ...DRIVE_FIELDS,
  ],
  roles: rolesOf(META, {
    "level-shift": {
      label: "follower after the level-shift network, single supply (in = out = b ± a·peak)",
      rules: LEVEL_SHIFT_RULES,
    },
    "reference-buffer": {
      label: "optional follower driving the network from the ADC reference (in = out = V_ref)",
      rules: [supplyRange, inputCommonMode, outputSwing, outputLoad, stageOutputCurrent, unityGainStable, offset],
    },
  }),
  roleTerms: ROLE_TERMS,
  appliesTo: singleEndedOnly,
  checkDesign: (d) => noHeldDivider(d, "offset-to-mid-rail"),
  evaluate,
  simulation: offsetToMidRailChain,
});
