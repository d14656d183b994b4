// output-load (SPEC §11.8): the load a stage's output drives, Σ 1/R over its branches, against
// 1/out_load_ohm, the load its swing is rated at. Datasheet swing is specified at a stated load,
// and an output stage's drop grows with its current (Sedra & Smith, Microelectronic Circuits,
// output stages; that datasheets state the load is common practice). Resistors in parallel add
// as conductances (Kirchhoff's current law). Numbers are in siemens: needed = Σ 1/R, available =
// 1/out_load_ohm, margin = available − needed.
//
// The rule cannot fail, by design: a heavier load than rated leaves the swing unproven
// (marginal), and whether the output can deliver the current at all is a current rating's
// question. So the table has pass, marginal and unrated cases, and one load a thousand times
// heavier than the rating that is still only marginal.
import { describe, expect, it } from "vitest";
import type { OpAmpStage } from "../../src/core/rule-kit/index.ts";
import { drivingPin } from "../../src/topologies/converter-drive.ts";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";
import { bufferStage, check, expectFinding, reasons, rectifierStage, type RuleCase } from "../helpers/rules.ts";

const R = 10_000;

/** Stage 1 of the full-wave rectifier: feedback R and the summer's R/2, both into virtual grounds (SPEC §11.2). */
function halfWave(r: number): OpAmpStage {
  return {
    ...rectifierStage(),
    label: "the rectifier's stage 1",
    load: {
      branches: [
        { what: "feedback R to the virtual ground", ohm: r },
        { what: "the summer's input R/2 to its virtual ground", ohm: r / 2 },
      ],
    },
  };
}

/** A follower into a 10 kΩ + 10 kΩ divider to ground: the output drives R1 + R2 = 20 kΩ. */
const intoDivider: OpAmpStage = {
  ...bufferStage(),
  load: { branches: [{ what: "R1 + R2 to ground", ohm: 20_000 }] },
};

/** A follower straight into the converter, whose sampling fields the design leaves out. */
const pinOnly: OpAmpStage = { ...bufferStage(), load: drivingPin(design(), []) };

/** A summer with feedback R into the converter: 1 MHz, 10 pF, 1 kΩ at the pin. */
const summerAtPin: OpAmpStage = {
  ...bufferStage(),
  label: "the summer",
  load: drivingPin(design({ adc: { sample_rate_hz: 1e6, sample_cap_f: 10e-12, pin_r_ohm: 1000 } }), [
    { what: "feedback R to the virtual ground", ohm: R },
  ]),
};

const cases: RuleCase[] = [
  {
    // R = 30 kΩ: 30 kΩ ‖ 15 kΩ = 10 kΩ exactly, the rating: 1/30k + 1/15k = 100 µS = 1/10k. Covered.
    label: "rectifier stage 1 at R = 30 kΩ (R/3 = 10 kΩ) on a part rated at 10 kΩ",
    run: { part: opAmp({ out_load_ohm: "10k" }), stage: halfWave(30_000) },
    expected: { verdict: "pass", needed: 1e-4, available: 1e-4, margin: 0 },
  },
  {
    // 1/20k = 50 µS against 1/2k = 500 µS: 450 µS to spare.
    label: "follower into a 20 kΩ divider, rated at 2 kΩ",
    run: { part: opAmp({ out_load_ohm: "2k" }), stage: intoDivider },
    expected: { verdict: "pass", needed: 5e-5, available: 5e-4, margin: 4.5e-4 },
  },
  {
    // R = 10 kΩ: 1/10k + 1/5k = 300 µS (3.33 kΩ) against 1/10k = 100 µS: heavier, 200 µS over.
    label: "rectifier stage 1 at R = 10 kΩ (R/3 = 3.33 kΩ) on a part rated at 10 kΩ",
    run: { part: opAmp({ out_load_ohm: "10k" }), stage: halfWave(R) },
    expected: { verdict: "marginal", needed: 3e-4, available: 1e-4, margin: -2e-4 },
  },
  {
    // The pin as a switched-capacitor resistor: 1/(1 MHz × 10 pF) = 100 kΩ, + 1 kΩ = 101 kΩ in series;
    // with the 10 kΩ feedback R: 1/10k + 1/101k = 109.90 µS (9.10 kΩ), just heavier than 10 kΩ.
    label: "summer with feedback R = 10 kΩ and the converter pin (101 kΩ), rated at 10 kΩ",
    run: { part: opAmp({ out_load_ohm: "10k" }), stage: summerAtPin },
    expected: { verdict: "marginal", needed: 1e-4 + 1 / 101_000, available: 1e-4, margin: -1 / 101_000 },
  },
  {
    // Cannot fail: 10 Ω on a part rated at 10 kΩ is 100 mS against 100 µS, still marginal.
    label: "a 10 Ω load on a part rated at 10 kΩ",
    run: {
      part: opAmp({ out_load_ohm: "10k" }),
      stage: { ...bufferStage(), load: { branches: [{ what: "a 10 Ω resistor to ground", ohm: 10 }] } },
    },
    expected: { verdict: "marginal", needed: 0.1, available: 1e-4, margin: 1e-4 - 0.1 },
  },
  {
    // No branch at all: 0 S, lighter than any rating.
    label: "a follower that drives only the converter pin (its draw not stated), rated at 10 kΩ",
    run: { part: opAmp({ out_load_ohm: "10k" }), stage: pinOnly },
    expected: { verdict: "pass", needed: 0, available: 1e-4, margin: 1e-4 },
  },
  {
    label: "an empty out_load_ohm, driving 3.33 kΩ",
    run: { part: opAmp({ out_load_ohm: "" }), stage: halfWave(R) },
    expected: { verdict: "unrated", needed: null, available: null, margin: null },
  },
  {
    // No load is the lightest there is, but the pin's draw is unknown here: unrated, never pass, without a rating.
    label: "an empty out_load_ohm, driving no stated load",
    run: { part: opAmp({ out_load_ohm: "" }), stage: pinOnly },
    expected: { verdict: "unrated", needed: null, available: null, margin: null },
  },
  {
    // A stage whose topology gives no load cannot be judged.
    label: "a stage with no load stated by its topology",
    run: { part: opAmp({ out_load_ohm: "10k" }), stage: bufferStage() },
    expected: { verdict: "unrated", needed: 0, available: 0, margin: 0 },
  },
];

