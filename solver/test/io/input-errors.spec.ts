// Every stable error code, each from a crafted bad input, with where it points.
import { describe, expect, it } from 'vitest';
import {
  matchClipJoints,
  readBvh,
  readCapture,
  readCharacter,
  readGltfClip,
  validateCapture,
  writeCaptureGlb,
  writeCharacterGlb,
  writeClipGlb,
  type SolverInputError,
} from '../../src/index.js';
import { makeBvh } from '../helpers/bvh-text.js';
import { elementOffset, patchGlb } from '../helpers/glb-patch.js';
import { syntheticCapture, syntheticClip } from '../helpers/synthetic-capture.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';

/** The SolverInputError thrown by `fn` (fails the test when nothing or something else is thrown). */
async function caught(fn: () => unknown): Promise<SolverInputError> {
  try {
    await fn();
  } catch (e) {
    expect((e as Error).name).toBe('SolverInputError');
    return e as SolverInputError;
  }
  throw new Error('expected a SolverInputError');
}

const character = syntheticCharacter();
const characterGlb = await writeCharacterGlb(character);
const captureOf = (frames: number, fps = 30) =>
  syntheticCapture(character, syntheticClip(character, frames, fps)).capture;
const attribute = (
  json: { meshes: { primitives: { attributes: Record<string, number> }[] }[] },
  name: string,
) => json.meshes[0].primitives[0].attributes[name];

