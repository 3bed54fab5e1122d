// What a procedural character is made of: a skeleton in rest pose, body parts (distance-field
// primitives bound to a few bones, some tagged with a soft-tissue region) and meshing settings.
import type { Shape, Vec3 } from './sdf.js';

/** One joint: world rest position; local axes are world-aligned at rest (identity rest rotation). */
export interface JointSpec {
  name: string;
  parent: string | null;
  at: Vec3;
  /** End of this joint's bone when it is a leaf (or to override the first child). */
  tip?: Vec3;
}

/** A body part: a shape, the bones that may move its skin, and an optional region tag. */
export interface PartSpec {
  shape: Shape;
  bones: string[];
  region?: string;
  /** The region covers only the side facing this (unit) direction; the rest counts as body. */
  facing?: Vec3;
}

/** A chain of limb joints from the body outwards. */
export interface LimbRoles {
  /** Clavicle or hip bone before the limb, when the rig has one. */
  base?: string;
  upper: string;
  lower: string;
  end: string;
  /** Toe or finger joint after the end joint. */
  tip?: string;
}

/** Which joints play which part in procedural motion. */
export interface RigRoles {
  hips: string;
  spine: string[];
  neck: string;
  head: string;
  jaw?: string;
  arms: { l: LimbRoles; r: LimbRoles };
  legs: { l: LimbRoles; r: LimbRoles };
}

/** Everything needed to build one character. */
export interface BodyPlan {
  /** File and mesh name (kebab-case). */
  id: string;
  /** Display name in the invented scenario. */
  title: string;
  description: string;
  /** How joints are named, for people mapping clips between rigs. */
  namingConvention: string;
  joints: JointSpec[];
  parts: PartSpec[];
  /** Region names; index 0 is the catch-all 'body'. */
  regions: string[];
  roles: RigRoles;
  /** Meshing grid spacing (metres): sets the triangle count. */
  cell: number;
  /** Smooth-union radius of the parts (metres). */
  blend: number;
  /** Softness of skin weights between parts and along bones (metres). */
  weightSoftness: number;
  /** Softness of region borders (metres). */
  regionSoftness: number;
}

/** Mirrors a left-side point to the right (+X is the character's left in glTF). */
export function mirror(p: Vec3): Vec3 {
  return [-p[0], p[1], p[2]];
}

/** p + s·(q − p). */
export function lerp3(p: Vec3, q: Vec3, s: number): Vec3 {
  return [p[0] + s * (q[0] - p[0]), p[1] + s * (q[1] - p[1]), p[2] + s * (q[2] - p[2])];
}
