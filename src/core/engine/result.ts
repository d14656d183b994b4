// What evaluating a design yields: derived values and, per role, ranked parts.
import type { PartKind } from "../catalogue-index.ts";
import type { Divider } from "../math/divider.ts";
import type { PumpRail } from "../math/charge-pump.ts";
import type { LevelShiftNetwork } from "../math/level-shift.ts";
import type { Design, Role } from "../schemas/design.ts";
import { isFitResult, type PartResult } from "./evaluate-part.ts";
import type { Rails, Stage } from "../rule-kit/types.ts";
import type { SimulationOutcome } from "../sim/report.ts";
import type { Budget, Conversion } from "./budget.ts";
import type { PumpLoad } from "../math/pump-load.ts";
import type { DesignState, DesignVerdict } from "./verdict-shape.ts";

/** A derived value the pages, the try page and the CLI print as it is. */
export type DisplayRow = { label: string; value: string; partId?: string; role?: string };
export type DisplayGroup = { title: string; rows: DisplayRow[] };

export type RoleResult = {
  role: Role;
  /** The kind the role asks for; the sign role also takes op amps. */
  kind: PartKind;
  kinds: readonly PartKind[];
  /** What the role does, in a few words. */
  label: string;
  rules: readonly string[];
  /** The role's first (often only) stage. */
  stage: Stage;
  /** Every stage the role's part serves; `id` is set when there are several. */
  stages: readonly { id?: string; stage: Stage; rules: readonly string[] }[];
  /** Parts of this role on the board (default 1). */
  count?: number;
  /** Ranked on first read. */
  fits: PartResult[];
  rejected: PartResult[];
  /** How many parts fit, without ranking them. */
  readonly fitCount: number;
  /** One part's result, without ranking the role. */
  resultOf(id: string): PartResult | undefined;
  /** BOM id for this role, if any. */
  bom?: string;
  /** The part the design uses: the BOM part, else the best-ranked fit. */
  chosen?: string;
  /** A role that may be left out without failing the design. */
  optional?: boolean;
};

export type DiodeUse = { id: string; vf_v: number; current_a: number; fits: boolean };

export type Derived = {
  rails: Rails;
  negative:
    | { kind: "ground" }
    | { kind: "fixed" }
    | ({
        kind: "charge-pump";
        diode: DiodeUse;
        /** The rail's load as a sum: the stated load and each part's supply current (SPEC §11.5). */
        load?: PumpLoad;
        /** The temperature the pump diode's drop is taken at (the cold end). */
        vf_c?: number;
      } & PumpRail);
  /** Target ratio window/peak (1 when no divider is needed). */
  target_ratio: number;
  divider: Divider | null;
  /** Ratio actually used, k. */
  ratio: number;
  /** Window actually used, W = k · peak_v. */
  window_v: number;
  /** (Rs + R1) ‖ R2. */
  thevenin_ohm: number;
  /** One ADC step referred to the input: (reference_v / 2^bits) / k. */
  adc_step_at_input_v: number;
  rectifier_diode?: DiodeUse;
  clamp_diode?: DiodeUse;
  /** Level-shift front ends only: the Millman network and the output span it gives. */
  level_shift?: LevelShiftNetwork & { output_low_v: number; output_high_v: number };
};

export type DesignResult = {
  design: Design;
  topology: string;
  derived: Derived;
  /** The topology's derived values, worded: what the CLI, the design page and the try page print. */
  display: DisplayGroup[];
  roles: RoleResult[];
  /** Things the reader must know about how the numbers were obtained. */
  notes: string[];
  budget: Budget;
  /** The design's verdict with its reasons (SPEC §11.11): roles, BOM parts and the budget together. */
  verdict: DesignVerdict;
  conversion: Conversion;
  /** The behavioural simulation's report (SPEC §13), when the caller ran it (CLI, site build, try page on demand). */
  simulation?: SimulationOutcome;
  /** Present when the design asked for topology "all": both topologies side by side. */
  comparison?: Comparison;
};

export type ComparisonRow = {
  topology: string;
  holds: boolean;
  /** The topology's design verdict (SPEC §11.11). */
  state: DesignState;
  roles: { role: Role; fits: number; chosen?: string }[];
  codes_spanned_bits: number;
  budget_verdict: Budget["verdict"];
  budget_worst_case_v: number;
  dominant: string | null;
  part_count: number;
  cost_total: number;
};

export type Comparison = {
  rows: ComparisonRow[];
  recommended: string;
  /** Why the recommended topology wins, as a clause ("its budget passes …"). */
  reason: string;
  /** Every topology's full result, in row order. */
  results: DesignResult[];
  /** Registered topologies left out because they cannot serve the design, and why. */
  skipped?: { topology: string; reason: string }[];
};

export type DesignProblem = { path: string; message: string };

export type Evaluation = { ok: true; result: DesignResult } | { ok: false; problems: DesignProblem[] };

/** Every BOM part fits and every required role has a fit (SPEC §10); the budget is not read: see `verdict`. */
export function designHolds(result: DesignResult): boolean {
  return result.roles.every((r) => {
    if (r.optional && r.fitCount === 0 && !r.bom) return true;
    if (r.fitCount === 0) return false;
    return r.bom === undefined || isFitResult(r.resultOf(r.bom));
  });
}
