// The demo show seed the API's seeder loads: the invented show, one user per role (plus a second
// animator), its assets, shots with frame ranges, assignees and due dates (some already late), and
// a few review notes. Dates are days relative to the day of seeding, so "late" stays late.
import type { AssetIndex } from '../asset-index.js';
import { GENERATOR, SCENARIO } from '../scenario.js';

/** Domain reserved for examples and tests (RFC 2606 reserves .test). */
const DOMAIN = 'example.test';

interface UserSeed {
  email: string;
  displayName: string;
  role: 'admin' | 'technical artist' | 'animator' | 'supervisor' | 'producer';
  demoPassword: string;
}

function user(first: string, last: string, role: UserSeed['role']): UserSeed {
  const handle = `${first}.${last}`.toLowerCase().replace(/[^a-z.]/g, '');
  return {
    email: `${handle}@${DOMAIN}`,
    displayName: `${first} ${last}`,
    role,
    demoPassword: `demo-only-${handle.split('.')[0]}-lido`,
  };
}

const USERS = {
  admin: user('Rowan', 'Ashgrove', 'admin'),
  ta: user('Tamsin', 'Okafor-Vale', 'technical artist'),
  animator: user('Felix', 'Marchbank', 'animator'),
  animator2: user('Ines', 'Cardew', 'animator'),
  supervisor: user('Greta', 'Holloway', 'supervisor'),
  producer: user('Osric', 'Pennywhistle', 'producer'),
};

interface ShotPlan {
  sequence: string;
  code: string;
  description: string;
  character: string;
  clip: string;
  frames: number;
  assignees: UserSeed[];
  dueInDays: number;
}

const SEQUENCES = [
  { code: 'SQ010', title: 'Arrival at the lido' },
  { code: 'SQ020', title: 'Morning drill' },
  { code: 'SQ030', title: 'The gala warm-up' },
];

const { ta, animator, animator2, supervisor } = USERS;
const SHOTS: ShotPlan[] = [
  { sequence: 'SQ010', code: 'SQ010_0010', description: 'Coach Madge strides along the pool deck.', character: 'coach-madge', clip: 'coach-walk', frames: 120, assignees: [animator, ta], dueInDays: -3 }, // prettier-ignore
  { sequence: 'SQ010', code: 'SQ010_0020', description: 'Grumbletusk waddles towards the water.', character: 'creature-grumbletusk', clip: 'creature-waddle', frames: 120, assignees: [animator2], dueInDays: 5 }, // prettier-ignore
  { sequence: 'SQ010', code: 'SQ010_0030', description: 'Grumbletusk dozes on the sun terrace.', character: 'creature-grumbletusk', clip: 'creature-idle-breathing', frames: 168, assignees: [animator2, ta], dueInDays: 12 }, // prettier-ignore
  { sequence: 'SQ020', code: 'SQ020_0010', description: 'Coach jumps to tap the diving-board flag.', character: 'coach-madge', clip: 'coach-jump-and-land', frames: 90, assignees: [animator], dueInDays: -1 }, // prettier-ignore
  { sequence: 'SQ020', code: 'SQ020_0020', description: 'Otto sprints the length of the pool.', character: 'swimmer-otto', clip: 'swimmer-run', frames: 90, assignees: [animator2], dueInDays: 7 }, // prettier-ignore
  { sequence: 'SQ020', code: 'SQ020_0030', description: 'Otto stops at the edge and turns back.', character: 'swimmer-otto', clip: 'swimmer-stop-and-turn', frames: 136, assignees: [animator, ta], dueInDays: 10 }, // prettier-ignore
  { sequence: 'SQ030', code: 'SQ030_0010', description: 'Coach runs the whole poolside drill.', character: 'coach-madge', clip: 'coach-poolside-drill', frames: 216, assignees: [animator], dueInDays: 14 }, // prettier-ignore
  { sequence: 'SQ030', code: 'SQ030_0020', description: 'Coach whistles, bounces and lands a big jump.', character: 'coach-madge', clip: 'coach-whistle-and-bounce', frames: 180, assignees: [animator2, ta], dueInDays: 21 }, // prettier-ignore
];

/** First frame of every shot (common practice in film pipelines). */
const FIRST_FRAME = 1001;

/** Builds the demo show seed for the generated assets. */
export function demoShow(index: AssetIndex, seed: number): object {
  const shots = SHOTS.map((s) => {
    const clip = index.clips.find((c) => c.key === s.clip);
    if (!clip) throw new Error(`shot ${s.code}: no clip ${s.clip}`);
    // The frame range fits in the clip once resampled to the show's 24 fps (shortened clips of
    // the small test variant shorten the shot).
    const available = Math.floor(((clip.frameCount - 1) / clip.fps) * 24) + 1;
    const frames = Math.min(s.frames, available);
    return {
      sequence: s.sequence,
      code: s.code,
      description: s.description,
      frameStart: FIRST_FRAME,
      frameEnd: FIRST_FRAME + frames - 1,
      fps: 24,
      character: s.character,
      clip: s.clip,
      assignees: s.assignees.map((u) => u.email),
      dueInDays: s.dueInDays,
    };
  });
  return {
    invented: true,
    notice:
      'Invented demo data: the studio, show, people, e-mail addresses and assets are made up. Passwords are for a local demo only.',
    generator: GENERATOR,
    seed,
    studio: SCENARIO.studio,
    show: {
      code: SCENARIO.showCode,
      name: SCENARIO.show,
      description: SCENARIO.logline,
      fps: 24,
    },
    passwordNotice:
      'demoPassword values are DEMO-ONLY: for a local demo install, never for real accounts.',
    users: Object.values(USERS),
    members: Object.values(USERS).map((u) => u.email),
    sequences: SEQUENCES,
    characters: index.characters.map((c) => ({ key: c.key, title: c.title, description: c.description, file: c.file, regions: c.regions, namingConvention: c.namingConvention })), // prettier-ignore
    clips: index.clips.map((c) => ({ key: c.key, title: c.title, character: c.character, fps: c.fps, frameCount: c.frameCount, bvh: c.bvh, glb: c.glb })), // prettier-ignore
    captures: index.captures.map((c) => ({
      key: c.key,
      title: c.title,
      character: c.character,
      clip: c.clip,
      file: c.file,
      groundTruth: c.groundTruth,
      consent: {
        performer: 'none: synthetic capture generated procedurally, no real person',
        scope: 'Overshoot demo and automated tests',
        expiresInDays: 3650,
        recordedBy: ta.email,
      },
    })),
    profilesToLearn: index.captures.slice(0, 1).map((c) => ({ name: `${c.title} profile`, character: c.character, capture: c.key })), // prettier-ignore
    shots,
    notes: [
      { shot: 'SQ010_0010', takeVersion: 1, frame: 1042, author: supervisor.email, text: 'Belly settles too slowly after each heel strike; try damping 1.3.', state: 'open' }, // prettier-ignore
      { shot: 'SQ020_0010', takeVersion: 1, frame: 1031, author: supervisor.email, text: 'Landing reads well. A touch more gain on the cheeks, please.', state: 'open' }, // prettier-ignore
      { shot: 'SQ010_0020', takeVersion: 1, frame: 1050, author: supervisor.email, text: 'Neck fold wobble is lovely; keep it.', state: 'resolved' }, // prettier-ignore
      { shot: 'SQ020_0010', takeVersion: 1, frame: 1012, author: USERS.animator.email, text: 'Pre-roll of 1 s removes the pop on frame 1001.', state: 'open' }, // prettier-ignore
    ],
  };
}
