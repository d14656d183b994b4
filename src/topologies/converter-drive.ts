// What every topology shares about the converter's pin and the input's faults
// (SPEC §12.3–12.4): which of the two rules a design's fields allow, the alias
// term, and the display rows that say what is checked and what to fill in.
import { adcSettling } from "../../rules/adc-settling.ts";
import { inputFault } from "../../rules/input-fault.ts";
import { budgetTerm, type BudgetTerm } from "../core/engine/budget.ts";
import type { DisplayGroup, DisplayRow } from "../core/engine/result.ts";
import { DEFAULT_INJECTION_A } from "../core/math/clamp-current.ts";
import { rcAttenuation } from "../core/math/settling.ts";
import { switchedCapOhm, type LoadBranch } from "../core/math/stage-load.ts";
import type { AnyRule, FaultPath, StageLoad } from "../core/rule-kit/index.ts";
import type { Design } from "../core/schemas/design.ts";
import { formatSI } from "../core/units.ts";

/** The design fields the settling rule cannot do without. */
export const SETTLING_FIELDS = ["adc.sample_cap_f", "adc.switch_ohm", "adc.acquisition_s"] as const;

/** Fields every topology reads for the converter's pin and the input's faults. */
export const DRIVE_FIELDS = [
  ...SETTLING_FIELDS,
  "adc.sample_rate_hz",
  "adc.pin_r_ohm",
  "adc.pin_c_f",
  "signal.fault_v",
  "signal.out_of_band_v",
  "front_end.protection_ohm",
  "logic.injection_ma",
] as const;

export function canCheckSettling(design: Design): boolean {
  const a = design.adc;
  return a.sample_cap_f !== undefined && a.switch_ohm !== undefined && a.acquisition_s !== undefined;
}

/**
 * A role's rules for this design: the settling and fault rules stay only when
 * the design states their fields (without them they would make every part
 * unrated; the design's drive is unrated instead, and driveDisplay says so).
 */
export function rulesFor(design: Design, rules: readonly AnyRule[]): readonly AnyRule[] {
  const settle = canCheckSettling(design);
  const fault = design.signal.fault_v !== undefined;
  if (settle && fault) return rules;
  return rules.filter((r) => (r !== adcSettling || settle) && (r !== inputFault || fault));
}

/** Series resistance in front of the front end that is not one of its own resistors: the source and the protection resistor. */
export function seriesInOhm(design: Design): number {
  return design.signal.source_ohm + (design.front_end.protection_ohm ?? 0);
}

/** The fault path straight into an input through `ohm` of resistance, scaled by `gain` (a divider's ratio). */
export function faultPath(gain: number, offsetV: number, ohm: number, what: string): FaultPath {
  return { gain, offset_v: offsetV, ohm, what };
}

/**
 * The load of the stage that drives the converter (SPEC §11.8), with its own
 * branches: the pin draws the sampling capacitor's charge each conversion,
 * 1/(f_s·C_s) through any pin resistor in series (the pin capacitor only
 * stores that charge). Its average current is f_s·C_s·(V_out − V_cap) with the
 * capacitor left anywhere in the converter's range 0 … V_ref between samples
 * (reset to ground or precharged; common practice [M]), so the branch returns
 * to that whole span and the current rule takes its worst end. Without the sample rate or capacitor the draw is
 * unknown and left out, and the reason says so.
 */
export function drivingPin(design: Design, branches: LoadBranch[]): StageLoad {
  const { sample_rate_hz: fs, sample_cap_f: cs, pin_r_ohm: rPin } = design.adc;
  if (fs === undefined || cs === undefined) {
    const missing = [fs === undefined ? "adc.sample_rate_hz" : null, cs === undefined ? "adc.sample_cap_f" : null]
      .filter((x) => x !== null)
      .join(" and ");
    return { branches, left_out: `the converter pin's sampling draw (no ${missing})` };
  }
  const pin = switchedCapOhm(fs, cs) + (rPin ?? 0);
  const what =
    rPin !== undefined && rPin > 0
      ? `the converter pin, R_pin + 1/(f_s·C_s) = ${formatSI(rPin, "Ω")} + ${formatSI(switchedCapOhm(fs, cs), "Ω")}`
      : "the converter pin, 1/(f_s·C_s)";
  return { branches: [...branches, { what, ohm: pin, return_v: { low: 0, high: design.adc.reference_v } }] };
}

/** The pin RC's corner, when the design gives both parts. */
function pinCorner(design: Design): number | null {
  const r = design.adc.pin_r_ohm ?? 0;
  const c = design.adc.pin_c_f ?? 0;
  return r > 0 && c > 0 ? 1 / (2 * Math.PI * r * c) : null;
}

