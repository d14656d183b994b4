// First-order RC step response v(t) = V_f − (V_f − V_0)·e^(−t/RC) (textbook; e.g. Sedra &
// Smith, Microelectronic Circuits, single-time-constant networks [M for the section]):
// 10–90 % rise = RC·ln 9 = 2.1972·RC, the "2.2·RC" of the textbooks.
import { describe, expect, it } from "vitest";
import { pullUpEdge, riseTime1090, RISE_1090_PER_RC, timeToThreshold } from "../../../src/core/math/rc-edge.ts";

describe("riseTime1090 (textbook 2.2·RC)", () => {
  it("is ln 9 = 2.1972 time constants", () => {
    expect(RISE_1090_PER_RC).toBeCloseTo(2.19722, 5);
  });

  it.each([
    // R, C, rise (s): 100 kΩ × 10 pF is the case, 2.2 µs to two figures
    [100e3, 10e-12, 2.19722e-6],
    [10e3, 10e-12, 219.722e-9],
    [4.7e3, 50e-12, 516.347e-9],
  ])("%d Ω into %d F rises in %d s", (r, c, t) => {
    expect(riseTime1090(r, c)).toBeCloseTo(t, 11);
  });

  it("100 kΩ into 10 pF rounds to 2.2 µs", () => {
    expect(Number((riseTime1090(100e3, 10e-12) * 1e6).toFixed(1))).toBe(2.2);
  });
});

describe("timeToThreshold (RC·ln((V_f − V_0)/(V_f − V_th)))", () => {
  it("one time constant reaches 1 − 1/e = 63.21 % of the step (pure arithmetic)", () => {
    expect(timeToThreshold(1e3, 1e-9, 0, 1, 1 - Math.exp(-1))).toBeCloseTo(1e-6, 15);
  });

  it("0 → 3.3 V reaches the LVCMOS V_IH of 2.0 V (JESD8C.01 [M]) in RC·ln(3.3/1.3) = 0.93156·RC", () => {
    expect(timeToThreshold(1, 1, 0, 3.3, 2.0)).toBeCloseTo(0.931558, 6);
  });

  it("is 0 when the edge starts past the threshold and Infinity when it never gets there", () => {
    expect(timeToThreshold(1e3, 1e-9, 3, 5, 2)).toBe(0);
    expect(timeToThreshold(1e3, 1e-9, 0, 5, 5)).toBe(Infinity);
  });
});

describe("pullUpEdge", () => {
  it("is the 10–90 % rise when the threshold comes sooner", () => {
    const e = pullUpEdge(100e3, 10e-12, 0, 5, 3.5);
    expect(e.seconds).toBeCloseTo(2.19722e-6, 11);
    expect(e.threshold_s).toBeCloseTo(1e-6 * Math.log(5 / 1.5), 12);
  });

  it("is the threshold time when the edge starts far below ground (−4.5 V towards 5 V, V_IH 4.5 V)", () => {
    // ln(9.5/0.5) = 2.9444 time constants, later than the 2.1972 of the 10–90 % rise
    expect(pullUpEdge(100e3, 10e-12, -4.5, 5, 4.5).seconds).toBeCloseTo(2.94444e-6, 10);
  });
});
