import { defineRule } from "../src/core/engine/finding.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";

export const unityGainStable = defineRule({
  id: "unity-gain-stable",
  unit: "",
  checks: "The op amp is stable at the low noise gain these stages run at (a follower is gain 1).",
  formula: "pass when unity_gain_stable = yes, otherwise fail",
  source: "Decompensated amplifiers need a minimum closed-loop gain (datasheet; common practice).",
  policy: null,
  kinds: ["op-amp"],
  needs: { "op-amp": ["unity_gain_stable"] },
  measure(_ctx, part) {
    const stable = (part as OpAmp).unity_gain_stable;
    return {
      verdict: stable ? "pass" : "fail",
      needed: 1,
      available: stable ? 1 : 0,
      margin: stable ? 0 : -1,
    } as const;
  },
  describe({ available }, { stage }) {
    const gain = stage.stage === "op-amp" ? stage.noise_gain : 1;
    return {
      reason:
        available === 1
          ? `stable as a follower; ${stage.label} runs at noise gain ${gain}`
          : `not unity-gain stable: ${stage.label} runs at noise gain ${gain}, where a decompensated part may oscillate`,
      steps: [{ label: "unity_gain_stable (1 = yes)", value: available, unit: "" }],
    };
  },
});
