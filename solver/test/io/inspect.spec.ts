// inspectFile: what each kind of file holds, and which mesh is chosen when there are several.
import { WebIO } from '@gltf-transform/core';
import { describe, expect, it } from 'vitest';
import {
  inspectFile,
  readCharacter,
  readClip,
  writeCharacterGlb,
  writeClipGlb,
} from '../../src/index.js';
import { makeBvh } from '../helpers/bvh-text.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';

describe('inspectFile', () => {
  it('reports a glTF clip with its joints, frames, rate and joint bounds', async () => {
    const bytes = await writeClipGlb(await readClip(makeBvh(10, 1 / 24), 'bvh'));
    const summary = await inspectFile(bytes, 'walk.glb');
    expect(summary).toMatchObject({
      kind: 'clip',
      frameCount: 10,
      fps: 24,
      vertexCount: 0,
      triangleCount: 0,
    });
    expect(summary.jointNames[0]).toBe('Hips');
    // The Hips offset is 0.9 m up and the root moves by at most ±0.2 m.
    expect(summary.boundingBox!.max[1]).toBeGreaterThan(0.7);
  });

  it('takes the largest of several skinned meshes and names it in a warning', async () => {
    const io = new WebIO();
    const doc = await io.readBinary(await writeCharacterGlb(syntheticCharacter()));
    const skin = doc.getRoot().listSkins()[0];
    const buffer = doc.getRoot().listBuffers()[0];
    const acc = (type: 'VEC3' | 'VEC4', a: ArrayLike<number>, ints = false) =>
      doc
        .createAccessor()
        .setType(type)
        .setArray(ints ? new Uint16Array(a) : new Float32Array(a))
        .setBuffer(buffer);
    const prim = doc
      .createPrimitive()
      .setAttribute('POSITION', acc('VEC3', [0, 0, 0, 1, 0, 0, 0, 1, 0]))
      .setAttribute('JOINTS_0', acc('VEC4', Array(12).fill(0), true))
      .setAttribute('WEIGHTS_0', acc('VEC4', [1, 0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0]));
    const small = doc
      .createNode('prop')
      .setMesh(doc.createMesh('prop').addPrimitive(prim))
      .setSkin(skin);
    doc.getRoot().listScenes()[0].addChild(small);
    const character = await readCharacter(await io.writeBinary(doc));
    expect(character.name).toBe('synthetic_body');
    expect(character.warnings.join(' ')).toMatch(
      /using the largest, "synthetic_body" \(ignored: prop\)/,
    );
  });
});
