// Issue 16, item 6: with the divider's resistors held (front_end.divider_r1_ohm and
// divider_r2_ohm), what does a larger source resistance do to the budget? The loaded
// ratio k = R2/(Rs + R1 + R2) (SPEC §11.1, the voltage divider with Rs in series with
// R1) falls, so every error referred to the input through 1/k grows. The issue asked
// for "the worst case never shrinks"; physics has two exceptions, each pinned here:
//
// 1. The divider's own tolerance term. With Rs known exactly, the worst-case change of
//    k over R1, R2 ± t is, to first order, t·(Rs + 2·R1)/(Rs + R1 + R2), whose slope in
//    Rs is t·(R2 − R1)/(Rs + R1 + R2)²: a larger exact Rs dilutes R1's share of the top
//    leg, so the term shrinks when R1 > R2 (every attenuator with k < ½). Counted with a
//    source tolerance at least the resistors', the pair grows again (≈ 2t·(1 − k)).
// 2. The rectifier's dead time. A smaller window drives the rectifier diode at a smaller
//    current, and its drop falls (Shockley: n·V_T·ln per decade, Sedra & Smith ch. 4); where
//    the stage is slew-limited (t ≈ 2Vf/SR) or the diode's drop is steep in current, the
//    jump shrinks faster than the slower input lengthens the time.
//
// Parts are held too (every role's part in the BOM), so only the physics moves.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import type { DesignResult } from "../../src/core/engine/result.ts";
import { heldDivider, loadedRatioDeviation, sourceRatioDeviation } from "../../src/core/math/divider.ts";
import type { Design } from "../../src/core/schemas/design.ts";
import type { Diode } from "../../src/core/schemas/diode.ts";
import { deadTime } from "../../src/core/math/dead-time.ts";
import { forwardVoltage } from "../../src/core/math/diode.ts";
import { evaluateDesign, rolesOf } from "../../src/engine.ts";
import { comparatorArb, decades, designInputArb, diodeArb, opAmpArb, parseDesign } from "./arbitraries.ts";

// At most one skipped case per run (fc.pre): a generator that drifted to mostly invalid designs fails, not passes.
const RUNS = { numRuns: 200, maxSkipsPerRun: 1 };
// Relative float allowance: terms are sums of a few dozen operations.
const EPS = 1e-9;

const heldCase = fc
  .record({
    raw: designInputArb,
    r2: decades(100, 1e6),
    // How much larger R1 is than the smallest that keeps k·peak inside the window.
    spare: decades(1, 10),
    rs: fc.oneof(fc.constant(0), decades(1, 1e6)),
    more: decades(1e-3, 1e6),
    op: opAmpArb,
    cmp: comparatorArb,
    diode: diodeArb,
  })
  .map((x) => {
    const { peak_v } = x.raw.signal;
    const smallest = x.r2 * (peak_v / x.raw.front_end.window_v - 1) - x.rs;
    // Rounded up, so the four digits a person types still fit the window.
    const r1 = Number((Math.max(10, smallest * x.spare) * 1.0005).toPrecision(4));
    return { ...x, r1 };
  });

type HeldCase = typeof heldCase extends fc.Arbitrary<infer T> ? T : never;

function designAt(x: HeldCase, rs: number, more: Record<string, number> = {}): Design | undefined {
  return parseDesign({
    ...x.raw,
    topology: "rectify-and-sign",
    signal: { ...x.raw.signal, source_ohm: rs, ...more },
    front_end: { ...x.raw.front_end, divider_r1_ohm: x.r1, divider_r2_ohm: x.r2 },
  });
}

