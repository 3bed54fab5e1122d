// Body plan → rigged, skinned character: mesh the smooth union of the parts, then derive skin
// weights and regions from each vertex's soft membership in the parts (smooth in space, so no
// seams), and weights within a part from the distance to each allowed bone.
import type { Character, Skeleton } from '@overshoot/solver';
import type { BodyPlan } from './body-plan.js';
import { shapeBounds, shapeCentre, shapeDistance, smoothUnion, softMembership } from './sdf.js';
import type { Vec3 } from './sdf.js';
import { fieldNormal, surfaceNets, type Field } from './surface-nets.js';

/** A character plus what the generator knows about it beyond the file. */
export interface BuiltCharacter {
  plan: BodyPlan;
  character: Character;
  /** Rest world position per joint (3J). */
  jointPositions: Float64Array;
  /** Soft region membership per vertex (N × R, rows sum to 1); labels are the row maxima. */
  regionSoft: Float32Array;
}

/** Builds the character described by `plan`. */
export function buildCharacter(plan: BodyPlan): BuiltCharacter {
  const { skeleton, jointPositions } = buildSkeleton(plan);
  const shapes = plan.parts.map((p) => p.shape);
  const dist = new Float64Array(shapes.length);
  const field: Field = (x, y, z) => {
    for (let i = 0; i < shapes.length; i++) dist[i] = shapeDistance(shapes[i], x, y, z);
    return smoothUnion(dist, plan.blend);
  };
  const lo = [Infinity, Infinity, Infinity];
  const hi = [-Infinity, -Infinity, -Infinity];
  for (const s of shapes) {
    const b = shapeBounds(s);
    for (let c = 0; c < 3; c++) {
      lo[c] = Math.min(lo[c], b.min[c]);
      hi[c] = Math.max(hi[c], b.max[c]);
    }
  }
  const mesh = surfaceNets(field, lo as unknown as Vec3, hi as unknown as Vec3, {
    cell: plan.cell,
  });
  const n = mesh.positions.length / 3;
  const normals = new Float32Array(3 * n);
  const g = [0, 0, 0];
  for (let i = 0; i < n; i++) {
    const p = mesh.positions;
    fieldNormal(field, p[3 * i], p[3 * i + 1], p[3 * i + 2], plan.cell * 0.25, g);
    normals.set(g, 3 * i);
  }
  const skin = skinAndRegions(plan, skeleton, mesh.positions);
  const character: Character = {
    name: plan.id,
    restPositions: Float32Array.from(mesh.positions),
    restNormals: normals,
    triangles: mesh.triangles,
    skeleton,
    skinJoints: skin.joints,
    skinWeights: skin.weights,
    regions: { labels: skin.labels, names: plan.regions.slice(), source: 'attribute' },
    warnings: [],
  };
  return { plan, character, jointPositions, regionSoft: skin.regionSoft };
}

function buildSkeleton(plan: BodyPlan): { skeleton: Skeleton; jointPositions: Float64Array } {
  const count = plan.joints.length;
  const index = new Map(plan.joints.map((j, k) => [j.name, k]));
  const parents = new Int32Array(count);
  const restTranslations = new Float64Array(3 * count);
  const restRotations = new Float64Array(4 * count);
  const inverseBindMatrices = new Float64Array(16 * count);
  const jointPositions = new Float64Array(3 * count);
  plan.joints.forEach((j, k) => {
    const p = j.parent === null ? -1 : index.get(j.parent)!;
    if (p >= k) throw new Error(`${plan.id}: joint ${j.name} is listed before its parent`);
    parents[k] = p;
    const base = p < 0 ? [0, 0, 0] : plan.joints[p].at;
    for (let c = 0; c < 3; c++) {
      restTranslations[3 * k + c] = j.at[c] - base[c];
      jointPositions[3 * k + c] = j.at[c];
      // Rest rotations are identity, so the inverse bind matrix is a pure translation.
      inverseBindMatrices[16 * k + 12 + c] = -j.at[c];
    }
    restRotations[4 * k + 3] = 1;
    for (const d of [0, 5, 10, 15]) inverseBindMatrices[16 * k + d] = 1;
  });
  const rootParentMatrix = new Float64Array(16);
  for (const d of [0, 5, 10, 15]) rootParentMatrix[d] = 1;
  const skeleton: Skeleton = {
    names: plan.joints.map((j) => j.name),
    parents,
    restTranslations,
    restRotations,
    restScales: new Float64Array(3 * count).fill(1),
    inverseBindMatrices,
    rootParentMatrix,
  };
  return { skeleton, jointPositions };
}

/** Each joint's bone as a segment: from the joint to its tip or first child. */
export function boneSegments(plan: BodyPlan): Vec3[][] {
  return plan.joints.map((j) => {
    const child = plan.joints.find((c) => c.parent === j.name);
    return [j.at, j.tip ?? child?.at ?? j.at];
  });
}

