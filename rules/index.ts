// Every rule, by id. Adding a rule: write its module, list it here, name it in
// a topology's role table (src/core/engine/topologies/).
import type { Rule } from "../src/core/engine/types.ts";
import { bandwidth } from "./bandwidth.ts";
import { forwardCurrent } from "./forward-current.ts";
import { inputCommonMode } from "./input-common-mode.ts";
import { leakage } from "./leakage.ts";
import { logicHigh } from "./logic-high.ts";
import { logicLow } from "./logic-low.ts";
import { offset } from "./offset.ts";
import { outputSwing } from "./output-swing.ts";
import { phaseReversal } from "./phase-reversal.ts";
import { propagationDelay } from "./propagation-delay.ts";
import { recovery } from "./recovery.ts";
import { reverseVoltage } from "./reverse-voltage.ts";
import { signDeadBand } from "./sign-dead-band.ts";
import { slewRate } from "./slew-rate.ts";
import { supplyRange } from "./supply-range.ts";
import { unityGainStable } from "./unity-gain-stable.ts";
import { zeroCrossing } from "./zero-crossing.ts";

export const RULES: readonly Rule[] = [
  supplyRange,
  inputCommonMode,
  outputSwing,
  unityGainStable,
  phaseReversal,
  offset,
  bandwidth,
  slewRate,
  zeroCrossing,
  logicHigh,
  logicLow,
  propagationDelay,
  signDeadBand,
  reverseVoltage,
  recovery,
  leakage,
  forwardCurrent,
];

export const RULES_BY_ID: ReadonlyMap<string, Rule> = new Map(RULES.map((r) => [r.id, r]));

export type RuleId =
  | "supply-range"
  | "input-common-mode"
  | "output-swing"
  | "unity-gain-stable"
  | "phase-reversal"
  | "offset"
  | "bandwidth"
  | "slew-rate"
  | "zero-crossing"
  | "logic-high"
  | "logic-low"
  | "propagation-delay"
  | "sign-dead-band"
  | "reverse-voltage"
  | "recovery"
  | "leakage"
  | "forward-current";