/** The design at Rs and at the larger Rs, each evaluated with every role's part held in the BOM. */
function atBoth(
  x: HeldCase,
  options: { diode?: Diode; signal?: Record<string, number> } = {},
): [DesignResult, DesignResult] {
  const diode = options.diode ?? x.diode;
  const catalogue = catalogueFromParts([
    { ...x.op, id: "oa" },
    { ...x.cmp, id: "cmp" },
    { ...diode, id: "d" },
  ]);
  const results = [x.rs, x.rs + x.more].map((rs) => {
    const d = designAt(x, rs, options.signal);
    fc.pre(d !== undefined);
    const bom = Object.fromEntries(
      rolesOf(d).map((r) => [r, r.endsWith("diode") ? "d" : r === "sign" ? "cmp" : "oa"] as const),
    );
    const e = evaluateDesign({ ...d, bom }, catalogue);
    // A pump past collapse is refused whatever Rs is; nothing to compare then.
    fc.pre(e.ok);
    return e.result;
  });
  return [results[0], results[1]] as [DesignResult, DesignResult];
}

const termsOf = (r: DesignResult) => new Map(r.budget.terms.map((t) => [t.name, t.v]));

describe("a larger source resistance behind a held divider (SPEC §11.1)", () => {
  it("never shrinks any budget term but the divider's tolerance and the dead time, and drops none", () => {
    fc.assert(
      fc.property(heldCase, (x) => {
        const [small, large] = atBoth(x);
        const after = termsOf(large);
        const shrunk: string[] = [];
        for (const [name, v] of termsOf(small)) {
          if (name === "divider-ratio" || name === "rectifier-dead-time") continue;
          const w = after.get(name);
          if (w === undefined || w < v * (1 - EPS)) shrunk.push(`${name}: ${v} → ${w}`);
        }
        expect(shrunk).toEqual([]);
      }),
      RUNS,
    );
  });

  it("shrinks the divider's tolerance term only when R1 > R2: dR/dRs ∝ t·(R2 − R1)", () => {
    fc.assert(
      fc.property(heldCase, (x) => {
        const [small, large] = atBoth(x);
        const before = termsOf(small).get("divider-ratio") ?? 0;
        const after = termsOf(large).get("divider-ratio") ?? 0;
        if (x.r2 >= x.r1) expect(after).toBeGreaterThanOrEqual(before * (1 - EPS));
        if (x.r1 >= x.r2) expect(after).toBeLessThanOrEqual(before * (1 + EPS));
      }),
      RUNS,
    );
  });

  it("never shrinks the worst case when the source is as uncertain as the resistors and the diode's drop is flat", () => {
    fc.assert(
      fc.property(heldCase, decades(1, 10), (x, wider) => {
        // Exception 1 closed: Rs ± t_s with t_s ≥ t. Exception 2 closed: the drop does not move with current.
        const t = x.raw.front_end.resistor_tolerance;
        const flat: Diode = { ...x.diode, vf_10ma_v: x.diode.vf_1ma_v };
        const [small, large] = atBoth(x, {
          diode: flat,
          signal: { source_tolerance: Math.min(1, Number((t * wider).toPrecision(4))) },
        });
        expect(large.budget.worst_case_v).toBeGreaterThanOrEqual(small.budget.worst_case_v * (1 - EPS));
      }),
      RUNS,
    );
  });
});

