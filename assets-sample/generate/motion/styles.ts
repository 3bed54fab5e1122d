// Movement styles of the three characters, and defaults for building motion scripts.
import type { MotionScript, MotionStyle } from './motion-script.js';
import { track } from './tracks.js';

/** Heavy, rolling gait of the stout coach. */
export const COACH_STYLE: MotionStyle = {
  sway: 0.035,
  roll: 0.06,
  armSwing: 0.3,
  armsDown: 0.35,
  footLift: 0.08,
  lean: 0.04,
};

/** Long, loose strides of the lanky swimmer. */
export const SWIMMER_STYLE: MotionStyle = {
  sway: 0.015,
  roll: 0.045,
  armSwing: 0.45,
  armsDown: 0.55,
  footLift: 0.11,
  lean: 0.06,
};

/** Side-to-side waddle of the walrus-like creature. */
export const CREATURE_STYLE: MotionStyle = {
  sway: 0.06,
  roll: 0.12,
  armSwing: 0.25,
  armsDown: 0.15,
  footLift: 0.05,
  lean: 0.02,
};

/** The fields a script must set; everything else defaults to standing still and breathing. */
export type ScriptCore = Pick<MotionScript, 'id' | 'title' | 'description' | 'fps' | 'duration' | 'style'>; // prettier-ignore

/** A complete script from its core and the fields that differ from standing still. */
export function makeScript(core: ScriptCore, parts: Partial<MotionScript> = {}): MotionScript {
  return {
    cadence: track(0.9),
    speed: track(0),
    stepping: track(0),
    run: track(0),
    heading: track(0),
    crouch: track(0),
    hops: [],
    bounce: null,
    armRaise: { l: track(0), r: track(0) },
    elbow: { l: track(0), r: track(0) },
    look: track(0),
    breath: track(0.5),
    breathRate: 0.28,
    ...core,
    ...parts,
  };
}
