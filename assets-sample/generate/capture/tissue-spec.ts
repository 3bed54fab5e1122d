// The known soft tissue of a synthetic capture: damped modes (each confined to a region, driven
// by one bone's specific force) and pose correctives (bulges driven by a joint's rotation).
import type { Vec3 } from '../body/sdf.js';

/** How a displacement field is laid out over a region. */
export interface ShapeSpec {
  /** Rest-space direction of motion (unit). */
  direction: Vec3;
  /** Share of motion along the surface normal, added to `direction`. */
  normalWeight: number;
  /** Favour vertices whose normal points this way (unit), e.g. the underside of an arm. */
  favour?: Vec3;
  /** Favour vertices far from the driving bone (flesh furthest from bone moves most). */
  fromBone?: boolean;
}

/** One damped mode of the tissue. */
export interface ModeSpec {
  id: string;
  region: string;
  /** Joint whose specific force (in its own frame) drives the mode. */
  driver: string;
  frequencyHz: number;
  dampingRatio: number;
  /**
   * Input gain b (bone frame): q̈ + 2ζωₙq̇ + ωₙ²q = b·(f − f_rest). A free mass on a spring has
   * b = −d for its direction d; smaller gains mean flesh that follows the bone more closely.
   */
  inputGain: Vec3;
  shape: ShapeSpec;
}

/** One pose corrective: a bulge whose activation is 1 − cos θ of a joint's local rotation. */
export interface CorrectiveSpec {
  id: string;
  region: string;
  joint: string;
  /** Displacement (m) of the most displaced vertex at activation 1 (θ = 90°). */
  amplitude: number;
  shape: ShapeSpec;
  /** Bone (joint name) along which the bulge sits. */
  bone: string;
  /** Centre of the bulge along that bone, 0 at the joint … 1 at its child or tip. */
  along: number;
}

/** Soft tissue of one character. */
export interface TissueSpec {
  modes: ModeSpec[];
  correctives: CorrectiveSpec[];
}
