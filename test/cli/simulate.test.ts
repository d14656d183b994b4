// `railsieve simulate` (issue 19 acceptance: the CSV of time, input, each stage's
// output, the code and the reading) and the simulation line of `check`.
import { describe, expect, it } from "vitest";
import { run } from "./run.ts";

const BRIDGE = "data/designs/bridge-10v-5v-adc.json";

describe("railsieve simulate", () => {
  it("--format csv prints time, input, each stage's output, the code and the reading", async () => {
    const { code, out, err } = await run("simulate", BRIDGE, "--format", "csv");
    expect(err).toBe("");
    expect([0, 1]).toContain(code);
    const [header, ...rows] = out.trimEnd().split("\n");
    expect(header).toBe(
      "topology,frequency_hz,time_s,input_v,front_v,buffer_v,rectifier-1_v,rectifier-1.amp_v,rectifier-2_v,sign,code,reading_v,error_v,reference_v",
    );
    // Both frequencies: 200 Hz (the design's highest) and 2 Hz, each at least 513 points of one period.
    const freqs = new Set(rows.map((r) => r.split(",")[1]));
    expect([...freqs]).toEqual(["200", "2"]);
    expect(rows.length).toBeGreaterThanOrEqual(2 * 513);
    for (const r of rows) expect(r.split(",")).toHaveLength(14);
    // The reading is sign·(code + 0.5)·volts_per_code (SPEC §8) on every row, and the error is the
    // reading less the input one shared phase delay earlier (the reference column).
    const first = rows[10]?.split(",").map(Number) ?? [];
    const [, , , , , , , , , sign, c, reading, error, reference] = first;
    expect(reading).toBeCloseTo((sign ?? 0) * ((c ?? 0) + 0.5) * 0.01953125, 6);
    expect(error).toBeCloseTo((reading ?? 0) - (reference ?? 0), 6);
  });

  it("text names the parts, both frequencies and the comparison with the worst case", async () => {
    const { out } = await run("simulate", BRIDGE);
    expect(out).toMatch(/^bridge-10v-5v-adc\ntopology rectify-and-sign with buffer=/);
    expect(out).toMatch(/at 200 Hz: largest error .* rms /);
    expect(out).toMatch(/at 2\.00 Hz: largest error /);
    expect(out).toMatch(/static worst case/);
  });

  it("--part puts a part in a role, as the bom would", async () => {
    const { out } = await run("simulate", BRIDGE, "--part", "buffer=oa-bip-gs-single", "--format", "json");
    const j = JSON.parse(out) as { simulations: { ran: boolean }[] };
    expect(j.simulations[0]?.ran).toBe(true);
    const text = await run("simulate", BRIDGE, "--part", "buffer=oa-bip-gs-single");
    expect(text.out).toContain("buffer=oa-bip-gs-single");
  });

  it.each([
    { args: ["--part", "buffer"], message: "--part needs ROLE=ID (got 'buffer', e.g. --part buffer=oa-bip-gs-single)" },
    { args: ["--part", "buffer=nope"], message: "bom.buffer: names no part in the catalogue (got 'nope'" },
    { args: ["--part", "buffer=d-si-switch"], message: "names a part of the wrong kind (got 'd-si-switch', a diode" },
    { args: ["--format", "xml"], message: "unknown format 'xml' (expected text, json or csv)" },
  ])("refuses $args with exit 2", async ({ args, message }) => {
    const { code, err } = await run("simulate", BRIDGE, ...args);
    expect(code).toBe(2);
    expect(err).toContain(message);
  });

  it("simulates each topology of a design that asks for all", async () => {
    const { out } = await run("simulate", "data/designs/audio-1v5-20k.json", "--format", "csv");
    const topologies = new Set(
      out
        .trimEnd()
        .split("\n")
        .slice(1)
        .map((r) => r.split(",")[0]),
    );
    // At 20 kHz no rectifier fits rectify-and-sign (its dead time, SPEC §11.3), so only the single-rail front ends run.
    expect([...topologies]).toEqual(["offset-to-mid-rail", "gained-level-shift", "difference-to-mid"]);
  });
});

describe("railsieve check", () => {
  it("has one simulation line in text and a simulation block in JSON", async () => {
    const text = await run("check", BRIDGE);
    expect(text.out).toMatch(/\n {2}simulation: largest error [^\n]* at 200 Hz/);
    const json = await run("check", BRIDGE, "--format", "json");
    const d = (JSON.parse(json.out) as { designs: { simulation: Record<string, unknown> }[] }).designs[0];
    expect(d?.simulation).toMatchObject({ ran: true, fast: { frequency_hz: 200 }, slow: { frequency_hz: 2 } });
    expect(typeof d?.simulation["within_worst_case"]).toBe("boolean");
  });
});
