// stage-output-current (SPEC §11.8, load): the current an op-amp signal stage's output delivers
// into what it drives, against iout_max_ma. Each branch carries (V_out − V_return)/R (Ohm's law)
// and the output pin carries their signed sum (Kirchhoff's current law), at each end of the
// output's swing; the peak is the larger magnitude. Margin = rated − peak, in amps; marginal
// within marginal_fraction (0.2 by default) of the rating, fail beyond it. With no rating, a
// peak ≤ 100 µA passes (any op-amp output drives that: common practice [M], shared with
// output-current), a larger one is unrated; under the floor with the converter pin's draw left
// out (no sampling fields) it is marginal.
import { describe, expect, it } from "vitest";
import type { OpAmpStage } from "../../src/core/rule-kit/index.ts";
import { peakOutputAmps, peakOutputCurrent } from "../../src/core/math/stage-load.ts";
import { drivingPin } from "../../src/topologies/converter-drive.ts";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";
import { bufferStage, check, expectFinding, GROUND_5V, reasons, SPLIT_5V, type RuleCase } from "../helpers/rules.ts";

const ZERO = { low: 0, high: 0 };

/** ±2.5 V into R to a virtual ground at 0 V: 2.5 V / R either way (Ohm's law). */
function intoVirtualGround(ohm: number): OpAmpStage {
  return { ...bufferStage({ w: 2.5 }), load: { branches: [{ what: "R to the virtual ground", ohm, return_v: ZERO }] } };
}

/**
 * The rectifier's stage 1 (SPEC §11.2) at W = 2.5 V, R = 10 kΩ, Vf = 0.6 V: the op amp's output
 * swings −(W + Vf) … +Vf, but its load (feedback R and the summer's R/2, both to virtual grounds)
 * hangs from the node beyond the diode, −W … 0.
 */
const halfWave: OpAmpStage = {
  ...bufferStage({ w: 2.5 }),
  label: "the rectifier's stage 1",
  output: { low: -3.1, high: 0.6 },
  load: {
    branches: [
      { what: "feedback R to the virtual ground", ohm: 10_000, return_v: ZERO },
      { what: "the summer's input R/2 to its virtual ground", ohm: 5000, return_v: ZERO },
    ],
    node_v: { low: -2.5, high: 0 },
  },
};

/** An output held at 2.5 V between 10 kΩ to 0 V and 10 kΩ to 5 V: the Thévenin 5 kΩ at 2.5 V, no current. */
const balanced: OpAmpStage = {
  ...bufferStage(),
  output: { low: 2.5, high: 2.5 },
  load: {
    branches: [
      { what: "10 kΩ to ground", ohm: 10_000, return_v: ZERO },
      { what: "10 kΩ to the 5 V rail", ohm: 10_000, return_v: { low: 5, high: 5 } },
    ],
  },
};

/** A difference amp's output 1 … 4 V driving R2 = 10 kΩ into a − input that sits anywhere in 0.5 … 2 V. */
const moving: OpAmpStage = {
  ...bufferStage(),
  output: { low: 1, high: 4 },
  load: { branches: [{ what: "feedback R2 to the − input", ohm: 10_000, return_v: { low: 0.5, high: 2 } }] },
};

/** ±2.5 V into 10 kΩ returning nowhere stated: taken at the farther rail of ±5 V. */
const unknownReturn: OpAmpStage = {
  ...bufferStage({ w: 2.5 }),
  load: { branches: [{ what: "10 kΩ to an unstated node", ohm: 10_000 }] },
};

/** A follower 0 … 2.5 V into a 3.3 V converter sampling at 1 MHz on 10 pF: 1/(f·C) = 100 kΩ to 0 … 3.3 V. */
const pinOnly: OpAmpStage = {
  ...bufferStage(),
  output: { low: 0, high: 2.5 },
  load: drivingPin(design({ adc: { reference_v: 3.3, sample_rate_hz: 1e6, sample_cap_f: 10e-12 } }), []),
};

/** The same follower when the design leaves the sampling fields out: no branch, the draw named as left out. */
const pinUnstated: OpAmpStage = { ...bufferStage(), load: drivingPin(design(), []) };

