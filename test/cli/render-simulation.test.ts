import { describe, expect, it } from "vitest";
import { simulationCsv, simulationJson, simulationLine, simulationText } from "../../src/cli/render-simulation.ts";
import { reportOf } from "../../src/core/sim/report.ts";
import { runChain, simulateChain } from "../../src/core/sim/simulate.ts";
import { BIPOLAR_AMP, rectifyChain } from "../core/sim/chains.ts";

const chain = rectifyChain({ peak: 10, k: 0.245, amp: { ...BIPOLAR_AMP, out_low_v: -3.58 } });
const run = simulateChain(chain, 200);

describe("simulationLine", () => {
  it("within the worst case", () => {
    expect(simulationLine(reportOf("rectify-and-sign", run, 0.5))).toMatchInlineSnapshot(
      `"simulation: largest error 174 mV at 200 Hz (rms 19.1 mV), 38.1 mV at 2.00 Hz; inside the static worst case 500 mV by 326 mV"`,
    );
  });

  it("beyond it, naming the model to distrust and why", () => {
    expect(simulationLine(reportOf("rectify-and-sign", run, 0.1))).toMatchInlineSnapshot(
      `"simulation: largest error 174 mV at 200 Hz (rms 19.1 mV), 38.1 mV at 2.00 Hz; BEYOND the static worst case 100 mV by 73.6 mV: distrust the budget, which leaves out what happened while rectifier-1 was crossing its diode drops at a zero crossing (dead time)"`,
    );
  });

  it("not run", () => {
    expect(simulationLine({ topology: "x", reason: "no part fits buffer" })).toBe(
      "simulation: not run (no part fits buffer)",
    );
  });
});

describe("simulationText", () => {
  it("reports both frequencies with what happened", () => {
    expect(simulationText("demo", [reportOf("rectify-and-sign", run, 0.5)], ["buffer=oa-x"])).toMatchInlineSnapshot(`
      "demo
      topology rectify-and-sign with buffer=oa-x
        at 200 Hz: largest error 174 mV at 14.8 µs into the period, rms 19.1 mV
          measured against the input 159 ns earlier, the chain's phase delay at this frequency (a fixed latency, not an error)
          then rectifier-1 was crossing its diode drops at a zero crossing (dead time)
          rectifier dead time 13.0 µs at each zero crossing
        at 2.00 Hz: largest error 38.1 mV at 500 ms into the period, rms 15.7 mV
          measured against the input 159 ns earlier, the chain's phase delay at this frequency (a fixed latency, not an error)
          rectifier dead time 131 µs at each zero crossing
        inside the static worst case 500 mV by 326 mV
      "
    `);
  });
});

describe("simulationJson", () => {
  it("carries the numbers and the comparison", () => {
    const j = simulationJson(reportOf("rectify-and-sign", run, 0.5));
    expect(j).toMatchObject({ ran: true, worst_case_v: 0.5, within_worst_case: true, distrust: null });
    expect(simulationJson({ topology: "x", reason: "r" })).toEqual({ ran: false, reason: "r" });
  });
});

describe("simulationCsv", () => {
  it("has a header of time, input, each stage's output, sign, code, reading and error, then one row per point", () => {
    const trace = runChain(chain, { frequency_hz: 200, steps_per_period: 64 });
    const csv = simulationCsv([{ topology: "rectify-and-sign", trace }]);
    const lines = csv.trimEnd().split("\n");
    expect(lines[0]).toBe(
      "topology,frequency_hz,time_s,input_v,front_v,buffer_v,rectifier-1_v,rectifier-1.amp_v,rectifier-2_v,sign,code,reading_v,error_v,reference_v",
    );
    expect(lines.length).toBe(1 + (trace.values[0]?.length ?? 0));
    const first = lines[1]?.split(",") ?? [];
    expect(first[0]).toBe("rectify-and-sign");
    expect(Number(first[2])).toBe(0);
  });
});
