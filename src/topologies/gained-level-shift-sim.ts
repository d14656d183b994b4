// The gained level shift's chain for the simulator (SPEC §13): the Millman
// network with the source in series with R1, the non-inverting stage as a
// linear stage of weight and noise gain Gs, an RC at the pin when the design
// has one, the converter and the reading.
import type { Catalogue } from "../core/catalogue-index.ts";
import type { DesignResult } from "../core/engine/result.ts";
import type { OpAmp } from "../core/schemas/op-amp.ts";
import type { ChainBuild, Stage } from "../core/sim/chain.ts";
import { opAmpModel } from "../core/sim/models.ts";
import { pinStages } from "./pin-rc-sim.ts";

export function gainedLevelShiftChain(result: DesignResult, catalogue: Catalogue): ChainBuild {
  const { design, derived } = result;
  const net = derived.level_shift;
  if (!net) return { ok: false, reason: "the level-shift network was not chosen" };
  const id = result.roles.find((r) => r.role === "gain-stage")?.chosen;
  const part = id === undefined ? undefined : catalogue.byId.get(id);
  if (part?.kind !== "op-amp") return { ok: false, reason: "no part fits gain-stage" };
  const stageGain = derived.ratio / net.gain;
  const rails = { positive_v: derived.rails.positive_v, negative_v: 0 };
  const stages: Stage[] = [
    {
      kind: "linear",
      id: "gain-stage",
      inputs: [{ from: "front", weight: stageGain }],
      offset_v: 0,
      noise_gain: stageGain,
      amp: opAmpModel(part as OpAmp, rails, design, net.parallel_ohm),
    },
  ];
  const last = pinStages(design, stages, "gain-stage");
  return {
    ok: true,
    parts: { "gain-stage": part.id },
    chain: {
      source: { peak_v: design.signal.peak_v, source_ohm: design.signal.source_ohm },
      // The network's a and b already include the source's resistance (evaluate chose them so).
      front: { gain: net.gain, offset_v: net.offset_v },
      stages,
      sign: null,
      adc: {
        from: last,
        bits: design.adc.bits,
        reference_v: design.adc.reference_v,
        sample_rate_hz: design.adc.sample_rate_hz ?? null,
      },
      reading: {
        volts_per_code: result.conversion.volts_per_code,
        offset_v: result.conversion.offset_v,
        signed: false,
      },
    },
  };
}
