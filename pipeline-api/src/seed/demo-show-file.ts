// The invented demo show as assets-sample describes it (files/show/demo-show.json): people with
// demo-only passwords, the show, its characters, clips and captures (paths under files/), the
// profile to learn, shots, and review notes. Read and checked here; a file that does not fit says
// what is wrong and where.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/** Where assets-sample keeps its generated files (the same from src/ and dist/). */
export const DEMO_FILES_DIR = join(__dirname, '..', '..', '..', 'assets-sample', 'files');

/** The show file, relative to the files folder. */
export const DEMO_SHOW_FILE = join('show', 'demo-show.json');

/** A person of the demo, with a password meant for a local demo only. */
export interface DemoUser {
  email: string;
  displayName: string;
  /** Role as the product says it: admin, technical artist, animator, supervisor, producer. */
  role: string;
  demoPassword: string;
}

/** A rigged character file. */
export interface DemoCharacter {
  key: string;
  title: string;
  file: string;
}

/** A clip in both formats, for one character. */
export interface DemoClip {
  key: string;
  title: string;
  character: string;
  bvh: string;
  glb: string;
}

/** A capture with the consent record that goes with it. */
export interface DemoCapture {
  key: string;
  title: string;
  character: string;
  file: string;
  consent: { performer: string; scope: string; expiresInDays: number; recordedBy: string };
}

/** A shot; dates are days from the day of seeding. */
export interface DemoShot {
  sequence: string;
  code: string;
  frameStart: number;
  frameEnd: number;
  fps: number;
  character: string;
  clip: string;
  assignees: string[];
  dueInDays: number;
}

/** A review note on a shot's take. */
export interface DemoNote {
  shot: string;
  takeVersion: number;
  frame: number;
  author: string;
  text: string;
  state: 'open' | 'resolved';
}

/** The whole demo show. */
export interface DemoShow {
  show: { code: string; name: string; fps: number };
  passwordNotice: string;
  users: DemoUser[];
  members: string[];
  characters: DemoCharacter[];
  clips: DemoClip[];
  captures: DemoCapture[];
  profilesToLearn: { name: string; character: string; capture: string }[];
  shots: DemoShot[];
  notes: DemoNote[];
}

/** The demo file is missing a field, has one of the wrong type, or names something it lacks. */
export class DemoDataError extends Error {
  readonly code = 'DEMO_DATA_INVALID';

  constructor(
    message: string,
    readonly where: string,
  ) {
    super(`${DEMO_SHOW_FILE}, ${where}: ${message}`);
    this.name = 'DemoDataError';
  }
}

type Kind = 'string' | 'number' | 'array' | 'object';

/** Checks that `obj[key]` has the type; returns it. */
function field<T>(obj: unknown, key: string, kind: Kind, where: string): T {
  const value = (obj as Record<string, unknown> | null)?.[key];
  const ok =
    kind === 'array'
      ? Array.isArray(value)
      : kind === 'object'
        ? typeof value === 'object' && value !== null && !Array.isArray(value)
        : typeof value === kind && (kind !== 'number' || Number.isFinite(value));
  if (!ok)
    throw new DemoDataError(`"${key}" must be ${kind === 'array' ? 'an' : 'a'} ${kind}`, where);
  return value as T;
}

/** Checks every listed field of each item of an array field. */
function items<T>(obj: unknown, key: string, fields: Record<string, Kind>): T[] {
  return field<unknown[]>(obj, key, 'array', key).map((item, i) => {
    for (const [name, kind] of Object.entries(fields)) field(item, name, kind, `${key}[${i}]`);
    return item as T;
  });
}

/** Parses and checks the demo show (JSON text). */
export function parseDemoShow(text: string): DemoShow {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    throw new DemoDataError(`not JSON (${(e as Error).message})`, 'file');
  }
  const show = field<DemoShow['show']>(raw, 'show', 'object', 'show');
  field(show, 'code', 'string', 'show');
  field(show, 'name', 'string', 'show');
  return {
    show,
    passwordNotice: field(raw, 'passwordNotice', 'string', 'passwordNotice'),
    users: items(raw, 'users', {
      email: 'string',
      displayName: 'string',
      role: 'string',
      demoPassword: 'string',
    }),
    members: field(raw, 'members', 'array', 'members'),
    characters: items(raw, 'characters', { key: 'string', title: 'string', file: 'string' }),
    clips: items(raw, 'clips', {
      key: 'string',
      title: 'string',
      character: 'string',
      bvh: 'string',
    }),
    captures: items(raw, 'captures', {
      key: 'string',
      title: 'string',
      character: 'string',
      file: 'string',
      consent: 'object',
    }),
    profilesToLearn: items(raw, 'profilesToLearn', {
      name: 'string',
      character: 'string',
      capture: 'string',
    }),
    shots: items(raw, 'shots', {
      sequence: 'string',
      code: 'string',
      frameStart: 'number',
      frameEnd: 'number',
      fps: 'number',
      character: 'string',
      clip: 'string',
      assignees: 'array',
      dueInDays: 'number',
    }),
    notes: items(raw, 'notes', {
      shot: 'string',
      takeVersion: 'number',
      frame: 'number',
      author: 'string',
      text: 'string',
      state: 'string',
    }),
  };
}

/** Reads the demo show from the files folder. */
export function readDemoShow(filesDir = DEMO_FILES_DIR): DemoShow {
  const path = join(filesDir, DEMO_SHOW_FILE);
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    throw new DemoDataError(
      `cannot be read (${(e as Error).message}); run \`npm run generate -w @overshoot/assets-sample\``,
      'file',
    );
  }
  return parseDemoShow(text);
}

/** The item of `list` whose `key` field is `value`, or a DemoDataError naming `where`. */
export function byKey<T extends object>(list: T[], key: keyof T, value: string, where: string): T {
  const found = list.find((item) => item[key] === value);
  if (!found) throw new DemoDataError(`names "${value}", which the file does not define`, where);
  return found;
}
