// Writes a character (skinned mesh, skeleton, regions) to .glb.
import { Document, type Node, type Skin, type Buffer as GltfBuffer } from '@gltf-transform/core';
import type { Character, Skeleton } from '../types.js';
import { writeGlb } from './glb-container.js';

/** Nodes created for a skeleton. */
export interface WrittenSkeleton {
  /** Joint nodes in skeleton order. */
  joints: Node[];
  /** Nodes to add to the scene (roots, or their common parent). */
  sceneRoots: Node[];
}

/** A character added to a document. */
export interface WrittenCharacter extends WrittenSkeleton {
  /** The skinned mesh node. */
  meshNode: Node;
  /** The skin. */
  skin: Skin;
}

/** Creates joint nodes with rest TRS under one parent node when the roots are not at origin. */
export function addSkeletonNodes(doc: Document, skeleton: Skeleton): WrittenSkeleton {
  const joints = skeleton.names.map((name, j) =>
    doc
      .createNode(name)
      .setTranslation(vec3(skeleton.restTranslations, j))
      .setRotation(vec4(skeleton.restRotations, j))
      .setScale(vec3(skeleton.restScales, j)),
  );
  const roots: Node[] = [];
  joints.forEach((node, j) => {
    const p = skeleton.parents[j];
    if (p >= 0) joints[p].addChild(node);
    else roots.push(node);
  });
  const m = skeleton.rootParentMatrix;
  const identity = m.every((v, i) => Math.abs(v - (i % 5 === 0 ? 1 : 0)) < 1e-12);
  if (identity) return { joints, sceneRoots: roots };
  const holder = doc.createNode('skeleton_root').setMatrix(Array.from(m) as never);
  roots.forEach((r) => holder.addChild(r));
  return { joints, sceneRoots: [holder] };
}

/** Adds the character's mesh, skin and skeleton to `doc` (creating a buffer when none). */
export function addCharacter(doc: Document, character: Character): WrittenCharacter {
  const buffer = doc.getRoot().listBuffers()[0] ?? doc.createBuffer();
  const { joints, sceneRoots } = addSkeletonNodes(doc, character.skeleton);
  const skin = doc
    .createSkin('skin')
    .setInverseBindMatrices(
      floatAccessor(doc, buffer, 'MAT4', new Float32Array(character.skeleton.inverseBindMatrices)),
    );
  joints.forEach((j) => skin.addJoint(j));
  if (sceneRoots.length === 1) skin.setSkeleton(sceneRoots[0]);
  const prim = doc
    .createPrimitive()
    .setAttribute('POSITION', floatAccessor(doc, buffer, 'VEC3', character.restPositions))
    .setAttribute('NORMAL', floatAccessor(doc, buffer, 'VEC3', character.restNormals))
    .setAttribute(
      'JOINTS_0',
      doc.createAccessor().setType('VEC4').setArray(character.skinJoints).setBuffer(buffer),
    )
    .setAttribute(
      'WEIGHTS_0',
      floatAccessor(doc, buffer, 'VEC4', exactWeights(character.skinWeights)),
    )
    .setIndices(
      doc.createAccessor().setType('SCALAR').setArray(character.triangles).setBuffer(buffer),
    );
  if (character.regions && character.regions.source === 'attribute') {
    prim.setAttribute(
      '_REGION',
      floatAccessor(doc, buffer, 'SCALAR', Float32Array.from(character.regions.labels)),
    );
    prim.setExtras({ regionNames: character.regions.names });
  }
  const mesh = doc.createMesh(character.name).addPrimitive(prim);
  const meshNode = doc.createNode(character.name).setMesh(mesh).setSkin(skin);
  return { joints, sceneRoots, meshNode, skin };
}

/** Serialises a character to .glb bytes. */
export async function writeCharacterGlb(character: Character): Promise<Uint8Array> {
  const doc = new Document();
  doc.createBuffer();
  const written = addCharacter(doc, character);
  const scene = doc.createScene('scene');
  written.sceneRoots.forEach((n) => scene.addChild(n));
  scene.addChild(written.meshNode);
  return writeGlb(doc);
}

/** A float accessor of the given type on `buffer`. */
export function floatAccessor(
  doc: Document,
  buffer: GltfBuffer,
  type: 'SCALAR' | 'VEC3' | 'VEC4' | 'MAT4',
  array: Float32Array,
) {
  return doc.createAccessor().setType(type).setArray(array).setBuffer(buffer);
}

/**
 * Weights whose float32 sum is as close to 1 as float32 allows: the largest weight absorbs the
 * rounding of the others (glTF 2.0 requires each vertex's weights to sum to 1).
 */
function exactWeights(weights: Float32Array): Float32Array {
  const out = new Float32Array(weights);
  for (let i = 0; i < out.length; i += 4) {
    let big = i;
    for (let k = i + 1; k < i + 4; k++) if (out[k] > out[big]) big = k;
    let others = 0;
    for (let k = i; k < i + 4; k++) if (k !== big) others += out[k];
    out[big] = 1 - others;
  }
  return out;
}

function vec3(a: Float64Array, j: number): [number, number, number] {
  return [a[3 * j], a[3 * j + 1], a[3 * j + 2]];
}

function vec4(a: Float64Array, j: number): [number, number, number, number] {
  return [a[4 * j], a[4 * j + 1], a[4 * j + 2], a[4 * j + 3]];
}
