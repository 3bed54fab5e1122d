// A motion script: the smooth schedules a procedural clip is evaluated from (gait cadence and
// speed, heading, hops, crouch, arm gestures, breathing) plus the character's movement style.
import type { Hop } from './hops.js';
import type { Track } from './tracks.js';

/** How a character moves. */
export interface MotionStyle {
  /** Lateral hip sway towards the stance foot (m). */
  sway: number;
  /** Pelvis roll per step (rad). */
  roll: number;
  /** Arm swing per step (rad). */
  armSwing: number;
  /** Arms hang this much lower than the rest A-pose while moving (rad). */
  armsDown: number;
  /** Foot lift in swing (m). */
  footLift: number;
  /** Forward lean per m/s of speed (rad). */
  lean: number;
}

/** Knee bounce whose rate sweeps from f0 to f1 Hz (a chirp): excites a band of frequencies. */
export interface Bounce {
  t0: number;
  t1: number;
  f0: number;
  f1: number;
  /** Depth of each bounce (m). */
  depth: number;
}

/** Left/right pair of tracks. */
export interface Sides {
  l: Track;
  r: Track;
}

/** Everything a procedural clip is evaluated from. */
export interface MotionScript {
  /** File name stem (kebab-case). */
  id: string;
  title: string;
  description: string;
  fps: number;
  /** Length in seconds; the clip has duration × fps frames. */
  duration: number;
  style: MotionStyle;
  /** Gait cycles per second (two steps per cycle). */
  cadence: Track;
  /** Forward speed (m/s). */
  speed: Track;
  /** 0 standing still … 1 stepping. */
  stepping: Track;
  /** 0 walk … 1 run. */
  run: Track;
  /** Heading: yaw about +Y (rad; 0 faces +Z). */
  heading: Track;
  /** Extra lowering of the hips (m). */
  crouch: Track;
  hops: Hop[];
  bounce: Bounce | null;
  /** Shoulder flexion (arm raised forward, rad). */
  armRaise: Sides;
  /** Extra elbow flexion (rad). */
  elbow: Sides;
  /** Head yaw (rad). */
  look: Track;
  /** Breathing depth 0…1. */
  breath: Track;
  /** Breaths per second. */
  breathRate: number;
}
