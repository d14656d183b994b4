// The current each topology's op-amp stages must deliver (stage-output-current, SPEC §11.8), for
// concrete designs worked by hand below. Each branch carries (V_out − V_return)/R (Ohm's law); the
// output carries their signed sum (Kirchhoff's current law), at the end of its swing where that is
// largest. Resistors into a virtual ground return to 0 V (the inverting input is held there;
// textbook op-amp analysis, e.g. Sedra & Smith ch. 2); the converter's sampling input draws its
// average, (V_out − V_cap)·f_s·C_s with the capacitor anywhere in 0 … V_ref (common practice [M]).
import { describe, expect, it } from "vitest";
import { stageOutputCurrent, peakOf } from "../../rules/stage-output-current.ts";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import type { DesignResult } from "../../src/core/engine/result.ts";
import type { Design } from "../../src/core/schemas/design.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { BRIDGE_20MV_ON_3V3, design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

// A micropower-class op amp rated for 0.5 mA (invented, demo-style), on every supply these designs use.
const CATALOGUE = catalogueFromParts([
  opAmp({ id: "oa-half-ma", supply_min_v: 1.8, iout_max_ma: "0.5" }),
  comparator(),
  diode(),
]);

function run(d: Design): DesignResult {
  const e = evaluateDesign(d, CATALOGUE);
  if (!e.ok) throw new Error(JSON.stringify(e.problems));
  return e.result;
}

type Peak = { amps: number; at_v: number; sources: boolean };

/** Each op-amp stage's peak current (to 6 significant figures), where it is reached and which way. */
function peaks(r: DesignResult): Record<string, Peak> {
  const out: Record<string, Peak> = {};
  for (const role of r.roles) {
    for (const s of role.stages) {
      if (s.stage.stage !== "op-amp" || !s.stage.load) continue;
      const p = peakOf(s.stage, r.derived.rails);
      const key = s.id === undefined ? role.role : `${role.role}/${s.id}`;
      out[key] = { amps: Number(p.amps.toPrecision(6)), at_v: Number(p.at_v.toPrecision(6)), sources: p.sources };
    }
  }
  return out;
}

function verdictOf(r: DesignResult, role: string, stage?: string): string | undefined {
  const fit = r.roles.find((x) => x.role === role)?.resultOf("oa-half-ma");
  return fit?.findings.find((f) => f.rule === stageOutputCurrent.id && f.stage === stage)?.verdict;
}

// 1 MHz and 10 pF: 1/(f_s·C_s) = 100 kΩ, and 1 kΩ at the pin in series: 101 kΩ.
const PIN = { sample_rate_hz: 1e6, sample_cap_f: 10e-12, pin_r_ohm: 1000 };

describe("rectify-and-sign", () => {
  // The default design: W = 2.5 V at the buffer, R = rectifier_load_ohm = 10 kΩ, every branch into a
  // virtual ground at 0 V.
  const r = run(design());

  it("works W and R as the hand arithmetic below takes them", () => {
    expect([r.derived.window_v, design().front_end.rectifier_load_ohm]).toEqual([2.5, 10_000]);
  });

  it("asks 2W/R of the buffer, 3W/R of stage 1 and W/R of the summer", () => {
    expect(peaks(r)).toEqual({
      // Buffer: ±2.5 V into two 10 kΩ: 2 × 2.5/10k = 0.5 mA (sunk at −2.5 V; sourced at +2.5 V the same).
      buffer: { amps: 5e-4, at_v: -2.5, sources: false },
      // Stage 1: the node beyond the diode at −W drives R and R/2: 2.5/10k + 2.5/5k = 0.75 mA = 3W/R, the
      // diode current. Taken at the op amp's own −(W + Vf) = −3.14 V it would be 0.94 mA: the diode's drop
      // is between, not in, the load. The other half-cycle carries only the input's W/R = 0.25 mA.
      "rectifier/stage-1": { amps: 7.5e-4, at_v: -2.5, sources: false },
      // Summer: 0 … W into feedback R: 2.5/10k = 0.25 mA, sourced at +2.5 V.
      "rectifier/stage-2": { amps: 2.5e-4, at_v: 2.5, sources: true },
    });
  });

  it("fails a 0.5 mA part as stage 1, holds it marginal at its rating as the buffer, passes it as the summer", () => {
    // Stage 1: 0.75 mA > 0.5 mA. Buffer: 0.5 mA, margin 0 < 0.2 × 0.5 mA. Summer: 0.25 mA spare ≥ 0.1 mA.
    expect([
      verdictOf(r, "buffer"),
      verdictOf(r, "rectifier", "stage-1"),
      verdictOf(r, "rectifier", "stage-2"),
    ]).toEqual(["marginal", "fail", "pass"]);
  });

  it("adds the converter pin's average draw to the summer when the design states it", () => {
    // At +2.5 V with the sampling capacitor at 0 V: 2.5/10k + 2.5/101k = 250 µA + 24.75 µA = 274.75 µA.
    // (At 0 V with it at V_ref = 5 V the pin gives back 5/101k = 49.5 µA: smaller.)
    expect(peaks(run(design({ adc: PIN })))["rectifier/stage-2"]).toEqual({
      amps: Number((2.5 / 10_000 + 2.5 / 101_000).toPrecision(6)),
      at_v: 2.5,
      sources: true,
    });
  });
});

