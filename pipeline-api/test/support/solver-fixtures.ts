// Invented solver inputs made here with the solver's own writers: a skinned tube character of any
// size, a capture of it swaying with a lagging wobble, and a BVH clip that bends it. Small sizes
// keep job tests quick; bigger ones give a solve that runs long enough to interrupt.
import {
  writeCaptureGlb,
  writeCharacterGlb,
  type Capture,
  type Character,
} from '@overshoot/solver';

/** Size of the tube: rings along its length, vertices around each ring. */
export interface TubeSize {
  rings: number;
  sides: number;
}

const LENGTH = 0.6;
const RADIUS = 0.06;
const identity = () => [1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1];

/** A tube along +Y over three joints (root, mid, tip), skinned smoothly between them. */
export function tubeCharacter({ rings, sides }: TubeSize): Character {
  const positions: number[] = [];
  const joints: number[] = [];
  const weights: number[] = [];
  const triangles: number[] = [];
  for (let r = 0; r < rings; r++) {
    const t = r / (rings - 1);
    const y = LENGTH * t;
    // Lower half between root and mid, upper half between mid and tip.
    const [j0, j1, w] = t < 0.5 ? [0, 1, 2 * t] : [1, 2, 2 * t - 1];
    for (let k = 0; k < sides; k++) {
      const a = (2 * Math.PI * k) / sides;
      positions.push(RADIUS * Math.cos(a), y, RADIUS * Math.sin(a));
      joints.push(j0, j1, 0, 0);
      weights.push(1 - w, w, 0, 0);
    }
  }
  for (let r = 0; r + 1 < rings; r++) {
    for (let k = 0; k < sides; k++) {
      const v00 = r * sides + k;
      const v01 = r * sides + ((k + 1) % sides);
      triangles.push(v00, v01 + sides, v01, v00, v00 + sides, v01 + sides);
    }
  }
  const mid = identity();
  mid[13] = -LENGTH / 2;
  const tip = identity();
  tip[13] = -LENGTH;
  const restPositions = new Float32Array(positions);
  const restNormals = new Float32Array(restPositions.length);
  for (let i = 0; i < restPositions.length; i += 3) {
    const len = Math.hypot(restPositions[i], restPositions[i + 2]) || 1;
    restNormals[i] = restPositions[i] / len;
    restNormals[i + 2] = restPositions[i + 2] / len;
  }
  return {
    name: `tube_${rings}x${sides}`,
    restPositions,
    restNormals,
    triangles: new Uint32Array(triangles),
    skeleton: {
      names: ['root', 'mid', 'tip'],
      parents: Int32Array.from([-1, 0, 1]),
      restTranslations: Float64Array.from([0, 0, 0, 0, LENGTH / 2, 0, 0, LENGTH / 2, 0]),
      restRotations: Float64Array.from([0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1]),
      restScales: Float64Array.from([1, 1, 1, 1, 1, 1, 1, 1, 1]),
      inverseBindMatrices: Float64Array.from([...identity(), ...mid, ...tip]),
      rootParentMatrix: Float64Array.from(identity()),
    },
    skinJoints: new Uint16Array(joints),
    skinWeights: new Float32Array(weights),
    regions: null,
    warnings: [],
  };
}

/** The character as .glb bytes. */
export const tubeCharacterGlb = (size: TubeSize): Promise<Uint8Array> =>
  writeCharacterGlb(tubeCharacter(size));

/**
 * A capture of the tube: its upper part sways sideways at 1.3 Hz and the flesh follows with a
 * lightly damped 2.5 Hz wobble, stronger towards the tip. `seconds` long at 30 fps.
 */
export function tubeCaptureGlb(size: TubeSize, seconds: number): Promise<Uint8Array> {
  const character = tubeCharacter(size);
  const n = character.restPositions.length / 3;
  const fps = 30;
  const frames = Math.round(seconds * fps);
  const positions = new Float32Array(frames * 3 * n);
  for (let f = 0; f < frames; f++) {
    const t = f / fps;
    const sway = 0.04 * Math.sin(2 * Math.PI * 1.3 * t);
    const wobble = 0.006 * Math.exp(-0.4 * (t % 2.5)) * Math.sin(2 * Math.PI * 2.5 * t);
    for (let i = 0; i < n; i++) {
      const h = character.restPositions[3 * i + 1] / LENGTH;
      const o = 3 * (f * n + i);
      positions[o] = character.restPositions[3 * i] + h * h * sway + h * wobble;
      positions[o + 1] = character.restPositions[3 * i + 1];
      positions[o + 2] = character.restPositions[3 * i + 2] + 0.3 * h * wobble;
    }
  }
  const capture: Capture = {
    name: `tube_capture_${seconds}s`,
    fps,
    frameCount: frames,
    vertexCount: n,
    positions,
    basePositions: character.restPositions,
    triangles: character.triangles,
    clip: null,
    warnings: [],
  };
  return writeCaptureGlb(capture, { character });
}

/** A BVH clip of the tube bending side to side: `frames` frames at 24 fps. */
export function tubeClipBvh(frames: number): Uint8Array {
  const half = (LENGTH / 2).toFixed(6);
  const lines = [
    'HIERARCHY',
    'ROOT root',
    '{',
    '  OFFSET 0 0 0',
    '  CHANNELS 6 Xposition Yposition Zposition Zrotation Xrotation Yrotation',
    '  JOINT mid',
    '  {',
    `    OFFSET 0 ${half} 0`,
    '    CHANNELS 3 Zrotation Xrotation Yrotation',
    '    JOINT tip',
    '    {',
    `      OFFSET 0 ${half} 0`,
    '      CHANNELS 3 Zrotation Xrotation Yrotation',
    '      End Site',
    '      {',
    '        OFFSET 0 0.1 0',
    '      }',
    '    }',
    '  }',
    '}',
    'MOTION',
    `Frames: ${frames}`,
    `Frame Time: ${(1 / 24).toFixed(7)}`,
  ];
  for (let f = 0; f < frames; f++) {
    const bend = 25 * Math.sin((2 * Math.PI * 1.5 * f) / 24);
    const x = 0.05 * Math.sin((2 * Math.PI * 0.7 * f) / 24);
    lines.push(
      [x, 0, 0, bend, 0, 0, 0.6 * bend, 0, 0, 0.3 * bend, 0, 0].map((v) => v.toFixed(6)).join(' '),
    );
  }
  return new TextEncoder().encode(lines.join('\n') + '\n');
}