const cases: RuleCase[] = [
  {
    // 2.5 V / 1 kΩ = 2.5 mA (Ohm's law) against 2 mA: 0.5 mA short.
    label: "±2.5 V into 1 kΩ to a virtual ground, rated 2 mA",
    run: { part: opAmp({ iout_max_ma: "2" }), stage: intoVirtualGround(1000) },
    expected: { verdict: "fail", needed: 2.5e-3, available: 2e-3, margin: -0.5e-3 },
  },
  {
    // 2.5 mA against 3 mA: 0.5 mA to spare, under 0.2 × 3 mA = 0.6 mA: marginal.
    label: "±2.5 V into 1 kΩ, rated 3 mA",
    run: { part: opAmp({ iout_max_ma: "3" }), stage: intoVirtualGround(1000) },
    expected: { verdict: "marginal", needed: 2.5e-3, available: 3e-3, margin: 0.5e-3 },
  },
  {
    // At the rating exactly: margin 0, not a failure, and marginal.
    label: "±2.5 V into 1 kΩ, rated 2.5 mA",
    run: { part: opAmp({ iout_max_ma: "2.5" }), stage: intoVirtualGround(1000) },
    expected: { verdict: "marginal", needed: 2.5e-3, available: 2.5e-3, margin: 0 },
  },
  {
    // 2.5 mA against 5 mA: 2.5 mA to spare ≥ 0.2 × 5 mA = 1 mA: pass.
    label: "±2.5 V into 1 kΩ, rated 5 mA",
    run: { part: opAmp({ iout_max_ma: "5" }), stage: intoVirtualGround(1000) },
    expected: { verdict: "pass", needed: 2.5e-3, available: 5e-3, margin: 2.5e-3 },
  },
  {
    // No rating and 2.5 mA, over the 100 µA floor: unrated, never pass.
    label: "±2.5 V into 1 kΩ, no rating",
    run: { part: opAmp({ iout_max_ma: "" }), stage: intoVirtualGround(1000) },
    expected: { verdict: "unrated", needed: 2.5e-3, available: 1e-4, margin: 1e-4 - 2.5e-3 },
  },
  {
    // 2.5 V / 50 kΩ = 50 µA, under the 100 µA any output drives (common practice [M]): pass with no rating.
    label: "±2.5 V into 50 kΩ, no rating (the floor)",
    run: { part: opAmp({ iout_max_ma: "" }), stage: intoVirtualGround(50_000) },
    expected: { verdict: "pass", needed: 5e-5, available: 1e-4, margin: 5e-5 },
  },
  {
    // The node beyond the diode at −2.5 V: 2.5/10k + 2.5/5k = 0.25 + 0.5 = 0.75 mA = 3W/R, sunk. Taken at the
    // op amp's −3.1 V it would be 3.1 × 3/10k = 0.93 mA and fail a 0.8 mA rating; at the node it is 0.05 mA
    // inside it, under 0.2 × 0.8 = 0.16 mA: marginal.
    label: "rectifier stage 1, W = 2.5 V, R = 10 kΩ, rated 0.8 mA",
    run: { part: opAmp({ iout_max_ma: "0.8" }), stage: halfWave },
    expected: { verdict: "marginal", needed: 7.5e-4, available: 8e-4, margin: 5e-5 },
  },
  {
    // Kirchhoff: +2.5/10k out to ground and −2.5/10k in from the rail cancel: 0 A, whatever the rating.
    label: "an output at mid-rail between 10 kΩ to each rail, no rating",
    run: { part: opAmp({ iout_max_ma: "" }), stage: balanced, rails: GROUND_5V },
    expected: { verdict: "pass", needed: 0, available: 1e-4, margin: 1e-4 },
  },
  {
    // Sourcing at 4 V into the − input at its lowest, 0.5 V: 3.5/10k = 350 µA (sinking at 1 V into 2 V is only 100 µA).
    label: "a difference amp's 1 … 4 V into 10 kΩ to a − input at 0.5 … 2 V, rated 2 mA",
    run: { part: opAmp({ iout_max_ma: "2" }), stage: moving, rails: GROUND_5V },
    expected: { verdict: "pass", needed: 3.5e-4, available: 2e-3, margin: 1.65e-3 },
  },
  {
    // Unknown return on ±5 V rails: +2.5 V into −5 V is 7.5/10k = 750 µA, against 0.9 mA: 150 µA < 180 µA, marginal.
    label: "±2.5 V into 10 kΩ to an unstated node on ±5 V, rated 0.9 mA",
    run: { part: opAmp({ iout_max_ma: "0.9" }), stage: unknownReturn, rails: SPLIT_5V },
    expected: { verdict: "marginal", needed: 7.5e-4, available: 9e-4, margin: 1.5e-4 },
  },
  {
    // The pin's average draw f·C·ΔV (switched-capacitor resistor, common practice [M]) with the capacitor anywhere
    // in 0 … 3.3 V: sinking at 0 V from 3.3 V, 3.3 V / 100 kΩ = 33 µA (sourcing at 2.5 V into 0 V is 25 µA).
    label: "a follower into a 1 MHz, 10 pF converter pin, no rating",
    run: { part: opAmp({ iout_max_ma: "" }), stage: pinOnly, rails: GROUND_5V },
    expected: { verdict: "pass", needed: 3.3e-5, available: 1e-4, margin: 6.7e-5 },
  },
  {
    label: "a follower into a converter pin whose sampling the design leaves out, rated 2 mA",
    run: { part: opAmp({ iout_max_ma: "2" }), stage: pinUnstated },
    expected: { verdict: "pass", needed: 0, available: 2e-3, margin: 2e-3 },
  },
  {
    // With no rating the 100 µA floor (common practice [M]) leaves no room for the pin's unstated draw, which a
    // 1 MHz, 10 pF converter at 3.3 V puts at 33 µA (case above): never a pass, marginal.
    label: "a follower into a converter pin whose sampling the design leaves out, no rating",
    run: { part: opAmp({ iout_max_ma: "" }), stage: pinUnstated },
    expected: { verdict: "marginal", needed: 0, available: 1e-4, margin: 1e-4 },
  },
  {
    label: "a stage with no load stated by its topology",
    run: { part: opAmp({ iout_max_ma: "2" }), stage: bufferStage() },
    expected: { verdict: "unrated", needed: 0, available: 0, margin: 0 },
  },
];

