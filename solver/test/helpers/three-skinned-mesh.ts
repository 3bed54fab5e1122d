// The same rig as a three.js SkinnedMesh (three 0.187.0), the reference implementation that the
// skinning test and the skinning benchmark compare the typed-array kernel with.
import {
  Bone,
  BufferAttribute,
  BufferGeometry,
  Matrix4,
  Skeleton as ThreeSkeleton,
  SkinnedMesh,
} from 'three';
import type { Character } from '../../src/index.js';

/** A three.js skinned mesh with the same skeleton, bind matrices and skin as `c`. */
export function threeSkinnedMesh(c: Character): { mesh: SkinnedMesh; bones: Bone[] } {
  const s = c.skeleton;
  const bones = s.names.map((name) => Object.assign(new Bone(), { name }));
  bones.forEach((b, j) => {
    b.position.fromArray(s.restTranslations, 3 * j);
    b.quaternion.fromArray(s.restRotations, 4 * j);
    b.scale.fromArray(s.restScales, 3 * j);
    if (s.parents[j] >= 0) bones[s.parents[j]].add(b);
  });
  const inverses = s.names.map((_, j) => new Matrix4().fromArray(s.inverseBindMatrices, 16 * j));
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new BufferAttribute(c.restPositions, 3));
  geometry.setAttribute('skinIndex', new BufferAttribute(c.skinJoints, 4));
  geometry.setAttribute('skinWeight', new BufferAttribute(c.skinWeights, 4));
  const mesh = new SkinnedMesh(geometry);
  mesh.add(bones[0]);
  mesh.bind(new ThreeSkeleton(bones, inverses), new Matrix4());
  return { mesh, bones };
}
