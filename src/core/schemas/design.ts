// Design files (SPEC §5). Numbers are SI; a string with an SI prefix ("1u",
// "100k") is accepted wherever a number is. DesignInput is what a user writes,
// Design the cleaned value with policy defaults filled in.
import * as z from "zod/mini";
import { firstUnsafe, unsafeTextMessage } from "../text-safety.ts";
import { ID_PATTERN } from "./cells.ts";
import { closest } from "../problems.ts";
import { parseSI } from "../units.ts";

type Range = { above?: number; min?: number; max?: number; below?: number; integer?: boolean };

function describe(r: Range): string {
  const bounds: string[] = [];
  if (r.above !== undefined) bounds.push(`greater than ${r.above}`);
  if (r.min !== undefined) bounds.push(`at least ${r.min}`);
  if (r.below !== undefined) bounds.push(`less than ${r.below}`);
  if (r.max !== undefined) bounds.push(`at most ${r.max}`);
  const what = r.integer ? "a whole number" : 'a number (or a string such as "100k")';
  return bounds.length === 0 ? what : `${what}, ${bounds.join(" and ")}`;
}

export function shown(value: unknown): string {
  if (typeof value === "string") return `'${value.length > 40 ? `${value.slice(0, 37)}…` : value}'`;
  if (value === undefined) return "nothing";
  // JSON.stringify would print a 1e400 that JSON.parse turned into Infinity as "null".
  if (typeof value === "number" && !Number.isFinite(value)) return String(value);
  let json: string | undefined;
  try {
    json = JSON.stringify(value);
  } catch {
    // Nested deeper than the stack allows: only a hostile or broken file does that.
    json = Array.isArray(value) ? "[…]" : "{…}";
  }
  return json === undefined ? String(value) : json.length > 40 ? `${json.slice(0, 37)}…` : json;
}

type Payload = z.core.ParsePayload;

/** Any JSON value, read by `fn` (zod/mini has no `.transform` method; see DEVELOPERS.md). */
function read<T>(fn: (value: unknown, ctx: Payload) => T) {
  return z.pipe(z.unknown(), z.transform(fn));
}

/** Reports why a value cannot be read; what a transform returns after it is ignored. */
function fail(ctx: Payload, message: string): never {
  ctx.issues.push({ code: "custom", message, input: ctx.value });
  return z.NEVER;
}

/** A number in SI units, given as a JSON number or an SI-prefixed string. */
export function si(range: Range = {}) {
  return read((value, ctx): number => {
    const expected = describe(range);
    let n: number | undefined;
    if (typeof value === "number") n = value;
    else if (typeof value === "string") {
      const parsed = parseSI(value);
      if (parsed.ok) n = parsed.value;
    }
    if (n === undefined || !Number.isFinite(n)) {
      const what =
        value === undefined ? "required value is missing" : typeof value === "number" ? "out of range" : "not a number";
      return fail(ctx, `${what} (got ${shown(value)}, expected ${expected})`);
    }
    const bad =
      (range.integer === true && !Number.isInteger(n)) ||
      (range.above !== undefined && n <= range.above) ||
      (range.min !== undefined && n < range.min) ||
      (range.below !== undefined && n >= range.below) ||
      (range.max !== undefined && n > range.max);
    if (bad) {
      return fail(ctx, `out of range (got ${shown(value)}, expected ${expected})`);
    }
    return n;
  });
}

function oneOf<const T extends readonly [string, ...string[]]>(values: T) {
  return read((value, ctx): T[number] => {
    if (typeof value === "string" && (values as readonly string[]).includes(value)) return value as T[number];
    const what = value === undefined ? "required value is missing" : "unknown value";
    return fail(ctx, `${what} (got ${shown(value)}, expected ${values.map((v) => `'${v}'`).join(" or ")})`);
  });
}

export const LEVEL_SHIFTS = ["diode-clamp", "npn-inverter", "pull-up"] as const;
export const SERIES = ["E12", "E24", "E96"] as const;
/** A signal against ground, or the difference of two inputs riding on a common mode (a bridge), SPEC §12.2. */
export const SIGNAL_KINDS = ["single-ended", "differential"] as const;
/** A role id; the topology registry (src/topologies/) says which exist. */
export type Role = string;

export const POLICY_DEFAULTS = {
  headroom_margin_v: 0.1,
  marginal_fraction: 0.2,
  offset_share: 0.25,
  speed_share: 0.25,
  sign_share: 0.5,
  timing_fraction: 0.01,
  timing_share: 0.25,
  allow_unrated: false,
} as const;