describe("stage-output-current", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("stage-output-current", run), expected));

  it("says why, naming where the peak is, each branch and its return", () => {
    expect(reasons("stage-output-current", cases)).toMatchInlineSnapshot(`
      {
        "a difference amp's 1 … 4 V into 10 kΩ to a − input at 0.5 … 2 V, rated 2 mA": "pass: with the output at +4.00 V it sources 350 µA into feedback R2 to the − input (10.0 kΩ to +0.50 V); rated 2.00 mA: 1.65 mA to spare",
        "a follower into a 1 MHz, 10 pF converter pin, no rating": "pass: with the output at 0.00 V it sinks 33.0 µA into the converter pin, 1/(f_s·C_s) (100 kΩ to +3.30 V); at most 100 µA, which any output drives (common practice): no rating needed",
        "a follower into a converter pin whose sampling the design leaves out, no rating": "marginal: its output drives no resistive load; at most 100 µA before a load the design leaves out, and 'iout_max_ma' is empty: the floor any output drives may not hold; left out: the converter pin's sampling draw (no adc.sample_rate_hz and adc.sample_cap_f)",
        "a follower into a converter pin whose sampling the design leaves out, rated 2 mA": "pass: its output drives no resistive load; rated 2.00 mA: 2.00 mA to spare; left out: the converter pin's sampling draw (no adc.sample_rate_hz and adc.sample_cap_f)",
        "a stage with no load stated by its topology": "unrated: not rated: the topology does not say what the buffer's output drives",
        "an output at mid-rail between 10 kΩ to each rail, no rating": "pass: the currents into 10 kΩ to ground (10.0 kΩ to 0.00 V), 10 kΩ to the 5 V rail (10.0 kΩ to +5.00 V) cancel at both ends of its output; at most 100 µA, which any output drives (common practice): no rating needed",
        "rectifier stage 1, W = 2.5 V, R = 10 kΩ, rated 0.8 mA": "marginal: with the node beyond its diode at −2.50 V it sinks 750 µA into feedback R to the virtual ground (10.0 kΩ to 0.00 V), the summer's input R/2 to its virtual ground (5.00 kΩ to 0.00 V); rated 800 µA: 50.0 µA to spare",
        "±2.5 V into 1 kΩ to a virtual ground, rated 2 mA": "fail: with the output at −2.50 V it sinks 2.50 mA into R to the virtual ground (1.00 kΩ to 0.00 V); rated 2.00 mA: 500 µA short",
        "±2.5 V into 1 kΩ, no rating": "unrated: with the output at −2.50 V it sinks 2.50 mA into R to the virtual ground (1.00 kΩ to 0.00 V); and 'iout_max_ma' is empty for this part: not rated",
        "±2.5 V into 1 kΩ, rated 2.5 mA": "marginal: with the output at −2.50 V it sinks 2.50 mA into R to the virtual ground (1.00 kΩ to 0.00 V); rated 2.50 mA: 0.00 A to spare",
        "±2.5 V into 1 kΩ, rated 3 mA": "marginal: with the output at −2.50 V it sinks 2.50 mA into R to the virtual ground (1.00 kΩ to 0.00 V); rated 3.00 mA: 500 µA to spare",
        "±2.5 V into 1 kΩ, rated 5 mA": "pass: with the output at −2.50 V it sinks 2.50 mA into R to the virtual ground (1.00 kΩ to 0.00 V); rated 5.00 mA: 2.50 mA to spare",
        "±2.5 V into 10 kΩ to an unstated node on ±5 V, rated 0.9 mA": "marginal: with the output at −2.50 V it sinks 750 µA into 10 kΩ to an unstated node (10.0 kΩ to +5.00 V); rated 900 µA: 150 µA to spare; return taken at the farther rail (unknown): 10 kΩ to an unstated node",
        "±2.5 V into 50 kΩ, no rating (the floor)": "pass: with the output at −2.50 V it sinks 50.0 µA into R to the virtual ground (50.0 kΩ to 0.00 V); at most 100 µA, which any output drives (common practice): no rating needed",
      }
    `);
  });

  it("shows each branch's current at the peak, the sum, the rating and the margin", () => {
    const f = check("stage-output-current", { part: opAmp({ iout_max_ma: "0.8" }), stage: halfWave });
    expect(f.steps.map((s) => [s.label, Number(s.value.toPrecision(6)), s.unit])).toEqual([
      ["feedback R to the virtual ground: (−2.50 V − 0.00 V) / 10.0 kΩ", -0.00025, "A"],
      ["the summer's input R/2 to its virtual ground: (−2.50 V − 0.00 V) / 5.00 kΩ", -0.0005, "A"],
      ["peak = |Σ|", 0.00075, "A"],
      ["iout_max_ma", 0.0008, "A"],
      ["margin", 0.00005, "A"],
    ]);
  });
});

