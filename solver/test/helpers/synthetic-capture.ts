// Invented test data: a capture made by skinning the synthetic character with a known smooth
// clip, plus optional "jiggle" on soft vertices. Ground truth for pose estimation and unposing.
import {
  clipFramePose,
  createPose,
  quatFromAxisAngle,
  quatMultiply,
  skinPositions,
  skinningMatrices,
  worldMatrices,
  type Capture,
  type Character,
  type Clip,
} from '../../src/index.js';
import { seededRandom } from './random.js';

/** A smooth clip on the character's skeleton: each joint swings about its own axis. */
export function syntheticClip(
  character: Character,
  frames: number,
  fps: number,
  seed = 1,
  amplitude = 0.6,
): Clip {
  const s = character.skeleton;
  const jc = s.names.length;
  const rand = seededRandom(seed);
  const rotations = new Float32Array(4 * jc * frames);
  const translations = new Float32Array(3 * jc * frames);
  const swing = new Float64Array(4);
  const q = new Float64Array(4);
  const params = s.names.map(() => {
    const axis = [rand() - 0.5, rand() - 0.5, rand() - 0.5];
    const l = Math.hypot(axis[0], axis[1], axis[2]);
    return {
      axis: axis.map((x) => x / l),
      amp: amplitude * (0.3 + 0.7 * rand()),
      freq: 0.3 + rand(),
      phase: rand() * 6,
    };
  });
  for (let f = 0; f < frames; f++) {
    const t = f / fps;
    for (let j = 0; j < jc; j++) {
      const { axis, amp, freq, phase } = params[j];
      quatFromAxisAngle(
        swing,
        0,
        axis[0],
        axis[1],
        axis[2],
        amp * Math.sin(2 * Math.PI * freq * t + phase),
      );
      quatMultiply(q, 0, s.restRotations, 4 * j, swing, 0);
      rotations.set(q, 4 * (f * jc + j));
      translations.set(s.restTranslations.subarray(3 * j, 3 * j + 3), 3 * (f * jc + j));
    }
    translations[3 * f * jc] += 0.3 * Math.sin(t);
    translations[3 * f * jc + 2] += 0.2 * t;
  }
  return {
    name: 'synthetic_motion',
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

/** Options for the synthetic capture. */
export interface SyntheticCaptureOptions {
  /** Jiggle amplitude in metres on soft vertices (0: none). */
  jiggle?: number;
  /** Joint whose front-side vertices are soft. */
  softJoint?: string;
}

/** Skins `clip` on `character` for every frame, adding jiggle along normals on soft vertices. */
export function syntheticCapture(
  character: Character,
  clip: Clip,
  options: SyntheticCaptureOptions = {},
): { capture: Capture; soft: Uint8Array } {
  const s = character.skeleton;
  const n = character.restPositions.length / 3;
  const map = Int32Array.from(s.names, (_, j) => j);
  const pose = createPose(s.names.length);
  const skin = new Float64Array(16 * s.names.length);
  const positions = new Float32Array(3 * n * clip.frameCount);
  const frame = new Float32Array(3 * n);
  const soft = new Uint8Array(n);
  const softJoint = s.names.indexOf(options.softJoint ?? 'chest');
  for (let i = 0; i < n; i++) {
    if (
      character.skinJoints[4 * i] === softJoint &&
      character.skinWeights[4 * i] > 0.99 &&
      character.restNormals[3 * i + 2] > 0.3
    )
      soft[i] = 1;
  }
  const amp = options.jiggle ?? 0;
  for (let f = 0; f < clip.frameCount; f++) {
    clipFramePose(clip, f, s, map, pose);
    worldMatrices(s, pose, skin);
    skinningMatrices(s, skin, skin);
    // Jiggle is added in rest space before skinning so it rides along with the joint.
    const t = f / clip.fps;
    const wobble = amp * Math.sin(2 * Math.PI * 3.1 * t) * Math.exp(-0.2 * t);
    const rest = character.restPositions.slice();
    for (let i = 0; i < n; i++) {
      if (!soft[i]) continue;
      for (let c = 0; c < 3; c++) rest[3 * i + c] += wobble * character.restNormals[3 * i + c];
    }
    skinPositions(rest, character.skinJoints, character.skinWeights, skin, frame);
    positions.set(frame, 3 * n * f);
  }
  return {
    capture: {
      name: 'synthetic_capture',
      fps: clip.fps,
      frameCount: clip.frameCount,
      vertexCount: n,
      positions,
      basePositions: character.restPositions.slice(),
      triangles: character.triangles.slice(),
      clip: null,
      warnings: [],
    },
    soft,
  };
}
