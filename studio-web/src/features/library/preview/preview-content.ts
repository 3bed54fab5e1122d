// What the 3D view shows for each kind of library file, read with three's GLTFLoader and
// BVHLoader: a character as rigged, a capture playing its frames, a clip as a stick figure or
// on a character's skeleton.
import {
  AnimationClip,
  AnimationMixer,
  Box3,
  BufferAttribute,
  Group,
  type Mesh,
  type MeshStandardMaterial,
  type Object3D,
} from 'three';
import { BVHLoader } from 'three/examples/jsm/loaders/BVHLoader.js';
import { GLTFLoader, type GLTF } from 'three/examples/jsm/loaders/GLTFLoader.js';
import { StickFigure } from './stick-figure';

/** Playback of animated content. */
export interface PreviewAnimation {
  /** Length of one loop in seconds. */
  duration: number;
  fps: number;
  frameCount: number;
  /** Poses the content at `time` seconds. */
  seek: (time: number) => void;
}

/** Something the view can show. */
export interface PreviewContent {
  object: Object3D;
  animation: PreviewAnimation | null;
  dispose: () => void;
}

/**
 * The box the content fills over its whole motion (a walk leaves its first pose's box), from
 * evenly spaced poses; ends posed at the start.
 */
export function motionBounds(content: PreviewContent, samples = 16): Box3 {
  const box = new Box3();
  const { object, animation } = content;
  if (!animation) return box.setFromObject(object, true);
  for (let i = 0; i <= samples; i++) {
    animation.seek((animation.duration * i) / samples);
    object.updateMatrixWorld(true);
    box.expandByObject(object, true);
  }
  animation.seek(0);
  return box;
}

/**
 * Reads a .glb from memory. A file without materials of its own gets glTF's default, which is
 * fully metallic: with no environment to reflect, its undersides render black. Those are shown
 * matte instead, the way the take player shows a take.
 */
export async function parseGlb(buffer: ArrayBuffer): Promise<GLTF> {
  const gltf = await new GLTFLoader().parseAsync(buffer, '');
  const declared = (gltf.parser.json as { materials?: unknown[] }).materials?.length ?? 0;
  if (declared === 0) {
    gltf.scene.traverse((o) => {
      const material = (o as Mesh).material as MeshStandardMaterial | undefined;
      if (material?.isMeshStandardMaterial) {
        material.metalness = 0;
        material.roughness = 0.85;
        // A mid clay grey: the view's lights are bright enough for white to lose its shape.
        material.color.set('#aaa49b');
      }
    });
  }
  return gltf;
}

function disposeTree(root: Object3D): void {
  root.traverse((o) => {
    const mesh = o as Mesh;
    mesh.geometry?.dispose();
    const materials = Array.isArray(mesh.material)
      ? mesh.material
      : mesh.material
        ? [mesh.material]
        : [];
    for (const m of materials) m.dispose();
  });
}

function mixerAnimation(
  root: Object3D,
  clip: AnimationClip,
  fps: number,
  after?: () => void,
): PreviewAnimation {
  const mixer = new AnimationMixer(root);
  mixer.clipAction(clip).play();
  const duration = Math.max(clip.duration, 1 / fps);
  return {
    duration,
    fps,
    frameCount: Math.max(1, Math.round(duration * fps) + 1),
    seek: (time) => {
      mixer.setTime(time);
      after?.();
    },
  };
}

/** A character as rigged, in its bind pose, with its skeleton drawn over it. */
export async function characterContent(buffer: ArrayBuffer): Promise<PreviewContent> {
  const gltf = await parseGlb(buffer);
  const group = new Group();
  group.add(gltf.scene);
  const bones = new Set<Object3D>();
  gltf.scene.traverse((o) => {
    if ((o as { isBone?: boolean }).isBone) bones.add(o);
  });
  const figure = new StickFigure(gltf.scene, (o) => bones.has(o));
  figure.visible = false;
  group.add(figure);
  group.userData.skeleton = figure;
  return {
    object: group,
    animation: null,
    dispose: () => (disposeTree(gltf.scene), figure.release()),
  };
}

/**
 * A capture playing its frames. Its morph targets (one per frame) are applied on the CPU: a
 * capture has hundreds of frames, far more morph targets than a shader can blend.
 */
