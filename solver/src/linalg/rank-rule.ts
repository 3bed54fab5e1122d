// How many dominant directions to keep. A variance target alone can drop a real but quiet
// component (a small region's jiggle may carry ~1 % of the energy), and a noise test alone keeps
// round-off structure on noise-free data; so K is the larger of the two counts below, capped:
// - the smallest rank whose energy reaches `varianceTarget` of the total;
// - the leading components that stand clear of the noise floor (more than `noiseFactor` times
//   the mean of the eigenvalues the solver did not resolve, which for white measurement noise is
//   the Marchenko–Pastur bulk's mean) AND carry at least `minEnergyShare` of the total.

/** Options for choosing the rank. */
export interface RankRuleOptions {
  /** Share of the energy the kept directions must reach. */
  varianceTarget?: number;
  /** Largest rank kept. */
  maxRank?: number;
  /** A component counts as signal above this multiple of the noise floor. */
  noiseFactor?: number;
  /** A component counts as signal only with at least this share of the total energy. */
  minEnergyShare?: number;
}

/**
 * Defaults: 95 % of the variance (the usual target); 4× the floor sits about twice above the edge
 * of the noise bulk for a 600 × 4,000 snapshot matrix; 1e-4 of the energy is far below any
 * visible jiggle. Common practice, tuned on the synthetic demo captures.
 */
export const RANK_RULE_DEFAULTS: Required<RankRuleOptions> = {
  varianceTarget: 0.95,
  maxRank: 32,
  noiseFactor: 4,
  minEnergyShare: 1e-4,
};

/** The rank decision and its evidence. */
export interface RankChoice {
  k: number;
  /** Rank reaching the variance target. */
  varianceRank: number;
  /** Rank of the components above the noise floor. */
  signalRank: number;
  /** Estimated noise floor (mean unresolved eigenvalue). */
  noiseFloor: number;
}

/**
 * Chooses K from the leading eigenvalues `spectrum` (σ², descending) of a rows × cols snapshot
 * matrix with total energy `total`.
 */
export function chooseRank(
  spectrum: Float64Array,
  total: number,
  rows: number,
  cols: number,
  options: RankRuleOptions = {},
): RankChoice {
  const opts = { ...RANK_RULE_DEFAULTS, ...options };
  const l = spectrum.length;
  let resolved = 0;
  for (let i = 0; i < l; i++) resolved += spectrum[i];
  const unresolved = Math.min(rows, cols) - l;
  const noiseFloor =
    unresolved > 0 ? Math.max(0, total - resolved) / unresolved : spectrum[l - 1] || 0;
  let varianceRank = 0;
  for (let cum = 0; varianceRank < l && cum < opts.varianceTarget * total; varianceRank++) {
    cum += spectrum[varianceRank];
  }
  let signalRank = 0;
  while (
    signalRank < l &&
    spectrum[signalRank] > opts.noiseFactor * noiseFloor &&
    spectrum[signalRank] > opts.minEnergyShare * total
  ) {
    signalRank++;
  }
  const k = Math.min(opts.maxRank, Math.max(varianceRank, signalRank), l);
  return { k, varianceRank, signalRank, noiseFloor };
}
