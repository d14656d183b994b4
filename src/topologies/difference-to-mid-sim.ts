// The difference amplifier's chain for the simulator (SPEC §13): the source is
// the difference V+in − V−in; the stage weighs it by G, adds REF, and has the
// noise gain 1 + G; an RC at the pin when the design has one. Resistors are
// nominal and matched, so the common-mode error is not simulated (the budget
// carries it in closed form).
import type { Catalogue } from "../core/catalogue-index.ts";
import type { DesignResult } from "../core/engine/result.ts";
import type { OpAmp } from "../core/schemas/op-amp.ts";
import type { ChainBuild, Stage } from "../core/sim/chain.ts";
import { opAmpModel } from "../core/sim/models.ts";
import { pinStages } from "./pin-rc-sim.ts";

export function differenceToMidChain(result: DesignResult, catalogue: Catalogue): ChainBuild {
  const { design, derived } = result;
  const id = result.roles.find((r) => r.role === "difference")?.chosen;
  const part = id === undefined ? undefined : catalogue.byId.get(id);
  if (part?.kind !== "op-amp") return { ok: false, reason: "no part fits difference" };
  const g = derived.ratio;
  const rails = { positive_v: derived.rails.positive_v, negative_v: 0 };
  const stages: Stage[] = [
    {
      kind: "linear",
      id: "difference",
      inputs: [{ from: "front", weight: g }],
      offset_v: design.adc.reference_v / 2,
      noise_gain: 1 + g,
      amp: opAmpModel(part as OpAmp, rails, design, 2 * derived.thevenin_ohm),
    },
  ];
  const last = pinStages(design, stages, "difference");
  return {
    ok: true,
    parts: { difference: part.id },
    chain: {
      source: { peak_v: design.signal.peak_v, source_ohm: design.signal.source_ohm },
      front: { gain: 1, offset_v: 0 },
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
