// The sign's lateness as a sum of named components (SPEC §11.4). A comparator's
// delay is rated at an overdrive; a ramp of slope S reaches it after V_od/S
// (arithmetic); hysteresis moves the threshold by Vh/2. An op amp as comparator
// follows the integrator-then-slew law (Fiore ch. 5, single-pole model).
import { describe, expect, it } from "vitest";
import { deadTime } from "../../../src/core/math/dead-time.ts";
import {
  ASSUMED_OVERDRIVE_V,
  comparatorDelay,
  opAmpComparatorDelay,
  sumDelay,
} from "../../../src/core/math/late-sign.ts";

const S = 2 * Math.PI * 1000 * 2.5; // 15 708 V/s

describe("comparatorDelay", () => {
  it("450 ns at 5 mV overdrive, 4 mV hysteresis, 1 kHz on ±2.5 V: 450 ns + 318.3 ns + 127.3 ns", () => {
    const { delay, overdrive_assumed } = comparatorDelay({
      tpd_s: 450e-9,
      overdrive_v: 5e-3,
      hysteresis_v: 4e-3,
      input_slope_v_per_s: S,
    });
    expect(overdrive_assumed).toBe(false);
    expect(delay.components.map((c) => c.name)).toEqual(["propagation", "overdrive", "hysteresis"]);
    expect(delay.components[1]!.seconds * 1e9).toBeCloseTo(318.31, 2);
    expect(delay.components[2]!.seconds * 1e9).toBeCloseTo(127.32, 2);
    expect(delay.seconds * 1e9).toBeCloseTo(895.63, 2);
    // Hysteresis is a threshold shift the dead band counts (Vh/k): left out of the budget time.
    expect(delay.budget_seconds * 1e9).toBeCloseTo(768.31, 2);
  });

  it("without a stated overdrive it takes the common-practice 100 mV and says so", () => {
    const { delay, overdrive_assumed } = comparatorDelay({
      tpd_s: 1e-6,
      overdrive_v: undefined,
      hysteresis_v: 0,
      input_slope_v_per_s: S,
    });
    expect(overdrive_assumed).toBe(true);
    expect(delay.components).toHaveLength(2);
    expect(delay.components[1]!.seconds).toBeCloseTo(ASSUMED_OVERDRIVE_V / S, 18);
  });
});

describe("opAmpComparatorDelay", () => {
  it("is the dead-time law at β = 1 through the whole output swing", () => {
    const d = opAmpComparatorDelay({ gbw_hz: 1e6, slew_v_per_s: 0.5e6, swing_v: 4.9, input_slope_v_per_s: S });
    const t = deadTime({ gbw_hz: 1e6, slew_v_per_s: 0.5e6, beta: 1, input_slope_v_per_s: S, jump_v: 4.9 });
    expect(d.seconds).toBe(t.seconds);
    // t₁ = 0.5 V/µs / (2π·1 MHz·15 708 V/s) = 5.066 µs, 1.267 V; then 3.633 V at 0.5 V/µs: 12.33 µs in all
    expect(d.seconds * 1e6).toBeCloseTo(12.33, 2);
  });
});

describe("sumDelay", () => {
  it("adds the components another check appends (e.g. a 2.2 µs RC rise, 2.2·R·C textbook)", () => {
    const base = comparatorDelay({ tpd_s: 300e-9, overdrive_v: 10e-3, hysteresis_v: 0, input_slope_v_per_s: S });
    const more = sumDelay([...base.delay.components, { name: "rise-time", seconds: 2.2e-6, formula: "2.2·R·C" }]);
    expect(more.seconds).toBeCloseTo(base.delay.seconds + 2.2e-6, 18);
    expect(more.budget_seconds).toBeCloseTo(more.seconds, 18);
  });
});
