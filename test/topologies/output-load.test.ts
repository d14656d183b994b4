// What each topology hands the output-load rule (SPEC §11.8): every op-amp stage's load branches,
// each resistor to the node it returns to, for concrete designs worked by hand below. Resistors
// into a virtual ground load the output as resistors to ground would (the inverting input is
// held at 0 V; textbook op-amp analysis, e.g. Sedra & Smith ch. 2); a non-inverting stage's Rf
// and Rg are in series to ground (the − input draws no current); the converter's sampling input
// draws as a switched-capacitor resistor 1/(f_s·C_s) (common practice [M]).
import { describe, expect, it } from "vitest";
import { catalogueFromParts } from "../../src/core/catalogue.ts";
import type { DesignResult } from "../../src/core/engine/result.ts";
import { parallelOhm } from "../../src/core/math/stage-load.ts";
import type { Design } from "../../src/core/schemas/design.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { BRIDGE_20MV_ON_3V3, design } from "../helpers/designs.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

// One op amp rated at 10 kΩ (common for the class [M]), on every supply these designs use.
const CATALOGUE = catalogueFromParts([
  opAmp({ id: "oa-10k", supply_min_v: 1.8, out_load_ohm: "10k" }),
  comparator(),
  diode(),
]);

function run(d: Design): DesignResult {
  const e = evaluateDesign(d, CATALOGUE);
  if (!e.ok) throw new Error(JSON.stringify(e.problems));
  return e.result;
}

/** Each op-amp stage's branches and their parallel sum, in ohms to 6 significant figures (float noise only). */
function loads(r: DesignResult): Record<string, { ohms: number[]; total: number; left_out?: string }> {
  const out: Record<string, { ohms: number[]; total: number; left_out?: string }> = {};
  for (const role of r.roles) {
    for (const s of role.stages) {
      if (s.stage.stage !== "op-amp" || !s.stage.load) continue;
      const l = s.stage.load;
      out[s.id === undefined ? role.role : `${role.role}/${s.id}`] = {
        ohms: l.branches.map((b) => Number(b.ohm.toPrecision(6))),
        total: Number(parallelOhm(l.branches).toPrecision(6)),
        ...(l.left_out === undefined ? {} : { left_out: l.left_out }),
      };
    }
  }
  return out;
}

const NO_PIN = "the converter pin's sampling draw (no adc.sample_rate_hz and adc.sample_cap_f)";
// 1 MHz and 10 pF: 1/(f_s·C_s) = 100 kΩ, and 1 kΩ at the pin in series: 101 kΩ.
const PIN = { sample_rate_hz: 1e6, sample_cap_f: 10e-12, pin_r_ohm: 1000 };

const OFFSET = design({ topology: "offset-to-mid-rail", supply: { positive_v: 5, negative: { kind: "ground" } } });
const GAINED = design({
  topology: "gained-level-shift",
  supply: { positive_v: 3.3, negative: { kind: "ground" } },
  signal: { peak_v: 0.2, max_frequency_hz: 500, source_ohm: 0 },
  front_end: { divider_total_ohm: 10e3 },
  adc: { bits: 12, reference_v: 1.8 },
});
const DIFFERENCE = design(BRIDGE_20MV_ON_3V3);

function verdictOf(r: DesignResult, role: string, stage?: string): string | undefined {
  const fit = r.roles.find((x) => x.role === role)?.resultOf("oa-10k");
  return fit?.findings.find((f) => f.rule === "output-load" && f.stage === stage)?.verdict;
}

describe("rectify-and-sign", () => {
  // R = rectifier_load_ohm = 10 kΩ. Buffer: stage 1's input R and the summer's input R, both into virtual
  // grounds: 10k ‖ 10k = 5 kΩ. Stage 1: feedback R and the summer's R/2 through the conducting diode:
  // 10k ‖ 5k = 3.33 kΩ (the 3·W/R the diode carries). Summer: feedback R = 10 kΩ, and the pin.
  const r = run(design());

  it("hands the buffer R ‖ R, stage 1 R ‖ R/2 and the summer R and the pin", () => {
    expect(loads(r)).toEqual({
      buffer: { ohms: [10_000, 10_000], total: 5000 },
      "rectifier/stage-1": { ohms: [10_000, 5000], total: 3333.33 },
      "rectifier/stage-2": { ohms: [10_000], total: 10_000, left_out: NO_PIN },
    });
  });

  it("judges a part rated at 10 kΩ marginal as buffer and stage 1, and covered as the summer", () => {
    expect(verdictOf(r, "buffer")).toBe("marginal");
    expect(verdictOf(r, "rectifier", "stage-1")).toBe("marginal");
    expect(verdictOf(r, "rectifier", "stage-2")).toBe("pass");
  });

  it("at R = 30 kΩ the buffer drives 15 kΩ and stage 1 10 kΩ: all covered", () => {
    const wide = run(design({ front_end: { rectifier_load_ohm: 30_000 } }));
    expect(loads(wide).buffer?.total).toBe(15_000);
    expect(loads(wide)["rectifier/stage-1"]?.total).toBe(10_000);
    expect([verdictOf(wide, "buffer"), verdictOf(wide, "rectifier", "stage-1")]).toEqual(["pass", "pass"]);
  });

  it("adds the converter pin to the summer when the design states its sampling input", () => {
    // 10k ‖ 101k = 9.099 kΩ.
    expect(loads(run(design({ adc: PIN })))["rectifier/stage-2"]).toEqual({ ohms: [10_000, 101_000], total: 9099.1 });
  });
});

