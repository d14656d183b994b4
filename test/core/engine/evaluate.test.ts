// evaluateDesign on a small catalogue built from generic classes (test/helpers/parts.ts).
import { describe, expect, it } from "vitest";
import { catalogueFromParts, type Catalogue } from "../../../src/core/catalogue.ts";
import { evaluateDesign } from "../../../src/engine.ts";
import { designHolds, type DesignResult, type RoleResult } from "../../../src/core/engine/result.ts";
import { forwardVoltage } from "../../../src/core/math/diode.ts";
import type { Design } from "../../../src/core/schemas/design.ts";
import { design, type DeepPartial } from "../../helpers/designs.ts";
import { comparator, diode, opAmp } from "../../helpers/parts.ts";

// Wide-supply rail-to-rail, twice under two ids, so only the id tells them apart in the ranking.
const RRIO_12V = {
  status: "listed",
  cost_band: 2,
  supply_min_v: 2.7,
  supply_max_v: 12,
  icm_neg_headroom_v: -0.1,
  icm_pos_headroom_v: -0.1,
  out_neg_headroom_v: 0.05,
  out_pos_headroom_v: 0.05,
  vos_max_mv: 1,
  ib_max_na: 0.01,
  gbw_mhz: 10,
  slew_v_per_us: 5,
};

const CATALOGUE: Catalogue = catalogueFromParts([
  // Ground-sensing bipolar: to V+ − 1.5 V, 3–32 V.
  opAmp({ id: "oa-gs", status: "stocked", cost_band: 1 }),
  opAmp({ id: "oa-gs-approved", status: "approved", cost_band: 1 }),
  // Wide-supply rail-to-rail: passes everything on ±5 V, with more margin.
  opAmp({ id: "oa-rrio-12v", ...RRIO_12V }),
  opAmp({ id: "oa-rrio-12v-b", ...RRIO_12V }),
  // Classic split-supply class rated from 10 V.
  opAmp({ id: "oa-classic", status: "stocked", cost_band: 1, supply_min_v: 10, supply_max_v: 36 }),
  opAmp({ id: "oa-decomp", status: "stocked", cost_band: 1, unity_gain_stable: false }),
  opAmp({ id: "oa-pr-unstated", status: "stocked", cost_band: 1, phase_reversal: "" }),
  comparator({
    id: "cmp-pp-wide",
    status: "stocked",
    cost_band: 1,
    supply_min_v: 2.7,
    supply_max_v: 36,
    icm_neg_headroom_v: -0.2,
    icm_pos_headroom_v: 1.5,
    out_neg_headroom_v: 0.1,
    out_pos_headroom_v: 0.2,
    vos_max_mv: 2,
    tpd_ns: 100,
  }),
  comparator({
    id: "cmp-od",
    status: "stocked",
    cost_band: 1,
    supply_max_v: 36,
    output: "open-drain",
    out_neg_headroom_v: "",
    out_pos_headroom_v: "",
  }),
  diode({ id: "d-si", status: "stocked", cost_band: 1 }),
  diode({ id: "d-si-07", status: "listed", cost_band: 2, vf_1ma_v: 0.7, vf_10ma_v: 0.7 }),
  diode({
    id: "d-sch",
    status: "approved",
    cost_band: 1,
    type: "schottky",
    vf_1ma_v: 0.3,
    vf_10ma_v: 0.4,
    ir_na: 500,
    vr_max_v: 30,
    trr_ns: "",
  }),
]);

function evaluate(overrides: DeepPartial = {}): DesignResult {
  const e = evaluateDesign(design(overrides), CATALOGUE);
  if (!e.ok) throw new Error(e.problems.map((p) => `${p.path}: ${p.message}`).join("\n"));
  return e.result;
}

function role(r: DesignResult, name: string): RoleResult {
  const found = r.roles.find((x) => x.role === name);
  if (!found) throw new Error(`no role ${name}`);
  return found;
}