/** Distance from (x, y, z) to the segment ab, and where along it (0…1) the closest point is. */
export function segmentDistance(a: Vec3, b: Vec3, x: number, y: number, z: number): number {
  return segmentClosest(a, b, x, y, z)[0];
}

/** [distance, parameter] of the closest point of segment ab to (x, y, z). */
export function segmentClosest(
  a: Vec3,
  b: Vec3,
  x: number,
  y: number,
  z: number,
): [number, number] {
  const bx = b[0] - a[0], by = b[1] - a[1], bz = b[2] - a[2]; // prettier-ignore
  const px = x - a[0], py = y - a[1], pz = z - a[2]; // prettier-ignore
  const l2 = bx * bx + by * by + bz * bz;
  const t = l2 > 0 ? Math.max(0, Math.min(1, (px * bx + py * by + pz * bz) / l2)) : 0;
  return [Math.hypot(px - t * bx, py - t * by, pz - t * bz), t];
}

/** Hermite smoothstep of x between e0 and e1. */
export function smoothstep(e0: number, e1: number, x: number): number {
  const t = Math.max(0, Math.min(1, (x - e0) / (e1 - e0)));
  return t * t * (3 - 2 * t);
}

function skinAndRegions(plan: BodyPlan, skeleton: Skeleton, positions: Float64Array) {
  const n = positions.length / 3;
  const jointCount = skeleton.names.length;
  const jointIndex = new Map(skeleton.names.map((name, k) => [name, k]));
  const segments = boneSegments(plan);
  const partBones = plan.parts.map((p) =>
    p.bones.map((b) => {
      const k = jointIndex.get(b);
      if (k === undefined) throw new Error(`${plan.id}: part bound to unknown joint ${b}`);
      return k;
    }),
  );
  const partRegion = plan.parts.map((p) => (p.region ? plan.regions.indexOf(p.region) : 0));
  partRegion.forEach((r, i) => {
    if (r < 0) throw new Error(`${plan.id}: part ${i} has unknown region ${plan.parts[i].region}`);
  });
  const centres = plan.parts.map((p) => shapeCentre(p.shape));
  const regionCount = plan.regions.length;
  const dist = new Float64Array(plan.parts.length);
  const member = new Float64Array(plan.parts.length);
  const regionMember = new Float64Array(plan.parts.length);
  const acc = new Float64Array(jointCount);
  const boneDist = new Float64Array(jointCount);
  const joints = new Uint16Array(4 * n);
  const weights = new Float32Array(4 * n);
  const labels = new Uint16Array(n);
  const regionSoft = new Float32Array(n * regionCount);
  for (let v = 0; v < n; v++) {
    const x = positions[3 * v], y = positions[3 * v + 1], z = positions[3 * v + 2]; // prettier-ignore
    plan.parts.forEach((p, i) => (dist[i] = shapeDistance(p.shape, x, y, z)));
    softMembership(dist, plan.weightSoftness, member);
    softMembership(dist, plan.regionSoftness, regionMember);
    acc.fill(0);
    for (let j = 0; j < jointCount; j++) {
      boneDist[j] = segmentDistance(segments[j][0], segments[j][1], x, y, z);
    }
    for (let i = 0; i < plan.parts.length; i++) {
      if (member[i] < 1e-6) continue;
      let m = Infinity;
      for (const j of partBones[i]) m = Math.min(m, boneDist[j]);
      let sum = 0;
      for (const j of partBones[i]) sum += Math.exp(-(boneDist[j] - m) / plan.weightSoftness);
      for (const j of partBones[i]) {
        acc[j] += (member[i] * Math.exp(-(boneDist[j] - m) / plan.weightSoftness)) / sum;
      }
    }
    const order = Array.from(acc.keys()).sort((a, b) => acc[b] - acc[a] || a - b);
    let total = 0;
    for (let k = 0; k < 4; k++) total += acc[order[k]];
    for (let k = 0; k < 4; k++) {
      joints[4 * v + k] = order[k];
      weights[4 * v + k] = acc[order[k]] / total;
    }
    const row = v * regionCount;
    for (let i = 0; i < plan.parts.length; i++) {
      const part = plan.parts[i];
      let mask = 1;
      if (part.facing) {
        const c = centres[i];
        const dx = x - c[0], dy = y - c[1], dz = z - c[2]; // prettier-ignore
        const len = Math.hypot(dx, dy, dz) || 1;
        const f = part.facing;
        mask = smoothstep(-0.1, 0.45, (dx * f[0] + dy * f[1] + dz * f[2]) / len);
      }
      regionSoft[row + partRegion[i]] += regionMember[i] * mask;
      regionSoft[row] += regionMember[i] * (1 - mask);
    }
    let best = 0;
    for (let r = 1; r < regionCount; r++)
      if (regionSoft[row + r] > regionSoft[row + best]) best = r;
    labels[v] = best;
  }
  return { joints, weights, labels, regionSoft };
}