describe("offset-to-mid-rail", () => {
  // ±2.5 V into a 5 V reference with a 100 kΩ scale: R1 = R2 = 75 kΩ, no R3 (a = ½, b = 2.5 V, the
  // network's own choice, shown on the design page). The level shifter is a follower into the pin
  // alone; the reference buffer drives R2 and, beyond the node, R1 to the signal: 75k + 75k = 150 kΩ.
  const d = OFFSET;
  const r = run(d);

  it("hands the level shifter no branch but the pin, and the reference buffer R2 + R1", () => {
    expect(r.derived.level_shift).toMatchObject({ r1_ohm: 75_000, r2_ohm: 75_000, r3_ohm: null });
    expect(loads(r)).toEqual({
      "level-shift": { ohms: [], total: Infinity, left_out: NO_PIN },
      "reference-buffer": { ohms: [150_000], total: 150_000 },
    });
    expect(verdictOf(r, "level-shift")).toBe("pass");
  });

  it("with the pin stated, the level shifter drives R_pin + 1/(f_s·C_s) = 101 kΩ", () => {
    expect(loads(run(design({ ...d, adc: { ...d.adc, ...PIN } })))["level-shift"]).toEqual({
      ohms: [101_000],
      total: 101_000,
    });
  });
});

describe("gained-level-shift", () => {
  // ±0.2 V into a 1.8 V, 12-bit converter on 3.3 V with a 10 kΩ scale: the search picks Rf = 36 kΩ and
  // Rg = 8.2 kΩ (Gs = 5.39). Non-inverting: the output drives Rf + Rg = 44.2 kΩ to ground.
  const r = run(GAINED);

  it("hands the gain stage Rf + Rg and the pin", () => {
    const rows = Object.fromEntries(r.display.flatMap((g) => g.rows.map((x) => [x.label, x.value])));
    expect([rows["Rf, output to inverting input"], rows["Rg, inverting input to ground"]]).toEqual(["36 kΩ", "8.2 kΩ"]);
    expect(loads(r)).toEqual({ "gain-stage": { ohms: [44_200], total: 44_200, left_out: NO_PIN } });
  });
});

describe("difference-to-mid", () => {
  // A bridge of ±20 mV on 1.6–1.7 V into a 2.5 V converter, 10 kΩ scale: R1 = R3 = 8.2 kΩ,
  // R2 = R4 = 470 kΩ (G = 57.3). The output drives R2 into the − input, which feedback holds at the
  // + input's level: 470 kΩ, as Rf of an inverting stage into its virtual ground.
  const r = run(DIFFERENCE);

  it("hands the difference amplifier R2 and the pin", () => {
    const rows = Object.fromEntries(r.display.flatMap((g) => g.rows.map((x) => [x.label, x.value])));
    expect(rows["R2 = R4, feedback and to REF"]).toBe("470 kΩ");
    expect(loads(r)).toEqual({ difference: { ohms: [470_000], total: 470_000, left_out: NO_PIN } });
  });
});

describe("every topology", () => {
  // A stage without a load would leave every part unrated; one without the rule would let a heavy load pass.
  it.each([
    ["rectify-and-sign", design()],
    ["offset-to-mid-rail", OFFSET],
    ["gained-level-shift", GAINED],
    ["difference-to-mid", DIFFERENCE],
  ] as const)("%s: every op-amp stage states its load and runs output-load", (_t, d) => {
    const stages = run(d).roles.flatMap((role) =>
      role.stages
        .filter((s) => s.stage.stage === "op-amp")
        .map((s) => ({
          who: `${role.role}/${s.id ?? ""}`,
          load: s.stage.stage === "op-amp" && !!s.stage.load,
          rules: s.rules,
        })),
    );
    expect(stages.length).toBeGreaterThan(0);
    for (const s of stages)
      expect({ who: s.who, load: s.load, rule: s.rules.includes("output-load") }).toEqual({
        who: s.who,
        load: true,
        rule: true,
      });
  });
});
