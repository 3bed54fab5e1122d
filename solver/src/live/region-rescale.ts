// Live region gains: rescales a take's morph targets (basis with the old per-vertex gains baked)
// to new per-vertex gains without a re-bake. Browser-safe and allocation-free.

/**
 * out = basis × newGains / oldGains per vertex (3N × K, column-major by mode). A vertex whose old
 * gain was 0 lost its shape in the bake and stays 0; the count of such vertices is returned
 * (re-bake to bring them back).
 */
export function rescaleRegionGains(
  basis: Float32Array,
  oldGains: Float32Array,
  newGains: Float32Array,
  out: Float32Array,
): number {
  const n = oldGains.length;
  const k = basis.length / (3 * n);
  let lost = 0;
  for (let i = 0; i < n; i++) {
    const old = oldGains[i];
    const f = old === 0 ? 0 : newGains[i] / old;
    if (old === 0 && newGains[i] !== 0) lost++;
    for (let c = 0; c < k; c++) {
      const o = c * 3 * n + 3 * i;
      out[o] = basis[o] * f;
      out[o + 1] = basis[o + 1] * f;
      out[o + 2] = basis[o + 2] * f;
    }
  }
  return lost;
}
