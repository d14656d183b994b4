// The level-shift topology's chain for the simulator (SPEC §13): the Millman
// network with the source's resistance in series with R1 (and the reference
// buffer's offset on the reference, when the design has one), the follower,
// the converter, and the reading by the design's conversion constant.
import type { Catalogue } from "../core/catalogue-index.ts";
import type { DesignResult } from "../core/engine/result.ts";
import { networkOf } from "../core/math/level-shift.ts";
import type { OpAmp } from "../core/schemas/op-amp.ts";
import type { ChainBuild } from "../core/sim/chain.ts";
import { offsetAtCorner, opAmpModel } from "../core/sim/models.ts";

export function offsetToMidRailChain(result: DesignResult, catalogue: Catalogue): ChainBuild {
  const { design, derived } = result;
  const net = derived.level_shift;
  if (!net) return { ok: false, reason: "the level-shift network was not chosen" };
  const parts: Record<string, string> = {};
  const chosen = (role: string) => {
    const id = result.roles.find((r) => r.role === role)?.chosen;
    const part = id === undefined ? undefined : catalogue.byId.get(id);
    if (part?.kind === "op-amp") parts[role] = part.id;
    return part?.kind === "op-amp" ? part : undefined;
  };
  const follower = chosen("level-shift");
  if (!follower) return { ok: false, reason: "no part fits level-shift" };
  const refBuffer = chosen("reference-buffer");
  const vref = design.adc.reference_v + (refBuffer ? offsetAtCorner(refBuffer, design, 0) : 0);
  // The network's a and b already include the source's resistance (evaluate chose them so);
  // only the buffered reference's offset moves them here.
  const real = networkOf(net.r1_ohm, net.r2_ohm, net.r3_ohm, vref, net.source_ohm);
  const sampleRate = (design.adc as { sample_rate_hz?: number }).sample_rate_hz;
  const rails = { positive_v: derived.rails.positive_v, negative_v: 0 };
  return {
    ok: true,
    parts,
    chain: {
      source: { peak_v: design.signal.peak_v, source_ohm: design.signal.source_ohm },
      front: { gain: real.gain, offset_v: real.offset_v },
      stages: [
        {
          kind: "linear",
          id: "level-shift",
          inputs: [{ from: "front", weight: 1 }],
          offset_v: 0,
          noise_gain: 1,
          amp: opAmpModel(follower as OpAmp, rails, design, real.parallel_ohm),
        },
      ],
      sign: null,
      adc: {
        from: "level-shift",
        bits: design.adc.bits,
        reference_v: design.adc.reference_v,
        sample_rate_hz: typeof sampleRate === "number" ? sampleRate : null,
      },
      reading: {
        volts_per_code: result.conversion.volts_per_code,
        offset_v: result.conversion.offset_v,
        signed: false,
      },
    },
  };
}
