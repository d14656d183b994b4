// The chain of `rectify-and-sign` for the simulator (SPEC §13): divider with the
// source's resistance, follower buffer, the two-op-amp full-wave rectifier
// (SPEC §11.2; stage 1 a half-wave inverting stage, stage 2 a summer weighting
// the buffer 1 and stage 1 2, all resistors from rectifier_load_ohm), the sign
// comparator on the buffer's output, the converter on stage 2, and the reading
// by the design's conversion constant. Parts: the BOM's, else the best fits.
import type { Catalogue } from "../core/catalogue-index.ts";
import type { DesignResult } from "../core/engine/result.ts";
import type { Comparator } from "../core/schemas/comparator.ts";
import type { Diode } from "../core/schemas/diode.ts";
import type { OpAmp } from "../core/schemas/op-amp.ts";
import type { ChainBuild } from "../core/sim/chain.ts";
import { comparatorModel, diodeModel, opAmpModel } from "../core/sim/models.ts";
import { seriesInOhm } from "./converter-drive.ts";

export function rectifyAndSignChain(result: DesignResult, catalogue: Catalogue): ChainBuild {
  const { design, derived } = result;
  const parts: Record<string, string> = {};
  const chosen = (role: string) => {
    const id = result.roles.find((r) => r.role === role)?.chosen;
    const part = id === undefined ? undefined : catalogue.byId.get(id);
    if (part) parts[role] = part.id;
    return part;
  };
  const buffer = chosen("buffer");
  const rectifier = chosen("rectifier");
  // A design may name a second part for the summer (stage 2); else the rectifier's part serves both.
  const summer = chosen("rectifier-2") ?? rectifier;
  const sign = chosen("sign");
  const diode = chosen("rectifier-diode");
  const missing = [
    buffer?.kind === "op-amp" ? null : "buffer",
    rectifier?.kind === "op-amp" ? null : "rectifier",
    sign && sign.kind !== "diode" ? null : "sign",
    diode?.kind === "diode" ? null : "rectifier-diode",
  ].filter((r): r is string => r !== null);
  if (missing.length > 0) return { ok: false, reason: `no part fits ${missing.join(", ")}` };

  const div = derived.divider;
  // The source and any protection resistor, as the divider was chosen with (SPEC §11.1).
  const rs = div ? div.source_ohm : seriesInOhm(design);
  // The loaded ratio (SPEC §11.1): the source's resistance is in series with R1.
  const k = div ? div.bottom_ohm / (rs + div.top_ohm + div.bottom_ohm) : 1;
  const rth = div ? ((rs + div.top_ohm) * div.bottom_ohm) / (rs + div.top_ohm + div.bottom_ohm) : rs;
  const r = design.front_end.rectifier_load_ohm;
  const rails = derived.rails;
  const sampleRate = (design.adc as { sample_rate_hz?: number }).sample_rate_hz;
  return {
    ok: true,
    parts,
    chain: {
      source: { peak_v: design.signal.peak_v, source_ohm: rs },
      front: { gain: k, offset_v: 0 },
      stages: [
        {
          kind: "linear",
          id: "buffer",
          inputs: [{ from: "front", weight: 1 }],
          offset_v: 0,
          noise_gain: 1,
          amp: opAmpModel(buffer as OpAmp, rails, design, rth),
        },
        {
          kind: "half-wave",
          id: "rectifier-1",
          from: "buffer",
          r_in_ohm: r,
          r_feedback_ohm: r,
          load_ohm: r / 2,
          // Its inverting input sees R‖R.
          amp: opAmpModel(rectifier as OpAmp, rails, design, r / 2),
          diode: diodeModel(diode as Diode),
        },
        {
          kind: "linear",
          id: "rectifier-2",
          inputs: [
            { from: "buffer", weight: -1 },
            { from: "rectifier-1", weight: -2 },
          ],
          offset_v: 0,
          noise_gain: 4,
          // Its inverting input sees R‖R/2‖R = R/4.
          amp: opAmpModel(summer as OpAmp, rails, design, r / 4),
        },
      ],
      sign: comparatorModel(sign as Comparator | OpAmp, "buffer", rails),
      adc: {
        from: "rectifier-2",
        bits: design.adc.bits,
        reference_v: design.adc.reference_v,
        sample_rate_hz: typeof sampleRate === "number" ? sampleRate : null,
      },
      reading: { volts_per_code: result.conversion.volts_per_code, offset_v: result.conversion.offset_v, signed: true },
    },
  };
}
