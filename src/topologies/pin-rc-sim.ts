// The optional RC at the converter pin as a simulator stage (SPEC §12.3): a
// first-order low pass of τ = R_pin·C_pin after the driving stage. The
// sampling capacitor's charge sharing is not simulated (the adc-settling rule
// checks it in closed form).
import type { Design } from "../core/schemas/design.ts";
import type { Stage } from "../core/sim/chain.ts";

/** Appends the pin RC after `from` when the design has one; returns the node the converter reads. */
export function pinStages(design: Design, stages: Stage[], from: string): string {
  const tau = (design.adc.pin_r_ohm ?? 0) * (design.adc.pin_c_f ?? 0);
  if (!(tau > 0)) return from;
  stages.push({ kind: "rc", id: "pin-rc", from, tau_s: tau });
  return "pin-rc";
}
