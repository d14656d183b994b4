// Topology `difference-to-mid` (SPEC §12.2): one op amp and four E-series
// resistors take the difference of two inputs (a bridge's outputs) and add
// REF = V_ref/2, so a differential signal riding on a common mode lands
// centred in the converter's range on one positive rail. A single-ended
// signal is the case V−in = 0.
import { adcSettling } from "../../rules/adc-settling.ts";
import { bandwidth } from "../../rules/bandwidth.ts";
import { inputFault } from "../../rules/input-fault.ts";
import { offset } from "../../rules/offset.ts";
import { budgetTerm, type BudgetTerm, type RoleTerm } from "../core/engine/budget.ts";
import type { Derived, DisplayGroup } from "../core/engine/result.ts";
import { metaOf, rolesOf } from "./meta.ts";
import { defineTopology, type TopologyEvaluation, type TopologyRun } from "../core/engine/topology.ts";
import { worstClampCurrent } from "../core/math/clamp-current.ts";
import {
  chooseDifferenceAmp,
  differenceSourceError,
  differenceToleranceError,
  pinCommonMode,
  toDecibels,
  worstCaseCmrr,
  type DifferenceAmp,
} from "../core/math/difference-amp.ts";
import { fillGain } from "../core/math/gained-level-shift.ts";
import type { FaultPath, OpAmpStage, Rails } from "../core/rule-kit/index.ts";
import type { Design } from "../core/schemas/design.ts";
import { formatSI, formatVolts } from "../core/units.ts";
import { converterTerms } from "./converter-terms.ts";
import {
  pinTerms,
  driveDisplay,
  DRIVE_FIELDS,
  drivingPin,
  faultPath,
  rulesFor,
  seriesInOhm,
} from "./converter-drive.ts";
import { differenceToMidChain } from "./difference-to-mid-sim.ts";
import { railRows, ratio, si } from "./display.ts";
import { OP_AMP_STAGE_RULES } from "./op-amp-stage.ts";
import { noHeldDivider } from "./front-end.ts";

const ROLE_RULES = [...OP_AMP_STAGE_RULES, adcSettling, inputFault];

/** The range the non-inverting input line (V+in) covers: common mode ± half the difference, or ±peak single-ended. */
export function plusInputRange(design: Design): { low: number; high: number; cm_max_abs: number } {
  const peak = design.signal.peak_v;
  if (design.signal.kind === "differential") {
    const lo = design.signal.common_mode_min_v ?? 0;
    const hi = design.signal.common_mode_max_v ?? 0;
    return { low: lo - peak / 2, high: hi + peak / 2, cm_max_abs: Math.max(Math.abs(lo), Math.abs(hi)) };
  }
  // Single-ended: V−in is ground, so the common mode is half the signal.
  return { low: -peak, high: peak, cm_max_abs: peak / 2 };
}

/** The worse of the two inputs' fault paths: V+in into (R3 ‖ R4) towards REF, V−in into (R1 ‖ R2) towards an output at either rail. */
function worstFaultPath(design: Design, amp: DifferenceAmp, ref: number, rails: Rails): FaultPath {
  const r1 = amp.r_in_ohm + amp.source_ohm;
  const r2 = amp.r_fb_ohm;
  const gain = r2 / (r1 + r2);
  const ohm = (r1 * r2) / (r1 + r2);
  const paths = [
    faultPath(gain, (ref * r1) / (r1 + r2), ohm, "the non-inverting input (through R3, R4 to REF)"),
    faultPath(gain, (rails.positive_v * r1) / (r1 + r2), ohm, "the inverting input, output at V+"),
    faultPath(gain, (rails.negative_v * r1) / (r1 + r2), ohm, "the inverting input, output at V−"),
  ];
  const fault = design.signal.fault_v ?? 0;
  let worst = paths[0] as FaultPath;
  let most = -1;
  for (const p of paths) {
    const i = worstClampCurrent(p, fault, rails.negative_v, rails.positive_v);
    if (i > most) {
      most = i;
      worst = p;
    }
  }
  return worst;
}