describe("the divider's tolerance against an exactly known source (divider arithmetic, SPEC §11.1)", () => {
  const ohms = decades(10, 1e7);
  it("its worst-case change of k falls with Rs when R1 > R2 and rises when R2 > R1, both corners", () => {
    fc.assert(
      fc.property(
        ohms,
        ohms,
        fc.oneof(fc.constant(0), ohms),
        ohms,
        fc.constantFrom(0.001, 0.01, 0.05, 0.2),
        (r1, r2, rs, more, t) => {
          const a = loadedRatioDeviation(heldDivider(r1, r2, rs), t);
          const b = loadedRatioDeviation(heldDivider(r1, r2, rs + more), t);
          // Exact: k_high/k = (1+t)(Rs + R1 + R2)/(Rs + R1(1−t) + R2(1+t)), whose slope in Rs is t(R2 − R1)/(…)².
          const sign = Math.sign(r2 - r1);
          for (const [p, q] of [
            [a.high, b.high],
            [-a.low, -b.low],
          ] as const) {
            if (sign > 0) expect(q).toBeGreaterThanOrEqual(p * (1 - EPS));
            if (sign < 0) expect(q).toBeLessThanOrEqual(p * (1 + EPS));
          }
        },
      ),
      { numRuns: 500 },
    );
  });

  it("39k over 13k at ±5 %, 10 V: the term falls from 769.2 mV behind 0 Ω to 724.9 mV behind 10 kΩ", () => {
    // Worst corner R1 −5 %, R2 +5 % (hand arithmetic, voltage divider with Rs in series with R1):
    // Rs = 0:    13.65/(37.05 + 13.65) = 0.269231 against 13/52 = 0.25: +7.692 %, × 10 V = 769.2 mV;
    // Rs = 10k:  13.65/(10 + 37.05 + 13.65) = 0.224876 against 13/62 = 0.209677: +7.2488 %, × 10 V = 724.9 mV.
    const at = (rs: number) => 10 * loadedRatioDeviation(heldDivider(39000, 13000, rs), 0.05).high;
    expect(at(0)).toBeCloseTo(0.76923, 5);
    expect(at(10000)).toBeCloseTo(0.72488, 5);
    // Counted with Rs ± 5 %, the pair grows: Rs −5 % gives 13/61.5 against 13/62, +0.813 %, 81.3 mV;
    // 724.9 + 81.3 = 806.2 mV against 769.2 mV (no source term behind 0 Ω).
    const source = 10 * sourceRatioDeviation(heldDivider(39000, 13000, 10000), 0.05).high;
    expect(source).toBeCloseTo(0.081301, 5);
    expect(at(10000) + source).toBeGreaterThan(at(0));
  });
});

describe("the dead time against a smaller window (SPEC §11.3)", () => {
  const pos = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

  it("at the same jump, a slower input never shortens it: only the diode's smaller drop can", () => {
    fc.assert(
      fc.property(
        pos(1e4, 1e9),
        pos(1e3, 1e9),
        pos(0.1, 1),
        pos(1, 1e7),
        pos(0.01, 3),
        pos(1, 100),
        (gbw, sr, beta, slope, jump, slower) => {
          const at = (s: number) =>
            deadTime({ gbw_hz: gbw, slew_v_per_s: sr, beta, input_slope_v_per_s: s, jump_v: jump }).seconds;
          expect(at(slope / slower)).toBeGreaterThanOrEqual(at(slope) * (1 - EPS));
        },
      ),
      { numRuns: 500 },
    );
  });

  it("slew-limited, halving W shortens it: 117.10 µs at 2.5 V, 109.98 µs at 1.25 V (0.6 V/0.72 V diode, 10 kΩ, 0.01 V/µs)", () => {
    // Diode drop at 3·W/R (the rectifier's peak current), Shockley's fixed step per decade
    // (Sedra & Smith ch. 4): 0.6 + 0.12·log10(0.75) = 0.585007 V, 0.6 + 0.12·log10(0.375) = 0.548884 V.
    // Integrator then slew (Fiore ch. 5), GBW 1 MHz, β ½, 1 kHz, SR 10⁴ V/s: a = 2π·GBW·β·2π·f·W,
    // t₁ = SR/a, t = t₁ + (2Vf − SR·t₁/2)/SR.
    // W = 2.5 V:  a = 4.9348e10 V/s², t₁ = 0.20264 µs, t = 0.20264 µs + (1.170015 − 0.001013)/10⁴ = 117.10 µs;
    // W = 1.25 V: t₁ = 0.40528 µs, t = 0.40528 µs + (1.097767 − 0.002026)/10⁴ = 109.98 µs.
    const diode = { vf_1ma_v: 0.6, vf_10ma_v: 0.72 };
    const at = (w: number) =>
      deadTime({
        gbw_hz: 1e6,
        slew_v_per_s: 0.01e6,
        beta: 0.5,
        input_slope_v_per_s: 2 * Math.PI * 1000 * w,
        jump_v: 2 * forwardVoltage(diode, (3 * w) / 10000),
      });
    expect(at(2.5).regime).toBe("gain-bandwidth-then-slew");
    expect(at(2.5).seconds * 1e6).toBeCloseTo(117.1, 1);
    expect(at(1.25).seconds * 1e6).toBeCloseTo(109.98, 1);
  });
});
