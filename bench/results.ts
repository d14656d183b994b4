// The shape of bench-results.json (issue 9), exactly: other tools read it, so
// the harness checks what it writes against this before writing it.
import { z } from "zod";

const positive = z.number().finite().positive();

export const benchResults = z.strictObject({
  engine: z.array(
    z.strictObject({
      parts: z.number().int().positive(),
      ms_per_design: positive,
      baseline_ms_per_design: positive,
      ratio: positive,
      /** Evaluation with every role's ranked lists read, and its ratio to the bare loop that also sorts (issue 18; optional so older results still read). */
      ranked_ms_per_design: positive.optional(),
      ranked_ratio: positive.optional(),
    }),
  ),
  validate_rows_per_s: positive,
  /** The slowest demo design/topology simulated at both frequencies, ms (issue 19; optional so older results still read). */
  simulation_ms: positive.optional(),
  build: z.strictObject({ demo_s: positive, large_s: positive, large_pages: z.number().int().positive() }),
  try_page: z.strictObject({ demo_p95_ms: positive, large_p95_ms: positive }),
  /** The large site on disk (issue 18; optional so older results still read). */
  site: z
    .strictObject({
      total_bytes: z.number().int().positive(),
      largest_page_bytes: z.number().int().positive(),
      largest_page: z.string(),
    })
    .optional(),
  weight: z.strictObject({
    /** What the try page fetches for its first answer on the default design (the 60 KB target's figure). */
    try_js_first_answer_gzip_bytes: z.number().int().positive().optional(),
    /** Every chunk the try page can fetch, static and dynamic imports alike. */
    try_js_gzip_bytes: z.number().int().positive(),
    catalogue_json_gzip_bytes: z.number().int().positive(),
  }),
});

export type BenchResults = z.output<typeof benchResults>;
