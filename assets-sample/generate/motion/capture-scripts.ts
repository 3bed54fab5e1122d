// The two performances behind the synthetic captures of Coach Madge, at 60 fps (common practice
// for captures). They excite the tissue broadly, as real motion does: walking at a changing
// cadence, a jog, stops, hops and a hard landing, turns, and a knee bounce whose rate sweeps
// through the modes' frequencies. Each ends with time to settle.
import type { MotionScript } from './motion-script.js';
import { COACH_STYLE, makeScript } from './styles.js';
import { bump, rampTrack, track } from './tracks.js';

/** Capture 1: walk, jog, stop, two hops, turn and walk off (10 s). */
export const poolsideDrill: MotionScript = makeScript(
  {
    id: 'coach-poolside-drill',
    title: 'Coach runs the poolside drill',
    description:
      'Walks off with a quickening cadence, breaks into a jog, stops, hops twice, turns round and walks off.',
    fps: 60,
    duration: 10,
    style: COACH_STYLE,
  },
  {
    cadence: rampTrack(0.72, [
      [1.2, 2.8, 1.02],
      [2.9, 3.5, 1.3],
      [4.3, 5.0, 0.9],
      [8.3, 8.7, 0.8],
    ]),
    speed: rampTrack(0, [
      [0.6, 1.6, 0.7],
      [1.6, 2.8, 1.1],
      [2.9, 3.6, 1.9],
      [4.3, 5.2, 0],
      [9.1, 9.9, 0.8],
    ]),
    stepping: rampTrack(0, [
      [0.5, 1.2, 1],
      [4.9, 5.4, 0],
      [8.4, 8.8, 0.6],
      [9.1, 9.5, 1],
    ]),
    run: rampTrack(0, [
      [2.9, 3.4, 1],
      [4.2, 4.8, 0],
    ]),
    hops: [
      { takeoff: 6.0, flight: 0.3, crouch: 0.08, absorb: 0.15 },
      { takeoff: 7.6, flight: 0.4, crouch: 0.11, absorb: 0.19 },
    ],
    heading: rampTrack(0, [[8.5, 9.6, Math.PI]]),
    look: rampTrack(0, bump(8.3, 9.5, 0.5, 0.4)),
  },
);

/** Capture 2: marching whistle, a knee-bounce sweep, a big jump and a hard landing (8 s). */
export const whistleAndBounce: MotionScript = makeScript(
  {
    id: 'coach-whistle-and-bounce',
    title: 'Coach whistles, bounces and jumps',
    description:
      'Marches on the spot blowing a whistle, bounces at the knees faster and faster, then jumps and lands hard.',
    fps: 60,
    duration: 8,
    style: COACH_STYLE,
  },
  {
    cadence: track(1.0),
    stepping: rampTrack(0, bump(0.3, 2.0, 0.7, 0.4)),
    armRaise: { l: track(0), r: rampTrack(0, bump(0.5, 2.1, 1.35, 0.45)) },
    elbow: { l: track(0), r: rampTrack(0, bump(0.5, 2.1, 1.7, 0.45)) },
    look: rampTrack(0, bump(0.6, 2.0, -0.3, 0.4)),
    bounce: { t0: 2.2, t1: 5.2, f0: 1.2, f1: 3.6, depth: 0.05 },
    hops: [{ takeoff: 6.05, flight: 0.46, crouch: 0.13, absorb: 0.15 }],
    breath: track(0.8),
  },
);

/** Every capture performance. */
export const CAPTURE_SCRIPTS = [poolsideDrill, whistleAndBounce];
