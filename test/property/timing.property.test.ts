// Properties physics guarantees (issue 16, item 6), over random valid inputs:
// a faster op amp never has a longer dead time (integrator-then-slew, Fiore ch. 5);
// a hotter range never lowers a diode's leakage; a colder range never deepens the
// pumped rail (drops grow as it cools, −2 mV/°C, Sedra & Smith); more supply current
// on the pumped rail never deepens it (droop I/(f·C), Winder).
// The held divider's source-resistance property is in budget.property.test.ts.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { deadTime } from "../../src/core/math/dead-time.ts";
import { railAt } from "../../src/core/math/pump-rail.ts";
import { leakageAt } from "../../src/core/math/temperature.ts";

const pos = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

describe("timing, supply and temperature properties", () => {
  it("a faster part (larger GBW and slew, all else equal) never has a longer dead time", () => {
    fc.assert(
      fc.property(
        pos(1e4, 1e9),
        pos(1e3, 1e9),
        pos(1, 10),
        pos(1, 10),
        pos(0.1, 1),
        pos(1, 1e7),
        pos(0.01, 3),
        (gbw, slew, gbwUp, slewUp, beta, slope, jump) => {
          const base = { beta, input_slope_v_per_s: slope, jump_v: jump };
          const slow = deadTime({ ...base, gbw_hz: gbw, slew_v_per_s: slew }).seconds;
          const fast = deadTime({ ...base, gbw_hz: gbw * gbwUp, slew_v_per_s: slew * slewUp }).seconds;
          expect(fast).toBeLessThanOrEqual(slow * (1 + 1e-12));
        },
      ),
    );
  });

  it("a hotter range never lowers a diode's leakage", () => {
    fc.assert(
      fc.property(
        fc.constantFrom("silicon", "schottky", "low-leakage"),
        pos(0, 1e6),
        pos(-55, 150),
        pos(0, 100),
        (type, ir, t, up) => {
          expect(leakageAt({ type, ir_na: ir }, t + up)).toBeGreaterThanOrEqual(leakageAt({ type, ir_na: ir }, t));
        },
      ),
    );
  });

  const pump = fc.record({
    drive_v: pos(2, 15),
    frequency_hz: pos(100, 1e6),
    flying_cap_f: pos(1e-7, 1e-4),
    reservoir_cap_f: pos(1e-7, 1e-3),
    drive_ohm: pos(0, 50),
    diode: fc.record({ vf_1ma_v: pos(0.15, 0.8), vf_10ma_v: pos(0.15, 1.0) }).filter((d) => d.vf_10ma_v >= d.vf_1ma_v),
    cold_c: pos(-55, 85),
  });

  it("a colder range never deepens the pumped rail", () => {
    fc.assert(
      fc.property(pump, pos(0, 0.05), pos(0, 60), (p, load, colder) => {
        const warm = railAt(p, load).worst_v;
        const cold = railAt({ ...p, cold_c: p.cold_c - colder }, load).worst_v;
        expect(cold).toBeGreaterThanOrEqual(warm - 1e-12);
      }),
    );
  });

  it("more supply current on the pumped rail never deepens it", () => {
    fc.assert(
      fc.property(pump, pos(0, 0.05), pos(0, 0.05), (p, load, more) => {
        expect(railAt(p, load + more).worst_v).toBeGreaterThanOrEqual(railAt(p, load).worst_v - 1e-12);
      }),
    );
  });
});
