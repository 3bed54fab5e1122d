// Test helpers for take files: load a .glb in three.js (the reference glTF implementation) and
// read the skinned vertex positions it plays at a time.
import { AnimationMixer, SkinnedMesh, Vector3 } from 'three';
import { GLTFLoader, type GLTF } from 'three/examples/jsm/loaders/GLTFLoader.js';

/** The .glb parsed by three.js's GLTFLoader. */
export function parseGlb(bytes: Uint8Array): Promise<GLTF> {
  const buffer = bytes.buffer.slice(
    bytes.byteOffset,
    bytes.byteOffset + bytes.byteLength,
  ) as ArrayBuffer;
  return new Promise((resolve, reject) => new GLTFLoader().parse(buffer, '', resolve, reject));
}

/** The first skinned mesh of the scene. */
export function skinnedMeshOf(gltf: GLTF): SkinnedMesh {
  let mesh: SkinnedMesh | null = null;
  gltf.scene.traverse((o) => {
    if (!mesh && (o as SkinnedMesh).isSkinnedMesh) mesh = o as SkinnedMesh;
  });
  if (!mesh) throw new Error('no skinned mesh');
  return mesh;
}

/** three.js's skinned positions at time t (morph targets, then skinning), in world space. */
export function threeFrame(gltf: GLTF, t: number): Float32Array {
  const m = skinnedMeshOf(gltf);
  const mixer = new AnimationMixer(gltf.scene);
  mixer.clipAction(gltf.animations[0]).play();
  mixer.setTime(t);
  gltf.scene.updateMatrixWorld(true);
  m.skeleton.update();
  const count = m.geometry.getAttribute('position').count;
  const out = new Float32Array(3 * count);
  const v = new Vector3();
  for (let i = 0; i < count; i++) {
    m.getVertexPosition(i, v);
    v.applyMatrix4(m.matrixWorld);
    out.set([v.x, v.y, v.z], 3 * i);
  }
  return out;
}

/** Largest absolute difference between two equally long arrays. */
export function maxDiff(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < a.length; i++) m = Math.max(m, Math.abs(a[i] - b[i]));
  return m;
}
