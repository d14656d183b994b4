import { describe, expect, it } from "vitest";
import { defineRule, driftSpanC, finding, railPhrase, rangeMargin, record } from "../../../src/core/engine/finding.ts";
import { design as makeDesign } from "../../helpers/designs.ts";
import { opAmp } from "../../helpers/parts.ts";
import { bufferStage, SPLIT_5V } from "../../helpers/rules.ts";

describe("finding", () => {
  // A made-up rule that counts how often its text is written.
  let calls = 0;
  const rule = defineRule({
    id: "offset",
    unit: "V",
    checks: "",
    formula: "",
    source: "",
    policy: null,
    kinds: ["op-amp"],
    needs: {},
    measure: (_ctx, _part, out) => record(out, "pass", 0.025, 0.01, 0.015, 0.025),
    describe: (m) => {
      calls++;
      return { reason: `adds ${m.available * 1000} mV`, steps: [{ label: "error", value: m.available, unit: "V" }] };
    },
  });
  const ctx = {
    role: "buffer" as const,
    stage: bufferStage(),
    design: makeDesign(),
    policy: makeDesign().policy,
    rails: SPLIT_5V,
  };
  const part = opAmp();

  it("writes its reason and steps once, on first read, and keeps them in JSON", () => {
    calls = 0;
    const f = finding(rule, ctx, part);
    expect(calls).toBe(0);
    expect(f.reason).toBe("adds 10 mV");
    expect(f.steps).toHaveLength(1);
    expect(calls).toBe(1);
    expect(JSON.parse(JSON.stringify(f))).toEqual({
      rule: "offset",
      verdict: "pass",
      needed: 0.025,
      available: 0.01,
      margin: 0.015,
      unit: "V",
      limit: 0.025,
      reason: "adds 10 mV",
      steps: [{ label: "error", value: 0.01, unit: "V" }],
    });
  });

  it("leaves limit out of JSON when it has none", () => {
    const yesNo = defineRule({
      ...rule,
      id: "unity-gain-stable",
      measure: (_ctx, _part, out) => record(out, "pass", 1, 1, 0, undefined),
    });
    const f = finding(yesNo, ctx, part);
    expect(Object.keys(JSON.parse(JSON.stringify(f)))).not.toContain("limit");
  });
});

describe("rangeMargin", () => {
  it.each([
    // needed, reach → side that binds
    [
      { low: -2.5, high: 2.5 },
      { low: -4.98, high: 3.5 },
      { margin: 1, side: "high", needed: 2.5, reached: 3.5 },
    ],
    [
      { low: -2.5, high: 2.5 },
      { low: 0.02, high: 3.5 },
      { margin: -2.52, side: "low", needed: -2.5, reached: 0.02 },
    ],
    [
      { low: -1, high: 1 },
      { low: -2, high: 2 },
      { margin: 1, side: "low", needed: -1, reached: -2 },
    ], // a tie names the low side
  ] as const)("needed %j within %j", (needed, reach, expected) => {
    const m = rangeMargin(needed, reach);
    expect({ ...m, margin: Number(m.margin.toFixed(9)) }).toEqual(expected);
  });
});

describe("railPhrase and driftSpanC", () => {
  it("names the rail that binds", () => {
    expect(railPhrase("high", { positive_v: 5, negative_v: -4.18 })).toBe("at V+ = 5.00 V");
    expect(railPhrase("low", { positive_v: 5, negative_v: -4.18 })).toBe("with V− = −4.18 V");
  });

  it.each([
    [0, 50, 25],
    [-40, 85, 65],
    [25, 25, 0],
    [30, 125, 100],
  ])("temperature %d…%d °C is %d °C from 25 °C at its far end", (min, max, span) => {
    expect(driftSpanC(min, max)).toBe(span);
  });
});