const chargePump = z.strictObject({
  kind: z.literal("charge-pump"),
  drive_v: si({ above: 0, max: 100 }),
  frequency_hz: si({ above: 0 }),
  flying_cap_f: si({ above: 0 }),
  reservoir_cap_f: si({ above: 0 }),
  load_a: si({ min: 0 }),
  // Optional (issue 16): output resistance of the pin that drives the pump.
  drive_ohm: z.optional(si({ min: 0, max: 1e6 })),
});

const negativeSupply = z.pipe(
  z.unknown(),
  z.discriminatedUnion(
    "kind",
    [
      z.strictObject({ kind: z.literal("ground") }),
      z.strictObject({ kind: z.literal("fixed"), v: si({ below: 0, min: -100 }) }),
      chargePump,
    ],
    { error: (iss) => negativeKindMessage(iss.input) },
  ),
);

function negativeKindMessage(input: unknown): string {
  const kind = typeof input === "object" && input !== null ? (input as { kind?: unknown }).kind : input;
  return `unknown negative supply (got kind ${shown(kind)}, expected 'ground', 'fixed' or 'charge-pump')`;
}

const trueOrFalse = () =>
  z.boolean({ error: (i) => `not true or false (got ${shown(i.input)}, expected true or false)` });

const policy = z.pipe(
  z.optional(
    z.strictObject({
      headroom_margin_v: z.optional(si({ min: 0, max: 10 })),
      marginal_fraction: z.optional(si({ min: 0, max: 1 })),
      offset_share: z.optional(si({ above: 0, max: 1 })),
      speed_share: z.optional(si({ above: 0, max: 1 })),
      sign_share: z.optional(si({ above: 0, max: 1 })),
      timing_fraction: z.optional(si({ above: 0, max: 1 })),
      timing_share: z.optional(si({ above: 0, max: 1 })),
      allow_unrated: z.optional(trueOrFalse()),
    }),
  ),
  z.transform((p) => ({ ...POLICY_DEFAULTS, ...stripUndefined(p ?? {}) })),
);

function stripUndefined<T extends object>(o: T): Partial<T> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}

const text = (what: string, max: number) =>
  read((value, ctx): string => {
    if (typeof value === "string" && value.trim() !== "" && value.length <= max) {
      const unsafe = firstUnsafe(value);
      if (unsafe === undefined) return value;
      return fail(ctx, `not a valid ${what}: ${unsafeTextMessage(unsafe)}`);
    }
    return fail(ctx, `not a valid ${what} (got ${shown(value)}, expected text of 1 to ${max} characters)`);
  });

const designId = read((value, ctx): string => {
  if (typeof value === "string" && ID_PATTERN.test(value) && value.length <= 80) return value;
  return fail(
    ctx,
    `not a valid id (got ${shown(value)}, expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)`,
  );
});

function bomOf(roles: readonly string[]) {
  const role = z.pipe(
    z.string(),
    z.transform((key: string, ctx: Payload): Role => {
      if (roles.includes(key)) return key;
      const guess = closest(key, roles);
      return fail(ctx, `unknown role (got '${key}', expected ${guess ? `'${guess}'` : `one of ${roles.join(", ")}`})`);
    }),
  );
  return z.pipe(
    z.optional(z.record(role, designId)),
    z.transform((b): Partial<Record<Role, string>> => b ?? {}),
  );
}

/**
 * What the design schema takes from the topology registry. The schema is built
 * from it (src/engine.ts does that once), so src/core names no topology and
 * imports nothing from src/topologies.
 */
export type DesignNames = {
  /** Topology ids, "all" included, in the order messages list them. */
  topologies: readonly [string, ...string[]];
  roles: readonly string[];
  /** Checks a topology adds for the designs that name it (or "all"). */
  check?: (design: DesignShape) => readonly { path: (string | number)[]; message: string }[];
};

