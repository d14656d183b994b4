// Part verdict and ranking of SPEC §7: a part's verdict is its worst finding (with
// allow_unrated an unrated finding counts as marginal); fits are ranked by verdict,
// status (stocked, approved, listed), cost_band, relative margin (largest first), id.
import { describe, expect, it } from "vitest";
import type { Part } from "../../../src/core/catalogue.ts";
import {
  compareResults,
  evaluatePart,
  isFit,
  partVerdict,
  type PartResult,
} from "../../../src/core/engine/evaluate-part.ts";
import type { Finding, Verdict } from "../../../src/core/engine/types.ts";
import { POLICY_DEFAULTS } from "../../../src/core/schemas/design.ts";
import { RULES_BY_ID } from "../../../rules/index.ts";
import { design } from "../../helpers/designs.ts";
import { opAmp } from "../../helpers/parts.ts";
import { bufferStage, SPLIT_5V } from "../../helpers/rules.ts";

type Key = { id: string; verdict: Verdict; status?: string; cost_band?: number | ""; relative?: number };

function result(k: Key): PartResult {
  const part = opAmp({ id: k.id, status: k.status ?? "listed", cost_band: k.cost_band ?? 1 });
  return { part, verdict: k.verdict, findings: [], bom: false, relative: k.relative ?? 0 };
}

const verdicts = (vs: Verdict[]) => vs.map((verdict) => ({ verdict }) as Finding);

describe("partVerdict", () => {
  it.each([
    [["pass", "pass"], false, "pass"],
    [["pass", "marginal"], false, "marginal"],
    [["marginal", "unrated"], false, "unrated"],
    [["marginal", "unrated"], true, "marginal"],
    [["unrated", "fail"], true, "fail"],
  ] as const)("%j with allow_unrated %s → %s", (vs, allow, expected) => {
    expect(partVerdict(verdicts([...vs]), { ...POLICY_DEFAULTS, allow_unrated: allow })).toBe(expected);
  });
});

describe("compareResults: each key decides only when the ones before it tie", () => {
  it.each([
    [
      "verdict",
      { id: "z", verdict: "pass", status: "listed", cost_band: 5, relative: 0 },
      { id: "a", verdict: "marginal", status: "stocked", cost_band: 1, relative: 9 },
    ],
    [
      "status",
      { id: "z", verdict: "pass", status: "stocked", cost_band: 5, relative: 0 },
      { id: "a", verdict: "pass", status: "approved", cost_band: 1, relative: 9 },
    ],
    [
      "status",
      { id: "z", verdict: "pass", status: "approved", cost_band: 5 },
      { id: "a", verdict: "pass", status: "listed", cost_band: 1 },
    ],
    [
      "cost_band",
      { id: "z", verdict: "pass", cost_band: 1, relative: 0 },
      { id: "a", verdict: "pass", cost_band: 2, relative: 9 },
    ],
    [
      "cost_band (unrated cost last)",
      { id: "z", verdict: "pass", cost_band: 5 },
      { id: "a", verdict: "pass", cost_band: "" },
    ],
    ["relative margin", { id: "z", verdict: "pass", relative: 0.9 }, { id: "a", verdict: "pass", relative: 0.3 }],
    ["id", { id: "a", verdict: "pass" }, { id: "b", verdict: "pass" }],
    ["verdict among rejects", { id: "z", verdict: "unrated" }, { id: "a", verdict: "fail" }],
  ] as const)("%s", (_key, first, second) => {
    const a = result(first as Key);
    const b = result(second as Key);
    expect(compareResults(a, b)).toBeLessThan(0);
    expect(compareResults(b, a)).toBeGreaterThan(0);
  });
});

describe("isFit", () => {
  it("counts pass and marginal as fits, unrated and fail as rejections", () => {
    expect(["pass", "marginal", "unrated", "fail"].map((v) => isFit(v as Verdict))).toEqual([true, true, false, false]);
  });
});

describe("evaluatePart", () => {
  const rules = ["output-swing", "phase-reversal", "offset"].map((id) => RULES_BY_ID.get(id)!);
  const d = design();
  const ctx = { role: "buffer" as const, stage: bufferStage(), design: d, policy: d.policy, rails: SPLIT_5V };

  it("runs every rule of the role, in order, and takes the worst as the part's verdict", () => {
    const r = evaluatePart(rules, ctx, opAmp({ phase_reversal: "" }), true);
    expect(r.findings.map((f) => `${f.rule}:${f.verdict}`)).toEqual([
      "output-swing:pass",
      "phase-reversal:unrated",
      "offset:pass",
    ]);
    expect(r.verdict).toBe("unrated");
    expect(r.bom).toBe(true);
  });

  it("counts unrated as marginal when the design allows it", () => {
    const allow = design({ policy: { allow_unrated: true } });
    expect(
      evaluatePart(rules, { ...ctx, design: allow, policy: allow.policy }, opAmp({ phase_reversal: "" }), false)
        .verdict,
    ).toBe("marginal");
  });

  // Output swing: 1.00 V spare of a 2.5 V level → 0.4; offset: 18 mV spare of 25 mV → 0.72.
  it("ranks by the smallest margin relative to its limit", () => {
    const r = evaluatePart(rules, ctx, opAmp(), false);
    expect(r.relative).toBeCloseTo(1 / 2.5, 12);
  });

  it("gives the same findings on every read, and in JSON", () => {
    const r: Part = opAmp();
    const res = evaluatePart(rules, ctx, r, false);
    const first = res.findings.map((f) => [f.rule, f.verdict, f.margin, f.reason]);
    expect(res.findings.map((f) => [f.rule, f.verdict, f.margin, f.reason])).toEqual(first);
    expect(JSON.parse(JSON.stringify(res)).findings.map((f: Finding) => f.rule)).toEqual([
      "output-swing",
      "phase-reversal",
      "offset",
    ]);
  });
});
