import type { Rule } from "../src/core/engine/types.ts";
import { finding } from "../src/core/engine/finding.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";

export const unityGainStable: Rule = {
  id: "unity-gain-stable",
  unit: "",
  checks: "The op amp is stable at the low noise gain these stages run at (a follower is gain 1).",
  formula: "pass when unity_gain_stable = yes, otherwise fail",
  source: "Decompensated amplifiers need a minimum closed-loop gain (datasheet; common practice).",
  policy: null,
  kinds: ["op-amp"],
  needs: { "op-amp": ["unity_gain_stable"] },
  evaluate({ part, stage }) {
    const p = part as OpAmp;
    const gain = stage.stage === "op-amp" ? stage.noise_gain : 1;
    const stable = p.unity_gain_stable;
    return finding("unity-gain-stable", {
      verdict: stable ? "pass" : "fail",
      needed: 1,
      available: stable ? 1 : 0,
      margin: stable ? 0 : -1,
      unit: "",
      reason: stable
        ? `stable as a follower; ${stage.label} runs at noise gain ${gain}`
        : `not unity-gain stable: ${stage.label} runs at noise gain ${gain}, where a decompensated part may oscillate`,
      steps: () => [{ label: "unity_gain_stable (1 = yes)", value: stable ? 1 : 0, unit: "" }],
    });
  },
};
