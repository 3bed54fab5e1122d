// Small figures helpers shared by the benchmarks.

/** The q-quantile (0…1) of samples, nearest-rank. */
export function quantile(sorted: readonly number[], q: number): number {
  if (sorted.length === 0) return NaN;
  const rank = Math.min(sorted.length, Math.max(1, Math.ceil(q * sorted.length)));
  return sorted[rank - 1];
}

/** p50, p95 and p99 of latencies in milliseconds. */
export function latencyFigures(samples: readonly number[]): {
  p50: number;
  p95: number;
  p99: number;
} {
  const sorted = [...samples].sort((a, b) => a - b);
  return { p50: quantile(sorted, 0.5), p95: quantile(sorted, 0.95), p99: quantile(sorted, 0.99) };
}

/** A number with fixed decimals, right-aligned in `width`. */
export const fmt = (n: number, digits = 1, width = 7) => n.toFixed(digits).padStart(width);
