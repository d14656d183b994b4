// The rules every op-amp signal stage passes, whatever the topology (SPEC §7, buffer row).
import { bandwidth } from "../../rules/bandwidth.ts";
import { inputCommonMode } from "../../rules/input-common-mode.ts";
import { offset } from "../../rules/offset.ts";
import { outputLoad } from "../../rules/output-load.ts";
import { outputSwing } from "../../rules/output-swing.ts";
import { phaseReversal } from "../../rules/phase-reversal.ts";
import { slewRate } from "../../rules/slew-rate.ts";
import { stageOutputCurrent } from "../../rules/stage-output-current.ts";
import { supplyRange } from "../../rules/supply-range.ts";
import { unityGainStable } from "../../rules/unity-gain-stable.ts";
import type { AnyRule } from "../core/rule-kit/index.ts";

export const OP_AMP_STAGE_RULES: readonly AnyRule[] = [
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
];
