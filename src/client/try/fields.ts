// Every editable field of a design file (SPEC §5), in file order. One table
// serves the page's markup (built at build time), the URL codec and the form
// script, so a field's name, label and unit are written once.
import { ALL_TOPOLOGIES, roleApplies } from "../../core/engine/engine.ts";
import { LEVEL_SHIFTS, POLICY_DEFAULTS, SERIES, SIGNAL_KINDS, type Role } from "../../core/schemas/design.ts";
import { ROLE_META, TOPOLOGY_META, type RoleMeta } from "../../topologies/meta.ts";
import { TOPOLOGY_IDS } from "./engine.ts";

export type FieldGroup = { id: string; legend: string; hint?: string };

export const GROUPS = [
  { id: "design", legend: "Design" },
  { id: "supply", legend: "Rails and charge pump" },
  { id: "signal", legend: "Signal" },
  { id: "front_end", legend: "Window and divider" },
  { id: "adc", legend: "ADC" },
  { id: "logic", legend: "Logic levels and level shift" },
  { id: "accuracy", legend: "Accuracy and temperature" },
  { id: "policy", legend: "Policy", hint: "Leave a box empty to keep the default shown in it." },
  { id: "bom", legend: "Parts already chosen (BOM)", hint: "Leave a role on “best fit” to let the engine pick." },
] as const satisfies readonly FieldGroup[];

export type GroupId = (typeof GROUPS)[number]["id"];

/**
 * How a number reads back in the box: "si" writes 1e-6 as "1u" and 100000 as
 * "100k"; "plain" keeps fractions, bit counts and temperatures as decimals.
 */
export type NumberStyle = "si" | "plain";

type Base = {
  path: string;
  group: GroupId;
  label: string;
  /** Extra words for screen readers and the hint line. */
  hint?: string;
  /** Only part of the design when this holds (a charge pump's capacitors, a fixed rail's voltage). */
  when?: (draft: Readonly<Record<string, string>>) => boolean;
  /** May be left empty (policy overrides, BOM). */
  optional?: boolean;
  /** A yes/no choice whose values "true"/"false" go into the file as JSON booleans. */
  boolean?: true;
};

export type NumberField = Base & { type: "number"; unit: string; style: NumberStyle; placeholder?: string };
export type TextField = Base & { type: "text"; maxLength: number };
export type ChoiceField = Base & { type: "choice"; choices: readonly { value: string; label: string }[] };
/** A BOM role: its choices are the catalogue's parts, filled in once the catalogue arrives. */
export type PartField = Base & { type: "part"; role: Role };

export type Field = NumberField | TextField | ChoiceField | PartField;

const isPump = (d: Readonly<Record<string, string>>) => d["supply.negative.kind"] === "charge-pump";
const isFixed = (d: Readonly<Record<string, string>>) => d["supply.negative.kind"] === "fixed";
const isNpn = (d: Readonly<Record<string, string>>) => d["logic.level_shift"] === "npn-inverter";
const isDifferential = (d: Readonly<Record<string, string>>) => d["signal.kind"] === "differential";
const pulledUp = (d: Readonly<Record<string, string>>) => d["logic.level_shift"] !== "diode-clamp";
// Only rectify-and-sign has an R1/R2 divider to hold (src/topologies/front-end.ts).
const hasDivider = (d: Readonly<Record<string, string>>) =>
  d["topology"] === "rectify-and-sign" || d["topology"] === ALL_TOPOLOGIES;

/**
 * A role's BOM box shows when the chosen topology has the role (any topology
 * for "all") and the role's own conditions hold, as the engine's rolesOf has it.
 */
const hasRole =
  (role: RoleMeta) =>
  (d: Readonly<Record<string, string>>): boolean =>
    TOPOLOGY_META.some(
      (t) => (d["topology"] === t.id || d["topology"] === ALL_TOPOLOGIES) && t.roles.some((r) => r.id === role.id),
    ) && roleApplies(role, (path) => d[path]);

const num = (
  path: string,
  group: GroupId,
  label: string,
  unit: string,
  more: Partial<NumberField> = {},
): NumberField => ({
  path,
  group,
  label,
  unit,
  type: "number",
  style: "si",
  ...more,
});

const plain = { style: "plain" } as const;

const policyNumber = (
  key: Exclude<keyof typeof POLICY_DEFAULTS, "allow_unrated">,
  label: string,
  unit: string,
): NumberField =>
  num(`policy.${key}`, "policy", label, unit, {
    style: "plain",
    optional: true,
    placeholder: String(POLICY_DEFAULTS[key]),
  });

const bomRole = (role: Role, label: string, when?: Base["when"]): PartField => ({
  path: `bom.${role}`,
  group: "bom",
  label,
  type: "part",
  role,
  optional: true,
  ...(when ? { when } : {}),
});

