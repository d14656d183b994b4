// The rule registry: every rule, in the order the rules page lists them.
// Adding a rule: write its module, list it here, and hand the rule object to
// the roles that use it in a topology module (src/topologies/).
import type { AnyRule } from "../src/core/rule-kit/index.ts";
import { adcSettling } from "./adc-settling.ts";
import { bandwidth } from "./bandwidth.ts";
import { clampLeakage } from "./clamp-leakage.ts";
import { baseEmitterReverse } from "./base-emitter-reverse.ts";
import { differentialInput } from "./differential-input.ts";
import { forwardCurrent } from "./forward-current.ts";
import { inputCommonMode } from "./input-common-mode.ts";
import { inputFault } from "./input-fault.ts";
import { lateSign } from "./late-sign.ts";
import { leakage } from "./leakage.ts";
import { logicHigh } from "./logic-high.ts";
import { logicLow } from "./logic-low.ts";
import { offset } from "./offset.ts";
import { outputCurrent } from "./output-current.ts";
import { outputLoad } from "./output-load.ts";
import { outputSwing } from "./output-swing.ts";
import { stageOutputCurrent } from "./stage-output-current.ts";
import { overloadRecoveryRule } from "./overload-recovery.ts";
import { phaseReversal } from "./phase-reversal.ts";
import { propagationDelay } from "./propagation-delay.ts";
import { pumpLoad } from "./pump-load.ts";
import { recovery } from "./recovery.ts";
import { reverseVoltage } from "./reverse-voltage.ts";
import { riseTime } from "./rise-time.ts";
import { signDeadBand } from "./sign-dead-band.ts";
import { slewRate } from "./slew-rate.ts";
import { supplyRange } from "./supply-range.ts";
import { unityGainStable } from "./unity-gain-stable.ts";
import { zeroCrossing } from "./zero-crossing.ts";

export const RULES = [
  supplyRange,
  inputCommonMode,
  outputSwing,
  outputLoad,
  stageOutputCurrent,
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
  differentialInput,
  overloadRecoveryRule,
  riseTime,
  lateSign,
  outputCurrent,
  baseEmitterReverse,
  pumpLoad,
  reverseVoltage,
  recovery,
  leakage,
  clampLeakage,
  forwardCurrent,
  adcSettling,
  inputFault,
] as const;

/** Every rule id, derived from the list: no hand-kept union. */
export type RuleId = (typeof RULES)[number]["id"];

export const RULE_IDS: readonly RuleId[] = RULES.map((r) => r.id);

export const RULES_BY_ID: ReadonlyMap<string, AnyRule> = new Map(RULES.map((r): [string, AnyRule] => [r.id, r]));
