// Dead time of an open-loop op amp at the zero crossing, from the textbook
// single-pole model: beyond its pole the op amp is an integrator A(s) ≈ ωt/s,
// ωt = 2π·GBW (T. Fiore, Operational Amplifiers & Linear Integrated Circuits,
// ch. 5), so an input error growing as β·S·t drives the output along
// v(t) = ωt·β·S·t²/2 (REFERENCES.md, "Added for §11–§13") until its rate meets the
// slew rate. Worked numbers from issue 16, derived from that model.
import { describe, expect, it } from "vitest";
import { crossingError, deadTime, timeForError } from "../../../src/core/math/dead-time.ts";

const threeFigures = (x: number) => Number(x.toPrecision(3));
const S = 2 * Math.PI * 1000 * 2.5; // 1 kHz, W = 2.5 V: 15 708 V/s at the crossing

describe("deadTime (integrator model, Fiore ch. 5; issue 16's worked numbers)", () => {
  it("GBW 1 MHz, β ½, 1 kHz, W 2.5 V, 2·Vf 1.2 V, fast slew: √(2·1.2/(2π·10⁶·½·S)) = 6.97 µs, gain-bandwidth limited", () => {
    const t = deadTime({ gbw_hz: 1e6, slew_v_per_s: 0.5e6, beta: 0.5, input_slope_v_per_s: S, jump_v: 1.2 });
    expect(threeFigures(t.seconds * 1e6)).toBe(6.97);
    expect(t.regime).toBe("gain-bandwidth");
    // The slew-only estimate the old rule used: 1.2 V / 0.5 V/µs = 2.4 µs (issue 16).
    expect(threeFigures(t.slew_only_s * 1e6)).toBe(2.4);
    expect(t.seconds).toBe(t.gbw_only_s);
  });

  it("the same with 0.2 V/µs: the ramp reaches the slew limit after 4.05 µs (0.405 V) and needs 8.03 µs in all", () => {
    const t = deadTime({ gbw_hz: 1e6, slew_v_per_s: 0.2e6, beta: 0.5, input_slope_v_per_s: S, jump_v: 1.2 });
    expect(t.regime).toBe("gain-bandwidth-then-slew");
    expect(threeFigures(t.slew_onset_s * 1e6)).toBe(4.05);
    expect(threeFigures(t.slew_onset_v)).toBe(0.405);
    expect(threeFigures(t.seconds * 1e6)).toBe(8.03);
    // Exactly t₁ + (ΔV − SR·t₁/2)/SR.
    expect(t.seconds).toBeCloseTo(t.slew_onset_s + (1.2 - t.slew_onset_v) / 0.2e6, 15);
  });

  it("is continuous where the two regimes meet (ΔV = v(t₁))", () => {
    const base = { gbw_hz: 1e6, slew_v_per_s: 0.2e6, beta: 0.5, input_slope_v_per_s: S };
    const onset = deadTime({ ...base, jump_v: 1 }).slew_onset_v;
    const below = deadTime({ ...base, jump_v: onset * (1 - 1e-12) });
    const above = deadTime({ ...base, jump_v: onset * (1 + 1e-12) });
    expect(below.regime).toBe("gain-bandwidth");
    expect(above.regime).toBe("gain-bandwidth-then-slew");
    expect(above.seconds).toBeCloseTo(below.seconds, 15);
  });

  it("an unlimited slew rate leaves the pure integrator time, t = √(2ΔV/(ωt·β·S))", () => {
    const t = deadTime({ gbw_hz: 3e6, slew_v_per_s: Infinity, beta: 1, input_slope_v_per_s: 1000, jump_v: 0.5 });
    expect(t.seconds).toBeCloseTo(Math.sqrt((2 * 0.5) / (2 * Math.PI * 3e6 * 1000)), 18);
  });
});

describe("crossingError (SPEC §11.3–§11.4: the reading is −x instead of +x while late)", () => {
  it("at the allowed 1 % of the period, a ±10 V, 1 kHz design is off by 1.26 V (issue 16)", () => {
    expect(threeFigures(crossingError(1000, 10, 0.01 / 1000))).toBe(1.26);
  });

  it("is half that where the output clips at 0 V instead of inverting", () => {
    expect(crossingError(1000, 10, 1e-5, "clips")).toBeCloseTo(crossingError(1000, 10, 1e-5) / 2, 15);
  });

  it("timeForError inverts it: 2·2π·200 Hz·10 V·t = 25 mV → t = 0.995 µs", () => {
    const t = timeForError(200, 10, 0.025);
    expect(threeFigures(t * 1e6)).toBe(0.995);
    expect(crossingError(200, 10, t)).toBeCloseTo(0.025, 15);
  });
});
