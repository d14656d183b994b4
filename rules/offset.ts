import {
  defineRule,
  driftSpanC,
  record,
  shareVerdict,
  spareOrShortSmall,
  stageAs,
  type RoleContext,
} from "../src/core/rule-kit/index.ts";
import { formatSI } from "../src/core/units.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";
import { biasCurrentAt, endPhrase } from "../src/core/math/temperature.ts";

/** Output offset of an op-amp stage at the temperature extreme, and its parts. */
export function stageOffset(p: OpAmp, vosMultiplier: number, biasOhm: number, minC: number, maxC: number) {
  const vos25 = p.vos_max_mv * 1e-3;
  const span = driftSpanC(minC, maxC);
  const drift = p.vos_drift_uv_per_c === undefined ? 0 : p.vos_drift_uv_per_c * 1e-6 * span;
  const vos = vos25 + drift;
  const ib25 = p.ib_max_na * 1e-9;
  // A FET input's bias current is gate leakage, doubling per 10 °C: taken at the hot end (SPEC §11.7).
  const fet = p.input_fet === true;
  const ib = biasCurrentAt(ib25, fet, maxC);
  return { vos25, drift, vos, ib25, ib, fet, output_v: vosMultiplier * vos + ib * biasOhm };
}

export const offset = defineRule({
  id: "offset",
  unit: "V",
  checks:
    "Input offset voltage and bias current through the source resistance stay inside this stage's share of the accuracy.",
  formula:
    "buffer: (Vos + Ib·R_th) / k; rectifier: (2·Vos + Ib·R_load) / k; Vos grows by drift × the largest distance of the temperature range from 25 °C; a FET input's Ib doubles per 10 °C above 25 °C (taken at the hot end); limit = offset_share · required_v; level shifter: (Vos + Ib·(R1‖R2‖R3)) / a; reference buffer of the level-shift network: Vos·(G/R2) / a",
  source:
    "V_err = V_OS + I_B·R_S (op-amp error analysis, e.g. Fiore, Operational Amplifiers & Linear Integrated Circuits, ch. 5); FET bias current doubling per 10 °C is common practice [M].",
  policy: "offset_share",
  kinds: ["op-amp"],
  needs: { "op-amp": ["vos_max_mv", "ib_max_na"] },
  measure(ctx, part, out) {
    const { design, policy } = ctx;
    const { s, o } = offsetIn(ctx, part);
    const error = o.output_v / s.output_per_input;
    const limit = policy.offset_share * design.accuracy.required_v;
    const margin = limit - error;
    record(out, shareVerdict(margin, limit, policy), limit, error, margin, limit);
  },
  describe({ available: error, margin, needed: limit }, ctx, part) {
    const { s, o } = offsetIn(ctx, part);
    const mult = s.vos_multiplier === 1 ? "" : `${round3(s.vos_multiplier)}·`;
    const drift = o.drift > 0 ? ` incl. ${mv(o.drift)} drift` : "";
    const scale = s.output_per_input === 1 ? "" : `, ÷ ${round3(s.output_per_input)} to the input`;
    const hot = ctx.design.temperature.max_c;
    const ibText =
      o.fet && o.ib > o.ib25
        ? `${formatSI(o.ib, "A")} ${endPhrase("hot", hot)}, a FET input doubling per 10 °C from ${formatSI(o.ib25, "A")}`
        : formatSI(o.ib, "A");
    return {
      reason: `adds ${mv(error)} at the input (${mult}${mv(o.vos)} offset${drift} + ${ibText} × ${formatSI(s.bias_ohm, "Ω")}${scale}); the limit is ${mv(limit)}: ${spareOrShortSmall(margin)}`,
      steps: [
        { label: "Vos at 25 °C", value: o.vos25, unit: "V" },
        { label: "drift × temperature span", value: o.drift, unit: "V" },
        { label: "Ib at 25 °C", value: o.ib25, unit: "A" },
        { label: `Ib at ${ctx.design.temperature.max_c} °C`, value: o.ib, unit: "A" },
        { label: "R through which Ib flows", value: s.bias_ohm, unit: "Ω" },
        { label: `output error = ${mult}Vos + Ib·R`, value: o.output_v, unit: "V" },
        { label: "input-referred error = output error / k", value: error, unit: "V" },
        { label: "limit = offset_share × required_v", value: limit, unit: "V" },
        { label: "margin = limit − error", value: margin, unit: "V" },
      ],
    };
  },
});

/** The stage and its output offset for one part: measure and describe read the same numbers. */
function offsetIn({ stage, design }: RoleContext, part: OpAmp) {
  const s = stageAs(stage, "op-amp", "offset");
  const o = stageOffset(part, s.vos_multiplier, s.bias_ohm, design.temperature.min_c, design.temperature.max_c);
  return { s, o };
}

function mv(v: number): string {
  return formatSI(v, "V");
}

function round3(v: number): string {
  return String(Number(v.toPrecision(3)));
}
