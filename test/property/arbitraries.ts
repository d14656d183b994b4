// fast-check generators for catalogue rows and designs. Each one writes raw
// cells (strings, as a CSV gives them) or raw JSON, and parses them through the
// real schemas, so a generated value is exactly one the tool would accept.
import fc from "fast-check";
import { catalogueFromParts, type Catalogue, type Part } from "../../src/core/catalogue.ts";
import { comparatorRow, type Comparator } from "../../src/core/schemas/comparator.ts";
import { LEVEL_SHIFTS, SERIES, type Design } from "../../src/core/schemas/design.ts";
import { designSchema, TOPOLOGY_IDS as TOPOLOGIES } from "../../src/engine.ts";
import { diodeRow, type Diode } from "../../src/core/schemas/diode.ts";
import { opAmpRow, type OpAmp } from "../../src/core/schemas/op-amp.ts";

/** A number in [min, max], rounded to four digits as a person would type it. */
export const num = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((v) => Number(v.toPrecision(4)));

/** Log-uniform, for quantities that span decades (bias currents, frequencies). */
export const decades = (min: number, max: number) =>
  num(Math.log10(min), Math.log10(max)).map((e) => Number((10 ** e).toPrecision(4)));

/** Half the time a plain number, half the time with an SI prefix ("2.2k"), as cells may hold. */
export const cell = (n: fc.Arbitrary<number>) =>
  fc.tuple(n, fc.boolean()).map(([v, prefixed]) => (prefixed ? withPrefix(v) : String(v)));

function withPrefix(v: number): string {
  const steps: [number, string][] = [
    [1e9, "G"],
    [1e6, "M"],
    [1e3, "k"],
    [1, ""],
    [1e-3, "m"],
    [1e-6, "u"],
    [1e-9, "n"],
    [1e-12, "p"],
  ];
  const [scale, prefix] = steps.find(([s]) => Math.abs(v) >= s) ?? [1e-12, "p"];
  return `${Number((v / scale).toPrecision(6))}${prefix}`;
}

const optional = (a: fc.Arbitrary<string>) => fc.oneof(fc.constant(""), a);
const status = fc.constantFrom("stocked", "approved", "listed", "");
const costBand = fc.constantFrom("1", "2", "3", "4", "5", "");
const yesNo = fc.constantFrom("yes", "no");

export const opAmpCells = fc.record({
  id: fc.constant("oa-generated"),
  name: fc.constant("Generated op amp"),
  status,
  cost_band: costBand,
  tags: fc.constant(""),
  notes: fc.constant(""),
  channels: fc.constantFrom("1", "2", "4"),
  supply_min_v: cell(num(1.5, 10)),
  supply_max_v: cell(num(5, 40)),
  icm_neg_headroom_v: cell(num(-0.3, 3)),
  icm_pos_headroom_v: cell(num(-0.3, 3)),
  out_neg_headroom_v: cell(num(0, 2)),
  out_pos_headroom_v: cell(num(0, 2)),
  out_load_ohm: optional(fc.constantFrom("2k", "10k")),
  vos_max_mv: cell(decades(0.001, 10)),
  vos_drift_uv_per_c: optional(cell(decades(0.005, 20))),
  ib_max_na: cell(decades(0.0005, 1000)),
  gbw_mhz: cell(decades(0.001, 2000)),
  slew_v_per_us: cell(decades(0.001, 5000)),
  iq_ma: cell(decades(0.0003, 20)),
  noise_nv_rthz: optional(cell(num(1, 200))),
  unity_gain_stable: yesNo,
  phase_reversal: fc.constantFrom("yes", "no", ""),
});

export const comparatorCells = fc.record({
  id: fc.constant("cmp-generated"),
  name: fc.constant("Generated comparator"),
  status,
  cost_band: costBand,
  tags: fc.constant(""),
  notes: fc.constant(""),
  channels: fc.constantFrom("1", "2", "4"),
  supply_min_v: cell(num(1.5, 10)),
  supply_max_v: cell(num(5, 40)),
  icm_neg_headroom_v: cell(num(-0.3, 2)),
  icm_pos_headroom_v: cell(num(-0.3, 2)),
  output: fc.constantFrom("push-pull", "open-drain"),
  out_neg_headroom_v: optional(cell(num(0, 1.5))),
  out_pos_headroom_v: optional(cell(num(0, 1.5))),
  vos_max_mv: cell(decades(0.01, 15)),
  tpd_ns: cell(decades(0.5, 20000)),
  hysteresis_mv: optional(cell(num(0, 20))),
  iq_ma: cell(decades(0.0003, 20)),
});

export const diodeCells = fc.record({
  id: fc.constant("d-generated"),
  name: fc.constant("Generated diode"),
  status,
  cost_band: costBand,
  tags: fc.constant(""),
  notes: fc.constant(""),
  type: fc.constantFrom("silicon", "schottky", "low-leakage"),
  vf_1ma_v: cell(num(0.1, 1)),
  vf_10ma_v: cell(num(0.15, 1.3)),
  ir_na: cell(decades(0.001, 5000)),
  vr_max_v: cell(num(4, 1000)),
  trr_ns: optional(cell(decades(0.5, 5000))),
  cj_pf: optional(cell(num(0.1, 100))),
  if_max_ma: cell(num(10, 3000)),
});

