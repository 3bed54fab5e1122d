// Vertices of the pose-driven fit grouped by the joints whose rotation can move them (one normal
// matrix per group), and the joints whose tissue-dynamics signals compete with the pose features:
// a vertex's dominant skin joint and that joint's parent (a region's flesh hangs from its bone and
// from the bone above; a child joint, like the elbow for the upper arm, drives correctives).
import type { Character } from '../types.js';

/** Vertices that share influencing joints and competing joints. */
export interface Group {
  joints: number[];
  /** Joints whose competing signals the group's vertices get: the dominant skin joint and its parent. */
  drivers: number[];
  vertices: number[];
}

/** Each joint's child joints, from the skeleton's parent list. */
export function jointChildren(parents: ArrayLike<number>): number[][] {
  const children: number[][] = Array.from({ length: parents.length }, () => []);
  for (let j = 0; j < parents.length; j++) if (parents[j] >= 0) children[parents[j]].push(j);
  return children;
}

/**
 * The ≤ 4 joints whose rotation can deform vertex i: its skin joints and their children (a bone's
 * flesh also bulges when the joint at its far end bends), ranked by skin weight, a child scoring
 * half its parent's weight. Sorted by joint index. Root joints are left out: their rotation is
 * the whole character's orientation, which moves the mesh rigidly and deforms nothing (as a
 * feature it made a shot that turns the character round extrapolate correctives learned from a
 * capture that faced one way to kilometres).
 */
export function influencingJoints(character: Character, i: number, children: number[][]): number[] {
  const { parents } = character.skeleton;
  const score = new Map<number, number>();
  const add = (j: number, s: number): void => {
    if (parents[j] >= 0) score.set(j, Math.max(score.get(j) ?? 0, s));
  };
  for (let s = 0; s < 4; s++) {
    const w = character.skinWeights[4 * i + s];
    if (!(w > 0)) continue;
    const j = character.skinJoints[4 * i + s];
    add(j, w);
    for (const c of children[j]) add(c, 0.5 * w);
  }
  return [...score]
    .sort((a, b) => b[1] - a[1] || a[0] - b[0])
    .slice(0, 4)
    .map(([j]) => j)
    .sort((a, b) => a - b);
}

/** Vertices grouped by their influencing joints and competing joints. */
export function groupVertices(character: Character): Group[] {
  const n = character.restPositions.length / 3;
  const { parents } = character.skeleton;
  const children = jointChildren(parents);
  const groups = new Map<string, Group>();
  for (let i = 0; i < n; i++) {
    const joints = influencingJoints(character, i, children);
    let top = 0;
    for (let s = 1; s < 4; s++)
      if (character.skinWeights[4 * i + s] > character.skinWeights[4 * i + top]) top = s;
    const top0 = character.skinJoints[4 * i + top];
    const drivers = parents[top0] >= 0 ? [parents[top0], top0] : [top0];
    const key = `${joints.join(',')}|${drivers.join(',')}`;
    let g = groups.get(key);
    if (!g) groups.set(key, (g = { joints, drivers, vertices: [] }));
    g.vertices.push(i);
  }
  return [...groups.values()];
}
