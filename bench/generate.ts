// A synthetic catalogue of any size, made by varying the demo classes, for
// benchmarks only (the values are invented, not a catalogue to use).
import type { Catalogue, Part } from "../src/core/catalogue.ts";
import { catalogueFromParts, KINDS } from "../src/core/catalogue.ts";
import { csvCell } from "../src/core/csv-escape.ts";

export function scaledCatalogue(base: Catalogue, size: number): Catalogue {
  // The demo classes stay, so the demo designs' BOM ids still name parts.
  const parts: Part[] = [...base.parts];
  const source = base.parts;
  for (let i = 0; parts.length < size; i++) {
    const p = source[i % source.length];
    if (!p) break;
    const factor = 1 + ((i * 7919) % 41) / 100 - 0.2;
    parts.push(vary(p, `${p.id}-v${i}`, factor));
  }
  return catalogueFromParts(parts);
}

function vary(p: Part, id: string, f: number): Part {
  switch (p.kind) {
    case "op-amp":
      return { ...p, id, vos_max_mv: p.vos_max_mv * f, gbw_mhz: p.gbw_mhz * f, ib_max_na: p.ib_max_na * f };
    case "comparator":
      return { ...p, id, vos_max_mv: p.vos_max_mv * f, tpd_ns: p.tpd_ns * f };
    case "diode":
      return { ...p, id, ir_na: p.ir_na * f, vf_1ma_v: p.vf_1ma_v * (0.95 + f / 20) };
  }
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
