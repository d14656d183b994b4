// zero-crossing (SPEC §11.3): the rectifier's dead time at each crossing, exact
// piecewise (integrator, then slew), from the textbook single-pole model: beyond
// its pole an open-loop op amp is an integrator A(s) ≈ ωt/s, ωt = 2π·GBW
// (T. Fiore, Operational Amplifiers & Linear Integrated Circuits, ch. 5;
// REFERENCES.md "Added for §11–§13"). The 6.97 µs and 4.05 µs / 0.405 V / 8.03 µs
// figures are issue 16's worked numbers from that model. The error is
// 2·2π·f·peak·t against timing_share (25 %) × required_v.
import { describe, expect, it } from "vitest";
import type { OpAmp } from "../../src/core/schemas/op-amp.ts";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";
import { check, expectFinding, reasons, rectifierStage, type RuleCase } from "../helpers/rules.ts";

// 1 kHz, W = peak = 2.5 V (k = 1), 2·Vf = 1.2 V, β = ½ (the rule's default).
const at = (required: number, f = 1000) =>
  design({ signal: { max_frequency_hz: f }, accuracy: { required_v: required } });
const gbwLimited = opAmp({ gbw_mhz: 1, slew_v_per_us: 0.5 }); // 6.97 µs
const slewing = opAmp({ gbw_mhz: 1, slew_v_per_us: 0.2 }); // 4.05 µs to the slew limit, 8.03 µs in all
const rect = rectifierStage({ vf: 0.6 });
// Dead times in double precision from the closed forms (the 3-figure checks are below).
const S = 2 * Math.PI * 1000 * 2.5;
const a = 2 * Math.PI * 1e6 * 0.5 * S;
const tGbw = Math.sqrt((2 * 1.2) / a);
const t1 = 0.2e6 / a;
const tSlew = t1 + (1.2 - (0.2e6 * t1) / 2) / 0.2e6;
const err = (t: number, f = 1000) => 2 * 2 * Math.PI * f * 2.5 * t;

const cases: RuleCase[] = [
  {
    label: "6.97 µs (0.219 V) against 25 % of 2 V",
    run: { part: gbwLimited, stage: rect, design: at(2) },
    expected: { verdict: "pass", needed: 0.5, available: err(tGbw), margin: 0.5 - err(tGbw) },
  },
  {
    label: "6.97 µs (0.219 V) against 25 % of 1 V",
    run: { part: gbwLimited, stage: rect, design: at(1) },
    expected: { verdict: "marginal", needed: 0.25, available: err(tGbw), margin: 0.25 - err(tGbw) },
  },
  {
    label: "gain-bandwidth limited 6.97 µs (0.219 V) against 25 % of 100 mV",
    run: { part: gbwLimited, stage: rect, design: at(0.1) },
    expected: { verdict: "fail", needed: 0.025, available: err(tGbw), margin: 0.025 - err(tGbw) },
  },
  {
    label: "gain-bandwidth then slew, 8.03 µs (0.252 V) against 25 % of 100 mV",
    run: { part: slewing, stage: rect, design: at(0.1) },
    expected: { verdict: "fail", needed: 0.025, available: err(tSlew), margin: 0.025 - err(tSlew) },
  },
  {
    label: "the same where the output clips at 0 V (off by x, not 2x), drops named at the cold end",
    run: {
      part: gbwLimited,
      stage: { ...rect, zero_crossing_error: "clips", zero_crossing_at: "at −20 °C (the cold end)" },
      design: at(0.1),
    },
    expected: { verdict: "fail", needed: 0.025, available: err(tGbw) / 2, margin: 0.025 - err(tGbw) / 2 },
  },
  {
    label: "gain-bandwidth empty",
    run: { part: { ...gbwLimited, gbw_mhz: undefined } as unknown as OpAmp, stage: rect, design: at(0.1) },
    expected: { verdict: "unrated", needed: null, available: null, margin: null },
  },
];

