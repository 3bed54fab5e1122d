// Per-region gains as a per-vertex field, blended across region borders by a few rounds of
// one-ring averaging so that neighbouring regions with different gains meet without a seam.
import { SolverInputError } from '../errors.js';
import { deriveRegions } from '../rig/regions.js';
import type { Character } from '../types.js';

/** Options for the region gain field. */
export interface RegionGainOptions {
  /** Rounds of one-ring averaging at borders (each widens the blend by one ring of vertices). */
  borderRings?: number;
}

/** Default region gain options. */
export const REGION_GAIN_DEFAULTS: Required<RegionGainOptions> = { borderRings: 3 };

/** Region names of a character (its labels, else regions named after dominant joints). */
export function characterRegionNames(character: Character): string[] {
  return (
    character.regions ??
    deriveRegions(character.skinJoints, character.skinWeights, character.skeleton.names)
  ).names;
}

/**
 * Gain per vertex (N) from gains by region name (missing: 1). UNKNOWN_REGION when a name is not
 * a region of the character.
 */
export function vertexGainField(
  character: Character,
  regionGains: Record<string, number>,
  options: RegionGainOptions = {},
): Float32Array {
  const { borderRings } = { ...REGION_GAIN_DEFAULTS, ...options };
  const n = character.restPositions.length / 3;
  const field = new Float32Array(n).fill(1);
  const names = Object.keys(regionGains);
  if (names.length === 0) return field;
  const regions =
    character.regions ??
    deriveRegions(character.skinJoints, character.skinWeights, character.skeleton.names);
  for (const name of names) {
    if (!regions.names.includes(name)) {
      throw new SolverInputError(
        'UNKNOWN_REGION',
        `the character has no region "${name}" (it has ${regions.names.join(', ')})`,
        { item: name },
      );
    }
  }
  const byLabel = regions.names.map((name) => regionGains[name] ?? 1);
  for (let i = 0; i < n; i++) field[i] = byLabel[regions.labels[i]] ?? 1;
  if (borderRings <= 0) return field;
  const { offsets, neighbours } = vertexNeighbours(character.triangles, n);
  let cur = Float64Array.from(field);
  let next = new Float64Array(n);
  for (let round = 0; round < borderRings; round++) {
    for (let i = 0; i < n; i++) {
      let s = cur[i];
      for (let e = offsets[i]; e < offsets[i + 1]; e++) s += cur[neighbours[e]];
      next[i] = s / (1 + offsets[i + 1] - offsets[i]);
    }
    [cur, next] = [next, cur];
  }
  for (let i = 0; i < n; i++) field[i] = cur[i];
  return field;
}

/** One-ring neighbours of every vertex in compressed rows (duplicates removed). */
function vertexNeighbours(
  triangles: Uint32Array,
  n: number,
): { offsets: Uint32Array; neighbours: Uint32Array } {
  const sets: Set<number>[] = Array.from({ length: n }, () => new Set());
  for (let t = 0; t < triangles.length; t += 3) {
    const a = triangles[t], b = triangles[t + 1], c = triangles[t + 2]; // prettier-ignore
    sets[a].add(b).add(c);
    sets[b].add(a).add(c);
    sets[c].add(a).add(b);
  }
  const offsets = new Uint32Array(n + 1);
  for (let i = 0; i < n; i++) offsets[i + 1] = offsets[i] + sets[i].size;
  const neighbours = new Uint32Array(offsets[n]);
  for (let i = 0; i < n; i++) neighbours.set([...sets[i]], offsets[i]);
  return { offsets, neighbours };
}
