// input-fault (SPEC §12.4): Thévenin source and Ohm's law, I = (V_th − (rail ± 0.3 V))/R_th;
// the 0.3 V clamp onset and the 5 mA default limit are common practice (absolute-maximum tables) [M].
import { describe, expect, it } from "vitest";
import type { FaultPath } from "../../src/core/rule-kit/index.ts";
import { design } from "../helpers/designs.ts";
import { opAmp } from "../helpers/parts.ts";
import { bufferStage, check, expectFinding, GROUND_5V, reasons, type RuleCase } from "../helpers/rules.ts";

const path = (gain: number, ohm: number): FaultPath => ({ gain, offset_v: 0, ohm, what: "the buffer's input" });
const run = (p: FaultPath, logic: Record<string, number> = {}) => ({
  part: opAmp(),
  stage: { ...bufferStage(), fault: p },
  design: design({ signal: { fault_v: 24 }, logic }),
  rails: GROUND_5V,
});

const cases: RuleCase[] = [
  {
    label: "24 V through 10 kΩ: −24 V pulls (24 − 0.3)/10k = 2.37 mA from the ground clamp",
    run: run(path(1, 10e3)),
    expected: { verdict: "pass", needed: 5e-3, available: 2.37e-3, margin: 2.63e-3 },
  },
  {
    label: "1:10 divider, 9.09 kΩ: −2.4 V still pulls (2.4 − 0.3)/9.09k = 231 µA",
    run: run(path(0.1, 9.09e3)),
    expected: { verdict: "pass", needed: 5e-3, available: 2.1 / 9.09e3, margin: 5e-3 - 2.1 / 9.09e3 },
  },
  {
    label: "24 V through 1 kΩ: 23.7 mA",
    run: run(path(1, 1e3)),
    expected: { verdict: "fail", needed: 5e-3, available: 23.7e-3, margin: 5e-3 - 23.7e-3 },
  },
  {
    label: "a design limit of 2.5 mA leaves 0.13 mA",
    run: run(path(1, 10e3), { injection_ma: 2.5 }),
    expected: { verdict: "marginal", needed: 2.5e-3, available: 2.37e-3, margin: 0.13e-3 },
  },
  {
    label: "a 1:100 divider keeps ±0.24 V inside the clamps' 0.3 V",
    run: run(path(0.01, 9.9e3)),
    expected: { verdict: "pass", needed: 5e-3, available: 0, margin: 5e-3 },
  },
];

describe("input-fault", () => {
  it.each(cases)("$label", ({ run: r, expected }) => expectFinding(check("input-fault", r), expected));

  it("says why", () => {
    expect(reasons("input-fault", cases)).toMatchInlineSnapshot(`
      {
        "1:10 divider, 9.09 kΩ: −2.4 V still pulls (2.4 − 0.3)/9.09k = 231 µA": "pass: a −24.00 V fault puts −2.40 V behind 9.09 kΩ at the buffer's input, past V− = 0.00 V: 231 µA into the clamp; the limit is 5.00 mA (the 5 mA common-practice limit): 4.77 mA to spare",
        "24 V through 1 kΩ: 23.7 mA": "fail: a −24.00 V fault puts −24.00 V behind 1.00 kΩ at the buffer's input, past V− = 0.00 V: 23.7 mA into the clamp; the limit is 5.00 mA (the 5 mA common-practice limit): 18.7 mA over",
        "24 V through 10 kΩ: −24 V pulls (24 − 0.3)/10k = 2.37 mA from the ground clamp": "pass: a −24.00 V fault puts −24.00 V behind 10.0 kΩ at the buffer's input, past V− = 0.00 V: 2.37 mA into the clamp; the limit is 5.00 mA (the 5 mA common-practice limit): 2.63 mA to spare",
        "a 1:100 divider keeps ±0.24 V inside the clamps' 0.3 V": "pass: a 24.00 V fault keeps the buffer's input inside the rails (clamps start 0.30 V beyond them): no clamp current; the limit is 5.00 mA (the 5 mA common-practice limit)",
        "a design limit of 2.5 mA leaves 0.13 mA": "marginal: a −24.00 V fault puts −24.00 V behind 10.0 kΩ at the buffer's input, past V− = 0.00 V: 2.37 mA into the clamp; the limit is 2.50 mA (logic.injection_ma): 130 µA to spare",
      }
    `);
  });
});
