import { defineRule, record } from "../src/core/rule-kit/index.ts";

export const unityGainStable = defineRule({
  id: "unity-gain-stable",
  unit: "",
  checks: "The op amp is stable at the low noise gain these stages run at (a follower is gain 1).",
  formula: "pass when unity_gain_stable = yes, otherwise fail",
  source: "Decompensated amplifiers need a minimum closed-loop gain (datasheet; common practice).",
  policy: null,
  kinds: ["op-amp"],
  needs: { "op-amp": ["unity_gain_stable"] },
  measure(_ctx, part, out) {
    const stable = part.unity_gain_stable;
    record(out, stable ? "pass" : "fail", 1, stable ? 1 : 0, stable ? 0 : -1, undefined);
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
