// Driving the converter (SPEC §12.3): the stage that drives the ADC pin must
// charge the sampling capacitor to within ½ LSB in the acquisition time. A
// topology hands this rule to its driving stage only when the design states
// the converter's sampling input (adc.sample_cap_f, adc.switch_ohm,
// adc.acquisition_s); without them the design's drive is unrated and the
// pages say which fields to fill in (src/topologies/converter-drive.ts).
import { defineRule, record, shareVerdict, stageAs, type RoleContext } from "../src/core/rule-kit/index.ts";
import { amplifierTau, chargeShareStep, samplingTau, timeConstantsFor } from "../src/core/math/settling.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";
import { formatSI } from "../src/core/units.ts";

/** The numbers of one part's settling: measure and describe read the same. */
export function settlingOf({ stage, design }: RoleContext, part: OpAmp) {
  const s = stageAs(stage, "op-amp", "adc-settling");
  const adc = design.adc;
  const cs = adc.sample_cap_f ?? 0;
  const pinC = adc.pin_c_f ?? 0;
  const net = { pin_r_ohm: adc.pin_r_ohm ?? 0, pin_c_f: pinC, switch_ohm: adc.switch_ohm ?? 0, sample_cap_f: cs };
  const halfLsb = adc.reference_v / 2 ** (adc.bits + 1);
  // Worst case: the sampling capacitor holds a full-scale code (or is reset) when it connects.
  const step = chargeShareStep(adc.reference_v, cs, pinC);
  const n = timeConstantsFor(step, halfLsb);
  const tauAmp = amplifierTau(part.gbw_mhz * 1e6, s.noise_gain);
  const tauNet = samplingTau(net);
  const tau = tauAmp + tauNet;
  return { s, net, halfLsb, step, n, tauAmp, tauNet, tau, needed: n * tau, acquisition: adc.acquisition_s ?? 0 };
}

export const adcSettling = defineRule({
  id: "adc-settling",
  unit: "s",
  checks:
    "The stage that drives the converter settles the sampling capacitor to within ½ LSB inside the acquisition time.",
  formula:
    "step = V_ref·C_s/(C_s + C_pin) (the whole V_ref without a pin capacitor); n = ln(step / ½ LSB) = (N+1)·ln 2 without one (9.011 at 12 bits, 7.625 at 10); τ = noise_gain/(2π·GBW) + R_pin·(C_pin + C_s) + R_switch·C_s; needed = n·τ ≤ acquisition_s",
  source:
    "First-order step response e^(−t/τ) = 2^−(N+1) (textbook settling arithmetic); charge sharing by Q = C·V; the sum of time constants (Elmore, J. Appl. Phys. 19, 1948) bounds cascaded poles from above.",
  policy: "marginal_fraction",
  kinds: ["op-amp"],
  needs: { "op-amp": ["gbw_mhz"] },
  measure(ctx, part, out) {
    const x = settlingOf(ctx, part);
    const margin = x.acquisition - x.needed;
    record(out, shareVerdict(margin, x.acquisition, ctx.policy), x.acquisition, x.needed, margin, x.acquisition);
  },
  describe({ margin }, ctx, part) {
    const x = settlingOf(ctx, part);
    const bits = ctx.design.adc.bits;
    const t = (v: number) => formatSI(v, "s");
    const pin = x.net.pin_c_f > 0 ? ` after the pin capacitor shares its charge (${formatSI(x.step, "V")} step)` : "";
    const rc = [
      x.net.pin_r_ohm > 0
        ? `R_pin ${formatSI(x.net.pin_r_ohm, "Ω")} × ${formatSI(x.net.pin_c_f + x.net.sample_cap_f, "F")}`
        : "",
      `switch ${formatSI(x.net.switch_ohm, "Ω")} × ${formatSI(x.net.sample_cap_f, "F")}`,
    ]
      .filter(Boolean)
      .join(" + ");
    const have = x.acquisition / x.tau;
    return {
      reason: `needs ${x.n.toFixed(3)} τ to settle to ½ LSB (${formatSI(x.halfLsb, "V")}) at ${bits} bits${pin}, with τ = ${t(x.tauAmp)} (GBW ÷ noise gain ${Number(x.s.noise_gain.toPrecision(4))}) + ${t(x.tauNet)} (${rc}) = ${t(x.tau)}: ${t(x.needed)}; the acquisition time ${t(x.acquisition)} is ${have.toFixed(3)} τ: ${margin >= 0 ? `${t(margin)} to spare` : `${t(-margin)} short`}`,
      steps: [
        { label: "½ LSB = V_ref / 2^(N+1)", value: x.halfLsb, unit: "V" },
        { label: "step = V_ref·C_s/(C_s + C_pin)", value: x.step, unit: "V" },
        { label: "time constants n = ln(step / ½ LSB)", value: x.n, unit: "" },
        { label: "τ of the op amp = noise gain / (2π·GBW)", value: x.tauAmp, unit: "s" },
        { label: "τ of the RC = R_pin·(C_pin + C_s) + R_switch·C_s", value: x.tauNet, unit: "s" },
        { label: "needed = n·τ", value: x.needed, unit: "s" },
        { label: "acquisition time", value: x.acquisition, unit: "s" },
        { label: "margin = acquisition − needed", value: margin, unit: "s" },
      ],
    };
  },
});
