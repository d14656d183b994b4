// What a topology module declares (src/topologies/<id>.ts) and what the
// engine hands it while it evaluates. The engine runs whatever topologies it
// is given (createEngine in engine.ts) and knows none of them by name.
import type { Catalogue } from "../catalogue-index.ts";
import type { Capability } from "../kinds.ts";
import type { AnyRule, Rails, Stage } from "../rule-kit/types.ts";
import type { Design } from "../schemas/design.ts";
import type { ChainBuilder } from "./simulate-result.ts";
import type { BudgetTerm, Conversion, NoiseFigure, RoleTerm } from "./budget.ts";
import type { Derived, DesignProblem, DisplayGroup, RoleResult } from "./result.ts";

export type { DisplayGroup, DisplayRow } from "./result.ts";

/**
 * A design value a role depends on: the role exists only when the design's
 * value at `path` (dot-separated) is one of `is`. Data, so the engine and the
 * try page's form (which holds text, not a Design) read the same condition.
 */
export type RoleCondition = { path: string; is: readonly string[] };

export type RoleDef = {
  /** The role's id, as in a design's `bom`. */
  id: string;
  /** Short name for headings and table columns ("Sign comparator"). */
  name: string;
  /** Label of its BOM box on the try page ("Sign comparator"). */
  field: string;
  /** What the role does, in a few words. */
  label: string;
  /** What its parts must be able to do; the kind registry says which kinds can. */
  wants: Capability;
  /** The rules every candidate must pass (rule objects from rules/). */
  rules: readonly AnyRule[];
  /** A role that may be left out without failing the design. */
  optional?: boolean;
  /** How many parts of this role go on the board (the rectifier's two op amps). Default 1. */
  count?: number;
  /** The role exists only when every condition holds. */
  when?: readonly RoleCondition[];
};

/**
 * One stage of a role. A role of one stage passes a Stage; a role whose part
 * serves several stages (a two-op-amp rectifier) passes one plan per stage,
 * each checked with its own rules, and every finding names its stage.
 */
export type StagePlan = {
  /** Short id shown with each finding ("stage-1"). */
  id: string;
  stage: Stage;
  /** Rules for this stage; the role's rules when absent. */
  rules?: readonly AnyRule[];
};

/** What a topology hands back from one evaluation. */
export type TopologyOutcome = {
  derived: Derived;
  notes: string[];
  /** Budget terms that do not come from a role's finding (quantization, ratios, noise, anything new). */
  terms: BudgetTerm[];
  /** Codes of the ADC the signal spans, in bits (not an ENOB). */
  codesSpannedBits: number;
  /** The chain's noise and the ENOB it leaves (SPEC §11.9), when the topology works it out. */
  noise?: NoiseFigure;
  conversion: Conversion;
  /** Its derived values, worded, in the order the reader needs them. */
  display: DisplayGroup[];
};

/** What the engine gives a topology's evaluate. */
export type TopologyRun = {
  design: Design;
  catalogue: Catalogue;
  /** Weighs every part that can fill the role; runs once per role per evaluation. */
  role(id: string, stages: Stage | readonly StagePlan[], rails: Rails): RoleResult;
};

export type TopologyEvaluation = { ok: true; outcome: TopologyOutcome } | { ok: false; problems: DesignProblem[] };

export type TopologyDef = {
  id: string;
  title: string;
  /** How it works, with the formulas and their sources; the rules page prints it. */
  description: string;
  /** How its firmware reads volts from a code (rules page). */
  reading: string;
  roles: readonly RoleDef[];
  /** Design fields it reads (dot paths into the design file). */
  fields: readonly string[];
  /** Budget terms taken from the chosen part's finding of one rule. */
  roleTerms: readonly RoleTerm[];
  /** Checks of a design that only this topology needs, by JSON path (run when the design names it). */
  checkDesign?(design: Design): DesignProblem[];
  evaluate(run: TopologyRun): TopologyEvaluation;
  /** The chain the simulator runs for one of its results (SPEC §13), from the parts it uses; absent: not simulated. */
  simulation?: ChainBuilder;
};

/** Identity, so a topology module's object literal is checked as one. */
export function defineTopology<const T extends TopologyDef>(topology: T): T {
  return topology;
}
