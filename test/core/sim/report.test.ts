import { describe, expect, it } from "vitest";
import { compareWithBudget, describeConditions, reportOf } from "../../../src/core/sim/report.ts";
import { simulateChain } from "../../../src/core/sim/simulate.ts";
import { BIPOLAR_AMP, rectifyChain } from "./chains.ts";

const run = simulateChain(rectifyChain({ peak: 10, k: 0.245, amp: { ...BIPOLAR_AMP, out_low_v: -3.58 } }), 200);

describe("compareWithBudget", () => {
  it("is within when the worst case covers the larger of the two runs, with the margin", () => {
    const c = compareWithBudget(run, 0.5);
    expect(c?.within).toBe(true);
    expect(c?.simulated_v).toBe(Math.max(run.fast.max_error_v, run.slow.max_error_v));
    expect(c?.margin_v).toBeCloseTo(0.5 - (c?.simulated_v ?? 0), 15);
    expect(c?.distrust).toBeNull();
  });

  it("distrusts the budget by the excess, naming what the chain was doing", () => {
    const c = compareWithBudget(run, 0.1);
    expect(c?.within).toBe(false);
    expect(c?.distrust?.model).toBe("budget");
    expect(c?.distrust?.by_v).toBeCloseTo(run.fast.max_error_v - 0.1, 15);
    expect(c?.distrust?.because).toEqual([{ stage: "rectifier-1", state: "dead-time" }]);
  });

  it("has nothing to compare with when there is no worst case", () => {
    expect(compareWithBudget(run, null)).toBeNull();
  });
});

describe("reportOf", () => {
  it("summarizes both runs: dead time of the rectifier, no slewing, no clipping", () => {
    const r = reportOf("rectify-and-sign", run, 0.5);
    expect(r.fast.frequency_hz).toBe(200);
    expect(r.slow.frequency_hz).toBe(2);
    // Dead time ∝ 1/√f (SPEC §11.3): a hundredth of the frequency, ten times as long.
    expect((r.slow.dead_time_s ?? 0) / (r.fast.dead_time_s ?? 1)).toBeCloseTo(10, 1);
    expect(r.fast.slewing).toEqual([]);
    expect(r.fast.clipped).toEqual([]);
  });
});

describe("describeConditions", () => {
  it("words each condition", () => {
    expect(
      describeConditions([
        { stage: "rectifier-1", state: "dead-time" },
        { stage: "sign", state: "sign-wrong" },
        { stage: "rectifier-2", state: "slewing" },
        { stage: "buffer", state: "clipped" },
      ]),
    ).toMatchInlineSnapshot(
      `"rectifier-1 was crossing its diode drops at a zero crossing (dead time); sign had not yet switched (the sign was wrong); rectifier-2 was slewing; buffer was pinned at its output swing limit"`,
    );
  });
});
