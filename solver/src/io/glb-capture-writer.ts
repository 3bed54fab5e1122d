// Writes a capture to .glb: one morph target per frame (offsets from the base mesh), shown one
// at a time by a STEP weights animation; optionally with a character's skeleton and its clip.
// The frames hold posed positions and glTF applies morph targets before skinning, so the capture
// mesh is never bound to the skin (it would be posed twice); the skin stays in the file so that
// readers find the skeleton the joint animation drives.
import { Document } from '@gltf-transform/core';
import { SolverInputError } from '../errors.js';
import type { Capture, Character } from '../types.js';
import { writeGlb } from './glb-container.js';
import { addCharacter, floatAccessor } from './glb-character-writer.js';
import { addClipChannels } from './glb-clip-writer.js';

/** Options for writing a capture. */
export interface WriteCaptureOptions {
  /** Bind the mesh to this character's skin (base mesh = its rest positions). */
  character?: Character | null;
}

/** Serialises a capture to .glb bytes. */
export async function writeCaptureGlb(
  capture: Capture,
  options: WriteCaptureOptions = {},
): Promise<Uint8Array> {
  const { frameCount: t, vertexCount: n } = capture;
  const doc = new Document();
  const buffer = doc.createBuffer();
  const scene = doc.createScene('scene');
  const character = options.character ?? null;
  let prim;
  let meshNode;
  let base = capture.basePositions;
  let jointNodes = null;
  if (character) {
    if (character.restPositions.length !== 3 * n) {
      throw new SolverInputError(
        'VERTEX_COUNT_MISMATCH',
        `capture has ${n} vertices, the character ${character.restPositions.length / 3}`,
        {},
      );
    }
    const written = addCharacter(doc, character);
    written.sceneRoots.forEach((r) => scene.addChild(r));
    meshNode = written.meshNode.setName(capture.name);
    prim = meshNode.getMesh()!.setName(capture.name).listPrimitives()[0];
    base = character.restPositions;
    meshNode.setSkin(null);
    for (const semantic of ['JOINTS_0', 'WEIGHTS_0']) {
      const accessor = prim.getAttribute(semantic);
      prim.setAttribute(semantic, null);
      accessor?.dispose();
    }
    jointNodes = new Map(character.skeleton.names.map((name, j) => [name, written.joints[j]]));
  } else {
    prim = doc
      .createPrimitive()
      .setAttribute('POSITION', floatAccessor(doc, buffer, 'VEC3', base))
      .setIndices(
        doc.createAccessor().setType('SCALAR').setArray(capture.triangles).setBuffer(buffer),
      );
    meshNode = doc
      .createNode(capture.name)
      .setMesh(doc.createMesh(capture.name).addPrimitive(prim));
  }
  scene.addChild(meshNode);
  const stride = 3 * n;
  for (let f = 0; f < t; f++) {
    const delta = new Float32Array(stride);
    const o = f * stride;
    for (let i = 0; i < stride; i++) delta[i] = capture.positions[o + i] - base[i];
    const target = doc
      .createPrimitiveTarget(`frame_${f}`)
      .setAttribute('POSITION', floatAccessor(doc, buffer, 'VEC3', delta));
    prim.addTarget(target);
  }
  meshNode.getMesh()!.setWeights(new Array(t).fill(0));
  const times = new Float32Array(t);
  const weights = new Float32Array(t * t);
  for (let f = 0; f < t; f++) {
    times[f] = f / capture.fps;
    weights[f * t + f] = 1;
  }
  const anim = doc.createAnimation(capture.name).setExtras({ fps: capture.fps });
  const sampler = doc
    .createAnimationSampler()
    .setInput(floatAccessor(doc, buffer, 'SCALAR', times))
    .setOutput(floatAccessor(doc, buffer, 'SCALAR', weights))
    .setInterpolation('STEP');
  anim.addSampler(sampler);
  anim.addChannel(
    doc
      .createAnimationChannel()
      .setTargetNode(meshNode)
      .setTargetPath('weights')
      .setSampler(sampler),
  );
  if (capture.clip && jointNodes) addClipChannels(doc, buffer, anim, capture.clip, jointNodes);
  return writeGlb(doc);
}
