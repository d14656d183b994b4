// Budget terms of the converter and its reference (SPEC §8, §11.10), shared by
// every topology: `perInput` is the gain from the signal input to the ADC pin
// (k of a divider, a of a level-shift network), `span_v` the input-referred
// amplitude a gain error scales (the peak).
//
// The step is Q = V_ref/2^N (IEEE Std 1241-2010, the convention this project
// states; some texts use V_ref/(2^N − 1)). A one-point gain calibration
// removes gain errors (reference tolerance, converter gain error); a
// two-point one also removes the converter's offset; nothing removes
// quantization or INL. A reference's tempco is measured over the temperature
// range: a calibration at one temperature does not remove it.
import { budgetTerm, type BudgetTerm } from "../core/engine/budget.ts";
import { driftSpanC } from "../core/rule-kit/define.ts";
import type { Design } from "../core/schemas/design.ts";
import { formatSI } from "../core/units.ts";

const v = (x: number) => formatSI(x, "V", { digits: 4 });
const n = (x: number) => String(Number(x.toPrecision(5)));

/** One converter step at the ADC pin, V_ref/2^N. */
export function adcStep(design: Design): number {
  return design.adc.reference_v / 2 ** design.adc.bits;
}

export function converterTerms(design: Design, perInput: number, span_v: number): BudgetTerm[] {
  const { bits, reference_v, reference_tolerance } = design.adc;
  const q = adcStep(design);
  const qText = `Q = ${n(reference_v)} V / 2^${bits} = ${v(q)}`;
  const terms: BudgetTerm[] = [
    budgetTerm(
      "quantization",
      "quantization, half a step",
      (0.5 * q) / perInput,
      `0.5 × Q / gain; ${qText}; 0.5 × ${v(q)} / ${n(perInput)} = ${v((0.5 * q) / perInput)}`,
      "none",
    ),
    budgetTerm(
      "reference",
      "ADC reference tolerance",
      reference_tolerance * span_v,
      `tolerance × peak = ${n(reference_tolerance)} × ${v(span_v)} = ${v(reference_tolerance * span_v)}`,
      "one-point",
    ),
  ];
  const adc = design.adc;
  if (adc.reference_tempco_ppm_per_c !== undefined) {
    const span = driftSpanC(design.temperature.min_c, design.temperature.max_c);
    const e = adc.reference_tempco_ppm_per_c * 1e-6 * span * span_v;
    terms.push(
      budgetTerm(
        "reference-tempco",
        "ADC reference tempco over the temperature range",
        e,
        `tempco × largest distance from 25 °C × peak = ${n(adc.reference_tempco_ppm_per_c)} ppm/°C × ${n(span)} °C × ${v(span_v)} = ${v(e)}`,
        "none",
      ),
    );
  }
  if (adc.offset_lsb !== undefined) {
    const e = (adc.offset_lsb * q) / perInput;
    terms.push(
      budgetTerm(
        "adc-offset",
        "ADC offset",
        e,
        `offset × Q / gain = ${n(adc.offset_lsb)} × ${v(q)} / ${n(perInput)} = ${v(e)}`,
        "two-point",
      ),
    );
  }
  if (adc.gain_error !== undefined) {
    const e = adc.gain_error * span_v;
    terms.push(
      budgetTerm(
        "adc-gain",
        "ADC gain error",
        e,
        `gain error × peak = ${n(adc.gain_error)} × ${v(span_v)} = ${v(e)}`,
        "one-point",
      ),
    );
  }
  if (adc.inl_lsb !== undefined) {
    const e = (adc.inl_lsb * q) / perInput;
    terms.push(
      budgetTerm(
        "adc-inl",
        "ADC integral non-linearity",
        e,
        `INL × Q / gain = ${n(adc.inl_lsb)} × ${v(q)} / ${n(perInput)} = ${v(e)}`,
        "none",
      ),
    );
  }
  return terms;
}
