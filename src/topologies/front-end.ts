// The attenuator every topology starts with (SPEC §6).
import { chooseDivider, theveninOhm, type Divider } from "../core/math/divider.ts";
import type { Design } from "../core/schemas/design.ts";
import { formatSI } from "../core/units.ts";
import type { DesignProblem } from "../core/engine/result.ts";

export type FrontEnd = {
  ok: true;
  target_ratio: number;
  divider: Divider | null;
  ratio: number;
  window_v: number;
  thevenin_ohm: number;
};

export function frontEnd(
  design: Design,
  windowV = design.front_end.window_v,
): FrontEnd | { ok: false; problems: DesignProblem[] } {
  const { peak_v, source_ohm } = design.signal;
  const target = Math.min(1, windowV / peak_v);
  // The source resistance is in series with R1: the ratio the search, the window,
  // the budget and the firmware constant use is the loaded one (SPEC §11.1).
  const divider = chooseDivider(target, design.front_end.divider_total_ohm, design.front_end.series, source_ohm);
  if (divider === undefined) {
    return {
      ok: false,
      problems: [
        {
          path: "front_end.divider_total_ohm",
          message: `no ${design.front_end.series} divider gives ratio ${Number(target.toPrecision(4))} (got a total of ${formatSI(design.front_end.divider_total_ohm, "Ω")}, expected one that leaves pairs of 10 Ω … 10 MΩ between half and twice it)`,
        },
      ],
    };
  }
  const ratio = divider ? divider.ratio : 1;
  return {
    ok: true,
    target_ratio: target,
    divider,
    ratio,
    window_v: ratio * peak_v,
    thevenin_ohm: theveninOhm(source_ohm, divider),
  };
}