describe("peakOutputCurrent", () => {
  it("is zero for no branches, and signs the direction", () => {
    expect(peakOutputCurrent([], { low: -1, high: 1 }, { low: -5, high: 5 }).amps).toBe(0);
    // 1 V into 1 kΩ to ground at either end: 1 mA, sourced at +1 V (the first found of two equals is kept).
    const p = peakOutputCurrent([{ what: "1 kΩ", ohm: 1000, return_v: ZERO }], { low: -0.5, high: 1 }, ZERO);
    expect([p.amps, p.at_v, p.sources]).toEqual([1e-3, 1, true]);
  });

  it("gives the rule's allocation-free |I| the same number for every case above", () => {
    for (const c of cases) {
      if (c.run.stage.stage !== "op-amp" || c.run.stage.load === undefined) continue;
      const { load, output } = c.run.stage;
      const rails = c.run.rails ?? SPLIT_5V;
      const span = { low: rails.negative_v, high: rails.positive_v };
      expect(peakOutputAmps(load.branches, load.node_v ?? output, span.low, span.high), c.label).toBe(
        peakOutputCurrent(load.branches, load.node_v ?? output, span).amps,
      );
    }
  });

  it("lets opposite branches cancel at one end but not the other", () => {
    // Output 0 … 5 V, 10 kΩ to 0 V and 10 kΩ to 5 V: at 5 V, 0.5 mA + 0 out; at 0 V, 0 − 0.5 mA (sunk).
    const p = peakOutputCurrent(balanced.load?.branches ?? [], { low: 0, high: 5 }, { low: 0, high: 5 });
    expect(p.amps).toBeCloseTo(5e-4, 12);
  });
});
