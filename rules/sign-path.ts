// What happens after the sign stage decides: the logic edge it makes through
// the level shift, the NPN's storage time, an op amp's overload recovery.
// Shared by the rise-time, overload-recovery, output-current and
// base-emitter-reverse rules and by the late-sign sum, so each time is worked
// out once, the same way.
import type { PartOf, RoleContext } from "../src/core/rule-kit/index.ts";
import { clampSourceCurrent } from "../src/core/math/output-current.ts";
import { forwardVoltage } from "../src/core/math/diode.ts";
import { timeForError } from "../src/core/math/dead-time.ts";
import { NPN_STORAGE_DEFAULT_S, npnTurnOff, type NpnTurnOff } from "../src/core/math/npn-inverter.ts";
import { DEFAULT_PIN_CAP_F, pullUpEdge, type PullUpEdge } from "../src/core/math/rc-edge.ts";
import { NPN_VCE_SAT_V, outputHigh, outputLow } from "./levels.ts";

/** The logic pin's capacitance, and whether it is the common-practice default. */
export function pinCap(ctx: RoleContext): { farad: number; assumed: boolean } {
  const c = ctx.design.logic.pin_cap_f;
  return c === undefined ? { farad: DEFAULT_PIN_CAP_F, assumed: true } : { farad: c, assumed: false };
}

export type SignEdge =
  /** The output drives the pin itself (push-pull under the pull-up shift), or cannot drive it at all. */
  | { case: "driven"; seconds: 0 }
  /** Diode clamp: when the output goes low the diode blocks and the pull-down discharges the pin. */
  | { case: "clamp-fall"; seconds: number; edge: PullUpEdge; ohm: number; from_v: number; cap: number }
  /** Pull-up on an open-drain output: the pin rises from the output's low level. */
  | { case: "pull-up-rise"; seconds: number; edge: PullUpEdge; ohm: number; from_v: number; cap: number }
  /** NPN inverter: storage time, then the collector rises through the pull-up. */
  | { case: "npn-off"; seconds: number; off: NpnTurnOff; ohm: number; cap: number; storage_assumed: boolean }
  /** The design names no pull-up resistor where one sets the edge. */
  | { case: "no-pull-up"; seconds: 0 };

/** The slower edge the level shift makes at the logic pin, per SPEC §7's three shifts. */
export function signEdge(ctx: RoleContext, part: PartOf<"op-amp" | "comparator">): SignEdge {
  const { logic } = ctx.design;
  const cap = pinCap(ctx).farad;
  const high = outputHigh(part, ctx.rails);
  switch (logic.level_shift) {
    case "diode-clamp": {
      if (high === null || !(high > 0)) return { case: "driven", seconds: 0 };
      const clamp = ctx.stage.stage === "sign" ? ctx.stage.clamp : undefined;
      const vf = clamp ? forwardVoltage(clamp, clampSourceCurrent(high, logic.pull_down_ohm, clamp)) : 0;
      const from = Math.max(0, high - vf);
      const edge = pullUpEdge(logic.pull_down_ohm, cap, from, 0, logic.vil_v);
      return { case: "clamp-fall", seconds: edge.seconds, edge, ohm: logic.pull_down_ohm, from_v: from, cap };
    }
    case "pull-up": {
      if (high !== null) return { case: "driven", seconds: 0 };
      if (logic.pull_up_ohm === undefined) return { case: "no-pull-up", seconds: 0 };
      const from = outputLow(part, ctx.rails);
      const edge = pullUpEdge(logic.pull_up_ohm, cap, from, logic.vdd_v, logic.vih_v);
      return { case: "pull-up-rise", seconds: edge.seconds, edge, ohm: logic.pull_up_ohm, from_v: from, cap };
    }
    case "npn-inverter": {
      if (logic.pull_up_ohm === undefined) return { case: "no-pull-up", seconds: 0 };
      const storage = logic.npn_storage_s ?? NPN_STORAGE_DEFAULT_S;
      const off = npnTurnOff(storage, logic.pull_up_ohm, cap, NPN_VCE_SAT_V, logic.vdd_v, logic.vih_v);
      return {
        case: "npn-off",
        seconds: off.seconds,
        off,
        ohm: logic.pull_up_ohm,
        cap,
        storage_assumed: logic.npn_storage_s === undefined,
      };
    }
  }
}

/** An op amp's rated overload recovery in seconds; 0 for a comparator; undefined when not rated. */
export function overloadRecovery(part: PartOf<"op-amp" | "comparator">): number | undefined {
  if (part.kind !== "op-amp") return 0;
  return part.overload_recovery_us === undefined ? undefined : part.overload_recovery_us * 1e-6;
}

/**
 * The longest the sign may be late (SPEC §11.4): while it is wrong the reading
 * is off by 2·2π·f·peak·t, and that may take the timing share of the required
 * accuracy. The one place this limit is worked out; the budget's late-sign
 * term is the same error.
 */
export function signTimeLimit(ctx: Pick<RoleContext, "design" | "policy">): number {
  const { design, policy } = ctx;
  return timeForError(
    design.signal.max_frequency_hz,
    design.signal.peak_v,
    policy.timing_share * design.accuracy.required_v,
  );
}
