// The demo clips of the invented short: each is authored on one character's skeleton (its
// joint names) at the rate an animator would use (24 and 30 fps for film, 60 fps for a fast jump).
import type { MotionScript } from './motion-script.js';
import { COACH_STYLE, CREATURE_STYLE, SWIMMER_STYLE, makeScript } from './styles.js';
import { bump, rampTrack, track } from './tracks.js';

/** Coach Madge sets off along the pool deck and walks at an easy pace. */
export const coachWalk: MotionScript = makeScript(
  {
    id: 'coach-walk',
    title: 'Coach walks the pool deck',
    description: 'Starts from standing, walks at about 0.9 m/s with a heavy rolling gait.',
    fps: 30,
    duration: 6,
    style: COACH_STYLE,
  },
  {
    cadence: track(0.85),
    speed: rampTrack(0, [[0.4, 1.6, 0.9]]),
    stepping: rampTrack(0, [[0.3, 1.2, 1]]),
  },
);

/** Coach Madge jumps to touch the diving-board flag and lands heavily. */
export const coachJump: MotionScript = makeScript(
  {
    id: 'coach-jump-and-land',
    title: 'Coach jumps and lands',
    description: 'Crouch, a 0.42 s jump with arm swing, a hard landing, then a small second hop.',
    fps: 60,
    duration: 4,
    style: COACH_STYLE,
  },
  {
    hops: [
      { takeoff: 1.0, flight: 0.42, crouch: 0.12, absorb: 0.17 },
      { takeoff: 2.95, flight: 0.22, crouch: 0.06, absorb: 0.12 },
    ],
    breath: track(0.8),
  },
);

/** Otto runs the length of the pool. */
export const swimmerRun: MotionScript = makeScript(
  {
    id: 'swimmer-run',
    title: 'Swimmer runs along the pool',
    description: 'From a jog into a run at about 3 m/s, long loose strides.',
    fps: 24,
    duration: 4,
    style: SWIMMER_STYLE,
  },
  {
    cadence: rampTrack(1.15, [[0.2, 1.2, 1.4]]),
    speed: rampTrack(1.8, [[0.2, 1.4, 3.0]]),
    stepping: track(1),
    run: rampTrack(0.6, [[0.2, 1.0, 1]]),
  },
);

/** Otto walks, stops at the pool edge, turns round and walks back. */
export const swimmerStopTurn: MotionScript = makeScript(
  {
    id: 'swimmer-stop-and-turn',
    title: 'Swimmer stops and turns',
    description: 'Walks at 1.3 m/s, stops at the edge, turns 180° on the spot and walks back.',
    fps: 30,
    duration: 6,
    style: SWIMMER_STYLE,
  },
  {
    cadence: track(0.95),
    speed: rampTrack(1.3, [
      [1.9, 2.8, 0],
      [3.8, 4.8, 1.2],
    ]),
    stepping: rampTrack(1, [
      [2.6, 3.0, 0.45],
      [3.6, 4.0, 1],
    ]),
    heading: rampTrack(0, [[2.7, 3.9, Math.PI]]),
    look: rampTrack(0, bump(2.3, 3.6, 0.5, 0.4)),
  },
);

/** Old Grumbletusk dozes on the sun terrace, breathing deeply. */
export const creatureIdle: MotionScript = makeScript(
  {
    id: 'creature-idle-breathing',
    title: 'Creature breathes on the terrace',
    description: 'Standing idle: deep slow breaths, a glance around, a flipper pat on the belly.',
    fps: 24,
    duration: 8,
    style: CREATURE_STYLE,
  },
  {
    breath: track(1),
    breathRate: 0.22,
    look: rampTrack(0, [
      [1.5, 2.5, 0.6],
      [4.0, 5.2, -0.4],
      [6.2, 7.2, 0],
    ]),
    armRaise: { l: rampTrack(0, bump(3.0, 5.5, 0.5, 0.6)), r: track(0) },
    elbow: { l: rampTrack(0, bump(3.0, 5.5, 0.6, 0.6)), r: track(0) },
    crouch: rampTrack(0, bump(5.6, 7.6, 0.03, 0.8)),
  },
);

/** Old Grumbletusk waddles to the water. */
export const creatureWaddle: MotionScript = makeScript(
  {
    id: 'creature-waddle',
    title: 'Creature waddles to the water',
    description: 'A slow side-to-side waddle at about 0.45 m/s with flippers paddling.',
    fps: 30,
    duration: 6,
    style: CREATURE_STYLE,
  },
  {
    cadence: track(0.8),
    speed: rampTrack(0, [[0.3, 1.4, 0.45]]),
    stepping: rampTrack(0, [[0.2, 1.0, 1]]),
    breath: track(0.7),
  },
);

/** Every demo clip (capture clips are listed with the captures). */
export const CLIP_SCRIPTS = [coachWalk, coachJump, swimmerRun, swimmerStopTurn, creatureIdle, creatureWaddle]; // prettier-ignore