function evaluate({ design, role }: TopologyRun): TopologyEvaluation {
  const vref = design.adc.reference_v;
  const peak = design.signal.peak_v;
  const margin = design.policy.headroom_margin_v;
  const t = design.front_end.resistor_tolerance;
  const target = fillGain(peak, vref, margin);
  const amp =
    target > 0
      ? chooseDifferenceAmp(target, design.front_end.divider_total_ohm, design.front_end.series, seriesInOhm(design))
      : undefined;
  if (!amp) {
    return {
      ok: false,
      problems: [
        {
          path: "adc.reference_v",
          message: `no ${design.front_end.series} difference amplifier maps ±${formatVolts(peak)} into the ADC range (got a ${formatVolts(vref)} reference, expected one wider than twice the ${formatVolts(margin)} margin, and resistors near front_end.divider_total_ohm)`,
        },
      ],
    };
  }
  const G = amp.gain;
  const ref = vref / 2;
  const rails: Rails = { positive_v: design.supply.positive_v, negative_v: 0 };
  const plus = plusInputRange(design);
  const pinLow = pinCommonMode(amp, plus.low, ref);
  const pinHigh = pinCommonMode(amp, plus.high, ref);
  const outLow = ref - G * peak;
  const outHigh = ref + G * peak;
  const stage: OpAmpStage = {
    stage: "op-amp",
    label: "the difference amplifier",
    input: { low: pinLow, high: pinHigh },
    output: { low: outLow, high: outHigh },
    noise_gain: 1 + G,
    vos_multiplier: 1 + G,
    // Each input's Ib flows through R1 ‖ R2 and reaches the output × (1 + G), i.e. × R2; the two added.
    bias_ohm: 2 * amp.r_fb_ohm,
    output_per_input: G,
    bandwidth_peak_v: peak,
    slew_amplitude_v: G * peak,
    fault: worstFaultPath(design, amp, ref, rails),
    // The output drives R2 into the − input, which feedback holds at the + input's level (the far side of R1
    // is the V−in source): R2 alone, as Rf of an inverting stage to its virtual ground, which sits where the
    // + input puts it, pinLow … pinHigh. And the converter pin.
    load: drivingPin(design, [
      { what: "feedback R2 to the − input", ohm: amp.r_fb_ohm, return_v: { low: pinLow, high: pinHigh } },
    ]),
  };
  role("difference", [{ stage, rules: rulesFor(design, ROLE_RULES) }], rails);
  const cmrr = worstCaseCmrr(G, t);
  const derived: Derived = {
    rails,
    negative: { kind: "ground" },
    target_ratio: target,
    divider: null,
    ratio: G,
    window_v: G * peak,
    thevenin_ohm: ((amp.r_in_ohm + amp.source_ohm) * amp.r_fb_ohm) / (amp.r_in_ohm + amp.source_ohm + amp.r_fb_ohm),
    adc_step_at_input_v: vref / 2 ** design.adc.bits / G,
  };
  const { bits } = design.adc;
  const tolErr = differenceToleranceError(amp, t, peak, ref);
  const cmErr = Number.isFinite(cmrr) ? plus.cm_max_abs / cmrr : 0;
  const terms: BudgetTerm[] = [
    ...converterTerms(design, G, peak),
    budgetTerm(
      "resistor-gain",
      "resistor tolerance in the gain and REF paths (worst corner)",
      tolErr,
      `R1…R4 ± ${Number((t * 100).toPrecision(4))} % at the worst of 16 corners, the reading's error at ±${formatVolts(peak)} with no common mode: ${formatSI(tolErr, "V")}`,
      "two-point",
    ),
    budgetTerm(
      "common-mode",
      `common-mode error, worst-case CMRR (1+G)/(4t) = ${Number(cmrr.toPrecision(4))} (${toDecibels(cmrr).toFixed(1)} dB)`,
      cmErr,
      `|Vcm|max / CMRR = ${formatVolts(plus.cm_max_abs)} / ((1 + ${Number(G.toPrecision(4))})/(4 × ${t})) = ${formatSI(cmErr, "V")}`,
      "none",
    ),
  ];
  const ts = design.signal.source_tolerance;
  if (ts !== undefined && amp.source_ohm > 0) {
    const srcErr = differenceSourceError(amp, ts, peak, ref, plus.cm_max_abs);
    terms.push(
      budgetTerm(
        "source-resistance-legs",
        "source resistance tolerance, each leg on its own",
        srcErr,
        `Rs = ${formatSI(amp.source_ohm, "Ω")} ± ${Number((ts * 100).toPrecision(4))} % in each leg independently, at ±${formatVolts(peak)} and a common mode of ±${formatVolts(plus.cm_max_abs)}: ${formatSI(srcErr, "V")}`,
        "none",
      ),
    );
  }
  terms.push(...pinTerms(design));
  const perCode = vref / 2 ** bits / G;
  const offsetIn = ref / G;
  return {
    ok: true,
    outcome: {
      derived,
      notes: [
        "This topology runs on the positive rail alone: the design's negative supply, sign comparator and logic level shift are not used.",
        "REF is taken as V_ref/2 from a low-impedance source (a buffered half of the reference); resistance in series with REF adds to R4 and spoils the common-mode rejection.",
      ],
      terms,
      codesSpannedBits: bits + Math.log2((outHigh - outLow) / vref),
      conversion: {
        volts_per_code: perCode,
        offset_v: offsetIn,
        formula: `reading = (code + 0.5) × ${perCode.toPrecision(6)} V − ${offsetIn.toPrecision(6)} V`,
        sign: `the sign is in the reading: codes below ${2 ** (bits - 1)} read negative`,
      },
      display: display(derived, amp, design, { pinLow, pinHigh, outLow, outHigh, ref, cmrr }),
    },
  };
}

