// Small statistics for the benchmarks: machines here are shared and noisy, so
// every figure is a median (or a p95) of several runs, never a single one.

export function median(xs: readonly number[]): number {
  return quantile(xs, 0.5);
}

/** Nearest-rank quantile: the smallest sample with at least q of the samples at or below it. */
export function quantile(xs: readonly number[], q: number): number {
  if (xs.length === 0) return NaN;
  const sorted = [...xs].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))] as number;
}

/** Milliseconds per call of `fn`, repeated until one sample lasts at least `minMs`. */
export function timePerCall(fn: () => void, minMs: number): number {
  let reps = 1;
  for (;;) {
    const t0 = performance.now();
    for (let i = 0; i < reps; i++) fn();
    const elapsed = performance.now() - t0;
    if (elapsed >= minMs || reps >= 1 << 20) return elapsed / reps;
    reps = Math.max(reps * 2, Math.ceil((reps * minMs) / Math.max(elapsed, 0.01)));
  }
}
