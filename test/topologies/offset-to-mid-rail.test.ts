// offset-to-mid-rail with a real source (SPEC §11.1): the source's resistance sits in
// series with R1 (Thevenin), so the network's gain and zero are those of R1 + Rs.
// An engineer's hand check of a 10 MΩ probe found the old model (R1 alone) off by
// −83 % in gain and 2.08 V at zero while its budget said 4.6 mV: a wrong pass.
import { describe, expect, it } from "vitest";
import { evaluateDesign } from "../../src/engine.ts";
import { simulateDesign } from "../../src/simulation.ts";
import { loadDataSet } from "../../src/node/load-data.ts";
import { design } from "../helpers/designs.ts";

const demo = loadDataSet("data");
const probe = demo.designs.find((d) => d.design?.id === "probe-0v5-10meg")?.design;

describe("offset-to-mid-rail counts the source in R1", () => {
  it("reads a 10 MΩ probe through R1 + Rs: a and b from Millman's node with the source in the signal branch", () => {
    if (!probe) throw new Error("demo design probe-0v5-10meg is missing");
    const e = evaluateDesign({ ...probe, topology: "offset-to-mid-rail" }, demo.catalogue);
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    const r = e.result;
    const n = r.derived.level_shift;
    if (!n) throw new Error("no level-shift network");
    expect(n.source_ohm).toBe(probe.signal.source_ohm);
    // Millman (Proc. IRE 28(9), 1940): node = (Vin/(R1+Rs) + Vref/R2)/(1/(R1+Rs) + 1/R2 + 1/R3).
    const g1 = 1 / (n.r1_ohm + probe.signal.source_ohm);
    const den = g1 + 1 / n.r2_ohm + (n.r3_ohm === null ? 0 : 1 / n.r3_ohm);
    expect(n.gain).toBeCloseTo(g1 / den, 12);
    expect(n.offset_v).toBeCloseTo(probe.adc.reference_v / n.r2_ohm / den, 12);
    // The firmware constant follows: volts per code = (Vref/2^N)/a.
    expect(r.conversion?.volts_per_code).toBeCloseTo(probe.adc.reference_v / 2 ** probe.adc.bits / n.gain, 12);
    // And the simulated circuit (which has always had Rs in series) now agrees with the budget.
    const sim = simulateDesign(r, demo.catalogue);
    if (!sim.ran) throw new Error(sim.reason);
    expect(sim.report.comparison?.within).toBe(true);
  });

  it("adds a source-tolerance term split into gain and zero when signal.source_tolerance is given", () => {
    const d = design({
      topology: "offset-to-mid-rail",
      supply: { positive_v: 5, negative: { kind: "ground" } },
      signal: { peak_v: 1.5, max_frequency_hz: 100, source_ohm: 600, source_tolerance: 0.1 },
      front_end: { window_v: 1, divider_total_ohm: 10e3, resistor_tolerance: 0.001, series: "E24" },
      adc: { bits: 12, reference_v: 2.5, reference_tolerance: 0.001 },
      accuracy: { required_v: 0.05 },
    });
    const e = evaluateDesign(d, demo.catalogue);
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    const r = e.result;
    const names = r.budget.terms.map((t) => t.name);
    expect(names).toEqual(expect.arrayContaining(["network-ratio", "network-zero", "source-resistance-network"]));
    const src = r.budget.terms.find((t) => t.name === "source-resistance-network");
    // A zero shift is in it, so a one-point gain calibration does not remove it.
    expect(src?.removed_by).toBe("two-point");
    expect(src?.v).toBeGreaterThan(0);
  });
});

describe("signal.source_tolerance gives a budget term on every front end with a source in its network (SPEC §11.1)", () => {
  it.each([
    { topology: "offset-to-mid-rail", name: "source-resistance-network" },
    { topology: "gained-level-shift", name: "source-resistance-network" },
    { topology: "difference-to-mid", name: "source-resistance-legs" },
  ] as const)("$topology: $name, present with the tolerance and absent without it", ({ topology, name }) => {
    const base = {
      topology,
      supply: { positive_v: 5, negative: { kind: "ground" as const } },
      front_end: { window_v: 1, divider_total_ohm: 10e3, resistor_tolerance: 0.001, series: "E24" as const },
      adc: { bits: 12, reference_v: 2.5, reference_tolerance: 0.001 },
      accuracy: { required_v: 0.05 },
    };
    const term = (tolerance?: number) => {
      const d = design({
        ...base,
        signal: {
          peak_v: 1,
          max_frequency_hz: 100,
          source_ohm: 1000,
          ...(tolerance === undefined ? {} : { source_tolerance: tolerance }),
        },
      });
      const e = evaluateDesign(d, demo.catalogue);
      if (!e.ok) throw new Error(JSON.stringify(e.problems));
      return e.result.budget.terms.find((t) => t.name === name);
    };
    expect(term()).toBeUndefined();
    expect(term(0.1)?.v).toBeGreaterThan(0);
    // Ten times the tolerance, about ten times the term (first order in Rs·t).
    const ratio = (term(0.1)?.v ?? 0) / (term(0.01)?.v ?? 1);
    expect(ratio).toBeGreaterThan(9);
    expect(ratio).toBeLessThan(11);
  });
});