function designObject(names: DesignNames) {
  return z.strictObject({
    id: designId,
    title: text("title", 200),
    topology: oneOf(names.topologies),
    supply: z.strictObject({
      positive_v: si({ above: 0, max: 100 }),
      negative: negativeSupply,
    }),
    signal: z.strictObject({
      peak_v: si({ above: 0, max: 100000 }),
      max_frequency_hz: si({ above: 0 }),
      source_ohm: si({ min: 0 }),
      // Optional (issue 17, SPEC §12.2): a differential source and the range its common mode moves over.
      /** "single-ended" when absent. */
      kind: z.optional(oneOf(SIGNAL_KINDS)),
      /** Lowest common-mode voltage of a differential source (both inputs' mean). */
      common_mode_min_v: z.optional(si({ min: -100, max: 100 })),
      /** Highest common-mode voltage of a differential source. */
      common_mode_max_v: z.optional(si({ min: -100, max: 100 })),
      // Optional (issue 17, SPEC §12.4): the largest voltage the input may see in a fault, either sign.
      fault_v: z.optional(si({ above: 0, max: 100000 })),
      /** Largest content above the band (pickup, noise) at the input, volts peak; the alias term takes peak_v when absent (issue 17). */
      out_of_band_v: z.optional(si({ min: 0, max: 100000 })),
      /** Optional (SPEC §11.1): the source resistance's tolerance, a budget term of its own. */
      source_tolerance: z.optional(si({ min: 0, max: 1 })),
    }),
    front_end: z.strictObject({
      window_v: si({ above: 0 }),
      divider_total_ohm: si({ above: 0 }),
      resistor_tolerance: si({ min: 0, max: 0.2 }),
      series: oneOf(SERIES),
      rectifier_load_ohm: si({ above: 0 }),
      /** Optional (SPEC §11.2): the rectifier's resistors' tolerance; resistor_tolerance when absent. */
      rectifier_tolerance: z.optional(si({ min: 0, max: 0.2 })),
      /** Series resistor into the sign input: limits the current when its input clamps conduct (issue 21). */
      sign_series_ohm: z.optional(si({ above: 0 })),
      /** Series resistor between the input connector and the front end: limits the fault current into clamps (issue 17). */
      protection_ohm: z.optional(si({ above: 0 })),
      // Optional (issue 16, SPEC §11.1): the divider's resistors held as given, both or neither; the E-series search is skipped.
      /** Top resistor R1, in series with the source. */
      divider_r1_ohm: z.optional(si({ above: 0, max: 1e9 })),
      /** Bottom resistor R2, across which the buffer reads. */
      divider_r2_ohm: z.optional(si({ above: 0, max: 1e9 })),
    }),
    adc: z.strictObject({
      bits: si({ integer: true, min: 1, max: 32 }),
      reference_v: si({ above: 0, max: 100 }),
      reference_tolerance: si({ min: 0, max: 0.2 }),
      // Optional (issue 17, SPEC §12.3): the converter's sampling input; settling is unrated without them.
      /** Sampling capacitor. */
      sample_cap_f: z.optional(si({ above: 0, max: 1e-6 })),
      /** Resistance of the sampling switch. */
      switch_ohm: z.optional(si({ min: 0, max: 1e6 })),
      /** Acquisition (tracking) time the converter allows. */
      acquisition_s: z.optional(si({ above: 0, max: 1 })),
      /** Conversions per second. */
      sample_rate_hz: z.optional(si({ above: 0 })),
      /** Optional series resistor between the driving stage and the pin. */
      pin_r_ohm: z.optional(si({ min: 0, max: 1e7 })),
      /** Optional capacitor from the pin to ground (the charge reservoir). */
      pin_c_f: z.optional(si({ min: 0, max: 1e-3 })),
      // Optional (SPEC §11.10): the reference's tempco and the converter's own errors.
      reference_tempco_ppm_per_c: z.optional(si({ min: 0, max: 10000 })),
      offset_lsb: z.optional(si({ min: 0, max: 1e6 })),
      gain_error: z.optional(si({ min: 0, max: 0.5 })),
      inl_lsb: z.optional(si({ min: 0, max: 1e6 })),
    }),
    logic: z.strictObject({
      vdd_v: si({ above: 0, max: 100 }),
      vih_v: si({ above: 0 }),
      vil_v: si({ min: 0 }),
      level_shift: oneOf(LEVEL_SHIFTS),
      pull_down_ohm: si({ above: 0 }),
      // Optional (issue 16): the lowest level the logic input tolerates; −0.3 V when absent.
      pin_min_v: z.optional(si({ min: -100, max: 0 })),
      // Sign-path fields (issue 21), all optional; defaults live in math/rc-edge.ts and math/npn-inverter.ts, marked there.
      /** Capacitance of the logic pin and its trace (default 10 pF, common practice). */
      pin_cap_f: z.optional(si({ above: 0 })),
      /** Pull-up of the pull-up level shift and the NPN inverter's collector. */
      pull_up_ohm: z.optional(si({ above: 0 })),
      /** NPN inverter: resistor from the sign output to the base. */
      npn_base_ohm: z.optional(si({ above: 0 })),
      /** NPN inverter: a diode across base and emitter that stops a negative output reverse-biasing the base. */
      npn_base_clamp: z.optional(trueOrFalse()),
      /** NPN inverter: the transistor's emitter-base reverse rating V_EBO (default 5 V, common practice). */
      npn_vebo_v: z.optional(si({ above: 0, max: 100 })),
      /** NPN inverter: the transistor's storage time when it leaves saturation (default 300 ns, common practice). */
      npn_storage_s: z.optional(si({ min: 0, max: 1 })),
      /** Current a logic or converter pin's clamps may carry, mA (default 5 mA, common practice: math/clamp-current.ts). */
      injection_ma: z.optional(si({ above: 0, max: 1000 })),
    }),
    accuracy: z.strictObject({ required_v: si({ above: 0 }) }),
    temperature: z.strictObject({ min_c: si({ min: -273.15 }), max_c: si({ max: 500 }) }),
    policy,
    bom: bomOf(names.roles),
  });
}

