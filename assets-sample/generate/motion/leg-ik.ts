// Two-bone inverse kinematics for a leg: the knee angle from the law of cosines, then the thigh
// orientation that points the hip→ankle line at the target with the knee hinge kept level.
import { Matrix4, Quaternion, Vector3 } from 'three';

/** A leg's rest geometry (rest local axes are world-aligned). */
export interface LegRig {
  /** Rest hip → knee vector (m). */
  thigh: Vector3;
  /** Rest knee → ankle vector (m). */
  shin: Vector3;
  /** Rest knee hinge axis (unit, perpendicular to the thigh; +angle bends the knee). */
  hinge: Vector3;
}

/** Rotations solved for one leg. */
export interface LegSolution {
  /** Thigh world rotation. */
  thighWorld: Quaternion;
  /** Knee local rotation. */
  knee: Quaternion;
}

const e1 = new Vector3();
const e2 = new Vector3();
const e3 = new Vector3();
const f1 = new Vector3();
const f2 = new Vector3();
const f3 = new Vector3();
const shinBent = new Vector3();
const mRest = new Matrix4();
const mWorld = new Matrix4();

/** Signed angle from a to b about the unit axis n. */
function signedAngle(a: Vector3, b: Vector3, n: Vector3): number {
  return Math.atan2(new Vector3().crossVectors(a, b).dot(n), a.dot(b));
}

/** Makes the leg reach from `hip` (world) to `ankle` (world) with the hinge along `hingeWorld`. */
export function solveLeg(
  leg: LegRig,
  hip: Vector3,
  ankle: Vector3,
  hingeWorld: Vector3,
  out: LegSolution,
): LegSolution {
  const l1 = leg.thigh.length();
  const l2 = leg.shin.length();
  const reach = Math.min(
    Math.max(hip.distanceTo(ankle), Math.abs(l1 - l2) + 1e-3),
    (l1 + l2) * 0.9995,
  );
  const restBend = signedAngle(leg.thigh, leg.shin, leg.hinge);
  const cosBend = (reach * reach - l1 * l1 - l2 * l2) / (2 * l1 * l2);
  const bend = Math.max(0, Math.acos(Math.max(-1, Math.min(1, cosBend))) - restBend);
  out.knee.setFromAxisAngle(leg.hinge, bend);
  shinBent.copy(leg.shin).applyQuaternion(out.knee);
  e1.copy(leg.thigh).add(shinBent).normalize();
  e2.copy(leg.hinge).addScaledVector(e1, -leg.hinge.dot(e1)).normalize();
  e3.crossVectors(e1, e2);
  f1.subVectors(ankle, hip).normalize();
  f2.copy(hingeWorld).addScaledVector(f1, -hingeWorld.dot(f1)).normalize();
  f3.crossVectors(f1, f2);
  mRest.makeBasis(e1, e2, e3);
  mWorld.makeBasis(f1, f2, f3);
  // World rotation = F · Eᵀ maps the rest frame onto the target frame.
  mWorld.multiply(mRest.transpose());
  out.thighWorld.setFromRotationMatrix(mWorld);
  return out;
}
