// What procedural motion needs to know about a skeleton: joint indices by role, rest bone
// vectors, limb lengths and swing axes, all from the body plan's rest joint positions.
import { Vector3 } from 'three';
import type { BodyPlan, LimbRoles } from '../body/body-plan.js';
import type { LegRig } from './leg-ik.js';

const UP = new Vector3(0, 1, 0);
const FORWARD = new Vector3(0, 0, 1);

/** Indices and rest geometry of an arm. */
export interface ArmInfo {
  base: number;
  upper: number;
  lower: number;
  end: number;
  /** Axis that swings the upper arm forward / lifts it sideways (rest frame, unit). */
  swingAxis: Vector3;
  liftAxis: Vector3;
  /** Axis that flexes the elbow forward. */
  elbowAxis: Vector3;
  /** Axis that raises the clavicle. */
  shrugAxis: Vector3;
}

/** Indices and rest geometry of a leg. */
export interface LegInfo extends LegRig {
  upper: number;
  lower: number;
  end: number;
  tip: number;
  /** Rest hip position relative to the hips joint. */
  hipOffset: Vector3;
  /** Rest ankle position (world). */
  ankleRest: Vector3;
}

/** Skeleton facts for procedural motion. */
export interface RigInfo {
  names: string[];
  parents: number[];
  /** Rest world position per joint. */
  rest: Vector3[];
  hips: number;
  spine: number[];
  neck: number;
  head: number;
  jaw: number;
  arms: [ArmInfo, ArmInfo];
  legs: [LegInfo, LegInfo];
}

/** Builds rig facts from a body plan. */
export function rigInfo(plan: BodyPlan): RigInfo {
  const names = plan.joints.map((j) => j.name);
  const at = (name: string | undefined): number => {
    if (name === undefined) return -1;
    const k = names.indexOf(name);
    if (k < 0) throw new Error(`${plan.id}: role names unknown joint ${name}`);
    return k;
  };
  const rest = plan.joints.map((j) => new Vector3(...j.at));
  const dir = (a: number, b: number) => new Vector3().subVectors(rest[b], rest[a]).normalize();
  const arm = (r: LimbRoles): ArmInfo => {
    const upper = at(r.upper), lower = at(r.lower), end = at(r.end), base = at(r.base); // prettier-ignore
    const du = dir(upper, lower);
    const dl = dir(lower, end);
    const db = base >= 0 ? dir(base, upper) : du;
    return {
      base,
      upper,
      lower,
      end,
      swingAxis: new Vector3().crossVectors(du, FORWARD).normalize(),
      liftAxis: new Vector3().crossVectors(du, UP).normalize(),
      elbowAxis: new Vector3().crossVectors(dl, FORWARD).normalize(),
      shrugAxis: new Vector3().crossVectors(db, UP).normalize(),
    };
  };
  const hips = at(plan.roles.hips);
  const leg = (r: LimbRoles): LegInfo => {
    const upper = at(r.upper), lower = at(r.lower), end = at(r.end); // prettier-ignore
    const thigh = new Vector3().subVectors(rest[lower], rest[upper]);
    const hinge = new Vector3(1, 0, 0);
    hinge.addScaledVector(thigh, -hinge.dot(thigh) / thigh.lengthSq()).normalize();
    return {
      upper,
      lower,
      end,
      tip: at(r.tip),
      thigh,
      shin: new Vector3().subVectors(rest[end], rest[lower]),
      hinge,
      hipOffset: new Vector3().subVectors(rest[upper], rest[hips]),
      ankleRest: rest[end].clone(),
    };
  };
  return {
    names,
    parents: plan.joints.map((j) => (j.parent === null ? -1 : names.indexOf(j.parent))),
    rest,
    hips,
    spine: plan.roles.spine.map(at),
    neck: at(plan.roles.neck),
    head: at(plan.roles.head),
    jaw: at(plan.roles.jaw),
    arms: [arm(plan.roles.arms.l), arm(plan.roles.arms.r)],
    legs: [leg(plan.roles.legs.l), leg(plan.roles.legs.r)],
  };
}
