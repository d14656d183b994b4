// The pump carries the parts (SPEC §11.5): every op amp and comparator channel
// on V− draws its supply current from the pumped rail. The role's other checks
// used the rail worked out with its pick's draw; a candidate that draws more
// would make the rail shallower than those checks assumed, so it is at best
// marginal here until a design names it (in its BOM the rail is worked out
// with its own draw, and every check is exact).
import { defineRule, record, type PartOf, type RoleContext } from "../src/core/rule-kit/index.ts";
import { poweredChannels, railAt } from "../src/core/math/pump-rail.ts";
import { formatSI, formatVolts } from "../src/core/units.ts";

function work(ctx: RoleContext, part: PartOf<"op-amp" | "comparator">) {
  const p = ctx.rails.pump;
  if (p === undefined) return undefined;
  const channels = poweredChannels(p.channels, part.channels);
  const own = channels * part.iq_ma * 1e-3;
  const total = p.other_a + own;
  const rail = railAt(p, total);
  const collapses = total >= rail.collapse_a || rail.worst_v >= 0;
  return { p, channels, own, total, rail, collapses, shallower: rail.worst_v - ctx.rails.negative_v };
}

export const pumpLoad = defineRule({
  id: "pump-load",
  unit: "V",
  checks:
    "On a charge-pumped V−, the part's own supply current (iq_ma per channel) adds to the rail's load; the rail it would see stays as deep as the one the role's other checks used.",
  formula:
    "I = load_a + Σ other roles' channels × iq + this part's channels × iq; V− = −(drive − 2·Vf(2I, T_min)) + I/(f·C_fly) + 4·I·R_drive + I/(2·f·C_res); shallower by ΔV than the checked rail: at best marginal; collapsed: fail; a fixed or grounded V−: nothing to add",
  source:
    "Switched-capacitor droop with the summed load, V_out ≈ −(V_d − 2V_F − I/(f·C₁)) (S. Winder, Analog and Digital Filter Design, 2nd ed., ch. 14); Vf −2 mV/°C (Sedra & Smith).",
  policy: "headroom_margin_v",
  kinds: ["op-amp", "comparator"],
  needs: { "op-amp": ["iq_ma"], comparator: ["iq_ma"] },
  measure(ctx, part, out) {
    const w = work(ctx, part);
    if (w === undefined) return record(out, "pass", 0, 0, 0, undefined);
    const depth = -ctx.rails.negative_v;
    if (w.collapses) return record(out, "fail", depth, 0, -depth, depth);
    // Deeper or equal: the other checks were conservative. Shallower: they were not.
    const verdict = w.shallower > 1e-12 ? "marginal" : "pass";
    record(out, verdict, depth, -w.rail.worst_v, -w.shallower, depth);
  },
  describe(m, ctx, part) {
    const w = work(ctx, part);
    if (w === undefined) {
      return { reason: "V− is not pumped: the part's supply current does not move it", steps: [] };
    }
    const sum = `${formatSI(w.p.other_a, "A")} (the stated load and the other roles' parts) + ${w.channels} × ${formatSI(part.iq_ma * 1e-3, "A")} = ${formatSI(w.total, "A")}`;
    const steps = [
      { label: "load without this part", value: w.p.other_a, unit: "A" },
      { label: "this part's draw = channels × iq", value: w.own, unit: "A" },
      { label: "load on V−", value: w.total, unit: "A" },
      { label: "V− with this part", value: w.rail.worst_v, unit: "V" },
      { label: "V− the other checks used", value: ctx.rails.negative_v, unit: "V" },
    ];
    if (w.collapses) {
      return {
        reason: `with this part the pumped rail carries ${sum}, past the ${formatSI(w.rail.collapse_a, "A")} at which it collapses: no negative rail`,
        steps,
      };
    }
    const tail =
      w.shallower > 1e-12
        ? `${formatSI(w.shallower, "V")} shallower than the ${formatVolts(ctx.rails.negative_v, { signed: true })} the other checks used, so they may be optimistic: at best marginal (name it in the BOM and the rail is worked out with its own draw)`
        : `no shallower than the ${formatVolts(ctx.rails.negative_v, { signed: true })} the other checks used`;
    return {
      reason: `with this part the pumped rail carries ${sum} and sits at ${formatVolts(w.rail.worst_v, { signed: true })}, ${tail}`,
      steps,
    };
  },
});
