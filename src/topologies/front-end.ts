// The attenuator every topology starts with (SPEC §6).
import { chooseDivider, heldDivider, loadedRatio, theveninOhm, type Divider } from "../core/math/divider.ts";
import type { Design } from "../core/schemas/design.ts";
import { formatSI } from "../core/units.ts";
import { si } from "./display.ts";
import { seriesInOhm } from "./converter-drive.ts";
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
  const { peak_v } = design.signal;
  // The source resistance, and the protection resistor the signal also passes
  // through, are in series with R1: the ratio the search, the window, the budget
  // and the firmware constant use is the loaded one (SPEC §11.1).
  const source_ohm = seriesInOhm(design);
  const target = Math.min(1, windowV / peak_v);
  // Resistors the design holds are used as given, even where the peak would need no divider:
  // they are on the board (the schema has both or neither, rectify-and-sign's check the window).
  const { divider_r1_ohm: r1, divider_r2_ohm: r2 } = design.front_end;
  const divider =
    r1 !== undefined && r2 !== undefined
      ? heldDivider(r1, r2, source_ohm)
      : chooseDivider(target, design.front_end.divider_total_ohm, design.front_end.series, source_ohm);
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

/**
 * A held divider must keep the peak inside the window: W = k·peak with the
 * loaded k of SPEC §11.1 (a larger W would drive the converter past its range).
 * Checked for rectify-and-sign, the one topology with an R1/R2 divider.
 */
export function heldDividerFits(design: Design): DesignProblem[] {
  const { divider_r1_ohm: r1, divider_r2_ohm: r2, window_v } = design.front_end;
  if (r1 === undefined || r2 === undefined) return [];
  const { peak_v } = design.signal;
  const source_ohm = seriesInOhm(design);
  const k = loadedRatio(r1, r2, source_ohm);
  // The same float allowance as the search's k ≤ target.
  if (k * peak_v <= window_v * (1 + 1e-12)) return [];
  const ohm = (v: number) => si(v, "Ω");
  const volts = (v: number) => `±${Number(v.toPrecision(4))} V`;
  return [
    {
      path: "front_end.divider_r2_ohm",
      message: `held divider puts the peak outside the window (got k = R2/(Rs + R1 + R2) = ${ohm(r2)}/(${ohm(source_ohm)} + ${ohm(r1)} + ${ohm(r2)}) = ${Number(k.toPrecision(4))}, ${volts(k * peak_v)} from the ${volts(peak_v)} peak, expected at most front_end.window_v ${volts(window_v)}: a larger R1 or a smaller R2)`,
    },
  ];
}

/**
 * A topology without an R1/R2 divider refuses held divider resistors when the
 * design names it alone: silently dropping resistors the engineer fixed would
 * hide that they are not in this circuit. With "all" they hold rectify-and-sign's.
 */
export function noHeldDivider(design: Design, topology: string): DesignProblem[] {
  const { divider_r1_ohm: r1, divider_r2_ohm: r2 } = design.front_end;
  if (design.topology !== topology || (r1 === undefined && r2 === undefined)) return [];
  const [path, v] = r1 !== undefined ? ["front_end.divider_r1_ohm", r1] : ["front_end.divider_r2_ohm", r2 ?? 0];
  return [
    {
      path,
      message: `topology '${topology}' has no R1/R2 divider to hold (got ${si(v, "Ω")}, expected the field left out: only 'rectify-and-sign' has one; this topology's resistors come from front_end.divider_total_ohm)`,
    },
  ];
}