export const FIELDS: readonly Field[] = [
  {
    path: "id",
    group: "design",
    label: "Id (also the file name)",
    type: "text",
    maxLength: 80,
    hint: "lower-case letters, digits and -",
  },
  { path: "title", group: "design", label: "Title", type: "text", maxLength: 200 },
  {
    path: "topology",
    group: "design",
    label: "Topology",
    type: "choice",
    choices: TOPOLOGY_IDS.map((t) => ({ value: t, label: t })),
  },

  num("supply.positive_v", "supply", "Positive rail V+", "V"),
  {
    path: "supply.negative.kind",
    group: "supply",
    label: "Negative rail",
    type: "choice",
    choices: [
      { value: "ground", label: "ground (0 V)" },
      { value: "fixed", label: "fixed negative rail" },
      { value: "charge-pump", label: "diode charge pump" },
    ],
  },
  num("supply.negative.v", "supply", "Negative rail V−", "V", { when: isFixed, hint: "below 0" }),
  num("supply.negative.drive_v", "supply", "Pump drive amplitude", "V", { when: isPump }),
  num("supply.negative.frequency_hz", "supply", "Pump frequency", "Hz", { when: isPump }),
  num("supply.negative.flying_cap_f", "supply", "Flying capacitor", "F", { when: isPump }),
  num("supply.negative.reservoir_cap_f", "supply", "Reservoir capacitor", "F", { when: isPump }),
  num("supply.negative.load_a", "supply", "Load on V−", "A", { when: isPump }),
  num("supply.negative.drive_ohm", "supply", "Drive pin output resistance", "Ω", {
    when: isPump,
    optional: true,
    hint: "optional; empty counts none",
  }),

  num("signal.peak_v", "signal", "Peak signal (±)", "V"),
  num("signal.max_frequency_hz", "signal", "Highest signal frequency", "Hz"),
  num("signal.source_ohm", "signal", "Source resistance", "Ω"),
  {
    path: "signal.kind",
    group: "signal",
    label: "Signal kind",
    type: "choice",
    optional: true,
    choices: [
      { value: "", label: "single-ended (default)" },
      ...SIGNAL_KINDS.map((k) => ({ value: k, label: k === "differential" ? "differential (a bridge)" : k })),
    ],
  },
  num("signal.common_mode_min_v", "signal", "Lowest common-mode voltage", "V", { ...plain, when: isDifferential }),
  num("signal.common_mode_max_v", "signal", "Highest common-mode voltage", "V", { ...plain, when: isDifferential }),
  num("signal.fault_v", "signal", "Largest fault voltage on the input (±)", "V", {
    optional: true,
    hint: "optional; empty leaves input protection unrated",
  }),
  num("signal.out_of_band_v", "signal", "Largest content above the band (pickup, noise)", "V", {
    optional: true,
    hint: "optional; the alias term takes the peak signal when empty",
  }),
  num("signal.source_tolerance", "signal", "Source resistance tolerance", "fraction", {
    ...plain,
    optional: true,
    hint: "optional; 0.1 = 10 %, a budget term of its own",
  }),

  num("front_end.window_v", "front_end", "Window at the ADC (±)", "V"),
  num("front_end.divider_total_ohm", "front_end", "Divider total resistance", "Ω"),
  num("front_end.resistor_tolerance", "front_end", "Resistor tolerance", "fraction", { ...plain, hint: "0.01 = 1 %" }),
  {
    path: "front_end.series",
    group: "front_end",
    label: "Resistor series",
    type: "choice",
    choices: SERIES.map((s) => ({ value: s, label: s })),
  },
  num("front_end.rectifier_load_ohm", "front_end", "Rectifier resistors", "Ω"),
  num("front_end.rectifier_tolerance", "front_end", "Rectifier resistor tolerance", "fraction", {
    ...plain,
    optional: true,
    hint: "optional; empty is the resistor tolerance; 0.0001 = 0.01 %",
  }),
  num("front_end.sign_series_ohm", "front_end", "Series resistor into the sign input", "Ω", { optional: true }),
  num("front_end.protection_ohm", "front_end", "Series protection resistor at the input", "Ω", { optional: true }),
  num("front_end.divider_r1_ohm", "front_end", "Divider top resistor R1, held", "Ω", {
    optional: true,
    when: hasDivider,
    hint: "optional; with R2, used as given instead of the search; both or neither",
  }),
  num("front_end.divider_r2_ohm", "front_end", "Divider bottom resistor R2, held", "Ω", {
    optional: true,
    when: hasDivider,
    hint: "optional; with R1, used as given instead of the search; both or neither",
  }),

  num("adc.bits", "adc", "ADC resolution", "bits", plain),
  num("adc.reference_v", "adc", "ADC reference", "V"),
  num("adc.reference_tolerance", "adc", "Reference tolerance", "fraction", { ...plain, hint: "0.002 = 0.2 %" }),
  num("adc.sample_cap_f", "adc", "Sampling capacitor", "F", {
    optional: true,
    hint: "optional; with the switch and acquisition time, settling is checked",
  }),
  num("adc.switch_ohm", "adc", "Sampling switch resistance", "Ω", { optional: true }),
  num("adc.acquisition_s", "adc", "Acquisition time", "s", { optional: true }),
  num("adc.sample_rate_hz", "adc", "Sample rate", "Hz", { optional: true, hint: "optional; gives the alias term" }),
  num("adc.pin_r_ohm", "adc", "Series resistor at the ADC pin", "Ω", { optional: true }),
  num("adc.pin_c_f", "adc", "Capacitor at the ADC pin", "F", { optional: true }),
  num("adc.reference_tempco_ppm_per_c", "adc", "Reference tempco", "ppm/°C", {
    ...plain,
    optional: true,
    hint: "optional; over the temperature range",
  }),
  num("adc.offset_lsb", "adc", "ADC offset", "LSB", { ...plain, optional: true, hint: "optional" }),
  num("adc.gain_error", "adc", "ADC gain error", "fraction", {
    ...plain,
    optional: true,
    hint: "optional; 0.001 = 0.1 %",
  }),
  num("adc.inl_lsb", "adc", "ADC integral non-linearity", "LSB", { ...plain, optional: true, hint: "optional" }),

  num("logic.vdd_v", "logic", "Logic supply VDD", "V"),
  num("logic.vih_v", "logic", "Logic-high threshold V_IH", "V"),
  num("logic.vil_v", "logic", "Logic-low threshold V_IL", "V"),
  {
    path: "logic.level_shift",
    group: "logic",
    label: "Level shift",
    type: "choice",
    choices: LEVEL_SHIFTS.map((s) => ({ value: s, label: s })),
  },
  num("logic.pull_down_ohm", "logic", "Pull-down resistor", "Ω"),
  num("logic.pin_min_v", "logic", "Lowest level the logic input tolerates", "V", {
    ...plain,
    optional: true,
    hint: "optional; empty is −0.3 V",
  }),
  num("logic.pull_up_ohm", "logic", "Pull-up resistor", "Ω", { optional: true, when: pulledUp }),
  num("logic.pin_cap_f", "logic", "Logic pin capacitance", "F", { optional: true, placeholder: "10p" }),
  num("logic.injection_ma", "logic", "Clamp current a pin may carry", "mA", {
    ...plain,
    optional: true,
    placeholder: "5",
    hint: "optional; empty is 5 mA (common practice)",
  }),
  num("logic.npn_base_ohm", "logic", "NPN base resistor", "Ω", { optional: true, when: isNpn }),
  {
    path: "logic.npn_base_clamp",
    group: "logic",
    label: "NPN base clamp diode",
    type: "choice",
    optional: true,
    boolean: true,
    when: isNpn,
    choices: [
      { value: "", label: "none" },
      { value: "true", label: "diode across base and emitter" },
      { value: "false", label: "none (stated)" },
    ],
  },
  num("logic.npn_vebo_v", "logic", "NPN emitter-base rating V_EBO", "V", {
    optional: true,
    when: isNpn,
    placeholder: "5",
  }),
  num("logic.npn_storage_s", "logic", "NPN storage time", "s", { optional: true, when: isNpn, placeholder: "300n" }),

  num("accuracy.required_v", "accuracy", "Required accuracy (input-referred)", "V"),
  num("temperature.min_c", "accuracy", "Lowest temperature", "°C", plain),
  num("temperature.max_c", "accuracy", "Highest temperature", "°C", plain),

  policyNumber("headroom_margin_v", "Headroom margin", "V"),
  policyNumber("marginal_fraction", "Marginal fraction", "fraction"),
  policyNumber("offset_share", "Offset share of the accuracy", "fraction"),
  policyNumber("speed_share", "Bandwidth-error share of the accuracy", "fraction"),
  policyNumber("sign_share", "Dead-band share of the accuracy", "fraction"),
  policyNumber("timing_fraction", "Pump-diode recovery share of its half period", "fraction"),
  policyNumber("timing_share", "Timing-error share of the accuracy (dead time, late sign)", "fraction"),
  {
    path: "policy.allow_unrated",
    group: "policy",
    label: "Accept unrated parts as marginal",
    type: "choice",
    optional: true,
    boolean: true,
    choices: [
      { value: "", label: `default (${POLICY_DEFAULTS.allow_unrated ? "yes" : "no"})` },
      { value: "true", label: "yes" },
      { value: "false", label: "no" },
    ],
  },

  ...ROLE_META.map((role) => bomRole(role.id, role.field, hasRole(role))),
];

export const FIELD_BY_PATH: ReadonlyMap<string, Field> = new Map(FIELDS.map((f) => [f.path, f]));

/** Text of every field, keyed by path: what the form shows and the URL carries. */
export type Draft = Record<string, string>;

export function applies(field: Field, draft: Readonly<Draft>): boolean {
  return field.when === undefined || field.when(draft);
}

/** Field ids are their paths; these name the helper elements around each box. */
export const messageId = (path: string) => `${path}--message`;
export const unitId = (path: string) => `${path}--unit`;
export const parsedId = (path: string) => `${path}--parsed`;
