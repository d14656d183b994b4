// bandwidth (SPEC §7): fc = gbw / noise_gain; error = (1 − 1/√(1 + (f/fc)²)) · peak_v;
// limit speed_share · A. Reference values (T. Fiore, Operational Amplifiers & Linear
// Integrated Circuits, ch. 5, single-pole response): error 0.1 % at f/fc = 0.044755,
// 1 % at 0.14249; a 1 MHz follower is 0.1 % low at 44.755 kHz, at noise gain 2 at 22.377 kHz.
import { describe, expect, it } from "vitest";
import { singlePoleError } from "../../rules/bandwidth.ts";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";
import { bufferStage, check, expectFinding, reasons, rectifierStage, type RuleCase } from "../helpers/rules.ts";

/** Written out from the formula, independent of the rule's cancellation-safe form. */
const gainError = (f: number, fc: number) => 1 - 1 / Math.sqrt(1 + (f / fc) ** 2);
const at = (f: number, required_v: number) => design({ signal: { max_frequency_hz: f }, accuracy: { required_v } });
const oneMHz = opAmp({ gbw_mhz: 1 });
// 10 V peak into a 2.5 V window: the error scales with the 10 V the input carries.
const buffer10 = bufferStage({ w: 2.5, k: 0.25, peak: 10 });
const err = (f: number, fc: number) => 10 * gainError(f, fc);

const cases: RuleCase[] = [
  {
    label: "1 MHz follower at 44.755 kHz: 0.1 % of 10 V = 10 mV against 25 mV",
    run: { part: oneMHz, stage: buffer10, design: at(44755, 0.1) },
    expected: { verdict: "pass", needed: 0.025, available: err(44755, 1e6), margin: 0.025 - err(44755, 1e6) },
  },
  {
    label: "the same 10 mV against an 11 mV limit",
    run: { part: oneMHz, stage: buffer10, design: at(44755, 0.044) },
    expected: { verdict: "marginal", needed: 0.011, available: err(44755, 1e6), margin: 0.011 - err(44755, 1e6) },
  },
  {
    label: "1 MHz follower at 142.49 kHz: 1 % of 10 V = 100 mV against 25 mV",
    run: { part: oneMHz, stage: buffer10, design: at(142490, 0.1) },
    expected: { verdict: "fail", needed: 0.025, available: err(142490, 1e6), margin: 0.025 - err(142490, 1e6) },
  },
  {
    label: "rectifier (noise gain 2) with 1 MHz at 22.377 kHz: fc = 500 kHz, 0.1 %",
    run: { part: oneMHz, stage: rectifierStage({ w: 2.5, k: 0.25, peak: 10 }), design: at(22377, 0.1) },
    expected: { verdict: "pass", needed: 0.025, available: err(22377, 5e5), margin: 0.025 - err(22377, 5e5) },
  },
];

describe("bandwidth", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("bandwidth", run), expected));

  it("the reference points give 10 mV and 100 mV of error on a 10 V peak", () => {
    expect(check("bandwidth", cases[0]?.run ?? ({} as never)).available).toBeCloseTo(0.01, 6);
    expect(check("bandwidth", cases[2]?.run ?? ({} as never)).available).toBeCloseTo(0.1, 5);
    expect(check("bandwidth", cases[3]?.run ?? ({} as never)).available).toBeCloseTo(0.01, 6);
  });

  it("says why, with the numbers", () => {
    expect(reasons("bandwidth", cases)).toMatchInlineSnapshot(`
      {
        "1 MHz follower at 142.49 kHz: 1 % of 10 V = 100 mV against 25 mV": "fail: at 142 kHz with fc = 1.00 MHz (GBW 1.00 MHz ÷ noise gain 1) the gain falls short by 100 mV of the 10.0 V peak; the limit is 25.0 mV: 75.0 mV short",
        "1 MHz follower at 44.755 kHz: 0.1 % of 10 V = 10 mV against 25 mV": "pass: at 44.8 kHz with fc = 1.00 MHz (GBW 1.00 MHz ÷ noise gain 1) the gain falls short by 10.0 mV of the 10.0 V peak; the limit is 25.0 mV: 15.0 mV to spare",
        "rectifier (noise gain 2) with 1 MHz at 22.377 kHz: fc = 500 kHz, 0.1 %": "pass: at 22.4 kHz with fc = 500 kHz (GBW 1.00 MHz ÷ noise gain 2) the gain falls short by 10.0 mV of the 10.0 V peak; the limit is 25.0 mV: 15.0 mV to spare",
        "the same 10 mV against an 11 mV limit": "marginal: at 44.8 kHz with fc = 1.00 MHz (GBW 1.00 MHz ÷ noise gain 1) the gain falls short by 10.0 mV of the 10.0 V peak; the limit is 11.0 mV: 1.00 mV to spare",
      }
    `);
  });
});

describe("singlePoleError (|H| = 1/√(1+(f/fc)²))", () => {
  it.each([
    [0.044755, 1e-3, 5],
    [0.14249, 1e-2, 4],
    [1, 1 - Math.SQRT1_2, 13],
    [0.5, 1 - 1 / Math.sqrt(1.25), 13],
  ])("at f/fc = %d the gain is low by %d", (ratio, error, digits) => {
    expect(singlePoleError(ratio, 1)).toBeCloseTo(error, digits + 2);
    expect(singlePoleError(ratio * 1e6, 1e6)).toBeCloseTo(error, digits + 2);
  });

  it("keeps tiny errors instead of cancelling them to zero (x²/2 for small x)", () => {
    expect(gainError(1e-9, 1)).toBe(0); // the naive form loses it
    expect(singlePoleError(1e-9, 1)).toBeCloseTo(5e-19, 30);
    expect(singlePoleError(1, 1e6)).toBeCloseTo(5e-13, 24);
  });

  it("is 0 at DC and tends to 1 far above fc", () => {
    expect(singlePoleError(0, 1e6)).toBe(0);
    expect(singlePoleError(1e12, 1)).toBeCloseTo(1, 11);
  });
});
