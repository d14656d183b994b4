import { copyFileSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import "./all-topologies.ts";
import { parseDesignText, parseDesignValue } from "../../../src/engine.ts";
import { formatProblem } from "../../../src/core/problems.ts";
import { main } from "../../../src/cli/main.ts";
import { DEFAULT_DRAFT } from "../../../src/client/try/defaults.ts";
import { designFileFromDraft } from "../../../src/client/try/design-file.ts";
import { draftFromInput } from "../../../src/client/try/draft.ts";
import { DEMO_DESIGNS } from "./demo-designs.ts";

// Top-level keys in the order SPEC §5 shows them; bom only when it names a part.
const SPEC_KEYS = [
  "id",
  "title",
  "topology",
  "supply",
  "signal",
  "front_end",
  "adc",
  "logic",
  "accuracy",
  "temperature",
  "policy",
];

function fileOf(draft: Record<string, string>) {
  const out = designFileFromDraft(draft);
  if (!out.ok) throw new Error(out.problems.map(formatProblem).join("\n"));
  return out;
}

describe("designFileFromDraft", () => {
  it.each(DEMO_DESIGNS.map((d) => [d.file, d.raw] as const))(
    "%s: the written file parses back to the same design",
    (file, raw) => {
      const out = fileOf(draftFromInput(raw, DEFAULT_DRAFT));
      expect(out.name).toBe(file);
      const parsed = parseDesignText(out.name, out.text);
      expect(parsed.problems).toEqual([]);
      expect(parsed.design).toEqual(parseDesignValue(file, raw).design);
      const keys = Object.keys(JSON.parse(out.text) as object);
      expect(keys).toEqual((raw as { bom?: object }).bom ? [...SPEC_KEYS, "bom"] : SPEC_KEYS);
    },
  );

  it("repeats only the policy keys the visitor set", () => {
    const hub = DEMO_DESIGNS.find((d) => d.file === "hub-generator-15v.json");
    const written = JSON.parse(fileOf(draftFromInput(hub?.raw, DEFAULT_DRAFT)).text) as { policy: object };
    expect(written.policy).toEqual({ headroom_margin_v: 0.2, marginal_fraction: 0.25, timing_fraction: 0.02 });
    const set = JSON.parse(
      fileOf({ ...DEFAULT_DRAFT, "policy.allow_unrated": "false", "policy.sign_share": "0.4" }).text,
    ) as { policy: object };
    // The default design sets offset_share 0.3 itself (its rectifier's summer carries 4·Vos, SPEC §11.2).
    expect(set.policy).toEqual({ offset_share: 0.3, sign_share: 0.4, allow_unrated: false });
  });

  it("writes numbers in SI units, whatever prefix was typed, and only the fields of the chosen rail kind", () => {
    const out = fileOf({
      ...DEFAULT_DRAFT,
      "supply.negative.kind": "fixed",
      "supply.negative.v": "-4.5",
      "signal.source_ohm": "2.2k",
      "accuracy.required_v": "50m",
    });
    const written = JSON.parse(out.text) as { supply: unknown; signal: { source_ohm: unknown }; accuracy: unknown };
    expect(written.supply).toEqual({ positive_v: 5, negative: { kind: "fixed", v: -4.5 } });
    expect(written.signal.source_ohm).toBe(2200);
    expect(written.accuracy).toEqual({ required_v: 0.05 });
  });

  it("writes the default design as this file, two-space indented with a final newline", () => {
    expect(fileOf(DEFAULT_DRAFT).text).toMatchInlineSnapshot(`
      "{
        "id": "new-design",
        "title": "±10 V signal into a 5 V, 10-bit ADC",
        "topology": "rectify-and-sign",
        "supply": {
          "positive_v": 5,
          "negative": {
            "kind": "charge-pump",
            "drive_v": 5,
            "frequency_hz": 20000,
            "flying_cap_f": 0.00001,
            "reservoir_cap_f": 0.000022,
            "load_a": 0.0005
          }
        },
        "signal": {
          "peak_v": 10,
          "max_frequency_hz": 200,
          "source_ohm": 1000
        },
        "front_end": {
          "window_v": 2.2,
          "divider_total_ohm": 100000,
          "resistor_tolerance": 0.001,
          "series": "E24",
          "rectifier_load_ohm": 10000,
          "rectifier_tolerance": 0.0001
        },
        "adc": {
          "bits": 10,
          "reference_v": 5,
          "reference_tolerance": 0.002
        },
        "logic": {
          "vdd_v": 5,
          "vih_v": 3,
          "vil_v": 1.5,
          "level_shift": "diode-clamp",
          "pull_down_ohm": 10000
        },
        "accuracy": {
          "required_v": 0.1
        },
        "temperature": {
          "min_c": 0,
          "max_c": 50
        },
        "policy": {
          "offset_share": 0.3
        }
      }
      "
    `);
  });

  it("refuses a draft the schema rejects, with the schema's problems", () => {
    const out = designFileFromDraft({ ...DEFAULT_DRAFT, id: "Not An Id" });
    expect(out.ok).toBe(false);
    expect(out.ok ? [] : out.problems.map((p) => p.path)).toEqual(["id"]);
  });

  it("passes `railsieve validate` when dropped into data/designs/", async () => {
    const dir = mkdtempSync(join(tmpdir(), "railsieve-try-"));
    try {
      for (const f of ["op-amps.csv", "comparators.csv", "diodes.csv"]) copyFileSync(join("data", f), join(dir, f));
      mkdirSync(join(dir, "designs"));
      const tweaked = {
        ...DEFAULT_DRAFT,
        id: "bench-12v",
        "supply.positive_v": "12",
        "bom.buffer": "oa-bip-gs-dual",
        "policy.headroom_margin_v": "0.2",
      };
      const out = fileOf(tweaked);
      writeFileSync(join(dir, "designs", out.name), out.text);
      let out_ = "";
      let err = "";
      const code = await main(["validate", "--data", dir], {
        out: (t) => (out_ += t),
        err: (t) => (err += t),
        color: false,
      });
      expect(err).toBe("");
      expect(code).toBe(0);
      expect(out_).toMatch(/, 1 design\n$/);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
