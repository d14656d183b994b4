// Topology `gained-level-shift` (SPEC §12.1): the Millman level-shift network
// followed by a non-inverting stage of gain Gs = 1 + Rf/Rg, so a small bipolar
// signal can fill most of the converter's codes on one positive rail. The
// overall gain A = Gs·a is chosen to put ±peak inside [m, V_ref − m]; the
// network centres its node on V_ref/(2·Gs), close to ground, so the op amp's
// input and output reach near ground decide which parts fit.
import { adcSettling } from "../../rules/adc-settling.ts";
import { bandwidth } from "../../rules/bandwidth.ts";
import { inputFault } from "../../rules/input-fault.ts";
import { offset } from "../../rules/offset.ts";
import { budgetTerm, type BudgetTerm, type RoleTerm } from "../core/engine/budget.ts";
import type { Derived, DisplayGroup } from "../core/engine/result.ts";
import { metaOf, rolesOf } from "./meta.ts";
import { defineTopology, type TopologyEvaluation, type TopologyRun } from "../core/engine/topology.ts";
import {
  chooseGainedLevelShift,
  fillGain,
  gainedSourceError,
  gainedToleranceError,
  type GainedLevelShift,
} from "../core/math/gained-level-shift.ts";
import type { OpAmpStage, Rails } from "../core/rule-kit/index.ts";
import type { Design } from "../core/schemas/design.ts";
import { formatSI, formatVolts } from "../core/units.ts";
import { converterTerms } from "./converter-terms.ts";
import { sourceNetworkTerms } from "./source-term.ts";
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
import { gainedLevelShiftChain } from "./gained-level-shift-sim.ts";
import { OP_AMP_STAGE_RULES } from "./op-amp-stage.ts";
import { noHeldDivider } from "./front-end.ts";

const ROLE_RULES = [...OP_AMP_STAGE_RULES, adcSettling, inputFault];

function evaluate({ design, role }: TopologyRun): TopologyEvaluation {
  const why = singleEndedOnly(design);
  if (why !== null) return { ok: false, problems: [notSingleEnded("gained-level-shift")] };
  const vref = design.adc.reference_v;
  const peak = design.signal.peak_v;
  const margin = design.policy.headroom_margin_v;
  const seriesIn = seriesInOhm(design);
  const x = chooseGainedLevelShift(
    peak,
    vref,
    margin,
    design.front_end.divider_total_ohm,
    design.front_end.series,
    seriesIn,
  );
  if (!x) {
    return {
      ok: false,
      problems: [
        {
          path: "adc.reference_v",
          message: `no ${design.front_end.series} gained level shift maps ±${formatVolts(peak)} into the ADC range (got a ${formatVolts(vref)} reference, expected one wider than twice the ${formatVolts(margin)} margin)`,
        },
      ],
    };
  }
  const n = x.network;
  const rails: Rails = { positive_v: design.supply.positive_v, negative_v: 0 };
  const nodeLow = n.offset_v - n.gain * peak;
  const nodeHigh = n.offset_v + n.gain * peak;
  const stage: OpAmpStage = {
    stage: "op-amp",
    label: "the gain stage",
    input: { low: nodeLow, high: nodeHigh },
    output: { low: x.output_low_v, high: x.output_high_v },
    noise_gain: x.stage_gain,
    vos_multiplier: x.stage_gain,
    // Ib+ through the network's G, times Gs; Ib− through Rf: added, as if of opposite signs.
    bias_ohm: x.stage_gain * n.parallel_ohm + x.rf_ohm,
    output_per_input: x.gain,
    bandwidth_peak_v: peak,
    slew_amplitude_v: x.gain * peak,
    fault: faultPath(n.gain, n.offset_v, n.parallel_ohm, "the gain stage's non-inverting input"),
    // Non-inverting: the output drives Rf into Rg to ground (the − input draws nothing), and the converter pin.
    load: drivingPin(design, [{ what: "Rf + Rg to ground", ohm: x.rf_ohm + x.rg_ohm, return_v: { low: 0, high: 0 } }]),
  };
  role("gain-stage", [{ stage, rules: rulesFor(design, ROLE_RULES) }], rails);
  const derived: Derived = {
    rails,
    negative: { kind: "ground" },
    target_ratio: fillGain(peak, vref, margin),
    divider: null,
    ratio: x.gain,
    window_v: x.gain * peak,
    thevenin_ohm: n.parallel_ohm,
    adc_step_at_input_v: vref / 2 ** design.adc.bits / x.gain,
    level_shift: { ...n, output_low_v: nodeLow, output_high_v: nodeHigh },
  };
  const tol = gainedToleranceError(x, design.front_end.resistor_tolerance, peak, vref);
  const { bits } = design.adc;
  const t = design.front_end.resistor_tolerance;
  const pct = `${Number((t * 100).toPrecision(4))} %`;
  const terms: BudgetTerm[] = [
    ...converterTerms(design, x.gain, peak),
    budgetTerm(
      "network-gain",
      "network and gain resistors, gain part (worst corner)",
      tol.gain_v,
      `R1, R2, R3, Rf, Rg ± ${pct} at the worst of 32 corners: |ΔA|/A × peak = ${formatSI(tol.gain_v, "V")}`,
      "one-point",
    ),
    budgetTerm(
      "network-offset",
      "network and gain resistors, offset part (worst corner)",
      tol.offset_v,
      `R1, R2, R3, Rf, Rg ± ${pct} at the worst of 32 corners: |Δ(Gs·b)|/A = ${formatSI(tol.offset_v, "V")}`,
      "two-point",
    ),
  ];
  terms.push(
    ...sourceNetworkTerms(design, x.source_ohm, (ts) => gainedSourceError(x, ts, peak, vref), {
      gain: "|ΔA|/A",
      zero: "|Δ(Gs·b)|/A",
    }),
  );
  terms.push(...pinTerms(design));
  const perCode = vref / 2 ** bits / x.gain;
  const offsetIn = x.offset_v / x.gain;
  return {
    ok: true,
    outcome: {
      derived,
      notes: [
        "This topology runs on the positive rail alone: the design's negative supply, sign comparator and logic level shift are not used.",
        "The network draws its offset from the ADC reference directly; a reference that cannot drive R2 needs a buffer (see offset-to-mid-rail's reference buffer).",
      ],
      terms,
      codesSpannedBits: bits + Math.log2((x.output_high_v - x.output_low_v) / vref),
      conversion: {
        volts_per_code: perCode,
        offset_v: offsetIn,
        formula: `reading = (code + 0.5) × ${perCode.toPrecision(6)} V − ${offsetIn.toPrecision(6)} V`,
        sign: `the sign is in the reading: codes below ${Math.round((x.offset_v / vref) * 2 ** bits - 0.5)} read negative`,
      },
      display: display(derived, x, design),
    },
  };
}

