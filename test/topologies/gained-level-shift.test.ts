// gained-level-shift (SPEC §12.1, issue 17 acceptance): Millman's node (Proc. IRE 28(9), 1940)
// times a non-inverting gain 1 + Rf/Rg (textbook). A ±0.2 V, 500 Hz signal into a 1.8 V,
// 12-bit converter with no negative rail must span at least 80 % of the codes.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";

// A rail-to-rail CMOS class with a small offset (values invented for the test).
const rrio = {
  icm_neg_headroom_v: -0.1,
  icm_pos_headroom_v: -0.1,
  out_neg_headroom_v: 0.005,
  out_pos_headroom_v: 0.005,
};
const CATALOGUE = catalogueFromParts([
  opAmp({
    id: "oa-rrio-fast",
    ...rrio,
    supply_min_v: 1.8,
    supply_max_v: 5.5,
    vos_max_mv: 0.05,
    ib_max_na: 0.001,
    gbw_mhz: 10,
    slew_v_per_us: 5,
  }),
  // Ground-sensing bipolar: its output stops 20 mV above ground but its offset is 7 mV.
  opAmp({ id: "oa-gs", supply_min_v: 3, supply_max_v: 32 }),
]);

const small = design({
  topology: "gained-level-shift",
  supply: { positive_v: 3.3, negative: { kind: "ground" } },
  signal: { peak_v: 0.2, max_frequency_hz: 500, source_ohm: 0 },
  front_end: { window_v: 0.9, divider_total_ohm: 10e3, resistor_tolerance: 0.001, series: "E24" },
  adc: { bits: 12, reference_v: 1.8, reference_tolerance: 0.001 },
  accuracy: { required_v: 0.002 },
});

describe("gained-level-shift", () => {
  const e = evaluateDesign(small, CATALOGUE);
  if (!e.ok) throw new Error(JSON.stringify(e.problems));
  const r = e.result;
  const rows = Object.fromEntries(r.display.flatMap((g) => g.rows.map((row) => [row.label, row.value])));

  it("acceptance: the signal spans at least 80 % of the codes, inside the 0.1 V margins", () => {
    const span = r.budget.codes_spanned_bits - 12;
    // effective bits = N + log2(span / V_ref): 80 % of the codes is N − 0.322.
    expect(span).toBeGreaterThanOrEqual(Math.log2(0.8));
    const [low, high] = (rows["Output span for ±peak"] ?? "").split(" … ").map((v) => Number.parseFloat(v));
    expect(low).toBeGreaterThanOrEqual(0.1);
    expect(high).toBeLessThanOrEqual(1.7);
  });

  it("names the gain resistors and the network from the E24 series", () => {
    expect(rows["Rf, output to inverting input"]).toMatch(/^\d+(\.\d+)? kΩ$/);
    expect(rows["Rg, inverting input to ground"]).toMatch(/^\d+(\.\d+)? kΩ$/);
    expect(rows["R3 to ground"]).toMatch(/Ω$/);
    // Overall gain near (0.9 − 0.1)/0.2 = 4 (what fills the range), never above it.
    const a = Number(rows["Overall gain A = Gs · a"]);
    expect(a).toBeGreaterThan(3.6);
    expect(a).toBeLessThanOrEqual(4);
  });

  it("quantization is half a step divided by the overall gain", () => {
    const q = r.budget.terms.find((t) => t.name === "quantization");
    expect(q?.v).toBeCloseTo((0.5 * 1.8) / 4096 / r.derived.ratio, 12);
  });

  it("the gain stage sits near ground: the low-offset rail-to-rail class fits, the 7 mV ground-sensing one does not", () => {
    const role = r.roles.find((x) => x.role === "gain-stage");
    expect(role?.fits.map((p) => p.part.id)).toEqual(["oa-rrio-fast"]);
    const gs = role?.resultOf("oa-gs");
    expect(gs?.verdict).toBe("fail");
    expect(gs?.findings.find((f) => f.rule === "offset")?.verdict).toBe("fail");
  });

  it("without converter fields the drive is unrated and the page says what to fill in", () => {
    expect(rows["Settling to ½ LSB"]).toBe("unrated: fill in adc.sample_cap_f, adc.switch_ohm, adc.acquisition_s");
    expect(rows["Input fault"]).toBe("unrated: fill in signal.fault_v (and front_end.protection_ohm)");
    expect(r.roles[0]?.rules).not.toContain("adc-settling");
  });

  it("a differential design is refused with the field to change", () => {
    const d = design({
      topology: "gained-level-shift",
      signal: { kind: "differential", common_mode_min_v: 1, common_mode_max_v: 2 },
    });
    const x = evaluateDesign(d, CATALOGUE);
    expect(x.ok).toBe(false);
    if (!x.ok) expect(x.problems[0]?.path).toBe("signal.kind");
  });

  it("compared with all, every single-ended topology is weighed and the reason names the runner-up", () => {
    const all = evaluateDesign({ ...small, topology: "all" }, CATALOGUE);
    if (!all.ok) throw new Error("all failed");
    const c = all.result.comparison;
    expect(c?.rows.map((x) => x.topology).sort()).toEqual(
      ["difference-to-mid", "gained-level-shift", "offset-to-mid-rail", "rectify-and-sign"].sort(),
    );
    expect(c?.reason).toMatch(/while|both|as good/);
  });
});
