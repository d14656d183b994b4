import { describe, expect, it } from "vitest";
import "./all-topologies.ts";
import { parseDesignValue } from "../../../src/engine.ts";
import { parseSI } from "../../../src/core/units.ts";
import { DEFAULT_DRAFT, DEFAULT_INPUT } from "../../../src/client/try/defaults.ts";
import { checkDraft, draftFromInput, policyOverrides, rawFromDraft, siText } from "../../../src/client/try/draft.ts";
import { FIELDS } from "../../../src/client/try/fields.ts";
import { DEMO_DESIGNS } from "./demo-designs.ts";

describe("siText", () => {
  // Prefixes as in IEC 60027-1 / the SI Brochure (k = 10³, m = 10⁻³, µ = 10⁻⁶ …), written with ASCII "u".
  it.each([
    [1e-6, "si", "1u"],
    [4.7e-6, "si", "4.7u"],
    [10e-6, "si", "10u"],
    [0.0005, "si", "500u"],
    [0.002, "si", "2m"],
    [0.05, "si", "50m"],
    [0.8, "si", "0.8"],
    [980, "si", "980"],
    [4000, "si", "4k"],
    [200000, "si", "200k"],
    [10e6, "si", "10M"],
    [-5, "si", "-5"],
    [0, "si", "0"],
    [0.01, "plain", "0.01"],
    [0.002, "plain", "0.002"],
    [-20, "plain", "-20"],
  ] as const)("%s (%s) → %s", (value, style, text) => {
    expect(siText(value, style)).toBe(text);
  });

  it("never changes the value it shows: the text parses back to exactly the same number", () => {
    const values = [
      1e-12, 3.3e-9, 1.5e-7, 2.2e-6, 4.7e-6, 0.0033, 0.099, 0.1, 1.234567, 999.9, 1001, 12345.678, 4.99e6, 1e9,
    ];
    for (const v of values) {
      const back = parseSI(siText(v));
      expect(back.ok && back.value).toBe(v);
    }
  });
});

describe("draftFromInput / rawFromDraft", () => {
  it.each(DEMO_DESIGNS.map((d) => [d.file, d.raw] as const))(
    "%s: the draft stands for the same cleaned design as the file",
    (_file, raw) => {
      const fromFile = parseDesignValue("file", raw).design;
      expect(fromFile).toBeDefined();
      expect(checkDraft(draftFromInput(raw, DEFAULT_DRAFT)).design).toEqual(fromFile);
    },
  );

  it("keeps SI strings as the file writes them and writes plain numbers with a prefix", () => {
    const hub = DEMO_DESIGNS.find((d) => d.file === "hub-generator-15v.json");
    const draft = draftFromInput(hub?.raw, DEFAULT_DRAFT);
    expect(draft["supply.negative.flying_cap_f"]).toBe("10u");
    expect(draft["front_end.divider_total_ohm"]).toBe("200k");
    expect(draft["supply.negative.frequency_hz"]).toBe("20k");
    expect(draft["policy.timing_fraction"]).toBe("0.02");
    expect(draft["policy.offset_share"]).toBe("");
  });

  it("fills the fields a design does not use from the fallback, and leaves them out of the raw design", () => {
    const fixed = { ...DEFAULT_INPUT, supply: { positive_v: 5, negative: { kind: "fixed", v: -5 } } };
    const draft = draftFromInput(fixed, DEFAULT_DRAFT);
    expect(draft["supply.negative.drive_v"]).toBe(DEFAULT_DRAFT["supply.negative.drive_v"]);
    expect(rawFromDraft(draft)["supply"]).toEqual({ positive_v: "5", negative: { kind: "fixed", v: "-5" } });
  });

  it("turns the allow_unrated choice into a boolean and leaves other text for the schema to judge", () => {
    expect(rawFromDraft({ ...DEFAULT_DRAFT, "policy.allow_unrated": "true" })["policy"]).toEqual({
      offset_share: "0.3",
      allow_unrated: true,
    });
    // The wording is the schema's (pinned in test/core); here only that it lands on the field.
    expect(checkDraft({ ...DEFAULT_DRAFT, "policy.allow_unrated": "maybe" }).problems).toEqual([
      {
        file: "form",
        path: "policy.allow_unrated",
        message: expect.stringContaining("(got 'maybe', expected true or false)"),
      },
    ]);
  });

  it("reports an empty box as a missing value at its JSON path", () => {
    expect(checkDraft({ ...DEFAULT_DRAFT, "signal.peak_v": " " }).problems).toEqual([
      {
        file: "form",
        path: "signal.peak_v",
        message: expect.stringMatching(/^required value is missing \(got nothing, expected a number/),
      },
    ]);
  });

  it("lists only the policy keys the visitor set", () => {
    // The default design sets offset_share itself (SPEC §11.2: the summer carries 4·Vos).
    expect(policyOverrides({ ...DEFAULT_DRAFT, "policy.sign_share": "0.3", "policy.allow_unrated": "false" })).toEqual([
      "offset_share",
      "sign_share",
      "allow_unrated",
    ]);
    expect(policyOverrides(DEFAULT_DRAFT)).toEqual(["offset_share"]);
  });

  it("has one field for every leaf of the SPEC §5 design (and no other)", () => {
    const leaves = (o: unknown, prefix = ""): string[] =>
      typeof o === "object" && o !== null
        ? Object.entries(o).flatMap(([k, v]) => leaves(v, prefix === "" ? k : `${prefix}.${k}`))
        : [prefix];
    // The §5 example, with the other two negative-rail kinds, every policy key and every role.
    const spec = [
      ...leaves({ ...DEFAULT_INPUT, policy: {} }),
      "supply.negative.v",
      "supply.negative.drive_ohm", // optional (issue 16)
      "logic.pin_min_v", // optional (issue 16)
      // The optional budget fields of issue 15 (SPEC §11.1, §11.2, §11.10).
      "signal.source_tolerance",
      "adc.reference_tempco_ppm_per_c",
      "adc.offset_lsb",
      "adc.gain_error",
      "adc.inl_lsb",
      "policy.headroom_margin_v",
      "policy.marginal_fraction",
      "policy.offset_share",
      "policy.speed_share",
      "policy.sign_share",
      "policy.timing_fraction",
      "policy.timing_share",
      "policy.allow_unrated",
      // The optional sign-path fields of issue 21.
      "front_end.sign_series_ohm",
      "logic.pull_up_ohm",
      "logic.pin_cap_f",
      "logic.npn_base_ohm",
      "logic.npn_base_clamp",
      "logic.npn_vebo_v",
      "logic.npn_storage_s",
      // The optional front-end fields of issue 17.
      "signal.kind",
      "signal.common_mode_min_v",
      "signal.common_mode_max_v",
      "signal.fault_v",
      "signal.out_of_band_v",
      "front_end.protection_ohm",
      "front_end.divider_r1_ohm", // optional (issue 16): a held divider
      "front_end.divider_r2_ohm",
      "adc.sample_cap_f",
      "adc.switch_ohm",
      "adc.acquisition_s",
      "adc.sample_rate_hz",
      "adc.pin_r_ohm",
      "adc.pin_c_f",
      "logic.injection_ma",
      ...[
        "buffer",
        "rectifier",
        "sign",
        "pump-diode",
        "rectifier-diode",
        "clamp-diode",
        "base-clamp-diode",
        "level-shift",
        "reference-buffer",
        "gain-stage",
        "difference",
      ].map((r) => `bom.${r}`),
    ].filter((p) => p !== "policy");
    expect(FIELDS.map((f) => f.path).sort()).toEqual([...new Set(spec)].sort());
  });
});
