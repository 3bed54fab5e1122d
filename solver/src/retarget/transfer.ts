// Transfer of a dynamic basis from the profile's source mesh to a target mesh. Same topology:
// identity. Otherwise each target vertex is carried into the source body through its dominant
// joint: its offset from that joint, turned so the joint's bone lines up with the mapped source
// bone and scaled by the bone-length ratio, lands near the source surface; the closest surface
// point (three-mesh-bvh) gives barycentric weights to blend the source basis, which is turned
// back into the target's frame and scaled by the size ratio. (The idea follows deformation
// transfer, Sumner & Popović 2004.)
import { BufferAttribute, BufferGeometry, Vector3 } from 'three';
import { MeshBVH, type HitPointInfo } from 'three-mesh-bvh';
import { SolverInputError } from '../errors.js';
import { dominantJoints } from '../rig/skin-weights.js';
import type { JointMapping } from '../rig/joint-map.js';
import type { Character } from '../types.js';
import { jointBindPositions } from './scaling.js';

/** True when the two meshes share vertex count and triangles. */
export function sameTopology(a: Character, b: Character): boolean {
  if (a.restPositions.length !== b.restPositions.length) return false;
  if (a.triangles.length !== b.triangles.length) return false;
  for (let i = 0; i < a.triangles.length; i++) if (a.triangles[i] !== b.triangles[i]) return false;
  return true;
}

/** Result of a basis transfer. */
export interface TransferResult {
  /** Basis on the target (3N′ × K, column k at [k·3N′, (k+1)·3N′)). */
  basis: Float32Array;
  method: 'identity' | 'closest-point';
  /** Mean distance from the carried target vertices to the source surface, metres (0: identity). */
  meanGap: number;
  /** Closest-point transfer only: per target vertex, the nearest source corner (−1: none). */
  nearestSource: Int32Array | null;
  /** Closest-point transfer only: per target vertex, the rotation target → source (9, column-major). */
  rotations: Float64Array | null;
}

/**
 * Carries `basis` (on `source`, K columns) onto `target`, scaling amplitudes by `sizeRatio`.
 * PROFILE_MISMATCH when no target joint maps to any source joint.
 */
export function transferBasis(
  source: Character,
  target: Character,
  basis: Float32Array,
  k: number,
  mapping: JointMapping,
  sizeRatio: number,
): TransferResult {
  const n3s = source.restPositions.length;
  const n3t = target.restPositions.length;
  const out = new Float32Array(n3t * k);
  if (sameTopology(source, target)) {
    for (let i = 0; i < out.length; i++) out[i] = basis[i] * sizeRatio;
    return { basis: out, method: 'identity', meanGap: 0, nearestSource: null, rotations: null };
  }
  const frames = boneFrames(source, target, mapping);
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new BufferAttribute(source.restPositions, 3));
  geometry.setIndex(new BufferAttribute(Uint32Array.from(source.triangles), 1));
  const bvh = new MeshBVH(geometry);
  const index = geometry.index!.array; // the BVH may reorder triangles; faceIndex refers to this
  const dominant = dominantJoints(target.skinJoints, target.skinWeights);
  const p = new Vector3();
  const hit: HitPointInfo = { point: new Vector3(), distance: 0, faceIndex: 0 };
  const tp = target.restPositions;
  const sp = source.restPositions;
  let gap = 0;
  const nearestSource = new Int32Array(n3t / 3).fill(-1);
  const rotations = new Float64Array(3 * n3t);
  for (let i = 0; i < n3t / 3; i++) {
    const f = frames.get(dominant[i]);
    if (!f) continue;
    const { r, scale, from, to } = f;
    rotations.set(r, 9 * i);
    const dx = tp[3 * i] - from[0], dy = tp[3 * i + 1] - from[1], dz = tp[3 * i + 2] - from[2]; // prettier-ignore
    p.set(
      to[0] + scale * (r[0] * dx + r[3] * dy + r[6] * dz),
      to[1] + scale * (r[1] * dx + r[4] * dy + r[7] * dz),
      to[2] + scale * (r[2] * dx + r[5] * dy + r[8] * dz),
    );
    bvh.closestPointToPoint(p, hit);
    gap += hit.distance;
    const a = index[3 * hit.faceIndex], b = index[3 * hit.faceIndex + 1], c = index[3 * hit.faceIndex + 2]; // prettier-ignore
    const [wa, wb, wc] = barycentric(hit.point, sp, a, b, c);
    nearestSource[i] = wa >= wb && wa >= wc ? a : wb >= wc ? b : c;
    for (let m = 0; m < k; m++) {
      const o = m * n3s;
      const x = wa * basis[o + 3 * a] + wb * basis[o + 3 * b] + wc * basis[o + 3 * c];
      const y = wa * basis[o + 3 * a + 1] + wb * basis[o + 3 * b + 1] + wc * basis[o + 3 * c + 1];
      const z = wa * basis[o + 3 * a + 2] + wb * basis[o + 3 * b + 2] + wc * basis[o + 3 * c + 2];
      // Back into the target's frame: Rᵀ (r is column-major, so Rᵀ rows are r's columns).
      const ot = m * n3t + 3 * i;
      out[ot] = sizeRatio * (r[0] * x + r[1] * y + r[2] * z);
      out[ot + 1] = sizeRatio * (r[3] * x + r[4] * y + r[5] * z);
      out[ot + 2] = sizeRatio * (r[6] * x + r[7] * y + r[8] * z);
    }
  }
  geometry.dispose();
  return {
    basis: out,
    method: 'closest-point',
    meanGap: gap / (n3t / 3),
    nearestSource,
    rotations,
  };
}

