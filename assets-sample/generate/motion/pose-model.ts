// Evaluates a motion script at one instant: root position and every joint's local rotation.
// Legs reach for procedural foot targets by IK (stance feet move back at the body's speed, so they
// do not slide); hips bob, sway and roll with the gait; spine, head and arms follow by forward
// kinematics. Every input is a smooth function of time, so joint accelerations are continuous.
import { Quaternion, Vector3 } from 'three';
import { airborne, hopArmSwing, hopOffset } from './hops.js';
import { solveLeg, type LegSolution } from './leg-ik.js';
import type { MotionScript } from './motion-script.js';
import type { RigInfo } from './rig-info.js';
import { integralAt, smootherstep, valueAt } from './tracks.js';

/** Root ground position (x, z), integrated by the caller from speed and heading. */
export interface RootPath {
  x: number;
  z: number;
}

/** A pose: root translation (3) and local rotations (4J, [x, y, z, w]). */
export interface ScriptPose {
  root: Float64Array;
  rotations: Float64Array;
}

const X = new Vector3(1, 0, 0);
const Y = new Vector3(0, 1, 0);
const Z = new Vector3(0, 0, 1);
const q = new Quaternion();
const q2 = new Quaternion();
const hipsQ = new Quaternion();
const hip = new Vector3();
const ankle = new Vector3();
const hinge = new Vector3();
const leg: LegSolution = { thighWorld: new Quaternion(), knee: new Quaternion() };
const TAU = 2 * Math.PI;

function put(out: Float64Array, j: number, r: Quaternion): void {
  if (j < 0) return;
  out[4 * j] = r.x;
  out[4 * j + 1] = r.y;
  out[4 * j + 2] = r.z;
  out[4 * j + 3] = r.w;
}

function axisAngle(axis: Vector3, angle: number): Quaternion {
  return new Quaternion().setFromAxisAngle(axis, angle);
}

/** Gait cycle position in [0, 1) at time t. */
export function gaitPhase(s: MotionScript, t: number): number {
  const cycles = integralAt(s.cadence, t);
  return cycles - Math.floor(cycles);
}

