// Input protection (SPEC §12.4): a fault of ±signal.fault_v on the input
// drives current into the rail clamps of every input pin it reaches. A
// topology hands this rule to those stages only when the design states
// signal.fault_v; the limit is logic.injection_ma, else 5 mA (common practice,
// src/core/math/clamp-current.ts).
import { defineRule, record, shareVerdict, type Rails, type RoleContext } from "../src/core/rule-kit/index.ts";
import { CLAMP_ONSET_V, clampCurrent, DEFAULT_INJECTION_A } from "../src/core/math/clamp-current.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";

/** The current for one stage, and where it comes from. */
export function faultCurrent({ stage, design, rails }: RoleContext) {
  if (stage.stage === "diode") throw new Error("input-fault applies to amplifier and sign stages only");
  const path = stage.fault;
  const fault = design.signal.fault_v ?? 0;
  const limit = design.logic.injection_ma === undefined ? DEFAULT_INJECTION_A : design.logic.injection_ma * 1e-3;
  const limitWhat = design.logic.injection_ma === undefined ? "the 5 mA common-practice limit" : "logic.injection_ma";
  if (!path) return { path, fault, limit, limitWhat, current: 0, sign: 1, vth: 0 };
  const up = clampCurrent(path, fault, rails.negative_v, rails.positive_v);
  const down = clampCurrent(path, -fault, rails.negative_v, rails.positive_v);
  const sign = up >= down ? 1 : -1;
  return {
    path,
    fault,
    limit,
    limitWhat,
    current: Math.max(up, down),
    sign,
    vth: path.gain * sign * fault + path.offset_v,
  };
}

function railHit(vth: number, rails: Rails): string {
  return vth > rails.positive_v ? `V+ = ${formatVolts(rails.positive_v)}` : `V− = ${formatVolts(rails.negative_v)}`;
}

export const inputFault = defineRule({
  id: "input-fault",
  unit: "A",
  checks: "A fault of ±fault_v on the input drives no more current into the pin's rail clamps than they may carry.",
  formula:
    "V_th = gain·(±fault_v) + offset at the pin behind R_th (the front end's Thévenin source); I = (V_th − (V+ + 0.3 V))/R_th above the rail, ((V− − 0.3 V) − V_th)/R_th below; limit = logic.injection_ma, else 5 mA",
  source:
    "Thévenin source and Ohm's law; clamp onset 0.3 V beyond the rail and the 5 mA injection limit are common practice (absolute-maximum tables).",
  policy: "marginal_fraction",
  kinds: ["op-amp", "comparator"],
  needs: {},
  measure(ctx, _part, out) {
    const x = faultCurrent(ctx);
    const margin = x.limit - x.current;
    record(out, shareVerdict(margin, x.limit, ctx.policy), x.limit, x.current, margin, x.limit);
  },
  describe({ margin }, ctx) {
    const x = faultCurrent(ctx);
    const what = x.path?.what ?? "the input";
    const a = (v: number) => formatSI(v, "A");
    const reason =
      x.current === 0
        ? `a ${formatVolts(x.fault)} fault keeps ${what} inside the rails (clamps start ${formatVolts(CLAMP_ONSET_V)} beyond them): no clamp current; the limit is ${a(x.limit)} (${x.limitWhat})`
        : `a ${formatVolts(x.sign * x.fault, { signed: true })} fault puts ${formatVolts(x.vth, { signed: true })} behind ${formatSI(x.path?.ohm ?? 0, "Ω")} at ${what}, past ${railHit(x.vth, ctx.rails)}: ${a(x.current)} into the clamp; the limit is ${a(x.limit)} (${x.limitWhat}): ${margin >= 0 ? `${a(margin)} to spare` : `${a(-margin)} over`}`;
    return {
      reason,
      steps: [
        { label: "fault voltage", value: x.fault, unit: "V" },
        { label: "V_th at the pin", value: x.vth, unit: "V" },
        { label: "R_th in front of the pin", value: x.path?.ohm ?? 0, unit: "Ω" },
        { label: "clamp current", value: x.current, unit: "A" },
        { label: "limit", value: x.limit, unit: "A" },
        { label: "margin = limit − current", value: margin, unit: "A" },
      ],
    };
  },
});
