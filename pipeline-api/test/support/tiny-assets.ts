// Invented test files, made here: a two-joint tube character, a capture of it wobbling, and a
// BVH clip. No real performer or production data.
import {
  writeCaptureGlb,
  writeCharacterGlb,
  type Capture,
  type Character,
} from '@overshoot/solver';

const SIDES = 6;
const RINGS = 4;
const LENGTH = 0.5;

/** A tube along +Y from the root joint to the tip joint, skinned half to each. */
export function tinyCharacter(): Character {
  const positions: number[] = [];
  const joints: number[] = [];
  const weights: number[] = [];
  const triangles: number[] = [];
  for (let r = 0; r < RINGS; r++) {
    const y = (LENGTH * r) / (RINGS - 1);
    const w = r / (RINGS - 1);
    for (let k = 0; k < SIDES; k++) {
      const a = (2 * Math.PI * k) / SIDES;
      positions.push(0.05 * Math.cos(a), y, 0.05 * Math.sin(a));
      joints.push(0, 1, 0, 0);
      weights.push(1 - w, w, 0, 0);
    }
  }
  for (let r = 0; r + 1 < RINGS; r++) {
    for (let k = 0; k < SIDES; k++) {
      const v00 = r * SIDES + k;
      const v01 = r * SIDES + ((k + 1) % SIDES);
      triangles.push(v00, v01 + SIDES, v01, v00, v00 + SIDES, v01 + SIDES);
    }
  }
  const identity = [1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1];
  const tipInverseBind = [...identity];
  tipInverseBind[13] = -LENGTH;
  const restPositions = new Float32Array(positions);
  return {
    name: 'tiny_tube',
    restPositions,
    restNormals: new Float32Array(restPositions.length).map((_, i) => (i % 3 === 1 ? 0 : 1)),
    triangles: new Uint32Array(triangles),
    skeleton: {
      names: ['root', 'tip'],
      parents: Int32Array.from([-1, 0]),
      restTranslations: Float64Array.from([0, 0, 0, 0, LENGTH, 0]),
      restRotations: Float64Array.from([0, 0, 0, 1, 0, 0, 0, 1]),
      restScales: Float64Array.from([1, 1, 1, 1, 1, 1]),
      inverseBindMatrices: Float64Array.from([...identity, ...tipInverseBind]),
      rootParentMatrix: Float64Array.from(identity),
    },
    skinJoints: new Uint16Array(joints),
    skinWeights: new Float32Array(weights),
    regions: null,
    warnings: [],
  };
}

/** The character as .glb bytes. */
export const tinyCharacterGlb = (): Promise<Uint8Array> => writeCharacterGlb(tinyCharacter());

/** A capture of the character wobbling sideways: `seconds` long at 30 fps. */
export function tinyCaptureGlb(seconds = 3): Promise<Uint8Array> {
  const character = tinyCharacter();
  const n = character.restPositions.length / 3;
  const fps = 30;
  const frames = Math.round(seconds * fps);
  const positions = new Float32Array(frames * 3 * n);
  for (let f = 0; f < frames; f++) {
    for (let i = 0; i < n; i++) {
      const y = character.restPositions[3 * i + 1];
      for (let c = 0; c < 3; c++)
        positions[3 * (f * n + i) + c] = character.restPositions[3 * i + c];
      positions[3 * (f * n + i)] += 0.01 * y * Math.sin((2 * Math.PI * 2 * f) / fps);
    }
  }
  const capture: Capture = {
    name: 'tiny_capture',
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

/** A BVH clip of the two joints bending: `frames` frames at 24 fps. */
export function tinyClipBvh(frames = 48): Uint8Array {
  const lines = [
    'HIERARCHY',
    'ROOT root',
    '{',
    '  OFFSET 0 0 0',
    '  CHANNELS 6 Xposition Yposition Zposition Zrotation Xrotation Yrotation',
    '  JOINT tip',
    '  {',
    `    OFFSET 0 ${LENGTH} 0`,
    '    CHANNELS 3 Zrotation Xrotation Yrotation',
    '    End Site',
    '    {',
    '      OFFSET 0 0.1 0',
    '    }',
    '  }',
    '}',
    'MOTION',
    `Frames: ${frames}`,
    `Frame Time: ${(1 / 24).toFixed(7)}`,
  ];
  for (let f = 0; f < frames; f++) {
    const bend = 30 * Math.sin((2 * Math.PI * f) / frames);
    const values = [0, 0, 0, 0, 0, 0, bend, 0.5 * bend, 0];
    lines.push(values.map((v) => v.toFixed(6)).join(' '));
  }
  return new TextEncoder().encode(lines.join('\n') + '\n');
}
