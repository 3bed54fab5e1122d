// Which joints drive the dynamics: for each dominant direction of the dynamic residual, the
// joints whose skin carries most of its displacement (tissue moves with the bone it hangs on).
import { ALL_DRIVER_SIGNALS } from '../dynamics/driver-inputs.js';
import type { Character, Driver, DriverSignal } from '../types.js';

/** Options for driver selection. */
export interface SelectDriversOptions {
  /** Joints taken per basis direction. */
  perDirection?: number;
  /** Most drivers kept (strongest total energy first). */
  maxDrivers?: number;
  /** Signals each driver contributes. */
  signals?: DriverSignal[];
}

/** Defaults: the two strongest joints per direction, at most 10 drivers, all three signals. */
export const SELECT_DRIVERS_DEFAULTS: Required<SelectDriversOptions> = {
  perDirection: 2,
  maxDrivers: 10,
  signals: ALL_DRIVER_SIGNALS,
};

/**
 * Drivers for the basis (K rows of 3N): for each row, the `perDirection` joints with the largest
 * Σᵢ wᵢⱼ ‖uᵢ‖² (skin weight × squared displacement); union in skeleton order after ranking.
 */
export function selectDrivers(
  character: Character,
  basis: Float32Array | Float64Array,
  k: number,
  options: SelectDriversOptions = {},
): Driver[] {
  const opts = { ...SELECT_DRIVERS_DEFAULTS, ...options };
  const { names } = character.skeleton;
  const n = character.restPositions.length / 3;
  const total = new Float64Array(names.length);
  const chosen = new Set<number>();
  const energy = new Float64Array(names.length);
  for (let q = 0; q < k; q++) {
    energy.fill(0);
    for (let i = 0; i < n; i++) {
      const o = q * 3 * n + 3 * i;
      const e = basis[o] ** 2 + basis[o + 1] ** 2 + basis[o + 2] ** 2;
      for (let s = 0; s < 4; s++)
        energy[character.skinJoints[4 * i + s]] += character.skinWeights[4 * i + s] * e;
    }
    const order = [...energy.keys()].sort((a, b) => energy[b] - energy[a] || a - b);
    for (const j of order.slice(0, opts.perDirection)) if (energy[j] > 0) chosen.add(j);
    for (let j = 0; j < names.length; j++) total[j] += energy[j];
  }
  return [...chosen]
    .sort((a, b) => total[b] - total[a] || a - b)
    .slice(0, opts.maxDrivers)
    .sort((a, b) => a - b)
    .map((j) => ({ joint: names[j], signals: [...opts.signals] }));
}
