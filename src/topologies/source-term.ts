// The source's tolerance through a level-shift network (SPEC §11.1): the source
// sits in series with R1, so Rs·(1 ± t) moves both the gain and the zero.
import { budgetTerm, type BudgetTerm } from "../core/engine/budget.ts";
import type { SplitError } from "../core/math/level-shift.ts";
import type { Design } from "../core/schemas/design.ts";
import { formatSI } from "../core/units.ts";

/**
 * The `source-resistance-network` term when the design gives
 * `signal.source_tolerance` and there is a source; `error(t)` is the network's
 * gain and zero change at Rs·(1 ± t), `gain`/`zero` their symbols in the formula.
 */
export function sourceNetworkTerms(
  design: Design,
  sourceOhm: number,
  error: (t: number) => SplitError,
  symbols: { gain: string; zero: string },
): BudgetTerm[] {
  const t = design.signal.source_tolerance;
  if (t === undefined || !(sourceOhm > 0)) return [];
  const e = error(t);
  return [
    budgetTerm(
      "source-resistance-network",
      "source resistance tolerance, through the network",
      e.gain_v + e.offset_v,
      `Rs = ${formatSI(sourceOhm, "Ω")} ± ${Number((t * 100).toPrecision(4))} % in series with R1: ${symbols.gain} × peak + ${symbols.zero} = ${formatSI(e.gain_v, "V")} + ${formatSI(e.offset_v, "V")}`,
      "two-point",
    ),
  ];
}