const ids = (rr: RoleResult) => ({
  fits: rr.fits.map((p) => `${p.part.id}:${p.verdict}`),
  rejected: rr.rejected.map((p) => `${p.part.id}:${p.verdict}`),
});
const problemsOf = (d: Design) => {
  const e = evaluateDesign(d, CATALOGUE);
  return e.ok ? [] : e.problems.map((p) => `${p.path}: ${p.message}`);
};

const PUMP = {
  kind: "charge-pump",
  drive_v: 5,
  frequency_hz: 980,
  flying_cap_f: 1e-6,
  reservoir_cap_f: 10e-6,
  load_a: 1e-3,
};

describe("evaluateDesign: roles and ranking", () => {
  it("has the rectify-and-sign roles; pump and clamp diodes only when used", () => {
    expect(evaluate().roles.map((r) => r.role)).toEqual([
      "buffer",
      "rectifier",
      "sign",
      "rectifier-diode",
      "clamp-diode",
    ]);
    expect(
      evaluate({ supply: { negative: PUMP }, logic: { level_shift: "pull-up" } }).roles.map((r) => r.role),
    ).toEqual(["buffer", "rectifier", "sign", "pump-diode", "rectifier-diode"]);
  });

  it("ranks the buffer's fits by verdict, status, cost band, relative margin and id, and lists every rejection", () => {
    expect(ids(role(evaluate(), "buffer"))).toEqual({
      fits: ["oa-gs:pass", "oa-gs-approved:pass", "oa-rrio-12v:pass", "oa-rrio-12v-b:pass", "oa-classic:marginal"],
      rejected: ["oa-pr-unstated:unrated", "oa-decomp:fail"],
    });
  });

  it("puts every part of the role's kinds in fits or rejected, each with a finding for every rule", () => {
    const r = evaluate({ supply: { negative: PUMP } });
    for (const rr of r.roles) {
      const all = [...rr.fits, ...rr.rejected];
      const candidates = CATALOGUE.parts.filter((p) => rr.kinds.includes(p.kind));
      expect(all.map((p) => p.part.id).sort()).toEqual(candidates.map((p) => p.id).sort());
      // A role of several stages (the rectifier, SPEC §11.2) has each stage's rules in turn.
      const rules = rr.stages.flatMap((st) => st.rules);
      for (const p of all) expect(p.findings.map((f) => f.rule)).toEqual(rules);
      for (const p of rr.rejected)
        expect(p.findings.some((f) => f.verdict === "fail" || f.verdict === "unrated")).toBe(true);
    }
  });

  it("allow_unrated moves an unrated part into the fits as marginal", () => {
    expect(ids(role(evaluate({ policy: { allow_unrated: true } }), "buffer")).fits).toContain(
      "oa-pr-unstated:marginal",
    );
    expect(ids(role(evaluate(), "rectifier-diode")).rejected).toContain("d-sch:unrated");
    expect(ids(role(evaluate({ policy: { allow_unrated: true } }), "rectifier-diode")).fits).toContain(
      "d-sch:marginal",
    );
  });
});