/** A design as the schema's object reads it, before the cross-field checks. */
export type DesignShape = z.output<ReturnType<typeof designObject>>;

export function designSchemaFor(names: DesignNames) {
  // Checks across fields, once every field has been read.
  const crossCheck = (d: DesignShape, ctx: z.core.$RefinementCtx<DesignShape>): void => {
    const issue = (path: (string | number)[], message: string) => ctx.addIssue({ code: "custom", path, message });
    if (d.front_end.window_v >= d.supply.positive_v) {
      issue(
        ["front_end", "window_v"],
        `window can never fit inside the positive rail (got ${d.front_end.window_v} V, expected less than supply.positive_v ${d.supply.positive_v} V)`,
      );
    }
    const { divider_r1_ohm: r1, divider_r2_ohm: r2 } = d.front_end;
    if ((r1 === undefined) !== (r2 === undefined)) {
      const [missing, given, what] =
        r1 === undefined ? ["divider_r1_ohm", "divider_r2_ohm", "top"] : ["divider_r2_ohm", "divider_r1_ohm", "bottom"];
      issue(
        ["front_end", missing],
        `required value is missing (got nothing, expected the divider's ${what} resistor in ohms: front_end.${given} holds the divider, so hold both of its resistors or neither)`,
      );
    }
    for (const p of names.check?.(d) ?? []) issue(p.path, p.message);
    const { signal } = d;
    if (signal.kind === "differential") {
      for (const key of ["common_mode_min_v", "common_mode_max_v"] as const) {
        if (signal[key] === undefined) {
          issue(
            ["signal", key],
            `required value is missing (got nothing, expected the ${key === "common_mode_min_v" ? "lowest" : "highest"} common-mode voltage of the differential source, in volts)`,
          );
        }
      }
    }
    if (
      signal.common_mode_min_v !== undefined &&
      signal.common_mode_max_v !== undefined &&
      signal.common_mode_min_v > signal.common_mode_max_v
    ) {
      issue(
        ["signal", "common_mode_min_v"],
        `range is upside down (got ${signal.common_mode_min_v} V, expected at most signal.common_mode_max_v ${signal.common_mode_max_v} V)`,
      );
    }
    const { acquisition_s, sample_rate_hz } = d.adc;
    if (acquisition_s !== undefined && sample_rate_hz !== undefined && acquisition_s > 1 / sample_rate_hz) {
      issue(
        ["adc", "acquisition_s"],
        `acquisition is longer than a conversion period (got ${acquisition_s} s, expected at most 1 / adc.sample_rate_hz = ${Number((1 / sample_rate_hz).toPrecision(4))} s)`,
      );
    }
    // The converter runs from the positive rail; a reference above it would put full scale out of reach.
    if (d.adc.reference_v > d.supply.positive_v) {
      issue(
        ["adc", "reference_v"],
        `ADC reference is above the positive rail (got ${d.adc.reference_v} V, expected at most supply.positive_v ${d.supply.positive_v} V)`,
      );
    }
    if (d.logic.vil_v >= d.logic.vih_v) {
      issue(
        ["logic", "vil_v"],
        `logic-low threshold is not below logic-high (got ${d.logic.vil_v} V, expected less than logic.vih_v ${d.logic.vih_v} V)`,
      );
    }
    if (d.logic.vih_v > d.logic.vdd_v) {
      issue(
        ["logic", "vih_v"],
        `logic-high threshold is above the logic supply (got ${d.logic.vih_v} V, expected at most logic.vdd_v ${d.logic.vdd_v} V)`,
      );
    }
    if (d.temperature.min_c > d.temperature.max_c) {
      issue(
        ["temperature", "min_c"],
        `range is upside down (got ${d.temperature.min_c} °C, expected at most temperature.max_c ${d.temperature.max_c} °C)`,
      );
    }
    if (d.supply.negative.kind === "charge-pump" && d.supply.negative.drive_v > d.supply.positive_v + 0.5) {
      issue(
        ["supply", "negative", "drive_v"],
        `pump drive is above the positive rail it is made from (got ${d.supply.negative.drive_v} V, expected at most supply.positive_v ${d.supply.positive_v} V)`,
      );
    }
  };
  return designObject(names).check(z.superRefine(crossCheck));
}

export type DesignSchema = ReturnType<typeof designSchemaFor>;
export type DesignInput = z.input<DesignSchema>;
export type Design = z.output<DesignSchema>;
export type Policy = Design["policy"];
export type NegativeSupply = Design["supply"]["negative"];
export type Topology = Design["topology"];
