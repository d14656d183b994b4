// overload-recovery (issue 21): an op amp run open loop as the sign comparator saturates at
// every crossing and needs its rated overload recovery before it moves. Expected values are
// the rating itself against the late-sign limit of the design.
import { describe, expect, it } from "vitest";
import { design } from "../helpers/designs.ts";
import { comparator, opAmp } from "../helpers/parts.ts";
import { check, expectFinding, reasons, signStage, type RuleCase } from "../helpers/rules.ts";

// The late-sign limit (SPEC §11.4): the time in which 2·2π·f·peak·t reaches timing_share (25 %) ×
// required_v. With required_v = 0.4π V at 200 Hz and 2.5 V peak it is 50 µs (arithmetic).
const REQUIRED = 0.4 * Math.PI;
const LIMIT = (0.25 * REQUIRED) / (2 * 2 * Math.PI * 200 * 2.5);
const at200 = design({ signal: { max_frequency_hz: 200 }, accuracy: { required_v: REQUIRED } });

const cases: RuleCase[] = [
  {
    label: "op amp recovering in 10 µs",
    run: { part: opAmp({ overload_recovery_us: 10 }), stage: signStage(), role: "sign", design: at200 },
    expected: { verdict: "pass", needed: LIMIT, available: 10e-6, margin: LIMIT - 10e-6 },
  },
  {
    label: "op amp recovering in 45 µs",
    run: { part: opAmp({ overload_recovery_us: 45 }), stage: signStage(), role: "sign", design: at200 },
    expected: { verdict: "marginal", needed: LIMIT, available: 45e-6, margin: LIMIT - 45e-6 },
  },
  {
    label: "op amp recovering in 60 µs",
    run: { part: opAmp({ overload_recovery_us: 60 }), stage: signStage(), role: "sign", design: at200 },
    expected: { verdict: "fail", needed: LIMIT, available: 60e-6, margin: LIMIT - 60e-6 },
  },
  {
    label: "op amp with no rating",
    run: { part: opAmp({ overload_recovery_us: undefined }), stage: signStage(), role: "sign", design: at200 },
    expected: { verdict: "unrated", needed: null, available: null, margin: null },
  },
  {
    label: "comparator: nothing to add",
    run: { part: comparator(), stage: signStage(), role: "sign", design: at200 },
    expected: { verdict: "pass", needed: LIMIT, available: 0, margin: LIMIT },
  },
];

describe("overload-recovery", () => {
  it.each(cases)("$label", ({ run, expected }) => expectFinding(check("overload-recovery", run), expected));

  it("says why, with the numbers", () => {
    expect(reasons("overload-recovery", cases)).toMatchInlineSnapshot(`
      {
        "comparator: nothing to add": "pass: a comparator is built to saturate: no overload recovery to add",
        "op amp recovering in 10 µs": "pass: used open loop it saturates at every crossing and needs 10.0 µs to recover before it moves, added to the sign's delay; the sign may be late by 50.0 µs: 40.0 µs to spare",
        "op amp recovering in 45 µs": "marginal: used open loop it saturates at every crossing and needs 45.0 µs to recover before it moves, added to the sign's delay; the sign may be late by 50.0 µs: 5.00 µs to spare",
        "op amp recovering in 60 µs": "fail: used open loop it saturates at every crossing and needs 60.0 µs to recover before it moves, added to the sign's delay; the sign may be late by 50.0 µs: 10.0 µs short",
        "op amp with no rating": "unrated: not rated: needs 'overload_recovery_us', which is empty for this part",
      }
    `);
  });
});
