// Catalogue rows → simulator models, for the topologies' chain builders. Offsets
// are taken at their rated maximum plus drift to the temperature end farthest
// from 25 °C, with the bias current through the resistance its input sees: the
// same corner the offset rule and the static budget take, all with one sign.
import type { Comparator } from "../schemas/comparator.ts";
import type { Diode } from "../schemas/diode.ts";
import type { Design } from "../schemas/design.ts";
import type { OpAmp } from "../schemas/op-amp.ts";
import type { ComparatorModel, DiodeModel, OpAmpModel } from "./chain.ts";

export type RailPair = { positive_v: number; negative_v: number };

export function driftSpan(design: Design): number {
  return Math.max(Math.abs(design.temperature.min_c - 25), Math.abs(design.temperature.max_c - 25));
}

/** Input offset at the corner: Vos max + drift·span + Ib·R (R = what its inputs see). */
export function offsetAtCorner(p: OpAmp, design: Design, biasOhm: number): number {
  const drift = p.vos_drift_uv_per_c === undefined ? 0 : p.vos_drift_uv_per_c * 1e-6 * driftSpan(design);
  return p.vos_max_mv * 1e-3 + drift + p.ib_max_na * 1e-9 * biasOhm;
}

export function opAmpModel(p: OpAmp, rails: RailPair, design: Design, biasOhm: number): OpAmpModel {
  return {
    gbw_hz: p.gbw_mhz * 1e6,
    slew_v_per_s: p.slew_v_per_us * 1e6,
    out_low_v: rails.negative_v + p.out_neg_headroom_v,
    out_high_v: rails.positive_v - p.out_pos_headroom_v,
    vos_v: offsetAtCorner(p, design, biasOhm),
  };
}

export function diodeModel(d: Diode): DiodeModel {
  return { vf_1ma_v: d.vf_1ma_v, vf_10ma_v: d.vf_10ma_v };
}

/**
 * A comparator as rated; an op amp used as one switches when its output has
 * slewed across its swing (the propagation-delay rule's estimate), with no
 * hysteresis. An unrated overdrive counts the delay from the crossing itself.
 */
export function comparatorModel(p: Comparator | OpAmp, from: string, rails: RailPair): ComparatorModel {
  if (p.kind === "comparator") {
    return {
      from,
      offset_v: p.vos_max_mv * 1e-3,
      hysteresis_v: (p.hysteresis_mv ?? 0) * 1e-3,
      overdrive_v: (p.tpd_overdrive_mv ?? 0) * 1e-3,
      delay_s: p.tpd_ns * 1e-9,
    };
  }
  const swing = rails.positive_v - p.out_pos_headroom_v - (rails.negative_v + p.out_neg_headroom_v);
  return {
    from,
    offset_v: p.vos_max_mv * 1e-3,
    hysteresis_v: 0,
    overdrive_v: 0,
    delay_s: swing / (p.slew_v_per_us * 1e6),
  };
}