function display(
  d: Derived,
  amp: DifferenceAmp,
  design: Design,
  v: { pinLow: number; pinHigh: number; outLow: number; outHigh: number; ref: number; cmrr: number },
): DisplayGroup[] {
  const s = design.signal;
  return [
    { title: "Rails", rows: railRows(d) },
    {
      title: "Difference amplifier",
      rows: [
        { label: "R1 = R3, from each input", value: si(amp.r_in_ohm, "Ω") },
        { label: "R2 = R4, feedback and to REF", value: si(amp.r_fb_ohm, "Ω") },
        { label: "Gain G = R2 / (R1 + source)", value: ratio(amp.gain) },
        { label: "REF = V_ref / 2", value: formatVolts(v.ref) },
        {
          label: "Source common mode",
          value:
            s.kind === "differential"
              ? `${formatVolts(s.common_mode_min_v ?? 0)} … ${formatVolts(s.common_mode_max_v ?? 0)}`
              : "single-ended (V−in at ground)",
        },
        {
          label: "Op amp input common mode (V+in·R4 + REF·R3)/(R3 + R4)",
          value: `${formatVolts(v.pinLow)} … ${formatVolts(v.pinHigh)}`,
        },
        { label: "Output span G·(±peak) + REF", value: `${formatVolts(v.outLow)} … ${formatVolts(v.outHigh)}` },
        {
          label: "Worst-case CMRR (1 + G)/(4t) from resistor tolerance",
          value: Number.isFinite(v.cmrr)
            ? `${Number(v.cmrr.toPrecision(4))} (${toDecibels(v.cmrr).toFixed(1)} dB)`
            : "unlimited (t = 0)",
        },
        { label: "One ADC step at the input", value: si(d.adc_step_at_input_v, "V") },
      ],
    },
    driveDisplay(design),
  ];
}

const ROLE_TERMS: readonly RoleTerm[] = [
  {
    name: "difference-offset",
    label: "difference amplifier offset and bias current",
    role: "difference",
    rule: offset.id,
    // A true offset: a two-point calibration removes it.
    removed_by: "two-point",
  },
  {
    name: "difference-bandwidth",
    label: "difference amplifier gain error at f max",
    role: "difference",
    rule: bandwidth.id,
  },
];

const META = metaOf("difference-to-mid");

export const differenceToMid = defineTopology({
  id: "difference-to-mid",
  title: META.title,
  description:
    "For a differential source (a bridge: signal.kind 'differential' with its common-mode range) or a single-ended one (V−in at ground). R1 from V−in to the inverting input, R2 from there to the output, R3 = R1 from V+in to the non-inverting input, R4 = R2 from there to REF = V_ref/2: out = G·(V+in − V−in) + REF, G = R2/R1 (textbook superposition; Franco, Design with Operational Amplifiers and Analog Integrated Circuits, ch. 2). G is the largest E-series ratio not above (V_ref/2 − m)/peak, the source's resistance counted in R1 and R3. The op amp's inputs sit at (V+in·R4 + REF·R3)/(R3 + R4) over the common-mode range, its output at REF ± G·peak. Resistor mismatch t limits the common-mode rejection to about (1 + G)/(4t) at worst (Franco, ch. 2): G = 1, t = 0.1 % gives 500, 54.0 dB; the common mode divided by it is a budget term of its own. One op amp on V+ and ground.",
  reading: "volts = (code + 0.5) · (V_ref/2^N)/G − (V_ref/2)/G",
  fields: [
    "supply.positive_v",
    "signal.kind",
    "signal.common_mode_min_v",
    "signal.common_mode_max_v",
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
    difference: {
      label:
        "difference amplifier with REF at V_ref/2, single supply (inputs at the divided common mode, out = REF ± G·peak)",
      rules: ROLE_RULES,
    },
  }),
  roleTerms: ROLE_TERMS,
  checkDesign: (d) => noHeldDivider(d, "difference-to-mid"),
  evaluate,
  simulation: differenceToMidChain,
});
