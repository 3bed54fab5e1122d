// One copy of a take in the viewport, posed at a frame by its own AnimationMixer. The main view
// uses the loaded scene itself (live tuning edits it); compare views use clones.
import {
  AnimationMixer,
  LoopOnce,
  type AnimationAction,
  type Material,
  type Object3D,
  type SkinnedMesh,
} from 'three';
import { clone as cloneSkinned } from 'three/addons/utils/SkeletonUtils.js';
import type { TakeModel } from './take-model';

/** How an actor is built. */
export interface TakeActorOptions {
  /** Play skinning alone (no dynamic morph weights). */
  skinningOnly?: boolean;
  /** Use a clone of the scene instead of the loaded scene itself. */
  clone?: boolean;
  /** three.js layer the actor draws on (the stage shows layers per side). */
  layer: number;
}

function findMesh(root: Object3D, name: string): SkinnedMesh {
  let found: SkinnedMesh | null = null;
  root.traverse((o) => {
    if (!found && (o as SkinnedMesh).isSkinnedMesh && o.name === name) found = o as SkinnedMesh;
  });
  if (!found) throw new Error(`The cloned take lost its mesh "${name}".`);
  return found;
}

/** A take posed frame by frame. */
export class TakeActor {
  /** Root object added to the scene. */
  readonly root: Object3D;
  /** The skinned mesh with the dynamic morph targets. */
  readonly mesh: SkinnedMesh;
  private readonly mixer: AnimationMixer;
  private readonly action: AnimationAction;
  private readonly ownMaterial: Material | Material[];

  constructor(
    readonly model: TakeModel,
    readonly options: TakeActorOptions,
  ) {
    this.root = options.clone ? cloneSkinned(model.scene) : model.scene;
    this.mesh = options.clone ? findMesh(this.root, model.mesh.name) : model.mesh;
    this.ownMaterial = this.mesh.material;
    this.root.traverse((o) => o.layers.set(options.layer));
    this.mixer = new AnimationMixer(this.root);
    this.action = this.mixer.clipAction(options.skinningOnly ? model.skinClip : model.clip);
    // Posed by setting the time directly: once, clamped, so the last frame never wraps to 0.
    this.action.setLoop(LoopOnce, 1);
    this.action.clampWhenFinished = true;
    this.action.play();
    this.action.paused = true;
  }

  /** Poses the take at frame `index` (0-based, at the take's rate). */
  setFrame(index: number): void {
    const t = Math.min(Math.max(0, index / this.model.fps), this.model.clip.duration);
    this.action.time = t;
    this.mixer.update(0);
  }

  /** Draws the mesh with `material`, or its own material again with null. */
  setMaterial(material: Material | null): void {
    this.mesh.material = material ?? this.ownMaterial;
  }

  /** Stops the mixer; the stage removes the root from its scene. */
  dispose(): void {
    this.mixer.stopAllAction();
    this.mixer.uncacheRoot(this.root);
    this.mesh.material = this.ownMaterial;
  }
}