describe("evaluateDesign: issue 3 acceptance", () => {
  it("fixed ±5 V, 2.5 V window: ground-sensing bipolar passes output-swing with 1.00 V to spare; a 10 V-minimum class is marginal on supply-range", () => {
    const buffer = role(evaluate(), "buffer");
    const gs = buffer.fits.find((p) => p.part.id === "oa-gs");
    const swing = gs?.findings.find((f) => f.rule === "output-swing");
    expect(swing).toMatchObject({ verdict: "pass", needed: 2.5, available: 3.5, margin: 1 });
    expect(swing?.reason).toMatchInlineSnapshot(
      `"needs the output to reach +2.50 V; at V+ = 5.00 V it reaches +3.50 V (1.50 V headroom): 1.00 V to spare"`,
    );
    const classic = buffer.fits.find((p) => p.part.id === "oa-classic");
    expect(classic?.verdict).toBe("marginal");
    expect(classic?.findings.find((f) => f.rule === "supply-range")).toMatchObject({
      verdict: "marginal",
      needed: 10,
      available: 10,
      margin: 0,
    });
  });

  it("a ground-only design leaves the buffer with no fit: every op amp fails output-swing on the negative side", () => {
    const r = evaluate({ supply: { negative: { kind: "ground" } } });
    const buffer = role(r, "buffer");
    expect(buffer.fits).toEqual([]);
    for (const p of buffer.rejected) {
      const swing = p.findings.find((f) => f.rule === "output-swing");
      expect(swing?.verdict).toBe("fail");
      expect(swing?.needed).toBe(-2.5);
    }
    expect(
      buffer.rejected.find((p) => p.part.id === "oa-gs")?.findings.find((f) => f.rule === "output-swing")?.reason,
    ).toMatchInlineSnapshot(
      `"needs the output to reach −2.50 V; with V− = 0.00 V it reaches only +0.02 V (0.02 V headroom): 2.52 V short"`,
    );
    expect(designHolds(r)).toBe(false);
  });

  it("10 V peak into a 2.5 V window from E24 with a 100 kΩ target and a 1 kΩ source: 47 kΩ over 16 kΩ, k = 0.25 loaded", () => {
    // SPEC §11.1: k = R2/(Rs + R1 + R2). 39k/13k (issue 3's pick, unloaded) gives 13/53 = 0.24528 behind
    // 1 kΩ; the loaded search finds 16k/(1k + 47k + 16k) = 0.25 exactly.
    const r = evaluate({ signal: { peak_v: 10, source_ohm: 1000 } });
    expect(r.derived.divider).toEqual({
      top_ohm: 47000,
      bottom_ohm: 16000,
      ratio: 0.25,
      total_ohm: 63000,
      source_ohm: 1000,
      chosen_by: "search",
    });
    expect(r.derived.ratio).toBe(0.25);
    expect(r.derived.window_v).toBe(2.5);
    expect(r.derived.target_ratio).toBe(0.25);
    // (Rs + R1) ‖ R2 = 48 kΩ ‖ 16 kΩ = 12 kΩ
    expect(r.derived.thevenin_ohm).toBeCloseTo(12e3, 9);
    // The firmware constant uses the loaded k: (5 V / 2^10) / 0.25 = 19.531 mV per code (IEEE 1241 Q = V_ref/2^N).
    expect(r.conversion.volts_per_code).toBeCloseTo(0.019531, 6);
  });

  it("with no source resistance, 39 kΩ over 13 kΩ: k = 0.25 (issue 3)", () => {
    const r = evaluate({ signal: { peak_v: 10, source_ohm: 0 } });
    expect(r.derived.divider).toEqual({
      top_ohm: 39000,
      bottom_ohm: 13000,
      ratio: 0.25,
      total_ohm: 52000,
      source_ohm: 0,
      chosen_by: "search",
    });
  });

  it("a held 39 kΩ over 13 kΩ behind 1 kΩ is used as given: k = 13/53 = 0.24528 in the window, budget and firmware constant", () => {
    // SPEC §11.1, the voltage divider with the source in series with R1: k = R2/(Rs + R1 + R2)
    // = 13k/(1k + 39k + 13k) = 0.245283. The search would pick 47k/16k here (the test above).
    const r = evaluate({
      signal: { peak_v: 10, source_ohm: 1000 },
      front_end: { divider_r1_ohm: 39000, divider_r2_ohm: 13000 },
    });
    expect(r.derived.divider).toEqual({
      top_ohm: 39000,
      bottom_ohm: 13000,
      ratio: 13 / 53,
      total_ohm: 52000,
      source_ohm: 1000,
      chosen_by: "held",
    });
    expect(r.derived.ratio).toBeCloseTo(0.245283, 6);
    // W = k · peak = 2.45283 V; (Rs + R1) ‖ R2 = 40k · 13k / 53k = 9811.32 Ω.
    expect(r.derived.window_v).toBeCloseTo(2.45283, 6);
    expect(r.derived.thevenin_ohm).toBeCloseTo(9811.3208, 3);
    // IEEE Std 1241-2010 Q = V_ref/2^N = 4.8828 mV, ÷ k = 19.907 mV per code at the input.
    expect(r.conversion.volts_per_code).toBeCloseTo(0.0199069, 7);
    // The divider's budget term at its worst corner, R1 −1 %, R2 +1 % (divider arithmetic, SPEC §11.1):
    // 13.13/(1 + 38.61 + 13.13) ÷ k − 1 = +1.4979 %, × 10 V = 149.79 mV.
    const term = r.budget.terms.find((t) => t.name === "divider-ratio");
    expect(term?.v).toBeCloseTo(0.14979, 5);
    expect(term?.formula).toMatch(/^k = 13 kΩ \/ \(1 kΩ \+ 39 kΩ \+ 13 kΩ\) = 0\.2453;/);
  });

  it("a held divider is used even where the peak needs none: 10k over 10k halves a 2.5 V peak", () => {
    const r = evaluate({ front_end: { divider_r1_ohm: 10000, divider_r2_ohm: 10000 } });
    expect([r.derived.divider?.chosen_by, r.derived.ratio, r.derived.window_v]).toEqual(["held", 0.5, 1.25]);
  });

  it("needs no divider when the peak fits the window", () => {
    const r = evaluate();
    expect([r.derived.divider, r.derived.ratio, r.derived.window_v, r.derived.thevenin_ohm]).toEqual([null, 1, 2.5, 0]);
  });
});

