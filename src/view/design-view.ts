// What a design page lists as the design's inputs and its derived values,
// as label/value rows, so the page stays markup and the numbers stay testable.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { DesignResult, RoleResult } from "../core/engine/result.ts";
import { POLICY_DEFAULTS, type Design, type Policy, type Role } from "../core/schemas/design.ts";
import { formatSI, formatVolts } from "../core/units.ts";
import { trimZeros } from "./trim-zeros.ts";

export type ValueRow = { label: string; value: string; partId?: string; role?: Role };
// A topology's DisplayGroup has the same shape, so derived values need no copying.
export type ValueGroup = { title: string; rows: ValueRow[] };

/** SI with a prefix and no padding zeros: "100 kΩ", "1 µF", "19.5 mV". */
export const si = (value: number, unit: string) => trimZeros(formatSI(value, unit));
/** What the design file says, to six digits: a 4.096 V reference stays 4.096 V. */
const given = (value: number, unit: string) => trimZeros(formatSI(value, unit, { digits: 6 }));
const celsius = (c: number) => `${String(c).replace("-", "\u2212")}\u00a0°C`;
const signed = (v: number) => formatVolts(v, { signed: true });
const percent = (fraction: number) => `${Number((fraction * 100).toPrecision(3))} %`;

export { HIGH_VOLTAGE_V } from "../core/caution.ts";

/**
 * Fits a design page shows in full (rail diagram, findings, arithmetic) per
 * role; the rest are one row each, linking to the part page that has them in
 * full. A shortlist is read from the top: the best three decide, the rest are one row each.
 */
export const FITS_IN_FULL = 3;

/** A part a design page draws in full, with its place among the fits (none for a rejection). */
export type ShownInFull = { result: PartResult; rank?: number };

export type RoleView = {
  /** The best fits, in rank order. */
  topFits: ShownInFull[];
  /** The part the design uses, when it is not among them: a BOM part ranked lower, or one that fails. */
  used?: ShownInFull;
  /** Ids drawn in full; their rows in the lists carry no anchor, so each id appears once on the page. */
  inFull: ReadonlySet<string>;
};

/** Which parts of a role a design page draws in full. */
export function roleView(role: RoleResult, count = FITS_IN_FULL): RoleView {
  const topFits = role.fits.slice(0, count).map((result, i) => ({ result, rank: i + 1 }));
  const index = role.chosen === undefined ? -1 : role.fits.findIndex((p) => p.part.id === role.chosen);
  const rejected = index < 0 ? role.rejected.find((p) => p.part.id === role.chosen) : undefined;
  const lower = index >= count ? role.fits[index] : undefined;
  const used: ShownInFull | undefined = lower
    ? { result: lower, rank: index + 1 }
    : rejected
      ? { result: rejected }
      : undefined;
  const inFull = new Set([...topFits, ...(used ? [used] : [])].map((p) => p.result.part.id));
  return { topFits, ...(used ? { used } : {}), inFull };
}

/** SPEC §9: a visible caution above extra-low-voltage levels. */
export { needsCaution } from "../core/caution.ts";

export const CAUTION_TEXT =
  "Voltages above extra-low-voltage limits need isolation and protection designed to local codes and licensed practice, which this guide does not assess.";

const POLICY_LABELS: Readonly<Record<keyof Policy, string>> = {
  headroom_margin_v: "Headroom margin",
  marginal_fraction: "Marginal fraction",
  offset_share: "Offset share",
  speed_share: "Speed share",
  sign_share: "Sign share",
  timing_fraction: "Timing fraction",
  timing_share: "Timing share",
  allow_unrated: "Allow unrated",
};

function policyValue(key: keyof Policy, value: Policy[keyof Policy]): string {
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (key === "headroom_margin_v") return given(value, "V");
  return `${percent(value)} (${value})`;
}

export function inputGroups(design: Design): ValueGroup[] {
  const neg = design.supply.negative;
  const negative =
    neg.kind === "ground"
      ? "ground (0 V)"
      : neg.kind === "fixed"
        ? `fixed ${signed(neg.v)}`
        : `charge pump driven with ${given(neg.drive_v, "V")} at ${given(neg.frequency_hz, "Hz")}, flying ${given(neg.flying_cap_f, "F")}, reservoir ${given(neg.reservoir_cap_f, "F")}, load ${given(neg.load_a, "A")}`;
  const groups: ValueGroup[] = [
    {
      title: "Signal",
      rows: [
        { label: "Peak", value: `±${given(design.signal.peak_v, "V")}` },
        { label: "Highest frequency", value: given(design.signal.max_frequency_hz, "Hz") },
        { label: "Source resistance", value: given(design.signal.source_ohm, "Ω") },
      ],
    },
    {
      title: "Supply",
      rows: [
        { label: "V+", value: signed(design.supply.positive_v) },
        { label: "V−", value: negative },
      ],
    },
    {
      title: "Front end",
      rows: [
        { label: "ADC window asked for", value: given(design.front_end.window_v, "V") },
        { label: "Divider total asked for", value: given(design.front_end.divider_total_ohm, "Ω") },
        ...(design.front_end.divider_r1_ohm !== undefined && design.front_end.divider_r2_ohm !== undefined
          ? [
              {
                label: "Divider resistors held (R1 over R2)",
                value: `${given(design.front_end.divider_r1_ohm, "Ω")} over ${given(design.front_end.divider_r2_ohm, "Ω")}`,
              },
            ]
          : []),
        { label: "Resistor tolerance", value: percent(design.front_end.resistor_tolerance) },
        { label: "Resistor series", value: design.front_end.series },
        { label: "Rectifier resistors", value: given(design.front_end.rectifier_load_ohm, "Ω") },
      ],
    },
    {
      title: "ADC",
      rows: [
        { label: "Resolution", value: `${design.adc.bits} bits` },
        {
          label: "Reference",
          value: `${given(design.adc.reference_v, "V")} ± ${percent(design.adc.reference_tolerance)}`,
        },
      ],
    },
    {
      title: "Logic input",
      rows: [
        { label: "Logic supply V_DD", value: given(design.logic.vdd_v, "V") },
        { label: "V_IH / V_IL", value: `${given(design.logic.vih_v, "V")} / ${given(design.logic.vil_v, "V")}` },
        { label: "Level shift", value: design.logic.level_shift },
        { label: "Pull-down", value: given(design.logic.pull_down_ohm, "Ω") },
      ],
    },
    {
      title: "Accuracy and temperature",
      rows: [
        { label: "Required accuracy at the input", value: given(design.accuracy.required_v, "V") },
        {
          label: "Temperature range",
          value: `${celsius(design.temperature.min_c)} to ${celsius(design.temperature.max_c)}`,
        },
      ],
    },
    {
      title: "Policy",
      rows: (Object.keys(POLICY_DEFAULTS) as (keyof Policy)[]).map((key) => {
        const value = design.policy[key];
        const set = value !== POLICY_DEFAULTS[key];
        return {
          label: POLICY_LABELS[key],
          value: `${policyValue(key, value)}${set ? ", set in the design" : ", default"}`,
        };
      }),
    },
  ];
  const bom = Object.entries(design.bom) as [Role, string][];
  if (bom.length > 0)
    groups.push({ title: "BOM", rows: bom.map(([role, id]) => ({ label: role, value: id, partId: id, role })) });
  return groups;
}

/** The topology's derived values (its module words them, so the CLI and the try page print the same rows). */
export function derivedGroups(result: DesignResult): ValueGroup[] {
  return result.display;
}
