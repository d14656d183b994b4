// The load a stage drives against the load its swing is rated at (SPEC §11.8).
// A datasheet's output swing holds at the stated load; the output stage's drop
// grows with the current it delivers, so a heavier load than rated leaves the
// swing figures (and output-swing's verdict on them) unproven: marginal, with
// each branch named. It never fails: whether the output can deliver the current
// at all is a current rating's question, not this one's. A stage that drives no
// resistive load passes when the part is rated (every rated load is heavier);
// an empty out_load_ohm stays unrated even then, as the converter pin's draw is
// unknown when a design leaves out its sampling fields.
//
// The numbers are conductances (S), Σ 1/R against 1/out_load_ohm, so "no load"
// is 0 rather than an infinite resistance; the reason speaks in ohms.
import { defineRule, record, stageAs, type StageLoad } from "../src/core/rule-kit/index.ts";
import { loadSiemens } from "../src/core/math/stage-load.ts";
import { formatSI } from "../src/core/units.ts";

/** Equal within float noise counts as covered: Σ 1/R need not land on 1/R_rated to the last bit. */
export const LOAD_SAME = 1e-9;

export const outputLoad = defineRule({
  id: "output-load",
  unit: "S",
  checks: "The stage's output drives no heavier a load than the one its swing is rated at.",
  formula:
    "G_load = Σ 1/R_branch over what the output drives, each to the node it returns to (its feedback network, the next stages' input resistors, the converter pin's R_pin + 1/(f_s·C_s)); R_load = 1/G_load; pass when R_load ≥ out_load_ohm (margin 1/out_load_ohm − G_load ≥ 0), marginal when heavier (the rated swing may not hold); no resistive load: pass; empty out_load_ohm: unrated. It cannot fail.",
  source:
    "Datasheet output swing is specified at a stated load, and an output stage's headroom grows with its load current (common practice; Sedra & Smith, Microelectronic Circuits, output stages); the sampling input as a switched-capacitor resistor 1/(f·C) (common practice [M]).",
  policy: null,
  kinds: ["op-amp"],
  needs: { "op-amp": ["out_load_ohm"] },
  measure({ stage }, part, out) {
    const s = stageAs(stage, "op-amp", "output-load");
    const rated = part.out_load_ohm;
    if (s.load === undefined || rated === undefined) return record(out, "unrated", 0, 0, 0, undefined);
    const g = loadSiemens(s.load.branches);
    const allowed = 1 / rated;
    record(out, g <= allowed * (1 + LOAD_SAME) ? "pass" : "marginal", g, allowed, allowed - g, undefined);
  },
  describe({ needed: g, verdict }, { stage }, part) {
    const s = stageAs(stage, "op-amp", "output-load");
    if (s.load === undefined || part.out_load_ohm === undefined) {
      return { reason: `not rated: the topology does not say what ${s.label}'s output drives`, steps: [] };
    }
    const rated = part.out_load_ohm;
    const ohm = (v: number) => formatSI(v, "Ω");
    const judged =
      verdict !== "pass"
        ? `heavier than the ${ohm(rated)} its swing is rated at (${Number((g * rated).toPrecision(3))}× its current at the same output), so the rated swing may not hold (an output's headroom grows with its current)`
        : g === 0
          ? `lighter than the ${ohm(rated)} its swing is rated at`
          : `no heavier than the ${ohm(rated)} its swing is rated at`;
    const steps = s.load.branches.map((b) => ({ label: b.what, value: b.ohm, unit: "Ω" }));
    if (g > 0) steps.push({ label: "load = 1 / Σ 1/R (in parallel)", value: 1 / g, unit: "Ω" });
    steps.push({ label: "out_load_ohm (swing rated at)", value: rated, unit: "Ω" });
    steps.push({ label: "margin = 1/out_load_ohm − Σ 1/R", value: 1 / rated - g, unit: "S" });
    return { reason: `${drives(s.load, g)}: ${judged}${leftOut(s.load)}`, steps };
  },
});

/** "drives its feedback R (10.0 kΩ) ‖ the summer's R/2 (5.00 kΩ) = 3.33 kΩ". */
function drives(l: StageLoad, g: number): string {
  const ohm = (v: number) => formatSI(v, "Ω");
  if (l.branches.length === 0) return "drives no resistive load";
  const list = l.branches.map((b) => `${b.what} (${ohm(b.ohm)})`).join(" ‖ ");
  return l.branches.length === 1 ? `drives ${list}` : `drives ${list} = ${ohm(1 / g)}`;
}

function leftOut(l: StageLoad): string {
  return l.left_out === undefined ? "" : `; left out: ${l.left_out}`;
}