function display(d: Derived, x: GainedLevelShift, design: Design): DisplayGroup[] {
  const n = x.network;
  return [
    { title: "Rails", rows: railRows(d) },
    {
      title: "Level-shift network",
      rows: [
        { label: "R1 from the signal", value: si(n.r1_ohm, "Ω") },
        { label: "R2 from the ADC reference", value: si(n.r2_ohm, "Ω") },
        { label: "R3 to ground", value: n.r3_ohm === null ? "none" : si(n.r3_ohm, "Ω") },
        { label: "Network gain a = G / (R1 + source), G = (R1 + source) ‖ R2 ‖ R3 (Millman)", value: ratio(n.gain) },
        { label: "Node at zero signal b = V_ref · G / R2", value: formatVolts(n.offset_v) },
      ],
    },
    {
      title: "Gain stage",
      rows: [
        { label: "Rf, output to inverting input", value: si(x.rf_ohm, "Ω") },
        { label: "Rg, inverting input to ground", value: si(x.rg_ohm, "Ω") },
        { label: "Stage gain Gs = 1 + Rf/Rg", value: ratio(x.stage_gain) },
        { label: "Overall gain A = Gs · a", value: ratio(x.gain) },
        { label: "Output at zero signal Gs · b", value: formatVolts(x.offset_v) },
        { label: "Output span for ±peak", value: `${formatVolts(x.output_low_v)} … ${formatVolts(x.output_high_v)}` },
        {
          label: "Share of the ADC codes the signal spans",
          value: `${((100 * (x.output_high_v - x.output_low_v)) / design.adc.reference_v).toFixed(1)} %`,
        },
        { label: "One ADC step at the input", value: si(d.adc_step_at_input_v, "V") },
      ],
    },
    driveDisplay(design),
  ];
}

const ROLE_TERMS: readonly RoleTerm[] = [
  {
    name: "gain-stage-offset",
    label: "gain stage offset and bias current",
    role: "gain-stage",
    rule: offset.id,
    // A true offset: a two-point calibration removes it.
    removed_by: "two-point",
  },
  { name: "gain-stage-bandwidth", label: "gain stage gain error at f max", role: "gain-stage", rule: bandwidth.id },
];

const META = metaOf("gained-level-shift");

export const gainedLevelShift = defineTopology({
  id: "gained-level-shift",
  title: META.title,
  description:
    "The level-shift network of offset-to-mid-rail (signal through R1, ADC reference through R2, R3 to ground; Millman, Proc. IRE 28(9), 1940: node = a·Vin + b, G = R1‖R2‖R3, a = G/R1, b = V_ref·G/R2) feeds a non-inverting stage of gain Gs = 1 + Rf/Rg with Rg to ground (textbook), so out = Gs·(a·Vin + b) and the overall gain A = Gs·a may exceed ½. All five resistors come from the design's E-series: A as close as the series allows to (V_ref/2 − m)/peak (m = headroom_margin_v) with ±peak inside [m, V_ref − m], the output centred near V_ref/2. Since a + b/V_ref = 1 − G/R3 < 1, the stage gain exceeds A + ½. One op amp on V+ and ground; its input sits near V_ref/(2·Gs), close to ground, and its output swings from m, so input and output reach near ground decide which parts fit. Resistor tolerance is split into a gain part (a one-point calibration removes it) and an offset part (it does not).",
  reading: "volts = (code + 0.5) · (V_ref/2^N)/A − Gs·b/A",
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
    "gain-stage": {
      label:
        "non-inverting gain stage after the level-shift network, single supply (in ≈ V_ref/(2·Gs), out = m … V_ref − m)",
      rules: ROLE_RULES,
    },
  }),
  roleTerms: ROLE_TERMS,
  appliesTo: singleEndedOnly,
  checkDesign: (d) => noHeldDivider(d, "gained-level-shift"),
  evaluate,
  simulation: gainedLevelShiftChain,
});