/** How one target joint's neighbourhood maps into the source body. */
interface BoneFrame {
  /** Rotation target → source (3×3 column-major). */
  r: Float64Array;
  /** Source bone length over target bone length. */
  scale: number;
  /** Target joint position, and its mapped source joint position. */
  from: number[];
  to: number[];
}

/** A frame per target joint, through the nearest mapped joint up the hierarchy. */
function boneFrames(
  source: Character,
  target: Character,
  mapping: JointMapping,
): Map<number, BoneFrame> {
  const ps = jointBindPositions(source.skeleton);
  const pt = jointBindPositions(target.skeleton);
  const tParents = target.skeleton.parents;
  const frames = new Map<number, BoneFrame>();
  const at = (p: Float64Array, j: number): number[] => [p[3 * j], p[3 * j + 1], p[3 * j + 2]];
  for (let j = 0; j < tParents.length; j++) {
    let jt = j;
    while (jt >= 0 && mapping.sourceOf[jt] < 0) jt = tParents[jt];
    if (jt < 0) continue;
    const js = mapping.sourceOf[jt];
    // A bone on both sides: towards a mapped child, else from a mapped parent.
    let bt: number[] | null = null;
    let bs: number[] | null = null;
    for (let c = 0; c < tParents.length && !bt; c++) {
      if (tParents[c] === jt && mapping.sourceOf[c] >= 0) {
        bt = sub(at(pt, c), at(pt, jt));
        bs = sub(at(ps, mapping.sourceOf[c]), at(ps, js));
      }
    }
    const pa = tParents[jt];
    if (!bt && pa >= 0 && mapping.sourceOf[pa] >= 0) {
      bt = sub(at(pt, jt), at(pt, pa));
      bs = sub(at(ps, js), at(ps, mapping.sourceOf[pa]));
    }
    const lt = bt ? Math.hypot(bt[0], bt[1], bt[2]) : 0;
    const ls = bs ? Math.hypot(bs[0], bs[1], bs[2]) : 0;
    const ok = lt > 1e-9 && ls > 1e-9;
    frames.set(j, {
      r: ok
        ? rotationBetween(
            bt!.map((x) => x / lt),
            bs!.map((x) => x / ls),
          )
        : identity3(),
      scale: ok ? ls / lt : 1,
      from: at(pt, jt),
      to: at(ps, js),
    });
  }
  if (frames.size === 0) {
    throw new SolverInputError(
      'PROFILE_MISMATCH',
      'no joint of the character corresponds to a joint of the profile’s source; give a joint map',
      {},
    );
  }
  return frames;
}

/** The smallest rotation taking unit vector a onto unit vector b (column-major 3×3). */
function rotationBetween(a: number[], b: number[]): Float64Array {
  const v = [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
  const c = a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  if (c < -1 + 1e-9) {
    // Opposite: half a turn about any axis perpendicular to a.
    const h = Math.abs(a[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
    const u = [a[1] * h[2] - a[2] * h[1], a[2] * h[0] - a[0] * h[2], a[0] * h[1] - a[1] * h[0]];
    const l = Math.hypot(u[0], u[1], u[2]);
    const [x, y, z] = u.map((e) => e / l);
    return Float64Array.from([
      2 * x * x - 1,
      2 * x * y,
      2 * x * z,
      2 * x * y,
      2 * y * y - 1,
      2 * y * z,
      2 * x * z,
      2 * y * z,
      2 * z * z - 1,
    ]);
  }
  // Rodrigues: R = I + [v]× + [v]×² / (1 + c).
  const f = 1 / (1 + c);
  const [x, y, z] = v;
  return Float64Array.from([
    1 - f * (y * y + z * z), z + f * x * y, -y + f * x * z,
    -z + f * x * y, 1 - f * (x * x + z * z), x + f * y * z,
    y + f * x * z, -x + f * y * z, 1 - f * (x * x + y * y),
  ]); // prettier-ignore
}

function identity3(): Float64Array {
  return Float64Array.from([1, 0, 0, 0, 1, 0, 0, 0, 1]);
}

function sub(a: number[], b: number[]): number[] {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

/** Barycentric weights of point q in triangle (a, b, c) of `pos` (clamped to the triangle). */
function barycentric(
  q: Vector3,
  pos: Float32Array,
  a: number,
  b: number,
  c: number,
): [number, number, number] {
  const ax = pos[3 * a], ay = pos[3 * a + 1], az = pos[3 * a + 2]; // prettier-ignore
  const e0 = [pos[3 * b] - ax, pos[3 * b + 1] - ay, pos[3 * b + 2] - az];
  const e1 = [pos[3 * c] - ax, pos[3 * c + 1] - ay, pos[3 * c + 2] - az];
  const d = [q.x - ax, q.y - ay, q.z - az];
  const d00 = e0[0] * e0[0] + e0[1] * e0[1] + e0[2] * e0[2];
  const d01 = e0[0] * e1[0] + e0[1] * e1[1] + e0[2] * e1[2];
  const d11 = e1[0] * e1[0] + e1[1] * e1[1] + e1[2] * e1[2];
  const d20 = d[0] * e0[0] + d[1] * e0[1] + d[2] * e0[2];
  const d21 = d[0] * e1[0] + d[1] * e1[1] + d[2] * e1[2];
  const den = d00 * d11 - d01 * d01;
  if (!(Math.abs(den) > 1e-30)) return [1, 0, 0]; // degenerate triangle: its first corner
  let v = (d11 * d20 - d01 * d21) / den;
  let w = (d00 * d21 - d01 * d20) / den;
  v = Math.min(1, Math.max(0, v));
  w = Math.min(1 - v, Math.max(0, w));
  return [1 - v - w, v, w];
}
