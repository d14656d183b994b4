// Topology "all" on the demo data: the comparison and its recommendation.
import { describe, expect, it } from "vitest";
import { evaluateDesign } from "../../../src/engine.ts";
import { loadDataSet } from "../../../src/node/load-data.ts";

const data = loadDataSet("data");
const audio = data.designs.find((d) => d.design?.id === "audio-1v5-20k")?.design;

describe("comparison of both topologies", () => {
  it("the audio demo design: at 20 kHz the rectifier's dead time rules out rectify-and-sign, and offset-to-mid-rail is recommended", () => {
    expect(audio).toBeDefined();
    if (!audio) return;
    const e = evaluateDesign(audio, data.catalogue);
    expect(e.ok).toBe(true);
    if (!e.ok) return;
    const c = e.result.comparison;
    expect(c?.recommended).toBe("offset-to-mid-rail");
    const byTopology = Object.fromEntries((c?.rows ?? []).map((r) => [r.topology, r]));
    expect(byTopology["offset-to-mid-rail"]?.budget_verdict).toBe("pass");
    // SPEC §11.3: the integrator-then-slew dead time at 20 kHz costs far more than the 40 mV required.
    expect(byTopology["rectify-and-sign"]?.budget_verdict).toBe("fail");
    expect(byTopology["rectify-and-sign"]?.dominant).toBe("rectifier-dead-time");
    expect(e.result.topology).toBe("offset-to-mid-rail");
  });

  it("every design evaluates in either topology with a complete budget object", () => {
    for (const f of data.designs) {
      if (!f.design) continue;
      for (const t of ["rectify-and-sign", "offset-to-mid-rail"] as const) {
        const e = evaluateDesign(f.design, data.catalogue, t);
        expect(e.ok, `${f.design.id} as ${t}`).toBe(true);
        if (!e.ok) continue;
        const b = e.result.budget;
        expect(Number.isFinite(b.worst_case_v) && Number.isFinite(b.rss_v)).toBe(true);
        expect(b.rss_v).toBeLessThanOrEqual(b.worst_case_v + 1e-15);
        expect(["pass", "marginal", "fail"]).toContain(b.verdict);
        expect(e.result.conversion.volts_per_code).toBeCloseTo(
          f.design.adc.reference_v / 2 ** f.design.adc.bits / e.result.derived.ratio,
          12,
        );
      }
    }
  });

  it("offset-to-mid-rail conversion puts zero input at mid-code", () => {
    const d = data.designs.find((x) => x.design?.id === "bridge-10v-5v-adc")?.design;
    if (!d) throw new Error("demo design missing");
    const e = evaluateDesign(d, data.catalogue, "offset-to-mid-rail");
    if (!e.ok) throw new Error("evaluation failed");
    const { volts_per_code, offset_v } = e.result.conversion;
    const n = e.result.derived.level_shift;
    if (!n) throw new Error("no network");
    // The ADC reads b volts at zero input: code = b / (V_ref / 2^N); reading = code·vpc − b/a = 0.
    const code = n.offset_v / (d.adc.reference_v / 2 ** d.adc.bits);
    expect(code * volts_per_code - offset_v).toBeCloseTo(0, 9);
  });
});