describe("offset-to-mid-rail", () => {
  // ±2.5 V into a 5 V reference with a 100 kΩ scale: R1 = R2 = 75 kΩ, no R3: a = ½, b = 2.5 V; the
  // level shifter's output (and node) spans 1.25 … 3.75 V.
  const OFFSET = design({ topology: "offset-to-mid-rail", supply: { positive_v: 5, negative: { kind: "ground" } } });
  const r = run(OFFSET);

  it("asks of the reference buffer what R2 carries with the node at its lowest", () => {
    expect(r.derived.level_shift).toMatchObject({ r1_ohm: 75_000, r2_ohm: 75_000, r3_ohm: null });
    // Thévenin: R2 + R1 = 150 kΩ to the signal at −2.5 V: (5 + 2.5)/150k = 50 µA. The same as the node
    // itself gives: it sits at ½·(−2.5) + 2.5 = 1.25 V, and (5 − 1.25)/75k = 50 µA through R2.
    expect(peaks(r)["reference-buffer"]).toEqual({ amps: 5e-5, at_v: 5, sources: true });
    expect((5 - 1.25) / 75_000).toBeCloseTo(5e-5, 15);
    // The follower without the pin's fields drives nothing stated: 0 A.
    expect(peaks(r)["level-shift"]?.amps).toBe(0);
    expect([verdictOf(r, "level-shift"), verdictOf(r, "reference-buffer")]).toEqual(["pass", "pass"]);
  });

  it("with the pin stated, the follower's output draws (3.75 V)/101 kΩ at either end", () => {
    // Sinking at 1.25 V from a capacitor at 5 V, or sourcing at 3.75 V into one at 0 V: 3.75/101k = 37.13 µA.
    const pinned = run(design({ ...OFFSET, adc: { ...OFFSET.adc, ...PIN } }));
    expect(peaks(pinned)["level-shift"]?.amps).toBe(Number((3.75 / 101_000).toPrecision(6)));
  });
});

describe("gained-level-shift", () => {
  // ±0.2 V into a 1.8 V converter on 3.3 V, 10 kΩ scale: Rf = 36 kΩ, Rg = 8.2 kΩ to ground. Non-inverting:
  // the output drives Rf + Rg = 44.2 kΩ to 0 V (the − input draws nothing), largest at the output's top.
  const r = run(
    design({
      topology: "gained-level-shift",
      supply: { positive_v: 3.3, negative: { kind: "ground" } },
      signal: { peak_v: 0.2, max_frequency_hz: 500, source_ohm: 0 },
      front_end: { divider_total_ohm: 10e3 },
      adc: { bits: 12, reference_v: 1.8 },
    }),
  );

  it("asks V_out,high / (Rf + Rg)", () => {
    const stage = r.roles.find((x) => x.role === "gain-stage")?.stages[0]?.stage;
    const high = stage?.stage === "op-amp" ? stage.output.high : NaN;
    // 1.69948 V / 44.2 kΩ = 38.45 µA.
    expect(high).toBeCloseTo(1.69948, 5);
    expect(peaks(r)["gain-stage"]).toEqual({
      amps: Number((high / 44_200).toPrecision(6)),
      at_v: Number(high.toPrecision(6)),
      sources: true,
    });
  });
});

describe("difference-to-mid", () => {
  // A ±20 mV bridge on 1.6–1.7 V into a 2.5 V converter: R2 = 470 kΩ. The output drives R2 into the
  // − input, which feedback holds at the + input's level, itself anywhere in the stage's input span.
  const r = run(design(BRIDGE_20MV_ON_3V3));

  it("asks (V_in+,high − V_out,low)/R2: the output at its lowest under the − input at its highest", () => {
    const stage = r.roles.find((x) => x.role === "difference")?.stages[0]?.stage;
    if (stage?.stage !== "op-amp") throw new Error("no difference stage");
    // 0.1037 V out against 1.7021 V at the − input: 1.598 V / 470 kΩ = 3.40 µA, sunk. The other way,
    // 2.3963 − 1.5842 = 0.812 V / 470 kΩ = 1.73 µA: smaller.
    expect([stage.output.low, stage.input.high]).toEqual([expect.closeTo(0.10366, 5), expect.closeTo(1.70211, 5)]);
    expect(peaks(r).difference).toEqual({
      amps: Number(((stage.input.high - stage.output.low) / 470_000).toPrecision(6)),
      at_v: Number(stage.output.low.toPrecision(6)),
      sources: false,
    });
  });
});