describe("evaluateDesign: derived values", () => {
  // IEEE Std 1241-2010: Q = V_FS / 2^N; 10 bit at 5 V is 4.8828 mV.
  it.each([
    [{}, 5 / 1024],
    [{ signal: { peak_v: 10 } }, 5 / 1024 / 0.25],
    [{ adc: { bits: 12, reference_v: 3.3 }, supply: { positive_v: 5 } }, 0.80566e-3],
  ])("one ADC step referred to the input (%j) is %d V", (overrides, step) => {
    expect(evaluate(overrides).derived.adc_step_at_input_v).toBeCloseTo(step, 8);
  });

  it("10 bit at 5 V: the step is 4.8828 mV (IEEE 1241)", () => {
    expect(evaluate().derived.adc_step_at_input_v * 1e3).toBeCloseTo(4.8828, 4);
  });

  it("a fixed negative rail is used as given", () => {
    expect(
      evaluate({ supply: { negative: { kind: "fixed", v: -12 }, positive_v: 12 }, logic: { vdd_v: 5 } }).derived.rails,
    ).toEqual({ positive_v: 12, negative_v: -12 });
  });

  it("evaluates the rectifier diode at 3·W / rectifier_load_ohm and the clamp diode at V+ / pull_down_ohm", () => {
    // Stage 1's diode feeds its feedback R and the summer's R/2 input, both at virtual ground: W/R + 2W/R (SPEC §11.2).
    const r = evaluate({ bom: { "rectifier-diode": "d-si", "clamp-diode": "d-si" } });
    const si = { vf_1ma_v: 0.65, vf_10ma_v: 0.75 };
    expect(r.derived.rectifier_diode).toMatchObject({
      id: "d-si",
      current_a: 7.5e-4,
      vf_v: forwardVoltage(si, 7.5e-4),
      fits: true,
    });
    expect(r.derived.clamp_diode).toMatchObject({ id: "d-si", current_a: 5e-4, vf_v: forwardVoltage(si, 5e-4) });
    // SPEC §11.2 (Franco, Sedra & Smith, precision rectifiers): stage 1, an inverting half-wave stage whose op
    // amp output swings −(W + Vf) … +Vf at noise gain 2; stage 2, a summer with inputs R and R/2 and feedback R,
    // noise gain 1 + R/(R ‖ R/2) = 4, output 0 … W; both inverting, so both inputs sit at 0 V.
    const vf = forwardVoltage(si, 7.5e-4);
    const [one, two] = role(r, "rectifier").stages;
    expect(one).toMatchObject({
      id: "stage-1",
      stage: {
        input: { low: 0, high: 0 },
        output: { low: -(2.5 + vf), high: vf },
        noise_gain: 2,
        vos_multiplier: 2,
        // Its output reaches the converter at the summer's weight 2: k / 2 (k = 1 here, no divider).
        output_per_input: r.derived.ratio / 2,
        zero_crossing_v: 2 * vf,
      },
    });
    expect(one?.rules).toContain("zero-crossing");
    expect(two).toMatchObject({
      id: "stage-2",
      stage: { input: { low: 0, high: 0 }, output: { low: 0, high: 2.5 }, noise_gain: 4, vos_multiplier: 4 },
    });
    expect(two?.rules).not.toContain("zero-crossing");
  });
});

