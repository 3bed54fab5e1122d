// A take .glb made ready to play: the three.js scene and clip (GLTFLoader), and the solver's
// view of the same file (live-tuning data, basis, baked region gains, the character's regions).
import {
  characterFromDocument,
  characterRegionNames,
  openGlb,
  readTakeGlb,
  unpackArray,
  type Character,
  type TakeFile,
} from '@overshoot/solver';
import { AnimationClip, type KeyframeTrack, type Object3D, type SkinnedMesh } from 'three';
import { GLTFLoader } from 'three/addons/loaders/GLTFLoader.js';

/** A loaded take: what the viewer shows and what live tuning changes. */
export interface TakeModel {
  /** The scene as loaded; the main view shows this one, compare views show clones. */
  scene: Object3D;
  /** The skinned mesh carrying the K dynamic morph targets. */
  mesh: SkinnedMesh;
  /** Joint animation and morph weights on one timeline. */
  clip: AnimationClip;
  /** The same clip without the morph weights: skinning alone. */
  skinClip: AnimationClip;
  /**
   * The morph-weight track: per frame one weight per morph target (the K dynamic ones and the
   * pose correctives, as `take.layout` says); live tuning writes the dynamic ones.
   */
  weightsTrack: KeyframeTrack;
  /** The dynamic weights shown now (T × K): the file's, or live tuning's latest. */
  dynamicWeights: Float32Array;
  /** The solver's reading of the file. */
  take: TakeFile;
  /** Per-vertex gain baked into the morph targets (N). */
  vertexGains: Float32Array;
  /** The target character (for region gains). */
  character: Character;
  /** Region names of the character, for the region gain sliders. */
  regionNames: string[];
  /** Shot rate and frame count. */
  fps: number;
  frameCount: number;
  /** Basis size K. */
  k: number;
}

/** A take file that cannot be shown: says what is wrong with it. */
export class TakeFileError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'TakeFileError';
  }
}

function findMorphMesh(scene: Object3D, k: number): SkinnedMesh | null {
  let found: SkinnedMesh | null = null;
  scene.traverse((o) => {
    const mesh = o as SkinnedMesh;
    if (!found && mesh.isSkinnedMesh && mesh.morphTargetInfluences?.length === k) found = mesh;
  });
  return found;
}

/** Parses a take .glb; throws TakeFileError (or the solver's typed error) when it is not one. */
export async function loadTakeModel(bytes: ArrayBuffer): Promise<TakeModel> {
  const u8 = new Uint8Array(bytes);
  const take = await readTakeGlb(u8);
  const character = characterFromDocument(await openGlb(u8));
  const gltf = await new GLTFLoader().parseAsync(bytes.slice(0), '');
  const { k, frameCount, fps } = take.live;
  const targets = take.layout.count;
  const mesh = findMorphMesh(gltf.scene, targets);
  if (!mesh) throw new TakeFileError(`The take has no skinned mesh with ${targets} morph targets.`);
  const clip = gltf.animations[0];
  const weightsTrack = clip?.tracks.find((t) => t.name.endsWith('.morphTargetInfluences'));
  if (!clip || !weightsTrack) throw new TakeFileError('The take has no morph-weight animation.');
  if (weightsTrack.values.length !== frameCount * targets) {
    throw new TakeFileError(
      `The take's morph weights hold ${weightsTrack.values.length} values, not ${frameCount} frames × ${targets} targets.`,
    );
  }
  // Tissue moves well outside the rest bounds; never let the camera cull the mesh.
  gltf.scene.traverse((o) => (o.frustumCulled = false));
  const skinClip = new AnimationClip(
    `${clip.name} (skinning only)`,
    clip.duration,
    clip.tracks.filter((t) => t !== weightsTrack),
  );
  return {
    scene: gltf.scene,
    mesh,
    clip,
    skinClip,
    weightsTrack,
    dynamicWeights: Float32Array.from(take.weights),
    take,
    vertexGains: unpackArray(take.extras.vertexGains) as Float32Array,
    character,
    regionNames: characterRegionNames(character),
    fps,
    frameCount,
    k,
  };
}
