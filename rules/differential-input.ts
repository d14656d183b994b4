import {
  defineRule,
  record,
  spareOrShort,
  voltageVerdict,
  type PartOf,
  type RoleContext,
} from "../src/core/rule-kit/index.ts";
import {
  checkClamp,
  CLAMP_CURRENT_MAX_A,
  CLAMP_SAFE_V,
  signDifference,
  type ClampCheck,
} from "../src/core/math/input-difference.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";

export const differentialInput = defineRule({
  id: "differential-input",
  unit: "V",
  checks:
    "The two inputs never differ by more than the part is rated for, or a series resistor keeps the current into its input clamps small.",
  formula:
    "sign stage: D = W (one input at ±W, the other at ground); D ≤ vdiff_max_v; past it, with a series resistor R (front_end.sign_series_ohm), I = (D − vdiff_max_v)/R ≤ 10 mA, at best marginal because the clamps conduct at every crossing; with an empty vdiff_max_v only D ≤ 0.3 V passes",
  source:
    "Many op amps carry back-to-back clamp diodes between their inputs that conduct above about 0.7 V; the 0.3 V below which no clamp conducts and the 10 mA clamp current are common practice [M].",
  policy: "headroom_margin_v",
  kinds: ["op-amp", "comparator"],
  needs: {},
  measure(ctx, part, out) {
    const d = difference(ctx, part);
    const c = d.check;
    switch (c.case) {
      case "below-floor":
        return record(out, "pass", d.volts, CLAMP_SAFE_V, c.margin, CLAMP_SAFE_V);
      case "unrated":
        return record(out, "unrated", d.volts, CLAMP_SAFE_V, c.margin, CLAMP_SAFE_V);
      case "within":
      case "conducts": {
        const rated = d.volts + c.margin;
        return record(out, voltageVerdict(c.margin, ctx.policy), d.volts, rated, c.margin, rated);
      }
      case "limited": {
        // In volts: the difference at which the clamp current would reach its limit.
        const tolerated = d.volts + c.margin * (d.series ?? 0);
        const margin = tolerated - d.volts;
        return record(out, margin < 0 ? "fail" : "marginal", d.volts, tolerated, margin, tolerated);
      }
    }
  },
  describe({ margin }, ctx, part) {
    const d = difference(ctx, part);
    const c = d.check;
    const D = formatVolts(d.volts);
    const where = `${d.what} differ by up to ${D}`;
    const steps = [{ label: d.label, value: d.volts, unit: "V" }];
    switch (c.case) {
      case "below-floor":
        return {
          reason: `${where}, below the ${formatVolts(CLAMP_SAFE_V)} at which any input clamp starts to conduct (common practice): no rating needed`,
          steps,
        };
      case "unrated":
        return {
          reason: `not rated: ${where} and 'vdiff_max_v' is empty for this part; many op amps clamp their inputs at about 0.7 V`,
          steps,
        };
      case "within":
        return {
          reason: `${where}; rated for ${formatVolts(d.rated ?? 0)} between its inputs: ${spareOrShort(margin, "V")}`,
          steps: [
            ...steps,
            { label: "vdiff_max_v", value: d.rated ?? 0, unit: "V" },
            { label: "margin", value: margin, unit: "V" },
          ],
        };
      case "conducts":
        return {
          reason: `${where} against a ${formatVolts(d.rated ?? 0)} limit: its input clamps conduct, load the signal and can be damaged (${spareOrShort(margin, "V")}); add a series resistor (front_end.sign_series_ohm) or choose a part rated for the difference`,
          steps: [
            ...steps,
            { label: "vdiff_max_v", value: d.rated ?? 0, unit: "V" },
            { label: "margin", value: margin, unit: "V" },
          ],
        };
      case "limited":
        return {
          reason: `${where} against a ${formatVolts(d.rated ?? 0)} limit, so its input clamps conduct at every crossing; the ${formatSI(d.series ?? 0, "Ω")} series resistor ${c.margin >= 0 ? "holds" : "only holds"} their current to ${formatSI(c.current_a, "A")} against ${formatSI(CLAMP_CURRENT_MAX_A, "A")} (common practice): ${c.margin >= 0 ? "at best marginal" : "a larger resistor or a part rated for the difference is needed"}`,
          steps: [
            ...steps,
            { label: "vdiff_max_v", value: d.rated ?? 0, unit: "V" },
            { label: "clamp current = (D − vdiff_max_v) / R", value: c.current_a, unit: "A" },
            { label: "current limit", value: CLAMP_CURRENT_MAX_A, unit: "A" },
          ],
        };
    }
  },
});

type Difference = {
  volts: number;
  what: string;
  label: string;
  rated: number | undefined;
  series: number | undefined;
  check: ClampCheck;
};

/** The largest difference between the part's inputs in this role, and what it does to the clamps. */
function difference(ctx: RoleContext, part: PartOf<"op-amp" | "comparator">): Difference {
  const rated = part.vdiff_max_v;
  const series = ctx.design.front_end.sign_series_ohm;
  const { low, high } = ctx.stage.stage === "diode" ? { low: 0, high: 0 } : ctx.stage.input;
  const volts = signDifference(low, high);
  return {
    volts,
    what: "its inputs (one at the signal, one at ground)",
    label: "D = the larger of |input low| and |input high|",
    rated,
    series,
    check: checkClamp(volts, rated, series),
  };
}