/**
 * The converter-pin terms (SPEC §12.3). Alias: content at sample_rate − f_max
 * folds onto f_max; it is taken as signal.out_of_band_v, or as large as the
 * signal's peak when the design does not say (nothing else bounds it),
 * attenuated by the pin RC alone (the op amps' own poles are left out, which
 * can only overstate it). The pin RC's own gain error at f_max,
 * (1 − |H(f_max)|)·peak, joins it when the design has an RC.
 */
export function pinTerms(design: Design): BudgetTerm[] {
  const terms: BudgetTerm[] = [];
  const r = design.adc.pin_r_ohm ?? 0;
  const c = design.adc.pin_c_f ?? 0;
  const fmax = design.signal.max_frequency_hz;
  if (r > 0 && c > 0) {
    const h = rcAttenuation(fmax, r, c);
    const e = (1 - h) * design.signal.peak_v;
    terms.push(
      budgetTerm(
        "pin-rc",
        "pin RC gain error at f max",
        e,
        `(1 − 1/√(1 + (f/fc)²)) × peak, fc = 1/(2π·${formatSI(r, "Ω")}·${formatSI(c, "F")}) = ${formatSI(1 / (2 * Math.PI * r * c), "Hz")}: (1 − ${Number(h.toPrecision(6))}) × ${formatSI(design.signal.peak_v, "V")} = ${formatSI(e, "V")}`,
        "none",
      ),
    );
  }
  const fs = design.adc.sample_rate_hz;
  if (fs !== undefined) {
    const fa = Math.abs(fs - fmax);
    const h = rcAttenuation(fa, r, c);
    const stated = design.signal.out_of_band_v;
    const size = stated ?? design.signal.peak_v;
    terms.push(
      budgetTerm(
        "alias",
        `alias: ${stated === undefined ? "signal-size content (no signal.out_of_band_v)" : "out-of-band content"} at sample rate − f max`,
        size * h,
        `content × |H(f_s − f_max)| of the pin RC = ${formatSI(size, "V")} × ${Number(h.toPrecision(4))} at ${formatSI(fa, "Hz")} = ${formatSI(size * h, "V")}`,
        "none",
      ),
    );
  }
  return terms;
}

/** The rows every topology shows about the converter's pin and faults: what is checked, or what to fill in. */
export function driveDisplay(design: Design): DisplayGroup {
  const a = design.adc;
  const rows: DisplayRow[] = [];
  if (canCheckSettling(design)) {
    rows.push({
      label: "Settling to ½ LSB",
      value: `checked on the stage that drives the pin: ${formatSI(a.sample_cap_f ?? 0, "F")} sampled through ${formatSI(a.switch_ohm ?? 0, "Ω")} in ${formatSI(a.acquisition_s ?? 0, "s")}`,
    });
  } else {
    const missing = SETTLING_FIELDS.filter(
      (f) => a[f.slice(4) as "sample_cap_f" | "switch_ohm" | "acquisition_s"] === undefined,
    );
    rows.push({ label: "Settling to ½ LSB", value: `unrated: fill in ${missing.join(", ")}` });
  }
  const fc = pinCorner(design);
  if (fc !== null) rows.push({ label: "Pin RC corner 1/(2π·R_pin·C_pin)", value: formatSI(fc, "Hz") });
  if (a.sample_rate_hz === undefined) {
    rows.push({ label: "Alias term", value: "unrated: fill in adc.sample_rate_hz" });
  } else {
    const fa = Math.abs(a.sample_rate_hz - design.signal.max_frequency_hz);
    rows.push({
      label: "Folds onto f max from sample rate − f max",
      value: `${formatSI(fa, "Hz")}${a.sample_rate_hz < 2 * design.signal.max_frequency_hz ? " (below the Nyquist rate: the signal itself aliases)" : ""}`,
    });
  }
  if (design.signal.fault_v === undefined) {
    rows.push({ label: "Input fault", value: "unrated: fill in signal.fault_v (and front_end.protection_ohm)" });
  } else {
    rows.push({
      label: "Input fault ±fault_v into the input pins' clamps",
      value: `±${formatSI(design.signal.fault_v, "V")} through ${formatSI(seriesInOhm(design), "Ω")} of source and series resistance; limit ${formatSI(design.logic.injection_ma === undefined ? DEFAULT_INJECTION_A : design.logic.injection_ma * 1e-3, "A")}${design.logic.injection_ma === undefined ? " (common practice)" : ""}`,
    });
  }
  return { title: "Converter drive and input protection", rows };
}

/** appliesTo for the single-ended front ends. */
export function singleEndedOnly(design: Design): string | null {
  return design.signal.kind === "differential"
    ? "it takes a single-ended signal, and this design's is differential"
    : null;
}

/** The problem a single-ended topology gives a differential design named for it. */
export function notSingleEnded(topology: string): { path: string; message: string } {
  return {
    path: "signal.kind",
    message: `${topology} takes a single-ended signal (got 'differential', expected 'single-ended' or no signal.kind; difference-to-mid takes a differential source)`,
  };
}
