// Seeded synthetic catalogues and designs for the benchmarks only: the values
// are invented around the demo classes, not a catalogue to choose parts from.
import type { Catalogue, Part } from "../src/core/catalogue.ts";
import { catalogueFromParts, KINDS } from "../src/core/catalogue.ts";
import type { Comparator } from "../src/core/schemas/comparator.ts";
import type { Design } from "../src/core/schemas/design.ts";
import type { Diode } from "../src/core/schemas/diode.ts";
import type { OpAmp } from "../src/core/schemas/op-amp.ts";
import { csvCell } from "../src/core/csv-escape.ts";

/** mulberry32: a small, well-mixed 32-bit generator; the same seed gives the same catalogue. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Random = () => number;

// Share of each kind, close to the demo catalogue's (33 : 13 : 17).
const MIX = [
  { kind: "op-amp", share: 0.52 },
  { kind: "comparator", share: 0.21 },
  { kind: "diode", share: 0.27 },
] as const;

const STATUS = ["stocked", "approved", "listed"] as const;

/**
 * `size` parts: the demo classes first (so the demo designs' BOMs still name
 * parts), then variants of a seeded-random demo class of a seeded-random kind,
 * each value scaled within the spread real parts of that class show.
 */
export function syntheticCatalogue(base: Catalogue, size: number, seed = 1): Catalogue {
  const random = seededRandom(seed);
  const parts: Part[] = base.parts.slice(0, size);
  const byKind = {
    "op-amp": base.opAmps,
    comparator: base.comparators,
    diode: base.diodes,
  } as const;
  for (let i = 0; parts.length < size; i++) {
    const r = random();
    const kind = r < MIX[0].share ? "op-amp" : r < MIX[0].share + MIX[1].share ? "comparator" : "diode";
    const pool: readonly Part[] = byKind[kind];
    const template = pool[Math.floor(random() * pool.length)];
    if (!template) throw new Error(`bench: the base catalogue has no ${kind}`);
    parts.push(vary(template, `${template.id}-g${i}`, random));
  }
  return catalogueFromParts(parts);
}

/** Log-uniform factor between 1/spread and spread. */
function factor(random: Random, spread: number): number {
  return Math.exp((random() * 2 - 1) * Math.log(spread));
}

function sig(v: number): number {
  return Number(v.toPrecision(3));
}

function common(p: Part, id: string, random: Random) {
  return {
    id,
    name: `${p.name} (generated variant)`,
    status: STATUS[Math.floor(random() * STATUS.length)] ?? "listed",
    cost_band: 1 + Math.floor(random() * 5),
    tags: p.tags,
    notes: "Generated for benchmarks.",
  };
}

function vary(p: Part, id: string, random: Random): Part {
  switch (p.kind) {
    case "op-amp":
      return varyOpAmp(p, id, random);
    case "comparator":
      return varyComparator(p, id, random);
    case "diode":
      return varyDiode(p, id, random);
  }
}

function varyOpAmp(p: OpAmp, id: string, random: Random): OpAmp {
  const drift = random() < 0.1 ? undefined : p.vos_drift_uv_per_c;
  return {
    ...p,
    ...common(p, id, random),
    vos_max_mv: sig(p.vos_max_mv * factor(random, 3)),
    vos_drift_uv_per_c: drift === undefined ? undefined : sig(drift * factor(random, 2)),
    ib_max_na: sig(p.ib_max_na * factor(random, 10)),
    gbw_mhz: sig(p.gbw_mhz * factor(random, 3)),
    slew_v_per_us: sig(p.slew_v_per_us * factor(random, 3)),
    iq_ma: sig(p.iq_ma * factor(random, 2)),
    // Headroom moves by up to ±30 %, which keeps their sum inside the supply.
    out_neg_headroom_v: sig(p.out_neg_headroom_v * (0.7 + 0.6 * random())),
    out_pos_headroom_v: sig(p.out_pos_headroom_v * (0.7 + 0.6 * random())),
    phase_reversal: random() < 0.1 ? undefined : p.phase_reversal,
  };
}

function varyComparator(p: Comparator, id: string, random: Random): Comparator {
  return {
    ...p,
    ...common(p, id, random),
    vos_max_mv: sig(p.vos_max_mv * factor(random, 3)),
    tpd_ns: sig(p.tpd_ns * factor(random, 4)),
    iq_ma: sig(p.iq_ma * factor(random, 2)),
  };
}

function varyDiode(p: Diode, id: string, random: Random): Diode {
  const vf1 = sig(p.vf_1ma_v * (0.9 + 0.2 * random()));
  return {
    ...p,
    ...common(p, id, random),
    vf_1ma_v: vf1,
    vf_10ma_v: sig(vf1 + (p.vf_10ma_v - p.vf_1ma_v) * (0.8 + 0.4 * random())),
    ir_na: sig(p.ir_na * factor(random, 5)),
    vr_max_v: sig(p.vr_max_v * factor(random, 1.5)),
    trr_ns: p.trr_ns === undefined ? undefined : sig(p.trr_ns * factor(random, 2)),
    if_max_ma: sig(p.if_max_ma * factor(random, 1.5)),
  };
}

/**
 * `count` designs: the base designs, then copies with the signal peak, source
 * resistance and frequency moved (seeded), so a build has that many design pages.
 */
export function syntheticDesigns(base: readonly Design[], count: number, seed = 1): Design[] {
  const random = seededRandom(seed);
  const designs = base.slice(0, count);
  for (let i = 0; designs.length < count; i++) {
    const d = base[i % base.length];
    if (!d) break;
    designs.push({
      ...d,
      id: `${d.id}-g${i}`,
      title: `${d.title} (generated variant ${i + 1})`,
      signal: {
        ...d.signal,
        peak_v: sig(d.signal.peak_v * (0.8 + 0.4 * random())),
        max_frequency_hz: sig(d.signal.max_frequency_hz * factor(random, 2)),
        source_ohm: sig(d.signal.source_ohm * factor(random, 2)),
      },
    });
  }
  return designs;
}

/** The catalogue back as the three CSV files, in each kind's column order. */
export function catalogueCsv(catalogue: Catalogue): Record<string, string> {
  const files: Record<string, string> = {};
  for (const spec of KINDS) {
    const columns = Object.keys(spec.columns);
    const rows = catalogue.parts
      .filter((p) => p.kind === spec.kind)
      .map((p) => columns.map((c) => cell((p as Record<string, unknown>)[c])).join(","));
    files[spec.file] = `${[columns.join(","), ...rows].join("\n")}\n`;
  }
  return files;
}

function cell(v: unknown): string {
  if (v === undefined) return "";
  if (typeof v === "boolean") return v ? "yes" : "no";
  if (Array.isArray(v)) return csvCell(v.join(";"));
  if (typeof v === "number") return String(Number(v.toPrecision(6)));
  return csvCell(String(v));
}