describe("evaluateDesign: the charge pump", () => {
  // Worked value (REFERENCES.md, diode charge-pump inverter): 5 V, 980 Hz, 1 µF, 0.7 V, 1 mA → −2.580 V.
  it("settles the BOM pump diode first, and every op amp is checked against the rail it gives", () => {
    const r = evaluate({ supply: { negative: PUMP }, bom: { "pump-diode": "d-si-07" } });
    const neg = r.derived.negative;
    expect(neg.kind).toBe("charge-pump");
    if (neg.kind !== "charge-pump") return;
    // SPEC §11.5: the rail carries the stated 1 mA and every amplifier's supply current; each diode
    // conducts about twice that (charge balance). Winder's droop with the summed load.
    const total = neg.load?.total_a ?? NaN;
    expect(neg.load?.stated_a).toBe(1e-3);
    expect(total).toBeCloseTo(1e-3 + (neg.load?.draws ?? []).reduce((a, d) => a + d.amps, 0), 15);
    expect(total).toBeGreaterThan(1e-3);
    expect(neg.diode).toMatchObject({ id: "d-si-07", vf_v: 0.7, current_a: 2 * total });
    expect(neg.dc_v).toBeCloseTo(-(5 - 2 * 0.7) + total / (980 * 1e-6), 12);
    expect(neg.ripple_v).toBeCloseTo(total / (980 * 10e-6), 12);
    expect(r.derived.rails.negative_v).toBeCloseTo(neg.dc_v + neg.ripple_v / 2, 12);
    const supply = role(r, "buffer")
      .resultOf("oa-gs")
      ?.findings.find((f) => f.rule === "supply-range");
    expect(supply?.needed).toBeCloseTo(5 - r.derived.rails.negative_v, 12);
  });

  it("without a BOM pump diode, takes the best-ranked fitting one (the Schottky is unrated on recovery)", () => {
    const r = evaluate({ supply: { negative: PUMP } });
    expect(ids(role(r, "pump-diode"))).toEqual({ fits: ["d-si:pass", "d-si-07:pass"], rejected: ["d-sch:unrated"] });
    const neg = r.derived.negative;
    if (neg.kind !== "charge-pump") throw new Error("expected a pump");
    expect(neg.diode.id).toBe("d-si");
    // −(5 − 2·Vf) + I / (980 Hz × 1 µF), then half the ripple, I the summed load and Vf at 2·I (SPEC §11.5)
    const total = neg.load?.total_a ?? NaN;
    expect(neg.worst_v).toBeCloseTo(-(5 - 2 * neg.diode.vf_v) + total / 980e-6 + total / 9.8e-3 / 2, 12);
  });

  it("a BOM pump diode that fails its role is still used, and said so", () => {
    const r = evaluate({ supply: { negative: PUMP }, bom: { "pump-diode": "d-sch" } });
    expect(r.derived.negative).toMatchObject({ diode: { id: "d-sch", fits: false } });
    expect(r.notes).toMatchInlineSnapshot(`
      [
        "The pump diode d-sch does not fit its role; values that depend on it use it anyway.",
        "The pumped rail carries its parts: worked out with buffer=oa-gs, rectifier=oa-rrio-12v, sign=cmp-pp-wide and checked again until no pick drew more than the rail was worked out with (2 passes).",
      ]
    `);
    expect(role(r, "pump-diode").rejected[0]).toMatchObject({ bom: true, verdict: "unrated" });
    expect(designHolds(r)).toBe(false);
  });

  it("a load at or past the collapse current (V_d − 2V_F)·f·C is a problem at supply.negative.load_a", () => {
    // 0.7 V flat diode: collapse at 3.6 V × 980 Hz × 1 µF = 3.53 mA.
    expect(problemsOf(design({ supply: { negative: { ...PUMP, load_a: 4e-3 } }, bom: { "pump-diode": "d-si-07" } })))
      .toMatchInlineSnapshot(`
        [
          "supply.negative.load_a: load is at or past the pump's collapse current (got 4.00 mA stated = 4.00 mA, expected less than (drive − 2·Vf)·f·C = 3.53 mA with diode d-si-07); raise the frequency or the flying capacitor, or lower the load",
        ]
      `);
    expect(
      problemsOf(design({ supply: { negative: { ...PUMP, load_a: 1e-3 } }, bom: { "pump-diode": "d-si-07" } })),
    ).toEqual([]);
  });
});

