// The delay every reading of a chain shares at one frequency: the phase delay of
// the single poles and RCs on the converter's path. A reading that is the input
// as it was τ earlier carries no error a static budget can see (the budget's
// bandwidth term is the amplitude loss |H| = 1/√(1 + (f/fc)²), Fiore ch. 5); a
// fixed latency is the firmware's to time-stamp. The simulator compares the
// reading with the input delayed by this τ, so what is left is error, not lag.
//
// Phase delay of a single pole at f: φ/ω with φ = atan(f/fc) (textbook). Where
// a stage sums several paths (the rectifier's summer: the input and stage 1),
// only the delay common to all of them is shared by the reading, so the
// smallest is taken: a path that lags more than the others (stage 1, the sign
// comparator) still shows its lag as error.
import type { Chain, Stage } from "./chain.ts";

function poleDelay(f: number, fc: number): number {
  if (!(fc > 0) || !Number.isFinite(fc)) return 0;
  return Math.atan(f / fc) / (2 * Math.PI * f);
}

function ownDelay(stage: Stage, f: number): number {
  switch (stage.kind) {
    case "linear":
      return poleDelay(f, stage.amp.gbw_hz / stage.noise_gain);
    case "rc":
      return poleDelay(f, 1 / (2 * Math.PI * stage.tau_s));
    case "half-wave":
      // While its loop is closed it is an inverting stage at noise gain 1 + Rf/Rin.
      return poleDelay(f, stage.amp.gbw_hz / (1 + stage.r_feedback_ohm / stage.r_in_ohm));
  }
}

function inputsOf(stage: Stage): readonly string[] {
  return stage.kind === "linear" ? stage.inputs.map((i) => i.from) : [stage.from];
}

/** τ in seconds at frequency f: the delay from the source to the converter's input common to every path. */
export function chainDelay(chain: Chain, f: number): number {
  if (!(f > 0)) return 0;
  const byId = new Map(chain.stages.map((s) => [s.id, s]));
  const memo = new Map<string, number>();
  const delayOf = (node: string): number => {
    const known = memo.get(node);
    if (known !== undefined) return known;
    // "input", "front" and a half-wave's ".amp" node: the source side, or a node inside a stage.
    const stage = byId.get(node);
    let d = 0;
    if (stage) {
      const paths = inputsOf(stage).map(delayOf);
      d = ownDelay(stage, f) + (paths.length > 0 ? Math.min(...paths) : 0);
    }
    memo.set(node, d);
    return d;
  };
  // A sign comparator decides on its own path: the reading shares only the smaller delay.
  const magnitude = delayOf(chain.adc.from);
  return chain.sign ? Math.min(magnitude, delayOf(chain.sign.from)) : magnitude;
}
