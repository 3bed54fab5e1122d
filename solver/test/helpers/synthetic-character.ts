// Invented test data: a small procedural rigged character (tubes around bones, smooth two-joint
// weights). Not a real asset; built only so tests know the ground truth.
import {
  mat4Compose,
  mat4Invert,
  mat4Multiply,
  computeNormals,
  type Character,
  type Skeleton,
} from '../../src/index.js';
import { randomQuat, seededRandom } from './random.js';

/** Options for the synthetic character. */
export interface SyntheticCharacterOptions {
  /** Random seed for rest rotations. */
  seed?: number;
  /** Vertices around each tube ring. */
  sides?: number;
  /** Rings along each bone. */
  rings?: number;
  /** Largest rest rotation angle (radians) per joint. */
  restAngle?: number;
  /** Non-unit rest scale on joint 2 (for skinning checks). */
  scaledJoint?: boolean;
}

/** Joint layout: name, parent, rest offset (metres). A hip, a spine chain and two arms. */
const LAYOUT: [string, number, [number, number, number]][] = [
  ['hips', -1, [0, 1, 0]],
  ['spine', 0, [0, 0.2, 0]],
  ['chest', 1, [0, 0.25, 0]],
  ['neck', 2, [0, 0.25, 0]],
  ['head', 3, [0, 0.12, 0]],
  ['arm_l', 2, [0.2, 0.15, 0]],
  ['forearm_l', 5, [0.28, 0, 0]],
  ['hand_l', 6, [0.25, 0, 0]],
  ['arm_r', 2, [-0.2, 0.15, 0]],
  ['forearm_r', 8, [-0.28, 0, 0]],
  ['hand_r', 9, [-0.25, 0, 0]],
  ['leg_l', 0, [0.1, -0.05, 0]],
  ['shin_l', 11, [0, -0.45, 0]],
  ['foot_l', 12, [0, -0.45, 0]],
  ['leg_r', 0, [-0.1, -0.05, 0]],
  ['shin_r', 14, [0, -0.45, 0]],
  ['foot_r', 15, [0, -0.45, 0]],
];

/** Builds the skeleton (rest rotations random within restAngle) and its bind matrices. */
export function syntheticSkeleton(options: SyntheticCharacterOptions = {}): Skeleton {
  const rand = seededRandom(options.seed ?? 1);
  const count = LAYOUT.length;
  const restTranslations = new Float64Array(3 * count);
  const restRotations = new Float64Array(4 * count);
  const restScales = new Float64Array(3 * count).fill(1);
  LAYOUT.forEach(([, , t], j) => {
    restTranslations.set(t, 3 * j);
    restRotations.set(randomQuat(rand, options.restAngle ?? 0), 4 * j);
  });
  if (options.scaledJoint) restScales.set([1.1, 0.9, 1.05], 6);
  const parents = Int32Array.from(LAYOUT.map(([, p]) => p));
  const world = new Float64Array(16 * count);
  for (let j = 0; j < count; j++) {
    mat4Compose(world, 16 * j, restTranslations, 3 * j, restRotations, 4 * j, restScales, 3 * j);
    if (parents[j] >= 0) mat4Multiply(world, 16 * j, world, 16 * parents[j], world, 16 * j);
  }
  const inverseBindMatrices = new Float64Array(16 * count);
  for (let j = 0; j < count; j++) mat4Invert(inverseBindMatrices, 16 * j, world, 16 * j);
  return {
    names: LAYOUT.map(([n]) => n),
    parents,
    restTranslations,
    restRotations,
    restScales,
    inverseBindMatrices,
    rootParentMatrix: Float64Array.from([1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1]),
  };
}

