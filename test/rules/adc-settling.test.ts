// adc-settling (SPEC §12.3): a first-order step settles to ½ LSB of N bits in
// (N+1)·ln2 time constants (e^(−t/τ) = 2^−(N+1), textbook settling arithmetic:
// 9.011 τ at 12 bits, 7.625 τ at 10 bits); the op amp's closed-loop pole is
// noise gain/(2π·GBW) (single-pole op amp, Franco ch. 6 [M]); charge sharing by
// Q = C·V; the time constants add (Elmore 1948, the sum bounds the slowest pole).
import { describe, expect, it } from "vitest";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";
import { bufferStage, check, expectFinding, GROUND_5V, reasons, type RuleCase } from "../helpers/rules.ts";

const LN2 = Math.LN2;
const tauAmp = (gbwMhz: number, noiseGain = 1) => noiseGain / (2 * Math.PI * gbwMhz * 1e6);
const adc = (bits: number, extra: Record<string, number> = {}) =>
  design({
    front_end: { window_v: 0.8 },
    adc: { bits, reference_v: 1.8, sample_cap_f: 10e-12, switch_ohm: 1e3, acquisition_s: 200e-9, ...extra },
  });
const run = (gbw: number, d = adc(12)) => ({
  part: opAmp({ gbw_mhz: gbw }),
  stage: bufferStage(),
  design: d,
  rails: GROUND_5V,
});

const need = (n: number, tau: number) => n * tau;
const at12 = 13 * LN2; // 9.011 τ
const at10 = 11 * LN2; // 7.625 τ

// The converter: 10 pF through 1 kΩ = 10 ns, 200 ns acquisition.
const slow = need(at12, tauAmp(1) + 10e-9);
const fast = need(at12, tauAmp(100) + 10e-9);
const edge = need(at12, tauAmp(16) + 10e-9);
const ten = need(at10, tauAmp(100) + 10e-9);
// 100 Ω and 1 nF at the pin: the step shrinks to V_ref·10p/1010p, τ gains 100 Ω × 1.01 nF.
const pinN = at12 + Math.log(10e-12 / 1010e-12);
const pin = need(pinN, tauAmp(100) + 100 * 1010e-12 + 10e-9);

const cases: RuleCase[] = [
  {
    label: "acceptance: a 1 MHz follower cannot settle 10 pF through 1 kΩ in 200 ns at 12 bits",
    run: run(1),
    expected: { verdict: "fail", needed: 200e-9, available: slow, margin: 200e-9 - slow },
  },
  {
    label: "a 100 MHz follower settles in 104 ns",
    run: run(100),
    expected: { verdict: "pass", needed: 200e-9, available: fast, margin: 200e-9 - fast },
  },
  {
    label: "16 MHz settles with less than a fifth of the time to spare",
    run: run(16),
    expected: { verdict: "marginal", needed: 200e-9, available: edge, margin: 200e-9 - edge },
  },
  {
    label: "10 bits need 7.625 τ",
    run: run(100, adc(10)),
    expected: { verdict: "pass", needed: 200e-9, available: ten, margin: 200e-9 - ten },
  },
  {
    label: "an RC at the pin: smaller step, slower recovery",
    run: run(100, adc(12, { pin_r_ohm: 100, pin_c_f: 1e-9, acquisition_s: 1e-6 })),
    expected: { verdict: "pass", needed: 1e-6, available: pin, margin: 1e-6 - pin },
  },
];

describe("adc-settling", () => {
  it.each(cases)("$label", ({ run: r, expected }) => expectFinding(check("adc-settling", r), expected));

  it("the issue's figures: 9.011 τ at 12 bits, 7.625 τ at 10", () => {
    expect(at12).toBeCloseTo(9.011, 3);
    expect(at10).toBeCloseTo(7.625, 3);
    // 1 MHz at unity gain: τ = 159.2 ns, plus 10 ns: 1.524 µs needed against 200 ns.
    expect(slow).toBeCloseTo(1.5243e-6, 9);
  });

  it("says why, with the number of time constants", () => {
    expect(reasons("adc-settling", cases)).toMatchInlineSnapshot(`
      {
        "10 bits need 7.625 τ": "pass: needs 7.625 τ to settle to ½ LSB (879 µV) at 10 bits, with τ = 1.59 ns (GBW ÷ noise gain 1) + 10.0 ns (switch 1.00 kΩ × 10.0 pF) = 11.6 ns: 88.4 ns; the acquisition time 200 ns is 17.254 τ: 112 ns to spare",
        "16 MHz settles with less than a fifth of the time to spare": "marginal: needs 9.011 τ to settle to ½ LSB (220 µV) at 12 bits, with τ = 9.95 ns (GBW ÷ noise gain 1) + 10.0 ns (switch 1.00 kΩ × 10.0 pF) = 19.9 ns: 180 ns; the acquisition time 200 ns is 10.026 τ: 20.3 ns to spare",
        "a 100 MHz follower settles in 104 ns": "pass: needs 9.011 τ to settle to ½ LSB (220 µV) at 12 bits, with τ = 1.59 ns (GBW ÷ noise gain 1) + 10.0 ns (switch 1.00 kΩ × 10.0 pF) = 11.6 ns: 104 ns; the acquisition time 200 ns is 17.254 τ: 95.5 ns to spare",
        "acceptance: a 1 MHz follower cannot settle 10 pF through 1 kΩ in 200 ns at 12 bits": "fail: needs 9.011 τ to settle to ½ LSB (220 µV) at 12 bits, with τ = 159 ns (GBW ÷ noise gain 1) + 10.0 ns (switch 1.00 kΩ × 10.0 pF) = 169 ns: 1.52 µs; the acquisition time 200 ns is 1.182 τ: 1.32 µs short",
        "an RC at the pin: smaller step, slower recovery": "pass: needs 4.396 τ to settle to ½ LSB (220 µV) at 12 bits after the pin capacitor shares its charge (17.8 mV step), with τ = 1.59 ns (GBW ÷ noise gain 1) + 111 ns (R_pin 100 Ω × 1.01 nF + switch 1.00 kΩ × 10.0 pF) = 113 ns: 495 ns; the acquisition time 1.00 µs is 8.882 τ: 505 ns to spare",
      }
    `);
  });
});
