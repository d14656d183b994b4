import { describe, expect, it } from "vitest";
import { closest, editDistance, formatProblem, InputError } from "../../src/core/problems.ts";

describe("formatProblem", () => {
  it.each([
    [
      { file: "data/op-amps.csv", line: 3, column: "gbw_mhz", message: "not a number (got 'x', expected …)" },
      "data/op-amps.csv:3: column 'gbw_mhz': not a number (got 'x', expected …)",
    ],
    [
      { file: "designs/x.json", path: "signal.peak_v", message: "out of range (got -1, expected …)" },
      "designs/x.json: signal.peak_v: out of range (got -1, expected …)",
    ],
    [{ file: "designs/x.json", line: 4, message: "not valid JSON: …" }, "designs/x.json:4: not valid JSON: …"],
    [
      { file: "diodes.csv", message: "file not found (expected it to exist)" },
      "diodes.csv: file not found (expected it to exist)",
    ],
    [{ file: "designs/x.json", path: "", message: "wrong type" }, "designs/x.json: wrong type"],
  ])("%j → %j", (problem, text) => {
    expect(formatProblem(problem)).toBe(text);
  });
});

describe("InputError", () => {
  it("carries every problem and joins their sentences, one a line", () => {
    const e = new InputError([
      { file: "a.csv", line: 2, column: "id", message: "one" },
      { file: "b.json", path: "x", message: "two" },
    ]);
    expect(e.problems).toHaveLength(2);
    expect(e.message).toBe("a.csv:2: column 'id': one\nb.json: x: two");
    expect(e.name).toBe("InputError");
  });
});

describe("editDistance and closest", () => {
  it.each([
    ["", "", 0],
    ["abc", "", 3],
    ["kitten", "sitting", 3],
    ["gbw_mz", "gbw_mhz", 1],
    ["vf_1ma_v", "vf_10ma_v", 1],
  ])("distance(%j, %j) = %i", (a, b, d) => {
    expect(editDistance(a, b)).toBe(d);
    expect(editDistance(b, a)).toBe(d);
  });

  it.each([
    ["gbw_mz", "gbw_mhz"],
    ["Slew_V_Per_Us", "slew_v_per_us"],
    ["peak", "peak_v"],
    ["colour", undefined],
  ])("closest(%j) is %j", (name, expected) => {
    expect(closest(name, ["gbw_mhz", "slew_v_per_us", "peak_v", "notes"])).toBe(expected);
  });
});