export async function captureContent(
  buffer: ArrayBuffer,
  fallbackFps: number | null,
): Promise<PreviewContent> {
  const gltf = await parseGlb(buffer);
  let mesh: Mesh | null = null;
  gltf.scene.traverse((o) => {
    const m = o as Mesh;
    const count = m.isMesh ? (m.geometry.morphAttributes.position?.length ?? 0) : 0;
    if (count > 0 && count > (mesh?.geometry.morphAttributes.position?.length ?? 0)) mesh = m;
  });
  if (!mesh) throw new Error('The capture has no mesh with one morph target per frame.');
  const target: Mesh = mesh;
  const geometry = target.geometry;
  const frames = geometry.morphAttributes.position as BufferAttribute[];
  const relative = geometry.morphTargetsRelative;
  // Read through the accessor: the file may interleave positions with other attributes.
  const source = geometry.getAttribute('position');
  const base = new Float32Array(source.count * 3);
  for (let i = 0; i < source.count; i++) {
    base[3 * i] = source.getX(i);
    base[3 * i + 1] = source.getY(i);
    base[3 * i + 2] = source.getZ(i);
  }
  // Plain mesh from here on: its own positions, written per frame, and normals recomputed.
  geometry.morphAttributes = {};
  target.morphTargetInfluences = undefined;
  target.morphTargetDictionary = undefined;
  const position = new BufferAttribute(base.slice(), 3);
  geometry.setAttribute('position', position);
  geometry.deleteAttribute('normal');
  const extrasFps = [target, target.parent, gltf.scene]
    .map((o) => o?.userData?.fps)
    .find((v) => typeof v === 'number');
  const fps = (extrasFps as number | undefined) ?? fallbackFps ?? 30;
  let shown = -1;
  const seek = (time: number) => {
    const frame = Math.min(frames.length - 1, Math.max(0, Math.floor(time * fps + 1e-6)));
    if (frame === shown) return;
    shown = frame;
    const out = position.array as Float32Array;
    const data = frames[frame];
    const offset = relative ? 1 : 0;
    for (let i = 0; i < data.count; i++) {
      const o = 3 * i;
      out[o] = offset * base[o] + data.getX(i);
      out[o + 1] = offset * base[o + 1] + data.getY(i);
      out[o + 2] = offset * base[o + 2] + data.getZ(i);
    }
    position.needsUpdate = true;
    geometry.computeVertexNormals();
    geometry.computeBoundingSphere();
  };
  seek(0);
  return {
    object: gltf.scene,
    animation: { duration: frames.length / fps, fps, frameCount: frames.length, seek },
    dispose: () => disposeTree(gltf.scene),
  };
}

/** A BVH's skeleton with its motion; track names bound to the bones by name. */
function readBvh(buffer: ArrayBuffer): { root: Group; clip: AnimationClip; names: Set<string> } {
  const text = new TextDecoder().decode(buffer);
  const { skeleton, clip } = new BVHLoader().parse(text);
  const root = new Group();
  root.add(skeleton.bones[0]);
  for (const track of clip.tracks) track.name = track.name.replace(/^\.bones\[(.+?)\]/, '$1');
  return { root, clip, names: new Set(skeleton.bones.map((b) => b.name)) };
}

/** Reads a clip file into a joint hierarchy and its animation. */
async function readClip(buffer: ArrayBuffer, format: 'bvh' | 'glb') {
  if (format === 'bvh') return readBvh(buffer);
  const gltf = await parseGlb(buffer);
  const clip = gltf.animations[0];
  if (!clip) throw new Error('The clip file has no animation.');
  const names = new Set(clip.tracks.map((t) => t.name.split('.')[0]));
  return { root: gltf.scene as Object3D, clip, names };
}

/** A clip as a stick figure moving through its frames. */
export async function clipContent(
  buffer: ArrayBuffer,
  format: 'bvh' | 'glb',
  fps: number | null,
): Promise<PreviewContent> {
  const { root, clip, names } = await readClip(buffer, format);
  const figure = new StickFigure(
    root,
    (o) => names.has(o.name) || (o as { isBone?: boolean }).isBone === true,
  );
  const group = new Group();
  root.visible = false;
  group.add(root, figure);
  const animation = mixerAnimation(root, clip, fps ?? 30, () => figure.update());
  animation.seek(0);
  return { object: group, animation, dispose: () => (disposeTree(root), figure.release()) };
}

/**
 * A clip played on a character's skeleton: joint rotations by name; only the root keeps its
 * translation, scaled from the clip's hip height to the character's.
 */
export async function clipOnCharacterContent(
  clipBuffer: ArrayBuffer,
  format: 'bvh' | 'glb',
  characterBuffer: ArrayBuffer,
  fps: number | null,
): Promise<PreviewContent> {
  const [{ root: clipRoot, clip }, gltf] = await Promise.all([
    readClip(clipBuffer, format),
    parseGlb(characterBuffer),
  ]);
  const target = gltf.scene;
  const rootName = clip.tracks.find((t) => t.name.endsWith('.position'))?.name.split('.')[0];
  const clipHip = rootName ? clipRoot.getObjectByName(rootName) : undefined;
  const charHip = rootName ? target.getObjectByName(rootName) : undefined;
  const scale =
    clipHip && charHip && clipHip.position.length() > 0
      ? charHip.position.length() / clipHip.position.length()
      : 1;
  const tracks = clip.tracks.flatMap((track) => {
    const [node, property] = track.name.split('.');
    if (!target.getObjectByName(node)) return [];
    if (property === 'quaternion') return [track];
    if (property === 'position' && node === rootName) {
      const scaled = track.clone();
      for (let i = 0; i < scaled.values.length; i++) scaled.values[i] *= scale;
      return [scaled];
    }
    return [];
  });
  if (tracks.length === 0)
    throw new Error('None of the clip’s joints has a match on this character.');
  const onCharacter = new AnimationClip(clip.name, clip.duration, tracks);
  const animation = mixerAnimation(target, onCharacter, fps ?? 30);
  animation.seek(0);
  return { object: target, animation, dispose: () => (disposeTree(target), disposeTree(clipRoot)) };
}
