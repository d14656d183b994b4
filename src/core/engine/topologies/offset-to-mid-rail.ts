// Topology `offset-to-mid-rail`: a three-resistor network (Millman) scales the
// bipolar signal and centres it on half the ADC reference; one op amp follows
// it on a single positive rail, so the ADC sees the whole signal with no
// negative supply and no comparator. An optional op amp buffers the reference.
import type { Catalogue } from "../../catalogue.ts";
import { chooseLevelShift, networkToleranceError } from "../../math/level-shift.ts";
import type { Design } from "../../schemas/design.ts";
import { formatVolts } from "../../units.ts";
import { buildBudget, type BudgetTerm, type Conversion } from "../budget.ts";
import type { Derived, DesignResult, Evaluation, RoleResult } from "../result.ts";
import { OP_AMP_STAGE_RULES, runRole, type RoleSpec } from "../run-role.ts";
import type { OpAmpStage, Rails } from "../types.ts";

export const OFFSET_TO_MID_RAIL_ROLES = {
  "level-shift": {
    kind: "op-amp",
    kinds: ["op-amp"],
    label: "follower after the level-shift network, single supply (in = out = b ± a·peak)",
    rules: OP_AMP_STAGE_RULES,
  },
  "reference-buffer": {
    kind: "op-amp",
    kinds: ["op-amp"],
    label: "optional follower driving the network from the ADC reference (in = out = V_ref)",
    rules: ["supply-range", "input-common-mode", "output-swing", "unity-gain-stable", "offset"],
    optional: true,
  },
} as const satisfies Record<string, RoleSpec>;

export function evaluateOffsetToMidRail(design: Design, catalogue: Catalogue): Evaluation {
  const vref = design.adc.reference_v;
  const peak = design.signal.peak_v;
  const margin = design.policy.headroom_margin_v;
  const network = chooseLevelShift(peak, vref, margin, design.front_end.divider_total_ohm, design.front_end.series);
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
    // The signal source sits in series with R1; its share is small next to R1 and is left out.
    bias_ohm: network.parallel_ohm,
    output_per_input: a,
    bandwidth_peak_v: peak,
    slew_amplitude_v: a * peak,
  };
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
  };
  const roles: RoleResult[] = [
    runRole(design, "level-shift", OFFSET_TO_MID_RAIL_ROLES["level-shift"], levelShift, rails, catalogue.opAmps),
    runRole(
      design,
      "reference-buffer",
      OFFSET_TO_MID_RAIL_ROLES["reference-buffer"],
      referenceBuffer,
      rails,
      catalogue.opAmps,
    ),
  ];
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
  const { bits, reference_tolerance } = design.adc;
  const fixed: BudgetTerm[] = [
    {
      name: "quantization",
      label: "quantization, half a step",
      v: (0.5 * (vref / 2 ** bits)) / a,
      calibrates_out: false,
    },
    { name: "reference", label: "ADC reference tolerance", v: reference_tolerance * peak, calibrates_out: true },
    {
      name: "network-ratio",
      label: "level-shift network, worst case of the three tolerances",
      v: networkToleranceError(network, design.front_end.resistor_tolerance, peak, vref),
      calibrates_out: true,
    },
  ];
  const budget = buildBudget(
    design,
    fixed,
    [
      {
        name: "level-shift-offset",
        label: "level shifter offset and bias current",
        role: "level-shift",
        rule: "offset",
      },
      {
        name: "level-shift-bandwidth",
        label: "level shifter gain error at f max",
        role: "level-shift",
        rule: "bandwidth",
      },
      { name: "reference-buffer-offset", label: "reference buffer offset", role: "reference-buffer", rule: "offset" },
    ],
    roles,
    bits + Math.log2((high - low) / vref),
  );
  const result: DesignResult = {
    design,
    topology: "offset-to-mid-rail",
    derived,
    roles,
    notes,
    budget,
    conversion: conversion(design, a, b),
  };
  return { ok: true, result };
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