describe("output-load", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("output-load", run), expected));

  it("says why, naming each branch and the parallel sum", () => {
    expect(reasons("output-load", cases)).toMatchInlineSnapshot(`
      {
        "a 10 Ω load on a part rated at 10 kΩ": "marginal: drives a 10 Ω resistor to ground (10.0 Ω): heavier than the 10.0 kΩ its swing is rated at (1000× its current at the same output), so the rated swing may not hold (an output's headroom grows with its current)",
        "a follower that drives only the converter pin (its draw not stated), rated at 10 kΩ": "pass: drives no resistive load: lighter than the 10.0 kΩ its swing is rated at; left out: the converter pin's sampling draw (no adc.sample_rate_hz and adc.sample_cap_f)",
        "a stage with no load stated by its topology": "unrated: not rated: the topology does not say what the buffer's output drives",
        "an empty out_load_ohm, driving 3.33 kΩ": "unrated: not rated: needs 'out_load_ohm', which is empty for this part",
        "an empty out_load_ohm, driving no stated load": "unrated: not rated: needs 'out_load_ohm', which is empty for this part",
        "follower into a 20 kΩ divider, rated at 2 kΩ": "pass: drives R1 + R2 to ground (20.0 kΩ): no heavier than the 2.00 kΩ its swing is rated at",
        "rectifier stage 1 at R = 10 kΩ (R/3 = 3.33 kΩ) on a part rated at 10 kΩ": "marginal: drives feedback R to the virtual ground (10.0 kΩ) ‖ the summer's input R/2 to its virtual ground (5.00 kΩ) = 3.33 kΩ: heavier than the 10.0 kΩ its swing is rated at (3× its current at the same output), so the rated swing may not hold (an output's headroom grows with its current)",
        "rectifier stage 1 at R = 30 kΩ (R/3 = 10 kΩ) on a part rated at 10 kΩ": "pass: drives feedback R to the virtual ground (30.0 kΩ) ‖ the summer's input R/2 to its virtual ground (15.0 kΩ) = 10.0 kΩ: no heavier than the 10.0 kΩ its swing is rated at",
        "summer with feedback R = 10 kΩ and the converter pin (101 kΩ), rated at 10 kΩ": "marginal: drives feedback R to the virtual ground (10.0 kΩ) ‖ the converter pin, R_pin + 1/(f_s·C_s) = 1.00 kΩ + 100 kΩ (101 kΩ) = 9.10 kΩ: heavier than the 10.0 kΩ its swing is rated at (1.1× its current at the same output), so the rated swing may not hold (an output's headroom grows with its current)",
      }
    `);
  });

  it("shows the arithmetic: each branch, the parallel load, the rating and the margin", () => {
    const f = check("output-load", { part: opAmp({ out_load_ohm: "10k" }), stage: halfWave(R) });
    expect(f.steps.map((s) => [s.label, Number(s.value.toPrecision(6)), s.unit])).toEqual([
      ["feedback R to the virtual ground", 10_000, "Ω"],
      ["the summer's input R/2 to its virtual ground", 5000, "Ω"],
      ["load = 1 / Σ 1/R (in parallel)", 3333.33, "Ω"],
      ["out_load_ohm (swing rated at)", 10_000, "Ω"],
      ["margin = 1/out_load_ohm − Σ 1/R", -0.0002, "S"],
    ]);
  });
});

describe("drivingPin", () => {
  it("adds the pin as R_pin + 1/(f_s·C_s) when the design states the sampling input", () => {
    // 1/(1 MHz × 10 pF) = 100 kΩ (switched-capacitor resistor, common practice [M]) + 1 kΩ.
    expect(summerAtPin.load?.branches[1]?.ohm).toBeCloseTo(101_000, 6);
    expect(summerAtPin.load?.left_out).toBeUndefined();
  });

  it("leaves the pin out, and says which fields are missing, when they are not stated", () => {
    expect(pinOnly.load).toEqual({
      branches: [],
      left_out: "the converter pin's sampling draw (no adc.sample_rate_hz and adc.sample_cap_f)",
    });
    expect(drivingPin(design({ adc: { sample_rate_hz: 1e6 } }), []).left_out).toBe(
      "the converter pin's sampling draw (no adc.sample_cap_f)",
    );
  });
});
