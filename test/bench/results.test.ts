// bench-results.json has exactly the fields of issues 9 and 18: nothing missing, nothing extra.
import { describe, expect, it } from "vitest";
import { benchResults } from "../../bench/results.ts";

const valid = {
  engine: [{ parts: 10000, ms_per_design: 13.4, baseline_ms_per_design: 4.36, ratio: 3.08 }],
  validate_rows_per_s: 158077,
  build: { demo_s: 2.3, large_s: 13.0, large_pages: 2015 },
  try_page: { demo_p95_ms: 10.5, large_p95_ms: 16.6 },
  weight: { try_js_gzip_bytes: 58226, catalogue_json_gzip_bytes: 4915 },
};

describe("benchResults", () => {
  it("takes the issue's shape", () => {
    expect(benchResults.parse(valid)).toEqual(valid);
  });

  it("takes the simulation figure of issue 19 when present", () => {
    expect(benchResults.parse({ ...valid, simulation_ms: 4.2 })).toEqual({ ...valid, simulation_ms: 4.2 });
  });

  it("takes issue 18's figures: the ranked lists against the sorting bare loop, and the large site on disk", () => {
    const withSite = {
      ...valid,
      engine: [{ ...valid.engine[0], ranked_ms_per_design: 25, ranked_ratio: 2.1 }],
      site: { total_bytes: 41_000_000, largest_page_bytes: 900_000, largest_page: "designs/x/index.html" },
    };
    expect(benchResults.safeParse(withSite).success).toBe(true);
  });

  it.each([
    ["an extra top-level field", { ...valid, memory_mb: 3 }],
    ["an extra engine field", { ...valid, engine: [{ ...valid.engine[0], memory_mb: 25 }] }],
    ["a missing field", { ...valid, build: { demo_s: 2.3, large_s: 13.0 } }],
    ["a figure that is not a number", { ...valid, try_page: { demo_p95_ms: NaN, large_p95_ms: 16.6 } }],
  ])("refuses %s", (_what, results) => {
    expect(benchResults.safeParse(results).success).toBe(false);
  });
});
