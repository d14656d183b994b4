// Column names carry their unit (SPEC §4); the schema's .meta() must say the same,
// because the site's table headers read it from there.
import { describe, expect, it } from "vitest";
import { KINDS } from "../../../src/core/catalogue.ts";
import type { ColumnMeta } from "../../../src/core/schemas/cells.ts";

const UNIT_OF_SUFFIX: [RegExp, string][] = [
  [/_uv_per_c$/, "µV/°C"],
  [/_v_per_us$/, "V/µs"],
  [/_nv_rthz$/, "nV/√Hz"],
  [/_mv$/, "mV"],
  [/_v$/, "V"],
  [/_na$/, "nA"],
  [/_ma$/, "mA"],
  [/_mhz$/, "MHz"],
  [/_ns$/, "ns"],
  [/_pf$/, "pF"],
  [/_ohm$/, "Ω"],
];

const columns = KINDS.flatMap((k) =>
  Object.entries(k.columns).map(([name, schema]) => [k.file, name, schema] as const),
);

describe("column metadata", () => {
  it.each(columns)("%s %s has a label and the unit its name carries", (_file, name, schema) => {
    const meta = schema.meta() as ColumnMeta | undefined;
    expect(meta?.label).toMatch(/\S/);
    const unit = UNIT_OF_SUFFIX.find(([suffix]) => suffix.test(name))?.[1];
    if (unit !== undefined) expect(meta?.unit).toBe(unit);
    else expect(meta?.unit).toBeTypeOf("string");
  });
});
