// Every budget term any topology can report, as the rules page lists it: its
// name, what it is, its formula, the least calibration that removes it and
// its source. test/topologies/budget-terms.test.ts checks that every term the
// demo designs produce is here, so a new term cannot go unlisted.
import type { Calibration } from "../core/engine/budget.ts";

export type TermInfo = { name: string; what: string; formula: string; removed_by: Calibration; source: string };

const IEEE = "IEEE Std 1241-2010 (Q = V_ref/2^N; some texts use V_ref/(2^N − 1))";
const DIVIDER = "divider arithmetic, exact worst corners (SPEC §11.1)";
const RECT = "two-op-amp precision rectifier (Franco; Sedra & Smith) [M for the sections]";

export const BUDGET_TERM_INFO: readonly TermInfo[] = [
  {
    name: "quantization",
    what: "half a converter step",
    formula: "0.5 · (V_ref/2^N) / gain",
    removed_by: "none",
    source: IEEE,
  },
  {
    name: "reference",
    what: "ADC reference tolerance",
    formula: "tolerance · peak",
    removed_by: "one-point",
    source: "gain error, scales the reading",
  },
  {
    name: "reference-tempco",
    what: "ADC reference drift over the temperature range",
    formula: "tempco · max|T − 25 °C| · peak",
    removed_by: "none",
    source: "a calibration at one temperature leaves the drift (SPEC §11.10)",
  },
  {
    name: "adc-offset",
    what: "converter offset",
    formula: "offset_lsb · Q / gain",
    removed_by: "two-point",
    source: IEEE,
  },
  {
    name: "adc-gain",
    what: "converter gain error",
    formula: "gain_error · peak",
    removed_by: "one-point",
    source: IEEE,
  },
  {
    name: "adc-inl",
    what: "converter integral non-linearity",
    formula: "inl_lsb · Q / gain",
    removed_by: "none",
    source: IEEE,
  },
  {
    name: "divider-ratio",
    what: "divider ratio over both resistors' tolerance",
    formula: "k = R2/(Rs + R1 + R2); max |k(R1 ∓ t, R2 ± t)/k − 1| · peak",
    removed_by: "one-point",
    source: DIVIDER,
  },
  {
    name: "source-resistance",
    what: "source resistance tolerance through the divider",
    formula: "max |k(Rs ± t_s)/k − 1| · peak",
    removed_by: "one-point",
    source: DIVIDER,
  },
  {
    name: "rectifier-ratio-common",
    what: "rectifier resistor ratios, the part both half-waves share",
    formula: "g+ = Rf2·(Rf1/(Ri1·Rb) − 1/Ra), g− = Rf2/Ra over 32 corners; max |(g+ + g−)/2 − 1| · peak",
    removed_by: "one-point",
    source: RECT,
  },
  {
    name: "rectifier-ratio-difference",
    what: "rectifier resistor ratios, the difference between the half-waves",
    formula: "max |g+ − g−| · peak over 32 corners",
    removed_by: "none",
    source: RECT,
  },
  {
    name: "noise",
    what: "random noise of the chain at coverage factor 2",
    formula: "2 · √Σ(√(en² + (in·R)² + 4kTR) · NG · √((π/2)·GBW/NG) · weight / k)²",
    removed_by: "none",
    source: "Johnson, Nyquist (Phys. Rev. 32, 1928); single-pole noise bandwidth (π/2)·fc; JCGM 100:2008 §6 (k = 2)",
  },
  {
    name: "buffer-offset",
    what: "buffer offset and bias current",
    formula: "(Vos + Ib·R_th) / k",
    removed_by: "two-point",
    source: "offset rule",
  },
  {
    name: "buffer-bandwidth",
    what: "buffer gain error at f max",
    formula: "bandwidth rule",
    removed_by: "none",
    source: "bandwidth rule",
  },
  {
    name: "rectifier-1-offset",
    what: "rectifier stage 1 offset and bias current, at the summer's weight 2",
    formula: "2 · (2·Vos + Ib·R) / k",
    removed_by: "none",
    source: "offset rule; the summer weights stage 1 by 2",
  },
  {
    name: "rectifier-2-offset",
    what: "rectifier stage 2 (summer) offset and bias current",
    formula: "(4·Vos + Ib·R) / k",
    removed_by: "none",
    source: "offset rule; noise gain 1 + R/(R ‖ R/2) = 4",
  },
  {
    name: "rectifier-1-bandwidth",
    what: "rectifier stage 1 gain error at f max, at weight 2",
    formula: "(1 − 1/√(1 + (f/(GBW/2))²)) · 2 · peak",
    removed_by: "none",
    source: "bandwidth rule",
  },
  {
    name: "rectifier-2-bandwidth",
    what: "rectifier stage 2 (summer) gain error at f max",
    formula: "(1 − 1/√(1 + (f/(GBW/4))²)) · peak",
    removed_by: "none",
    source: "bandwidth rule",
  },
  {
    name: "sign-dead-band",
    what: "comparator dead band",
    formula: "sign-dead-band rule",
    removed_by: "none",
    source: "sign-dead-band rule",
  },
  {
    name: "rectifier-diode-leakage",
    what: "rectifier diode leakage",
    formula: "leakage rule",
    removed_by: "none",
    source: "leakage rule",
  },
  {
    name: "rectifier-dead-time",
    what: "rectifier dead time at the crossings",
    formula: "zero-crossing rule",
    removed_by: "none",
    source: "zero-crossing rule (SPEC §11.3)",
  },
  {
    name: "late-sign",
    what: "late sign decision at the crossings",
    formula: "late-sign rule",
    removed_by: "none",
    source: "late-sign rule (SPEC §11.4)",
  },
  {
    name: "network-ratio",
    what: "level-shift network over its three resistors' tolerance",
    formula: "worst of the eight tolerance corners at ±peak",
    removed_by: "one-point",
    source: "Millman network arithmetic",
  },
  {
    name: "level-shift-offset",
    what: "level shifter offset and bias current",
    formula: "offset rule",
    removed_by: "two-point",
    source: "offset rule",
  },
  {
    name: "level-shift-bandwidth",
    what: "level shifter gain error at f max",
    formula: "bandwidth rule",
    removed_by: "none",
    source: "bandwidth rule",
  },
  {
    name: "reference-buffer-offset",
    what: "reference buffer offset",
    formula: "offset rule",
    removed_by: "two-point",
    source: "offset rule",
  },
];