describe('input errors', () => {
  it('NOT_GLTF for bytes that are not a .glb, with a hint for JSON glTF', async () => {
    const e = await caught(() =>
      readCharacter(new TextEncoder().encode('{"asset":{"version":"2.0"}}')),
    );
    expect(e.code).toBe('NOT_GLTF');
    expect(e.message).toContain('JSON');
    expect(e.where.item).toBe('header');
  });

  it('TRUNCATED_FILE for a .glb cut short, naming the chunk', async () => {
    const e = await caught(() => readCharacter(characterGlb.slice(0, characterGlb.length - 100)));
    expect(e.code).toBe('TRUNCATED_FILE');
    const patched = new Uint8Array(characterGlb.slice(0, characterGlb.length - 100));
    new DataView(patched.buffer).setUint32(8, patched.length, true); // header agrees, chunk does not
    const e2 = await caught(() => readCharacter(patched));
    expect(e2.code).toBe('TRUNCATED_FILE');
    expect(e2.where.item).toBe('chunk 1');
  });

  it('NO_SKINNED_MESH for a capture read as a character', async () => {
    const e = await caught(async () => readCharacter(await writeCaptureGlb(captureOf(3))));
    expect(e.code).toBe('NO_SKINNED_MESH');
  });

  it('NON_FINITE_VALUE for a NaN position, with its vertex', async () => {
    const bytes = patchGlb(characterGlb, (parts) => {
      const o = elementOffset(parts, attribute(parts.json, 'POSITION'), 42, 12);
      new DataView(parts.bin.buffer).setFloat32(o + 4, NaN, true);
    });
    const e = await caught(() => readCharacter(bytes));
    expect(e.code).toBe('NON_FINITE_VALUE');
    expect(e.where.vertex).toBe(42);
  });

  it('WEIGHTS_NOT_NORMALISED for weights summing to 0.5, with its vertex', async () => {
    const bytes = patchGlb(characterGlb, (parts) => {
      const o = elementOffset(parts, attribute(parts.json, 'WEIGHTS_0'), 5, 16);
      const view = new DataView(parts.bin.buffer);
      [0.5, 0, 0, 0].forEach((w, k) => view.setFloat32(o + 4 * k, w, true));
    });
    const e = await caught(() => readCharacter(bytes));
    expect(e.code).toBe('WEIGHTS_NOT_NORMALISED');
    expect(e.where.vertex).toBe(5);
  });

  it('MISSING_JOINT for a joint index past the skin, with its vertex', async () => {
    const bytes = patchGlb(characterGlb, (parts) => {
      const acc = attribute(parts.json, 'JOINTS_0');
      const size = parts.json.accessors[acc].componentType === 5121 ? 4 : 8;
      const o = elementOffset(parts, acc, 3, size);
      const view = new DataView(parts.bin.buffer);
      if (size === 4) view.setUint8(o, 99);
      else view.setUint16(o, 99, true);
    });
    const e = await caught(() => readCharacter(bytes));
    expect(e.code).toBe('MISSING_JOINT');
    expect(e.where.vertex).toBe(3);
  });

  it('MISSING_JOINT for a clip without one of the skeleton joints, naming it', async () => {
    const e = await caught(() =>
      matchClipJoints(readBvh(makeBvh(2, 0.04)), character.skeleton, { requireAll: true }),
    );
    expect(e.code).toBe('MISSING_JOINT');
    expect(e.where.joint).toBe('hips');
  });

  it('VERTEX_COUNT_MISMATCH for a morph target shorter than its mesh, with its frame', async () => {
    const bytes = patchGlb(await writeCaptureGlb(captureOf(4)), (parts) => {
      const target = parts.json.meshes[0].primitives[0].targets[2].POSITION;
      parts.json.accessors[target].count -= 1;
    });
    const e = await caught(() => readCapture(bytes));
    expect(e.code).toBe('VERTEX_COUNT_MISMATCH');
    expect(e.where.frame).toBe(2);
  });

  it('VERTEX_COUNT_MISMATCH and TRIANGLE_MISMATCH when a capture does not fit the character', async () => {
    const other = syntheticCharacter({ rings: 5 });
    const e = await caught(() => validateCapture(other, captureOf(90)));
    expect(e.code).toBe('VERTEX_COUNT_MISMATCH');
    const capture = captureOf(90);
    capture.triangles = capture.triangles.slice();
    capture.triangles[7] = 0;
    const e2 = await caught(() => validateCapture(character, capture));
    expect(e2.code).toBe('TRIANGLE_MISMATCH');
    expect(e2.where.item).toBe('triangle 2');
  });

  it('NO_FRAMES for a capture shorter than two seconds and for a BVH with 0 frames', async () => {
    const e = await caught(() => validateCapture(character, captureOf(30, 30)));
    expect(e.code).toBe('NO_FRAMES');
    const e2 = await caught(() => readBvh(makeBvh(0, 0.04)));
    expect(e2.code).toBe('NO_FRAMES');
    expect(e2.where.line).toBeGreaterThan(0);
  });

  it('NO_FRAMES for a glTF clip file without animation', async () => {
    const e = await caught(() => readGltfClip(characterGlb));
    expect(e.code).toBe('NO_FRAMES');
  });

  it('BAD_FPS for a zero BVH frame time (with its line) and a negative extras.fps', async () => {
    const text = makeBvh(3, 0.04).replace('Frame Time: 0.04', 'Frame Time: 0');
    const line = text.split('\n').findIndex((l) => l.startsWith('Frame Time')) + 1;
    const e = await caught(() => readBvh(text));
    expect(e.code).toBe('BAD_FPS');
    expect(e.where.line).toBe(line);
    const bytes = patchGlb(await writeClipGlb(readBvh(makeBvh(3, 0.04))), (parts) => {
      parts.json.animations[0].extras.fps = -24;
    });
    expect((await caught(() => readGltfClip(bytes))).code).toBe('BAD_FPS');
  });

  it('BVH_SYNTAX with the line number of the bad token', async () => {
    const lines = makeBvh(2, 0.04).split('\n');
    const k = lines.findIndex((l) => l.includes('OFFSET 0.2 0.35 0'));
    lines[k] = lines[k].replace('0.35', 'abc');
    const e = await caught(() => readBvh(lines.join('\n')));
    expect(e.code).toBe('BVH_SYNTAX');
    expect(e.where.line).toBe(k + 1);
    expect(e.message).toContain(`line ${k + 1}`);
  });

  it('BVH_CHANNEL_COUNT for a frame row with a missing value, with frame and line', async () => {
    const lines = makeBvh(4, 0.04).split('\n');
    const first = lines.findIndex((l) => l.startsWith('Frame Time')) + 1;
    lines[first + 2] = lines[first + 2].split(' ').slice(1).join(' ');
    const e = await caught(() => readBvh(lines.join('\n')));
    expect(e.code).toBe('BVH_CHANNEL_COUNT');
    expect(e.where.frame).toBe(2);
    expect(e.where.line).toBe(first + 3);
  });

  it('NON_FINITE_VALUE for a NaN in one frame of a capture, with frame and vertex', async () => {
    const bytes = patchGlb(await writeCaptureGlb(captureOf(5)), (parts) => {
      const target = parts.json.meshes[0].primitives[0].targets[3].POSITION;
      new DataView(parts.bin.buffer).setFloat32(
        elementOffset(parts, target, 17, 12),
        Infinity,
        true,
      );
    });
    const e = await caught(() => readCapture(bytes));
    expect(e.code).toBe('NON_FINITE_VALUE');
    expect(e.where).toMatchObject({ frame: 3, vertex: 17 });
  });

  it('UNSUPPORTED_INPUT for a skinned mesh without triangles', async () => {
    const bytes = patchGlb(characterGlb, (parts) => {
      parts.json.meshes[0].primitives[0].mode = 0; // POINTS
    });
    const e = await caught(() => readCharacter(bytes));
    expect(e.code).toBe('UNSUPPORTED_INPUT');
    expect(e.where.item).toBe('synthetic_body');
  });

  it('NO_MORPH_TARGETS for a character read as a capture', async () => {
    expect((await caught(() => readCapture(characterGlb))).code).toBe('NO_MORPH_TARGETS');
  });
});
