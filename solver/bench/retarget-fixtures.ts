// Invented benchmark data for retargeting: a profile with K decoupled modes of known frequency
// on a bench character, and a swinging clip on another. Not real assets.
import {
  quatFromAxisAngle,
  quatMultiply,
  type Character,
  type Clip,
  type Driver,
  type TissueProfile,
} from '../src/index.js';
import { benchCharacter, rng } from './fixtures.js';

/**
 * A bench character whose mesh is a closed-ring tube (radius 0.15 m, 1.8 m tall, `sides` around)
 * along the chain skeleton of `benchCharacter`, each vertex skinned to its two nearest joints.
 */
export function benchTube(vertices: number, joints: number, sides = 64): Character {
  const base = benchCharacter(joints * 4, joints);
  const rings = Math.max(2, Math.round(vertices / sides));
  const n = rings * sides;
  const restPositions = new Float32Array(3 * n);
  const skinJoints = new Uint16Array(4 * n);
  const skinWeights = new Float32Array(4 * n);
  const seg = 1.8 / joints;
  for (let r = 0; r < rings; r++) {
    const y = (1.8 * (r + 0.5)) / rings;
    const x = y / seg - 0.5;
    const j0 = Math.min(joints - 2, Math.max(0, Math.floor(x)));
    const u = Math.min(1, Math.max(0, x - j0));
    for (let s = 0; s < sides; s++) {
      const i = r * sides + s;
      const a = (2 * Math.PI * s) / sides;
      restPositions.set([0.15 * Math.cos(a), y, 0.15 * Math.sin(a)], 3 * i);
      skinJoints.set([j0, j0 + 1, 0, 0], 4 * i);
      skinWeights.set([1 - u, u, 0, 0], 4 * i);
    }
  }
  const tri: number[] = [];
  for (let r = 0; r + 1 < rings; r++) {
    for (let s = 0; s < sides; s++) {
      const a = r * sides + s;
      const b = r * sides + ((s + 1) % sides);
      tri.push(a, b, b + sides, a, b + sides, a + sides);
    }
  }
  return {
    ...base,
    name: 'bench_tube',
    restPositions,
    restNormals: new Float32Array(3 * n),
    triangles: Uint32Array.from(tri),
    skinJoints,
    skinWeights,
  };
}

/** A profile on `source` with `k` modes (1.2–8 Hz) and six drivers with every signal. */
export function benchProfile(source: Character, k: number, fps: number): TissueProfile {
  const rand = rng(7);
  const names = source.skeleton.names;
  const step = Math.floor(names.length / 6);
  const drivers: Driver[] = Array.from({ length: 6 }, (_, i) => ({
    joint: names[i * step],
    signals: ['specificForce', 'angularVelocity', 'angularAcceleration'],
  }));
  const m = 9 * drivers.length;
  const n3 = source.restPositions.length;
  // Mode c: an outward bulge (peak 1) around height 1.8·(c + 0.5)/k, 0.1 m wide.
  const basis = new Float32Array(n3 * k);
  for (let c = 0; c < k; c++) {
    const centre = (1.8 * (c + 0.5)) / k;
    for (let i = 0; i < n3 / 3; i++) {
      const x = source.restPositions[3 * i], y = source.restPositions[3 * i + 1], z = source.restPositions[3 * i + 2]; // prettier-ignore
      const bump = Math.exp(-(((y - centre) / 0.1) ** 2));
      if (bump < 1e-4) continue;
      const r = Math.hypot(x, z) || 1;
      basis[c * n3 + 3 * i] = (bump * x) / r;
      basis[c * n3 + 3 * i + 2] = (bump * z) / r;
    }
  }
  // Correctives: an outward bulge of each vertex with entry (1,1) of R − I of each skin joint,
  // so the take writer has corrective morph targets to make.
  const fpv = 36;
  const coefficients = new Float32Array((n3 / 3) * 3 * fpv);
  for (let i = 0; i < n3 / 3; i++) {
    const x = source.restPositions[3 * i], z = source.restPositions[3 * i + 2]; // prettier-ignore
    const r = Math.hypot(x, z) || 1;
    for (let s = 0; s < 4; s++) {
      const w = source.skinWeights[4 * i + s];
      if (!(w > 0)) continue;
      coefficients[3 * i * fpv + 9 * s + 4] = (-0.03 * w * x) / r;
      coefficients[(3 * i + 2) * fpv + 9 * s + 4] = (-0.03 * w * z) / r;
    }
  }
  const a1 = new Float64Array(k * k);
  const a2 = new Float64Array(k * k);
  const b0 = new Float64Array(k * m);
  const b1 = new Float64Array(k * m);
  const modes = [];
  for (let c = 0; c < k; c++) {
    const f = 1.2 + (6.8 * c) / Math.max(1, k - 1);
    const zeta = 0.05 + 0.2 * rand();
    const wn = 2 * Math.PI * f;
    const r = Math.exp((-zeta * wn) / fps);
    a1[c * k + c] = 2 * r * Math.cos((wn * Math.sqrt(1 - zeta * zeta)) / fps);
    a2[c * k + c] = -r * r;
    for (let j = 0; j < m; j++) b0[c * m + j] = b1[c * m + j] = (rand() - 0.5) * 1e-3;
    modes.push({
      frequencyHz: f,
      dampingRatio: zeta,
      region: 'body',
      energyShare: 1 / k,
      flags: [],
    });
  }
  return {
    formatVersion: 1,
    id: 'bench',
    name: 'bench profile (invented)',
    fps,
    settings: {},
    source,
    drivers,
    basis,
    singularValues: new Float64Array(k).fill(1),
    correctives: {
      featuresPerVertex: fpv,
      featureJoints: source.skinJoints,
      coefficients,
      ridgeLambda: 0,
    },
    dynamics: {
      k,
      m,
      a1,
      a2,
      b0,
      b1,
      inputMean: new Float64Array(m),
      inputScale: new Float64Array(m).fill(1),
    },
    modes,
    fitReport: {
      trainFrames: 0, heldOutFrames: 0, oneStepNrmse: 0, freeRunNrmse: 0, varianceExplained: 1,
      stabilityMargin: 0, poseShare: 0, dynamicShare: 1, spectrumPeaks: [],
    }, // prettier-ignore
  };
}

/** `frames` frames at `fps` of every joint swinging about Z, with the root moving. */
export function benchClip(target: Character, frames: number, fps: number): Clip {
  const s = target.skeleton;
  const jc = s.names.length;
  const rotations = new Float32Array(4 * jc * frames);
  const translations = new Float32Array(3 * jc * frames);
  const q = new Float64Array(4);
  for (let f = 0; f < frames; f++) {
    for (let j = 0; j < jc; j++) {
      quatFromAxisAngle(q, 0, 0, 0, 1, 0.05 * Math.sin((f / fps) * 6 + j));
      quatMultiply(q, 0, s.restRotations, 4 * j, q, 0);
      rotations.set(q, 4 * (f * jc + j));
      translations.set(s.restTranslations.subarray(3 * j, 3 * j + 3), 3 * (f * jc + j));
    }
    translations[3 * f * jc + 1] += 0.1 * Math.sin((f / fps) * 9);
  }
  return {
    name: 'bench_clip',
    fps,
    frameCount: frames,
    jointNames: [...s.names],
    parents: s.parents.slice(),
    offsets: s.restTranslations.slice(),
    rotations,
    translations,
    translationAnimated: Uint8Array.from(s.parents, (p) => (p < 0 ? 1 : 0)),
    warnings: [],
  };
}
