// Design factory for tests: a schema-valid design on fixed ±5 V rails with a
// 2.5 V window (the issue-3 acceptance set-up), changed by deep overrides.
import type { Design } from "../../src/core/schemas/design.ts";
import { designSchema } from "../../src/engine.ts";

export const BASE_DESIGN = {
  id: "test-design",
  title: "Test design",
  topology: "rectify-and-sign",
  supply: { positive_v: 5, negative: { kind: "fixed", v: -5 } },
  signal: { peak_v: 2.5, max_frequency_hz: 20, source_ohm: 0 },
  front_end: {
    window_v: 2.5,
    divider_total_ohm: 100000,
    resistor_tolerance: 0.01,
    series: "E24",
    rectifier_load_ohm: 10000,
  },
  adc: { bits: 10, reference_v: 5, reference_tolerance: 0.01 },
  logic: { vdd_v: 5, vih_v: 3.5, vil_v: 1.5, level_shift: "diode-clamp", pull_down_ohm: 10000 },
  accuracy: { required_v: 0.1 },
  temperature: { min_c: 25, max_c: 25 },
  policy: {},
} as const;

type Json = string | number | boolean | null | undefined | Json[] | { [key: string]: Json };
export type DeepPartial = { [key: string]: Json };

/**
 * Overrides for a ±20 mV bridge on a 1.6–1.7 V common mode, difference-to-mid on a
 * single 3.3 V rail into a 2.5 V, 12-bit converter (pass to `design`).
 */
export const BRIDGE_20MV_ON_3V3: DeepPartial = {
  topology: "difference-to-mid",
  supply: { positive_v: 3.3, negative: { kind: "ground" } },
  signal: {
    peak_v: 0.02,
    max_frequency_hz: 50,
    source_ohm: 0,
    kind: "differential",
    common_mode_min_v: 1.6,
    common_mode_max_v: 1.7,
  },
  front_end: { divider_total_ohm: 10e3 },
  adc: { bits: 12, reference_v: 2.5 },
};

function isObject(v: unknown): v is Record<string, Json> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

/** Merges objects key by key; any other value (including a whole `negative` supply) replaces. */
export function merge(base: Json, overrides: Json): Json {
  if (!isObject(base) || !isObject(overrides)) return overrides;
  const out: Record<string, Json> = { ...base };
  for (const [k, v] of Object.entries(overrides)) {
    if (v === undefined) delete out[k];
    else out[k] = k === "negative" ? v : merge(out[k], v);
  }
  return out;
}

/** The raw design object (what a user writes). */
export function designInput(overrides: DeepPartial = {}): Record<string, Json> {
  return merge(JSON.parse(JSON.stringify(BASE_DESIGN)) as Json, overrides) as Record<string, Json>;
}

export function design(overrides: DeepPartial = {}): Design {
  return designSchema.parse(designInput(overrides));
}
