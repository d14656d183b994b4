// The current an op-amp signal stage's output must deliver, against its rating
// (SPEC §11.8, load). output-load asks whether the rated swing holds at this
// load and never fails; this rule asks whether the output can drive the load at
// all: a micropower output rated for half a milliampere cannot put volts across
// a few hundred ohms, whatever its swing figures say.
//
// Kirchhoff's current law at the output: each branch carries (V_out − V_return)/R
// to the node it returns to (a virtual ground, an input held by feedback, a
// sampling capacitor's charge), the sum signed, at both ends of the output
// (src/core/math/stage-load.ts peakOutputCurrent). The current needs no part
// figure, so it is the stage's; only the rating is the part's.
import { defineRule, record, shareVerdict, spareOrShort, stageAs } from "../src/core/rule-kit/index.ts";
import { peakOutputAmps, peakOutputCurrent, type PeakCurrent } from "../src/core/math/stage-load.ts";
import type { OpAmpStage, Rails } from "../src/core/rule-kit/index.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";
import { OUTPUT_CURRENT_FLOOR_A } from "./output-current.ts";

export const stageOutputCurrent = defineRule({
  id: "stage-output-current",
  unit: "A",
  checks: "The stage's output delivers the current its load draws at the ends of its swing, within its rating.",
  formula:
    "I = Σ (V_out − V_return,i) / R_i over the branches the output drives (feedback network, next stages' inputs, the converter pin's R_pin + 1/(f_s·C_s) to a sampling capacitor anywhere in 0 … V_ref), signed, at V_out = each end of the output (the node beyond a rectifier diode where one stands between); a return that moves is taken at its worse end, an unknown one at the farther rail; peak = the largest |I|; margin = iout_max_ma − peak; with an empty iout_max_ma only a peak ≤ 100 µA passes, and is marginal when a load is left out (the converter pin's draw without its sampling fields)",
  source:
    "Ohm's law and Kirchhoff's current law at the output node; the output's rated current; the sampling input's average draw as a switched-capacitor resistor 1/(f·C) (common practice [M]); 100 µA that any op-amp output drives is common practice [M].",
  policy: "marginal_fraction",
  kinds: ["op-amp"],
  needs: {},
  measure({ stage, rails, policy }, part, out) {
    const s = stageAs(stage, "op-amp", "stage-output-current");
    if (s.load === undefined) return record(out, "unrated", 0, 0, 0, undefined);
    const load = s.load;
    const peak = peakOutputAmps(load.branches, load.node_v ?? s.output, rails.negative_v, rails.positive_v);
    if (part.iout_max_ma === undefined) {
      const margin = OUTPUT_CURRENT_FLOOR_A - peak;
      // Under the floor with a load the design leaves out (the converter pin's
      // draw, tens of µA on a fast converter), the floor may not hold: marginal.
      const floorVerdict = load.left_out === undefined ? "pass" : "marginal";
      return record(
        out,
        margin >= 0 ? floorVerdict : "unrated",
        peak,
        OUTPUT_CURRENT_FLOOR_A,
        margin,
        OUTPUT_CURRENT_FLOOR_A,
      );
    }
    const rated = part.iout_max_ma * 1e-3;
    const margin = rated - peak;
    record(out, shareVerdict(margin, rated, policy), peak, rated, margin, rated);
  },
  describe({ needed: peak, available, margin }, { stage, rails }, part) {
    const s = stageAs(stage, "op-amp", "stage-output-current");
    if (s.load === undefined) {
      return { reason: `not rated: the topology does not say what ${s.label}'s output drives`, steps: [] };
    }
    const p = peakOf(s, rails);
    const amps = (v: number) => formatSI(v, "A");
    const steps = p.shares.map(({ branch: b, return_v, amps: a }) => ({
      label: `${b.what}: (${formatVolts(p.at_v, { signed: true })} − ${formatVolts(return_v, { signed: true })}) / ${formatSI(b.ohm, "Ω")}`,
      value: a,
      unit: "A",
    }));
    steps.push({ label: "peak = |Σ|", value: peak, unit: "A" });
    steps.push({
      label: part.iout_max_ma === undefined ? "no rating; any output drives" : "iout_max_ma",
      value: available,
      unit: "A",
    });
    steps.push({ label: "margin", value: margin, unit: "A" });
    const bound =
      part.iout_max_ma === undefined
        ? margin < 0
          ? `and 'iout_max_ma' is empty for this part: not rated`
          : s.load.left_out === undefined
            ? `at most ${amps(OUTPUT_CURRENT_FLOOR_A)}, which any output drives (common practice): no rating needed`
            : `at most ${amps(OUTPUT_CURRENT_FLOOR_A)} before a load the design leaves out, and 'iout_max_ma' is empty: the floor any output drives may not hold`
        : `rated ${amps(available)}: ${spareOrShort(margin, "A")}`;
    return { reason: `${delivers(s, p)}; ${bound}${extras(s, p)}`, steps };
  },
});

/** The stage's peak current: its branches from the node they hang from (the output unless a diode stands between). */
export function peakOf(s: OpAmpStage, rails: Rails): PeakCurrent {
  const load = s.load ?? { branches: [] };
  return peakOutputCurrent(load.branches, load.node_v ?? s.output, { low: rails.negative_v, high: rails.positive_v });
}

/** "at −2.00 V it sinks 400 µA into stage 1's input R (10.0 kΩ to 0 V) and …". */
function delivers(s: OpAmpStage, p: PeakCurrent): string {
  if (p.shares.length === 0) return "its output drives no resistive load";
  if (p.amps === 0) return `the currents into ${list(p)} cancel at both ends of its output`;
  const where = s.load?.node_v === undefined ? "with the output at" : "with the node beyond its diode at";
  return `${where} ${formatVolts(p.at_v, { signed: true })} it ${p.sources ? "sources" : "sinks"} ${formatSI(p.amps, "A")} into ${list(p)}`;
}

/** "R (10.0 kΩ to 0.00 V), R/2 (5.00 kΩ to 0.00 V)": each branch with the return it was taken at. */
function list(p: PeakCurrent): string {
  const to = (v: number) => formatVolts(v, { signed: true });
  return p.shares.map(({ branch: b, return_v }) => `${b.what} (${formatSI(b.ohm, "Ω")} to ${to(return_v)})`).join(", ");
}

function extras(s: OpAmpStage, p: PeakCurrent): string {
  const out: string[] = [];
  if (p.assumed.length > 0) out.push(`return taken at the farther rail (unknown): ${p.assumed.join(", ")}`);
  if (s.load?.note !== undefined) out.push(s.load.note);
  if (s.load?.left_out !== undefined) out.push(`left out: ${s.load.left_out}`);
  return out.map((x) => `; ${x}`).join("");
}
