// Issue 16 acceptance, through the engine: the rectifier's dead time (SPEC §11.3)
// and the late sign (§11.4) as rectify-and-sign computes them. The dead-time
// figures are issue 16's worked numbers from the textbook single-pole model
// (an open-loop op amp is an integrator A(s) ≈ ωt/s beyond its pole, T. Fiore,
// Operational Amplifiers & Linear Integrated Circuits, ch. 5): GBW 1 MHz,
// β = ½, 1 kHz, W = 2.5 V, 2·Vf = 1.2 V → 6.97 µs; with 0.2 V/µs the ramp meets
// the slew limit after 4.05 µs (0.405 V) and needs 8.03 µs in all.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import type { RoleResult } from "../../src/core/engine/result.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

// Split ±5 V rails (rail-to-rail classes, so only timing decides), 1 kHz, peak = window = 2.5 V (k = 1).
const RRIO = {
  supply_max_v: 12,
  icm_neg_headroom_v: -0.1,
  icm_pos_headroom_v: -0.1,
  out_neg_headroom_v: 0.05,
  out_pos_headroom_v: 0.05,
  vos_max_mv: 0.5,
  ib_max_na: 0.01,
};
const catalogue = catalogueFromParts([
  opAmp({ id: "oa-1m-fast-slew", gbw_mhz: 1, slew_v_per_us: 0.5, ...RRIO }),
  opAmp({ id: "oa-1m-slow-slew", gbw_mhz: 1, slew_v_per_us: 0.2, ...RRIO }),
  comparator({ supply_max_v: 12 }),
  // 0.600 V at 1 mA, the current the 2.5 V window drives through stage 1's loads at 7.5 kΩ
  // (its feedback R and the summer's R/2 input: 3·W/R, SPEC §11.2): 2·Vf = 1.2 V.
  diode({ id: "d-0v6", vf_1ma_v: 0.6, vf_10ma_v: 0.7, ir_na: 0.001 }),
]);
const at1k = design({
  signal: { max_frequency_hz: 1000 },
  front_end: { rectifier_load_ohm: 7500 },
  temperature: { min_c: 25, max_c: 25 },
});

function rectifier(): RoleResult {
  const e = evaluateDesign(at1k, catalogue, "rectify-and-sign");
  if (!e.ok) throw new Error(JSON.stringify(e.problems));
  const r = e.result.roles.find((x) => x.role === "rectifier");
  if (!r) throw new Error("no rectifier role");
  return r;
}
const steps = (r: RoleResult, id: string) =>
  Object.fromEntries(
    (r.resultOf(id)?.findings.find((f) => f.rule === "zero-crossing")?.steps ?? []).map((s) => [s.label, s.value]),
  );
const us3 = (s: number | undefined) => Number(((s ?? NaN) * 1e6).toPrecision(3));

describe("rectify-and-sign: the rectifier's dead time (issue 16)", () => {
  it("comes out of the engine to 3 significant figures: 6.97 µs gain-bandwidth limited", () => {
    const s = steps(rectifier(), "oa-1m-fast-slew");
    expect(s["jump = 2·Vf"]).toBeCloseTo(1.2, 12);
    expect(us3(s["dead time"])).toBe(6.97);
    expect(us3(s["slew only jump / SR"])).toBe(2.4);
  });

  it("and 4.05 µs (0.405 V) to the slew limit, 8.03 µs in all, with 0.2 V/µs", () => {
    const s = steps(rectifier(), "oa-1m-slow-slew");
    expect(us3(s["slew onset t₁ = SR / a"])).toBe(4.05);
    expect(us3(s["dead time"])).toBe(8.03);
  });

  it("rejects a rectifier whose gain-bandwidth-limited dead time exceeds the limit, naming both regimes", () => {
    const r = rectifier();
    const f = r.resultOf("oa-1m-fast-slew")?.findings.find((x) => x.rule === "zero-crossing");
    expect(r.resultOf("oa-1m-fast-slew")?.verdict).toBe("fail");
    expect(f?.verdict).toBe("fail");
    expect(f?.reason).toMatch(/gain-bandwidth limited/);
    expect(f?.reason).toMatch(/slew rate \(slew alone would take 2\.40 µs\)/);
    // Clips at 0 V in this topology: off by 2π·1 kHz·2.5 V·6.97 µs = 110 mV, against 25 % of 100 mV.
    expect(f?.reason).toContain("off by up to 110 mV");
    expect(f?.reason).toContain("the limit is 25.0 mV");
  });

  it("puts the error into the budget as the rectifier-dead-time term", () => {
    const e = evaluateDesign({ ...at1k, bom: { rectifier: "oa-1m-fast-slew" } }, catalogue, "rectify-and-sign");
    if (!e.ok) throw new Error("evaluation failed");
    const term = e.result.budget.terms.find((t) => t.name === "rectifier-dead-time");
    const t = Math.sqrt((2 * 1.2) / (2 * Math.PI * 1e6 * 0.5 * 2 * Math.PI * 1000 * 2.5));
    expect(term?.v).toBeCloseTo(2 * Math.PI * 1000 * 2.5 * t, 12);
  });
});