/** Parses cells through a row schema; rows the schema refuses are dropped (valid by construction). */
function parsed<T>(
  cells: fc.Arbitrary<Record<string, string>>,
  schema: { safeParse(v: unknown): { success: boolean; data?: T } },
): fc.Arbitrary<T> {
  return cells
    .map((c) => schema.safeParse(c))
    .filter((r) => r.success)
    .map((r) => r.data as T);
}

export const opAmpArb: fc.Arbitrary<OpAmp> = parsed(opAmpCells, opAmpRow);
export const comparatorArb: fc.Arbitrary<Comparator> = parsed(comparatorCells, comparatorRow);
export const diodeArb: fc.Arbitrary<Diode> = parsed(diodeCells, diodeRow);

/** A catalogue of a few parts of each kind, with unique ids. */
export const catalogueArb: fc.Arbitrary<Catalogue> = fc
  .tuple(
    fc.array(opAmpArb, { minLength: 1, maxLength: 4 }),
    fc.array(comparatorArb, { maxLength: 3 }),
    fc.array(diodeArb, { maxLength: 3 }),
  )
  .map(([o, c, d]) => {
    const parts: Part[] = [
      ...o.map((p, i) => ({ ...p, id: `oa-${i}` })),
      ...c.map((p, i) => ({ ...p, id: `cmp-${i}` })),
      ...d.map((p, i) => ({ ...p, id: `d-${i}` })),
    ];
    return catalogueFromParts(parts);
  });

const negative = (positive: number) =>
  fc.oneof(
    fc.constant({ kind: "ground" }),
    num(0.5, 30).map((v) => ({ kind: "fixed", v: -v })),
    fc.record({
      kind: fc.constant("charge-pump"),
      drive_v: num(0.3, 1).map((f) => Number((f * positive).toPrecision(4))),
      frequency_hz: decades(100, 1e6),
      flying_cap_f: decades(1e-7, 1e-4),
      reservoir_cap_f: decades(1e-7, 1e-4),
      load_a: decades(1e-6, 0.02),
    }),
  );

/** Raw design JSON, as a user writes it. */
export const designInputArb = num(1.8, 30).chain((positive) =>
  fc
    .record({
      topology: fc.constantFrom(...TOPOLOGIES),
      negative: negative(positive),
      peak_v: decades(0.05, 200),
      max_frequency_hz: decades(0.1, 1e5),
      source_ohm: fc.oneof(fc.constant(0), decades(1, 1e7)),
      window: num(0.1, 0.95),
      divider_total_ohm: decades(1e3, 1e6),
      resistor_tolerance: fc.constantFrom(0.001, 0.01, 0.05),
      series: fc.constantFrom(...SERIES),
      rectifier_load_ohm: decades(1e3, 1e6),
      bits: fc.integer({ min: 8, max: 16 }),
      reference: num(1, 2),
      reference_tolerance: fc.constantFrom(0.001, 0.005, 0.01),
      vdd_v: num(1.8, 5),
      vih: num(0.5, 0.8),
      vil: num(0.2, 0.8),
      level_shift: fc.constantFrom(...LEVEL_SHIFTS),
      pull_down_ohm: decades(1e3, 1e6),
      required_v: decades(1e-4, 1),
      min_c: fc.integer({ min: -40, max: 25 }),
      max_c: fc.integer({ min: 25, max: 125 }),
      allow_unrated: fc.boolean(),
    })
    .map((r) => {
      const window = Number((r.window * positive).toPrecision(4));
      const vih = Number((r.vih * r.vdd_v).toPrecision(4));
      return {
        id: "generated",
        title: "Generated design",
        topology: r.topology,
        supply: { positive_v: positive, negative: r.negative },
        signal: { peak_v: r.peak_v, max_frequency_hz: r.max_frequency_hz, source_ohm: r.source_ohm },
        front_end: {
          window_v: window,
          divider_total_ohm: r.divider_total_ohm,
          resistor_tolerance: r.resistor_tolerance,
          series: r.series,
          rectifier_load_ohm: r.rectifier_load_ohm,
        },
        adc: {
          bits: r.bits,
          reference_v: Math.min(100, Number((window * r.reference).toPrecision(4))),
          reference_tolerance: r.reference_tolerance,
        },
        logic: {
          vdd_v: r.vdd_v,
          vih_v: vih,
          vil_v: Number((r.vil * vih).toPrecision(4)),
          level_shift: r.level_shift,
          pull_down_ohm: r.pull_down_ohm,
        },
        accuracy: { required_v: r.required_v },
        temperature: { min_c: r.min_c, max_c: r.max_c },
        policy: { allow_unrated: r.allow_unrated },
      };
    }),
);

/** The raw JSON a generated design starts as, before the schema reads it. */
export type RawDesign = (typeof designInputArb extends fc.Arbitrary<infer T> ? T : never) & {
  bom?: Record<string, string>;
};

export function parseDesign(raw: unknown): Design | undefined {
  const r = designSchema.safeParse(raw);
  return r.success ? r.data : undefined;
}

/** Schema-valid designs only. */
export const designArb: fc.Arbitrary<Design> = designInputArb
  .map(parseDesign)
  .filter((d): d is Design => d !== undefined);