describe("zero-crossing", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("zero-crossing", run), expected));

  it("issue 16's worked numbers come out of the rule to 3 significant figures", () => {
    const steps = (part: OpAmp) =>
      Object.fromEntries(
        check("zero-crossing", { part, stage: rect, design: at(0.1) }).steps.map((s) => [s.label, s.value]),
      );
    const g = steps(gbwLimited);
    expect(Number(((g["dead time"] as number) * 1e6).toPrecision(3))).toBe(6.97);
    expect(Number(((g["slew only jump / SR"] as number) * 1e6).toPrecision(3))).toBe(2.4);
    const s = steps(slewing);
    expect(Number(((s["slew onset t₁ = SR / a"] as number) * 1e6).toPrecision(3))).toBe(4.05);
    expect(Number(((s["dead time"] as number) * 1e6).toPrecision(3))).toBe(8.03);
  });

  it("a stage's own β replaces the default ½ (β = 1 is faster by √2 in the gain-bandwidth regime)", () => {
    const f = check("zero-crossing", { part: gbwLimited, stage: { ...rect, zero_crossing_beta: 1 }, design: at(0.1) });
    expect(f.available).toBeCloseTo(err(tGbw) / Math.SQRT2, 12);
  });

  it("says why, naming both regimes, with the numbers", () => {
    expect(reasons("zero-crossing", cases)).toMatchInlineSnapshot(`
      {
        "6.97 µs (0.219 V) against 25 % of 1 V": "marginal: dead 6.97 µs at each crossing, gain-bandwidth limited: the open-loop output ramps as an integrator and crosses 1.20 V (two diode drops) in 6.97 µs, before its rate reaches the 0.500 V/µs slew rate (slew alone would take 2.40 µs); the reading is off by up to 219 mV (2·2π·f·peak·t: −x for +x); the limit is 250 mV (timing share 25 % of the required accuracy): 30.9 mV to spare",
        "6.97 µs (0.219 V) against 25 % of 2 V": "pass: dead 6.97 µs at each crossing, gain-bandwidth limited: the open-loop output ramps as an integrator and crosses 1.20 V (two diode drops) in 6.97 µs, before its rate reaches the 0.500 V/µs slew rate (slew alone would take 2.40 µs); the reading is off by up to 219 mV (2·2π·f·peak·t: −x for +x); the limit is 500 mV (timing share 25 % of the required accuracy): 281 mV to spare",
        "gain-bandwidth empty": "unrated: not rated: needs 'gbw_mhz', which is empty for this part",
        "gain-bandwidth limited 6.97 µs (0.219 V) against 25 % of 100 mV": "fail: dead 6.97 µs at each crossing, gain-bandwidth limited: the open-loop output ramps as an integrator and crosses 1.20 V (two diode drops) in 6.97 µs, before its rate reaches the 0.500 V/µs slew rate (slew alone would take 2.40 µs); the reading is off by up to 219 mV (2·2π·f·peak·t: −x for +x); the limit is 25.0 mV (timing share 25 % of the required accuracy): 194 mV short",
        "gain-bandwidth then slew, 8.03 µs (0.252 V) against 25 % of 100 mV": "fail: dead 8.03 µs at each crossing, gain-bandwidth, then slew: the open-loop output ramps as an integrator for 4.05 µs (405 mV) until its rate reaches the 0.200 V/µs slew rate, then slews the rest of the 1.20 V (two diode drops): 8.03 µs in all; the reading is off by up to 252 mV (2·2π·f·peak·t: −x for +x); the limit is 25.0 mV (timing share 25 % of the required accuracy): 227 mV short",
        "the same where the output clips at 0 V (off by x, not 2x), drops named at the cold end": "fail: dead 6.97 µs at each crossing, gain-bandwidth limited: the open-loop output ramps as an integrator and crosses 1.20 V (two diode drops at −20 °C (the cold end)) in 6.97 µs, before its rate reaches the 0.500 V/µs slew rate (slew alone would take 2.40 µs); the reading is off by up to 110 mV (2π·f·peak·t: the output would go below 0 V, where the converter reads 0); the limit is 25.0 mV (timing share 25 % of the required accuracy): 84.5 mV short",
      }
    `);
  });
});
