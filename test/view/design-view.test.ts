// Inputs and derived values as the design page lists them. Expected numbers are
// the worked values of REFERENCES.md (../shared), recomputed in the comments.
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import type { DesignResult } from "../../src/core/engine/result.ts";
import type { Design } from "../../src/core/schemas/design.ts";
import {
  CAUTION_TEXT,
  derivedGroups,
  inputGroups,
  needsCaution,
  roleView,
  type ValueGroup,
} from "../../src/view/design-view.ts";
import { design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

// A diode of exactly 0.7 V at 1 mA, the silicon drop of the worked charge-pump example.
const catalogue = catalogueFromParts([
  opAmp(),
  comparator({ supply_max_v: 36 }),
  diode({ id: "d-07", vf_1ma_v: 0.7, vf_10ma_v: 0.8 }),
]);

function evaluate(d: Design): DesignResult {
  const e = evaluateDesign(d, catalogue);
  if (!e.ok) throw new Error(JSON.stringify(e.problems));
  return e.result;
}

const rows = (groups: ValueGroup[], title: string) =>
  Object.fromEntries(groups.find((g) => g.title === title)?.rows.map((r) => [r.label, r.value]) ?? []);

describe("derivedGroups", () => {
  it("shows the 30k/10k divider: k 0.25, R_th 7.5 kΩ (REFERENCES.md, Divider) and one ADC step at the input", () => {
    const result = evaluate(design({ signal: { peak_v: 10, source_ohm: 0 }, front_end: { divider_total_ohm: 40000 } }));
    const groups = derivedGroups(result);
    expect(rows(groups, "Divider")).toEqual({
      "Target ratio = window ÷ peak": "0.25",
      "Top resistor R1 (E24)": "30 kΩ",
      "Bottom resistor R2 (E24)": "10 kΩ",
      "Source (and protection) resistance Rs, in series with R1": "0 Ω",
      "Ratio k = R2 / (Rs + R1 + R2)": "0.25",
      "Total R1 + R2": "40 kΩ, as asked",
      "Why this total":
        "chosen by search: the E24 pair with the largest ratio not above the target, among totals from half to twice the 40 kΩ asked for (a larger ratio uses more of the ADC, so it wins over a total nearer the ask; ties go to the nearer total)",
    });
    // IEEE Std 1241-2010: Q = 5 V / 2^10 = 4.8828 mV, ÷ k 0.25 = 19.53 mV at the input.
    expect(rows(groups, "Signal at the ADC side")).toEqual({
      "Window used W = k · peak": "±2.50 V",
      "Resistance seen by the buffer (Rs + R1) ‖ R2": "7.5 kΩ",
      "One ADC step at the input": "19.5 mV",
    });
  });

  it("says how far the chosen total is from the one asked: 100 kΩ asked for k 0.25 gives E24 39k + 13k = 52 kΩ", () => {
    // 39k/13k = 0.25 exactly (E24, IEC 60063), the one E24 pair with k = 0.25 and a total within
    // 50…200 kΩ (30k/10k = 40 kΩ is below half the ask): the ratio wins, the total lands at 0.52 × the ask.
    const result = evaluate(
      design({ signal: { peak_v: 10, source_ohm: 0 }, front_end: { divider_total_ohm: 100000 } }),
    );
    expect(rows(derivedGroups(result), "Divider")["Total R1 + R2"]).toBe("52 kΩ, asked 100 kΩ (0.52 × the ask)");
  });

  it("says a held divider is held: 39k over 13k behind 1 kΩ, k = 13/53 = 0.2453 (SPEC §11.1), the total asked for unused", () => {
    const result = evaluate(
      design({
        signal: { peak_v: 10, source_ohm: 1000 },
        front_end: { divider_total_ohm: 100000, divider_r1_ohm: 39000, divider_r2_ohm: 13000 },
      }),
    );
    expect(rows(derivedGroups(result), "Divider")).toMatchInlineSnapshot(`
      {
        "Bottom resistor R2 (held)": "13 kΩ",
        "Ratio k = R2 / (Rs + R1 + R2)": "0.2453",
        "Source (and protection) resistance Rs, in series with R1": "1 kΩ",
        "Target ratio = window ÷ peak": "0.25",
        "Top resistor R1 (held)": "39 kΩ",
        "Total R1 + R2": "52 kΩ",
        "Why these resistors": "held by the design (front_end.divider_r1_ohm and divider_r2_ohm): used as given, no search; the 100 kΩ total asked for is not used",
      }
    `);
    expect(rows(inputGroups(result.design), "Front end")["Divider resistors held (R1 over R2)"]).toBe(
      "39 kΩ over 13 kΩ",
    );
  });

  it("says there is no divider when the peak already fits the window", () => {
    expect(rows(derivedGroups(evaluate(design())), "Divider")).toEqual({
      Divider: "none: the peak already fits the window (k = 1)",
    });
  });

  it("shows the pumped rail of the worked example: 5 V drive, 980 Hz, 1 µF, 0.7 V diodes, 1 mA (REFERENCES.md, charge pump)", () => {
    const pump = {
      kind: "charge-pump",
      drive_v: 5,
      frequency_hz: 980,
      flying_cap_f: 1e-6,
      reservoir_cap_f: 10e-6,
      load_a: 0.001,
    };
    // Amplifiers drawing nothing and a flat 0.7 V diode, so the rail carries exactly the stated 1 mA (SPEC §11.5).
    const idle = catalogueFromParts([
      opAmp({ iq_ma: 0 }),
      comparator({ supply_max_v: 36, iq_ma: 0 }),
      diode({ id: "d-07", vf_1ma_v: 0.7, vf_10ma_v: 0.7 }),
    ]);
    const e = evaluateDesign(design({ supply: { negative: pump }, bom: { "pump-diode": "d-07" } }), idle);
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    const result = e.result;
    const rails = derivedGroups(result).find((g) => g.title === "Rails");
    // No load −(5 − 1.4) = −3.60 V; droop 1 mA / (980 Hz · 1 µF) = 1.020 V; loaded −2.580 V;
    // ripple 1 mA / (980 Hz · 10 µF) = 102 mV p-p; worst −2.580 + 0.051 = −2.529 V;
    // collapse (5 − 1.4) · 980 · 1 µF = 3.528 mA.
    expect(rails?.rows.map((r) => [r.label, r.value])).toEqual([
      ["V+", "+5.00 V"],
      ["Pump diode", "d-07, 0.70 V at 2 mA and 25 °C (the cold end)"],
      ["Load on V− = stated + each part's supply current", "1 mA stated = 1 mA"],
      ["V− with no load = −(drive − 2·Vf)", "−3.60 V"],
      ["Droop = I / (f · C_flying)", "1.02 V"],
      ["V− at load, average", "−2.58 V"],
      ["Ripple = I / (f · C_reservoir), peak to peak", "102 mV"],
      ["V− used by every check = average + ripple / 2", "−2.53 V"],
      ["Load at which the pump collapses", "3.53 mA"],
    ]);
    expect(rails?.rows[1]).toEqual(expect.objectContaining({ partId: "d-07", role: "pump-diode" }));
  });

  it("names the diodes in the signal chain with their drop at the operating current", () => {
    // The rectifier diode carries 3·W/R = 3 · 2.5 V / 10 kΩ = 750 µA (its feedback R and the summer's R/2 input,
    // SPEC §11.2): Vf(750 µA) = 0.7 + 0.1 · log10(0.75) = 0.688 V; Vf(500 µA) = 0.670 V (SPEC §4 two-point model).
    expect(rows(derivedGroups(evaluate(design())), "Diode drops in the signal chain")).toEqual({
      "Rectifier diode drop": "d-07, 0.69 V at 750 µA",
      "Clamp diode drop": "d-07, 0.67 V at 500 µA",
    });
  });
});

describe("inputGroups", () => {
  it("lists the signal and the supply in SI", () => {
    const groups = inputGroups(design({ signal: { peak_v: 48, max_frequency_hz: 200, source_ohm: 100 } }));
    expect(rows(groups, "Signal")).toEqual({
      Peak: "±48 V",
      "Highest frequency": "200 Hz",
      "Source resistance": "100 Ω",
    });
    expect(rows(groups, "Supply")).toEqual({ "V+": "+5.00 V", "V−": "fixed −5.00 V" });
  });

  it("shows what the file says to six digits, with a true minus sign", () => {
    const groups = inputGroups(
      design({
        adc: { bits: 12, reference_v: 4.096, reference_tolerance: 0.001 },
        temperature: { min_c: -20, max_c: 70 },
      }),
    );
    expect(rows(groups, "ADC")).toEqual({ Resolution: "12 bits", Reference: "4.096 V ± 0.1 %" });
    expect(rows(groups, "Accuracy and temperature")["Temperature range"]).toBe("−20\u00a0°C to 70\u00a0°C");
  });

  it("marks which policy values the design sets and which are defaults", () => {
    const policy = rows(inputGroups(design({ policy: { headroom_margin_v: 0.2, allow_unrated: true } })), "Policy");
    expect(policy).toEqual({
      "Headroom margin": "200 mV, set in the design",
      "Marginal fraction": "20 % (0.2), default",
      "Offset share": "25 % (0.25), default",
      "Speed share": "25 % (0.25), default",
      "Sign share": "50 % (0.5), default",
      "Timing fraction": "1 % (0.01), default",
      "Timing share": "25 % (0.25), default",
      "Allow unrated": "yes, set in the design",
    });
  });

  it("lists the BOM with links to the parts only when there is one", () => {
    expect(inputGroups(design()).some((g) => g.title === "BOM")).toBe(false);
    const bom = inputGroups(design({ bom: { buffer: "oa-test" } })).find((g) => g.title === "BOM");
    expect(bom?.rows).toEqual([{ label: "buffer", value: "oa-test", partId: "oa-test", role: "buffer" }]);
  });
});

describe("needsCaution", () => {
  // SPEC §9: a caution for designs whose peak_v exceeds 30 V.
  it.each([
    [29.9, false],
    [30, false],
    [30.1, true],
    [48, true],
  ])("peak %d V → %s", (peak, expected) => {
    expect(needsCaution(design({ signal: { peak_v: peak } }))).toBe(expected);
  });

  it("words the caution as the spec does", () => {
    expect(CAUTION_TEXT).toMatchInlineSnapshot(
      `"Voltages above extra-low-voltage limits need isolation and protection designed to local codes and licensed practice, which this guide does not assess."`,
    );
  });
});

describe("roleView", () => {
  // Five op amps that all fit the ±5 V buffer; cost bands set their rank (SPEC §7: verdict, status, cost, …).
  const fits = [1, 2, 3, 4, 5].map((n) => opAmp({ id: `oa-c${n}`, name: `Cost ${n}`, cost_band: n }));
  // Accepts inputs only down to −5 + 2.6 = −2.40 V against the −2.50 V needed: rejected.
  const short = opAmp({ id: "oa-short", name: "Short", icm_neg_headroom_v: 2.6 });
  const five = catalogueFromParts([...fits, short, comparator({ supply_max_v: 36 }), diode()]);
  const buffer = (bom: Record<string, string> = {}) => {
    const e = evaluateDesign(design({ bom }), five);
    if (!e.ok) throw new Error(JSON.stringify(e.problems));
    const role = e.result.roles.find((r) => r.role === "buffer");
    if (!role) throw new Error("no buffer role");
    return role;
  };
  const ids = (shown: { result: { part: { id: string } }; rank?: number }[]) =>
    shown.map((s) => [s.result.part.id, s.rank]);

  it("draws the best fits in full, best first, and nothing else when the design uses one of them", () => {
    const view = roleView(buffer(), 3);
    expect(ids(view.topFits)).toEqual([
      ["oa-c1", 1],
      ["oa-c2", 2],
      ["oa-c3", 3],
    ]);
    expect(view.used).toBeUndefined();
    expect([...view.inFull]).toEqual(["oa-c1", "oa-c2", "oa-c3"]);
  });

  it("adds a BOM part ranked below them, with its rank", () => {
    const view = roleView(buffer({ buffer: "oa-c5" }), 3);
    expect(view.used && ids([view.used])).toEqual([["oa-c5", 5]]);
    expect(view.inFull.has("oa-c5")).toBe(true);
  });

  it("adds a BOM part that fails, without a rank", () => {
    const view = roleView(buffer({ buffer: "oa-short" }), 3);
    expect(view.used?.result.part.id).toBe("oa-short");
    expect(view.used?.result.verdict).toBe("fail");
    expect(view.used?.rank).toBeUndefined();
  });
});
