// Runs one rule on one part the way the engine does (through evaluatePart, so an
// empty needed column gives `unrated`), with stages written out from SPEC §6–§7.
import type { Part } from "../../src/core/catalogue.ts";
import { evaluatePart } from "../../src/core/engine/evaluate-part.ts";
import type { DiodeStage, Finding, OpAmpStage, Rails, SignStage, Stage } from "../../src/core/engine/types.ts";
import type { Design, Role } from "../../src/core/schemas/design.ts";
import { RULES_BY_ID, type RuleId } from "../../rules/index.ts";
import { design as makeDesign } from "./designs.ts";

export const SPLIT_5V: Rails = { positive_v: 5, negative_v: -5 };
export const GROUND_5V: Rails = { positive_v: 5, negative_v: 0 };

/** Follower after the divider: in = out = ±W, noise gain 1, Ib through R_th. */
export function bufferStage(o: { w?: number; k?: number; rth?: number; peak?: number } = {}): OpAmpStage {
  const w = o.w ?? 2.5;
  const k = o.k ?? 1;
  return {
    stage: "op-amp",
    label: "the buffer",
    input: { low: -w, high: w },
    output: { low: -w, high: w },
    noise_gain: 1,
    vos_multiplier: 1,
    bias_ohm: o.rth ?? 0,
    output_per_input: k,
    bandwidth_peak_v: o.peak ?? w / k,
    slew_amplitude_v: w,
  };
}

/** Precision rectifier: output −Vf … W + Vf, noise gain 2, offset 2·Vos + Ib·R_load. */
export function rectifierStage(
  o: { w?: number; vf?: number; k?: number; load?: number; peak?: number } = {},
): OpAmpStage {
  const w = o.w ?? 2.5;
  const vf = o.vf ?? 0.6;
  const k = o.k ?? 1;
  return {
    stage: "op-amp",
    label: "the rectifier",
    input: { low: -w, high: w },
    output: { low: -vf, high: w + vf },
    noise_gain: 2,
    vos_multiplier: 2,
    bias_ohm: o.load ?? 10000,
    output_per_input: k,
    bandwidth_peak_v: o.peak ?? w / k,
    slew_amplitude_v: w + vf,
    zero_crossing_v: 2 * vf,
  };
}

export function signStage(o: { w?: number; k?: number; clamp?: SignStage["clamp"] } = {}): SignStage {
  const w = o.w ?? 2.5;
  return {
    stage: "sign",
    label: "the sign comparator",
    input: { low: -w, high: w },
    output_per_input: o.k ?? 1,
    ...(o.clamp ? { clamp: o.clamp } : {}),
  };
}

/** Pump diode of a drive_v square wave at frequency_hz carrying load_a (SPEC §7). */
export function pumpDiodeStage(
  o: { drive?: number; frequency?: number; load?: number; timing?: number } = {},
): DiodeStage {
  const drive = o.drive ?? 5;
  const f = o.frequency ?? 980;
  return {
    stage: "diode",
    label: "the pump diode",
    reverse_v: 2 * drive,
    reverse_what: `2 × the ${drive} V drive`,
    recovery_limit_s: (o.timing ?? 0.01) / (2 * f),
    recovery_what: "1 % of the pump's half period",
    forward_a: 2 * (o.load ?? 0.001),
  };
}

export function rectifierDiodeStage(
  o: { w?: number; k?: number; load?: number; limit?: number; f?: number } = {},
): DiodeStage {
  const w = o.w ?? 2.5;
  return {
    stage: "diode",
    label: "the rectifier diode",
    reverse_v: 2 * w,
    reverse_what: "2 × the window",
    recovery_limit_s: 0.01 / (o.f ?? 200),
    recovery_what: "1 % of the signal period",
    leakage_ohm: o.load ?? 10000,
    leakage_limit_v: o.limit ?? 0.025,
    leakage_per_input: o.k ?? 1,
    leakage_what: "offset share of the required accuracy, input-referred",
  };
}

export function clampDiodeStage(o: { negative?: number; pull?: number; vil?: number } = {}): DiodeStage {
  return {
    stage: "diode",
    label: "the clamp diode",
    reverse_v: Math.abs(o.negative ?? -5),
    reverse_what: "|V−|, when the comparator output sits low",
    leakage_ohm: o.pull ?? 10000,
    leakage_limit_v: o.vil ?? 1.5,
    leakage_what: "V_IL of the logic input",
  };
}

export type RuleRun = { part: Part; stage: Stage; design?: Design; rails?: Rails; role?: Role };

/** The finding of one rule for one part, as evaluatePart produces it. */
export function check(rule: RuleId, run: RuleRun): Finding {
  const r = RULES_BY_ID.get(rule);
  if (!r) throw new Error(`no rule ${rule}`);
  const design = run.design ?? makeDesign();
  const ctx = {
    role: run.role ?? "buffer",
    stage: run.stage,
    design,
    policy: design.policy,
    rails: run.rails ?? SPLIT_5V,
  };
  const result = evaluatePart([r], ctx, run.part, false);
  const f = result.findings[0];
  if (!f) throw new Error("no finding");
  return f;
}

export type Expected = {
  verdict: Finding["verdict"];
  needed: number | null;
  available: number | null;
  margin: number | null;
};
export type RuleCase = { label: string; run: RuleRun; expected: Expected };

/** The finding's verdict and numbers, to within 1 part in 10⁹ (float noise only). */
export function expectFinding(f: Finding, e: Expected): void {
  const close = (a: number | null, b: number | null) =>
    a === null || b === null ? a === b : Math.abs(a - b) <= 1e-9 * Math.abs(b) + 1e-15;
  const got = { verdict: f.verdict, needed: f.needed, available: f.available, margin: f.margin };
  const same =
    f.verdict === e.verdict &&
    close(f.needed, e.needed) &&
    close(f.available, e.available) &&
    close(f.margin, e.margin);
  if (!same)
    throw new Error(
      `finding differs:\n  got      ${JSON.stringify(got)}\n  expected ${JSON.stringify(e)}\n  reason   ${f.reason}`,
    );
}

/** Each case's reason sentence by its label, for one inline snapshot per rule. */
export function reasons(rule: RuleId, cases: readonly RuleCase[]): Record<string, string> {
  return Object.fromEntries(cases.map((c) => [c.label, `${c.expected.verdict}: ${check(rule, c.run).reason}`]));
}