describe("evaluateDesign: the BOM", () => {
  it("reports a BOM part even when it fails, and the design then does not hold", () => {
    const r = evaluate({ bom: { buffer: "oa-decomp" } });
    const buffer = role(r, "buffer");
    expect(buffer.bom).toBe("oa-decomp");
    expect(buffer.chosen).toBe("oa-decomp");
    const bomPart = buffer.rejected.find((p) => p.part.id === "oa-decomp");
    expect(bomPart).toMatchObject({ bom: true, verdict: "fail" });
    expect(bomPart?.findings.find((f) => f.verdict === "fail")?.reason).toMatchInlineSnapshot(
      `"not unity-gain stable: the buffer runs at noise gain 1, where a decompensated part may oscillate"`,
    );
    expect(designHolds(r)).toBe(false);
  });

  it("holds when every BOM part fits and every role has a fit", () => {
    const r = evaluate({ bom: { buffer: "oa-gs", sign: "cmp-pp-wide" } });
    expect(role(r, "buffer").chosen).toBe("oa-gs");
    expect(role(r, "sign").chosen).toBe("cmp-pp-wide");
    expect(designHolds(r)).toBe(true);
  });

  it("rejects a BOM id that names no part, a part of the wrong kind, or a role the design does not have", () => {
    expect(
      problemsOf(design({ bom: { buffer: "oa-missing", rectifier: "d-si", "pump-diode": "d-si", sign: "oa-gs" } })),
    ).toMatchInlineSnapshot(`
      [
        "bom.buffer: names no part in the catalogue (got 'oa-missing', expected the id of an op amp such as 'oa-gs')",
        "bom.rectifier: names a part of the wrong kind (got 'd-si', a diode, expected an op amp)",
        "bom.pump-diode: role is not used by this design (got 'pump-diode', expected one of buffer, rectifier, sign, rectifier-diode, clamp-diode)",
      ]
    `);
  });
});

describe("evaluateDesign: an op amp in the sign role", () => {
  it("is at best marginal, ranked after the comparators that pass, with a reason saying why", () => {
    // ±400 mV required: room for an op amp's slow transition at a 20 Hz crossing (SPEC §11.4, integrator then slew).
    const sign = role(evaluate({ accuracy: { required_v: 0.4 } }), "sign");
    expect(ids(sign)).toMatchInlineSnapshot(`
      {
        "fits": [
          "cmp-pp-wide:pass",
          "oa-rrio-12v:marginal",
          "oa-rrio-12v-b:marginal",
        ],
        "rejected": [
          "oa-classic:fail",
          "oa-decomp:fail",
          "oa-gs:fail",
          "oa-pr-unstated:fail",
          "cmp-od:fail",
          "oa-gs-approved:fail",
        ],
      }
    `);
    const rrio = sign.fits.find((p) => p.part.id === "oa-rrio-12v");
    expect(rrio?.verdict).toBe("marginal");
    expect(rrio?.findings.filter((f) => f.verdict !== "pass").map((f) => `${f.rule}: ${f.reason}`))
      .toMatchInlineSnapshot(`
        [
          "propagation-delay: an op amp used as a comparator leaves its old level as an integrator driven by the input's 314 V/s ramp, then slews: 31.7 µs to cross 9.90 V at 10.0 MHz GBW and 5.00 V/µs; the sign may be late by 159 µs (timing share 25 % of the required accuracy at 2·2π·f·peak·t): 127 µs to spare; an estimate, so at best marginal",
        ]
      `);
  });
});