/** Writes the pose of `rig` at time t into `out`. */
export function poseAt(
  rig: RigInfo,
  s: MotionScript,
  t: number,
  path: RootPath,
  out: ScriptPose,
): ScriptPose {
  const st = s.style;
  const u = gaitPhase(s, t);
  const stepping = valueAt(s.stepping, t);
  const run = valueAt(s.run, t);
  const cadence = Math.max(valueAt(s.cadence, t), 1e-3);
  const speed = valueAt(s.speed, t);
  const heading = valueAt(s.heading, t);
  const duty = 0.6 - 0.22 * run;
  const stride = (speed * duty) / cadence;
  const legLength = rig.legs[0].thigh.length() + rig.legs[0].shin.length();
  const air = airborne(s.hops, t);

  // Hips: bob (lowest in double support when walking, at mid-stance when running), sway, roll.
  const walkDrop = (stride * stride) / (8 * legLength) + 0.012;
  const walkBob = walkDrop * (0.5 + 0.5 * Math.cos(2 * TAU * (u - 0.05)));
  const runBob = 0.045 * (0.5 + 0.5 * Math.cos(2 * TAU * (u - duty / 2)));
  let drop = stepping * ((1 - run) * walkBob + run * runBob) + valueAt(s.crouch, t);
  if (s.bounce && t > s.bounce.t0 && t < s.bounce.t1) {
    const b = s.bounce;
    const span = b.t1 - b.t0;
    const w = (t - b.t0) / span;
    const window = smootherstep(w / 0.15) * smootherstep((1 - w) / 0.15);
    // Phase of a linear chirp: 2π(f0·τ + (f1 − f0)τ²/(2·span)).
    const tau = t - b.t0;
    const phase = TAU * (b.f0 * tau + ((b.f1 - b.f0) * tau * tau) / (2 * span));
    drop += window * b.depth * (0.5 - 0.5 * Math.cos(phase));
  }
  const sway = st.sway * stepping * (1 - 0.6 * run) * Math.sin(TAU * (u - 0.05));
  const rootRest = rig.rest[rig.hips];
  const cosH = Math.cos(heading), sinH = Math.sin(heading); // prettier-ignore
  out.root[0] = path.x + cosH * sway;
  out.root[1] = rootRest.y - drop + hopOffset(s.hops, t);
  out.root[2] = path.z - sinH * sway;
  const pelvisYaw = 0.07 * stepping * Math.sin(TAU * u);
  const roll = st.roll * stepping * Math.sin(TAU * (u - 0.05));
  const lean = st.lean * speed + 0.9 * valueAt(s.crouch, t) + 0.15 * run;
  hipsQ.setFromAxisAngle(Y, heading + pelvisYaw);
  hipsQ.multiply(axisAngle(X, lean * 0.4)).multiply(axisAngle(Z, roll));
  put(out.rotations, rig.hips, hipsQ);

  // Legs: stance feet move back at the body's speed, swing feet arc forward.
  hinge.set(cosH, 0, -sinH);
  for (let side = 0; side < 2; side++) {
    const L = rig.legs[side];
    const phase = (u + 0.5 * side) % 1;
    let z: number;
    let lift = 0;
    if (phase < duty) z = stride / 2 - (stride * phase) / duty;
    else {
      const w = (phase - duty) / (1 - duty);
      z = -stride / 2 + stride * smootherstep(w);
      lift = st.footLift * stepping * Math.sin(Math.PI * w) ** 2;
    }
    const fx = L.ankleRest.x - rootRest.x;
    const fz = L.ankleRest.z - rootRest.z + z;
    ankle.set(path.x + cosH * fx + sinH * fz, L.ankleRest.y + lift, path.z - sinH * fx + cosH * fz);
    hip.copy(L.hipOffset).applyQuaternion(hipsQ);
    hip.x += out.root[0];
    hip.y += out.root[1];
    hip.z += out.root[2];
    solveLeg(L, hip, ankle, hinge, leg);
    put(out.rotations, L.upper, q.copy(hipsQ).invert().multiply(leg.thighWorld));
    put(out.rotations, L.lower, leg.knee);
    // Foot flat on the ground, toes pointed while airborne.
    q2.setFromAxisAngle(Y, heading).multiply(axisAngle(X, 0.6 * air));
    const shinWorld = q.copy(leg.thighWorld).multiply(leg.knee);
    put(out.rotations, L.end, shinWorld.invert().multiply(q2));
    put(out.rotations, L.tip, q.identity());
  }

  // Spine: lean, counter-twist against the pelvis, breathing; head steadies itself.
  const breath = valueAt(s.breath, t) * Math.sin(TAU * s.breathRate * t);
  const n = rig.spine.length;
  rig.spine.forEach((j, k) => {
    const bend = (lean * 0.6) / n - (k >= n - 2 ? 0.025 * breath : 0);
    q.setFromAxisAngle(Y, -pelvisYaw / n).multiply(axisAngle(X, bend)).multiply(axisAngle(Z, -roll / n)); // prettier-ignore
    put(out.rotations, j, q);
  });
  const look = valueAt(s.look, t);
  put(out.rotations, rig.neck, q.setFromAxisAngle(X, -lean * 0.35).multiply(axisAngle(Y, look * 0.4))); // prettier-ignore
  put(out.rotations, rig.head, q.setFromAxisAngle(X, -lean * 0.35 + 0.015 * breath).multiply(axisAngle(Y, look * 0.6))); // prettier-ignore
  put(out.rotations, rig.jaw, q.setFromAxisAngle(X, 0.04 + 0.04 * breath));

  // Arms swing against the legs; hops add a swing back and up; gestures raise and bend.
  const hopSwing = hopArmSwing(s.hops, t);
  for (let side = 0; side < 2; side++) {
    const A = rig.arms[side];
    const sign = side === 0 ? -1 : 1;
    const swing = sign * st.armSwing * (1 + 1.2 * run) * stepping * Math.cos(TAU * u);
    const raise = valueAt(side === 0 ? s.armRaise.l : s.armRaise.r, t);
    const moving = Math.min(1, stepping + 0.5);
    const elbow =
      0.2 + 0.25 * stepping + 1.2 * run + valueAt(side === 0 ? s.elbow.l : s.elbow.r, t);
    put(out.rotations, A.base, q.setFromAxisAngle(A.shrugAxis, 0.03 * breath + 0.1 * air));
    q.setFromAxisAngle(A.swingAxis, swing + raise + hopSwing).multiply(axisAngle(A.liftAxis, -st.armsDown * moving + 0.25 * air)); // prettier-ignore
    put(out.rotations, A.upper, q);
    put(out.rotations, A.lower, q.setFromAxisAngle(A.elbowAxis, elbow));
    put(out.rotations, A.end, q.setFromAxisAngle(A.elbowAxis, 0.15 + 0.1 * air));
  }
  return out;
}