/** Builds the character: tubes around bones, each vertex bound to at most two joints. */
export function syntheticCharacter(options: SyntheticCharacterOptions = {}): Character {
  const sides = options.sides ?? 8;
  const rings = options.rings ?? 6;
  const skeleton = syntheticSkeleton(options);
  const count = skeleton.names.length;
  // World rest positions of joints (bind pose) from the inverse bind matrices.
  const bind = new Float64Array(16 * count);
  for (let j = 0; j < count; j++) mat4Invert(bind, 16 * j, skeleton.inverseBindMatrices, 16 * j);
  const pos = (j: number): number[] => [bind[16 * j + 12], bind[16 * j + 13], bind[16 * j + 14]];
  const positions: number[] = [];
  const joints: number[] = [];
  const weights: number[] = [];
  const triangles: number[] = [];
  // Each joint owns a tube towards each child (leaves: a short stub along the parent bone).
  // Weights blend into the parent over the first quarter and into the child over the last.
  const segments: [number, number, number[]][] = [];
  for (let j = 0; j < count; j++) {
    const children = [];
    for (let c = 0; c < count; c++) if (skeleton.parents[c] === j) children.push(c);
    for (const c of children) segments.push([j, c, pos(c)]);
    if (children.length === 0) {
      const a = pos(j);
      const p = pos(skeleton.parents[j]);
      const dir = [a[0] - p[0], a[1] - p[1], a[2] - p[2]];
      const l = Math.hypot(dir[0], dir[1], dir[2]);
      segments.push([j, -1, a.map((x, k) => x + (dir[k] / l) * 0.1)]);
    }
  }
  for (const [j, c, b] of segments) {
    const a = pos(j);
    const parent = skeleton.parents[j];
    const axis = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
    const len = Math.hypot(axis[0], axis[1], axis[2]);
    const d = axis.map((x) => x / len);
    // Two unit vectors perpendicular to the bone.
    const helper = Math.abs(d[1]) < 0.9 ? [0, 1, 0] : [1, 0, 0];
    const u = cross(d, helper);
    const ul = Math.hypot(u[0], u[1], u[2]);
    const e1 = u.map((x) => x / ul);
    const e2 = cross(d, e1);
    const radius = 0.04 + 0.02 * Math.sin(j + c);
    const first = positions.length / 3;
    for (let r = 0; r < rings; r++) {
      const s = (r + 0.5) / rings;
      const wc = c >= 0 ? 0.5 * smoothstep(0.75, 1, s) : 0;
      const wp = parent >= 0 ? 0.5 * (1 - smoothstep(0, 0.25, s)) : 0;
      const other = wc > 0 ? c : parent >= 0 && wp > 0 ? parent : 0;
      const wo = wc > 0 ? wc : wp;
      for (let k = 0; k < sides; k++) {
        const ang = (2 * Math.PI * k) / sides;
        const ca = Math.cos(ang) * radius;
        const sa = Math.sin(ang) * radius;
        for (let x = 0; x < 3; x++) positions.push(a[x] + axis[x] * s + e1[x] * ca + e2[x] * sa);
        if (wo > 0) {
          joints.push(j, other, 0, 0);
          weights.push(1 - wo, wo, 0, 0);
        } else {
          joints.push(j, 0, 0, 0);
          weights.push(1, 0, 0, 0);
        }
      }
    }
    for (let r = 0; r + 1 < rings; r++) {
      for (let k = 0; k < sides; k++) {
        const v00 = first + r * sides + k;
        const v01 = first + r * sides + ((k + 1) % sides);
        const v10 = v00 + sides;
        const v11 = v01 + sides;
        triangles.push(v00, v01, v11, v00, v11, v10);
      }
    }
  }
  const restPositions = new Float32Array(positions);
  const tri = new Uint32Array(triangles);
  return {
    name: 'synthetic_body',
    restPositions,
    restNormals: computeNormals(restPositions, tri),
    triangles: tri,
    skeleton,
    skinJoints: new Uint16Array(joints),
    skinWeights: new Float32Array(weights),
    regions: null,
    warnings: [],
  };
}

function cross(a: number[], b: number[]): number[] {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

function smoothstep(e0: number, e1: number, x: number): number {
  const t = Math.min(1, Math.max(0, (x - e0) / (e1 - e0)));
  return t * t * (3 - 2 * t);
}
