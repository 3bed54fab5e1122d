// BVH motion import: HIERARCHY (joints, offsets, channels in any order) and MOTION (frames).
// Rotation channels compose in the order listed (intrinsic: q = q₁·q₂·q₃); position channels
// add to the joint's offset. End sites carry no motion and are not kept as joints.
import { SolverInputError } from '../errors.js';
import { quatFromAxisAngle, quatMakeContinuous, quatMultiply } from '../linalg/quat.js';
import type { Clip } from '../types.js';

/** Options for reading BVH. */
export interface ReadBvhOptions {
  /** Multiplies every length (BVH has no unit; 0.01 converts centimetres to metres). */
  unitScale?: number;
  /** Clip name. */
  name?: string;
}

/** Default BVH read options. */
export const READ_BVH_DEFAULTS: Required<ReadBvhOptions> = { unitScale: 1, name: 'clip' };

interface Token {
  text: string;
  line: number;
}

interface BvhJoint {
  name: string;
  /** Line of the joint's name, for errors. */
  line: number;
  parent: number;
  offset: [number, number, number];
  channels: string[];
}

const CHANNELS = new Set([
  'xposition',
  'yposition',
  'zposition',
  'xrotation',
  'yrotation',
  'zrotation',
]);

/** Parses BVH text into a clip (lengths × unitScale, in metres when scaled correctly). */
export function readBvh(text: string, options: ReadBvhOptions = {}): Clip {
  const opts = { ...READ_BVH_DEFAULTS, ...options };
  const lines = text.split(/\r?\n/);
  const motionLine = lines.findIndex((l) => /^\s*MOTION\b/i.test(l));
  if (motionLine < 0) throw syntax('no MOTION section', lines.length);
  const tokens = tokenize(lines.slice(0, motionLine));
  let pos = 0;
  const next = (): Token => {
    if (pos >= tokens.length) throw syntax('unexpected end of HIERARCHY', motionLine + 1);
    return tokens[pos++];
  };
  const expect = (word: string): Token => {
    const t = next();
    if (t.text.toUpperCase() !== word) throw syntax(`expected ${word}, found "${t.text}"`, t.line);
    return t;
  };
  const number = (): number => {
    const t = next();
    const v = Number(t.text);
    if (!Number.isFinite(v)) throw syntax(`expected a number, found "${t.text}"`, t.line);
    return v;
  };
  expect('HIERARCHY');
  const joints: BvhJoint[] = [];
  const readJoint = (parent: number): void => {
    const name = next();
    expect('{');
    expect('OFFSET');
    const offset: [number, number, number] = [number(), number(), number()];
    const index = joints.length;
    const joint: BvhJoint = { name: name.text, line: name.line, parent, offset, channels: [] };
    joints.push(joint);
    const head = expect('CHANNELS');
    const count = number();
    if (!Number.isInteger(count) || count < 0 || count > 6) {
      throw syntax(`bad channel count ${count}`, head.line);
    }
    for (let c = 0; c < count; c++) {
      const t = next();
      if (!CHANNELS.has(t.text.toLowerCase())) throw syntax(`unknown channel "${t.text}"`, t.line);
      joint.channels.push(t.text.toLowerCase());
    }
    for (;;) {
      const t = next();
      const word = t.text.toUpperCase();
      if (word === '}') return;
      if (word === 'JOINT') readJoint(index);
      else if (word === 'END') {
        expect('SITE');
        expect('{');
        expect('OFFSET');
        number();
        number();
        number();
        expect('}');
      } else throw syntax(`expected JOINT, End Site or }, found "${t.text}"`, t.line);
    }
  };
  while (pos < tokens.length) {
    expect('ROOT');
    readJoint(-1);
  }
  if (joints.length === 0) throw syntax('no ROOT joint', motionLine + 1);
  const names = new Set<string>();
  for (const j of joints) {
    if (names.has(j.name)) {
      throw new SolverInputError('BVH_SYNTAX', `line ${j.line}: duplicate joint "${j.name}"`, {
        joint: j.name,
        line: j.line,
      });
    }
    names.add(j.name);
  }
  return readMotion(lines, motionLine, joints, opts);
}

function readMotion(
  lines: string[],
  motionLine: number,
  joints: BvhJoint[],
  opts: Required<ReadBvhOptions>,
): Clip {
  let li = motionLine + 1;
  const nextLine = (): [string, number] => {
    while (li < lines.length && lines[li].trim() === '') li++;
    if (li >= lines.length) return ['', li + 1];
    return [lines[li].trim(), ++li];
  };
  const [framesText, framesLine] = nextLine();
  const fm = /^Frames:\s*(\S+)$/i.exec(framesText);
  if (!fm) throw syntax(`expected "Frames: N", found "${framesText}"`, framesLine);
  const frameCount = Number(fm[1]);
  if (!Number.isInteger(frameCount) || frameCount < 0) {
    throw syntax(`bad frame count "${fm[1]}"`, framesLine);
  }
  const [timeText, timeLine] = nextLine();
  const tm = /^Frame\s+Time:\s*(\S+)$/i.exec(timeText);
  if (!tm) throw syntax(`expected "Frame Time: seconds", found "${timeText}"`, timeLine);
  const frameTime = Number(tm[1]);
  if (!(frameTime > 0) || !Number.isFinite(frameTime)) {
    throw new SolverInputError('BAD_FPS', `frame time ${tm[1]} is not a positive number`, {
      line: timeLine,
    });
  }
  if (frameCount === 0)
    throw new SolverInputError('NO_FRAMES', 'the BVH has 0 frames', { line: framesLine });
  const jc = joints.length;
  const s = opts.unitScale;
  const channelCount = joints.reduce((n, j) => n + j.channels.length, 0);
  const rotations = new Float32Array(4 * jc * frameCount);
  const translations = new Float32Array(3 * jc * frameCount);
  const translationAnimated = new Uint8Array(jc);
  joints.forEach((j, k) => {
    if (j.channels.some((c) => c.endsWith('position'))) translationAnimated[k] = 1;
  });
  const q = new Float64Array(4);
  const axis = new Float64Array(4);
  for (let f = 0; f < frameCount; f++) {
    const [row, line] = nextLine();
    if (row === '') {
      throw new SolverInputError(
        'TRUNCATED_FILE',
        `the BVH declares ${frameCount} frames but ends after ${f}`,
        { frame: f, line },
      );
    }
    const values = row.split(/\s+/);
    if (values.length !== channelCount) {
      throw new SolverInputError(
        'BVH_CHANNEL_COUNT',
        `frame ${f} has ${values.length} values; the hierarchy declares ${channelCount} channels`,
        { frame: f, line },
      );
    }
    let v = 0;
    for (let k = 0; k < jc; k++) {
      const joint = joints[k];
      const to = 3 * (f * jc + k);
      translations[to] = joint.offset[0] * s;
      translations[to + 1] = joint.offset[1] * s;
      translations[to + 2] = joint.offset[2] * s;
      q[0] = 0;
      q[1] = 0;
      q[2] = 0;
      q[3] = 1;
      for (const ch of joint.channels) {
        const x = Number(values[v++]);
        if (!Number.isFinite(x)) {
          throw new SolverInputError(
            'NON_FINITE_VALUE',
            `frame ${f}: "${values[v - 1]}" is not a number`,
            {
              frame: f,
              line,
              joint: joint.name,
            },
          );
        }
        const ax = ch.charCodeAt(0) - 120; // 'x' → 0, 'y' → 1, 'z' → 2
        if (ch.endsWith('position')) translations[to + ax] += x * s;
        else {
          quatFromAxisAngle(
            axis,
            0,
            ax === 0 ? 1 : 0,
            ax === 1 ? 1 : 0,
            ax === 2 ? 1 : 0,
            (x * Math.PI) / 180,
          );
          quatMultiply(q, 0, q, 0, axis, 0);
        }
      }
      rotations.set(q, 4 * (f * jc + k));
    }
  }
  const warnings: string[] = [];
  // Extra rows are ignored rather than rejected: the header's frame count is authoritative.
  if (nextLine()[0] !== '')
    warnings.push(`rows after the ${frameCount} declared frames were ignored`);
  for (let k = 0; k < jc; k++) quatMakeContinuous(rotations, frameCount, 4 * jc, 4 * k);
  const offsets = new Float64Array(3 * jc);
  joints.forEach((j, k) =>
    offsets.set(
      j.offset.map((x) => x * s),
      3 * k,
    ),
  );
  const fps = snapFps(1 / frameTime);
  checkBvhUnits(offsets, warnings);
  return {
    name: opts.name,
    fps,
    frameCount,
    jointNames: joints.map((j) => j.name),
    parents: Int32Array.from(joints.map((j) => j.parent)),
    offsets,
    rotations,
    translations,
    translationAnimated,
    warnings,
  };
}

/** Rounds a rate to the nearest integer when within 0.1 % (frame times are printed rounded). */
export function snapFps(fps: number): number {
  const r = Math.round(fps);
  return r > 0 && Math.abs(fps - r) <= 1e-3 * r ? r : fps;
}

function checkBvhUnits(offsets: Float64Array, warnings: string[]): void {
  let longest = 0;
  for (let i = 0; i < offsets.length; i += 3) {
    longest = Math.max(longest, Math.hypot(offsets[i], offsets[i + 1], offsets[i + 2]));
  }
  if (longest > 3) {
    warnings.push(
      `a bone is ${longest.toFixed(1)} units long; lengths look like centimetres (use unitScale 0.01)`,
    );
  }
}

function tokenize(lines: string[]): Token[] {
  const out: Token[] = [];
  lines.forEach((l, i) => {
    for (const text of l.trim().split(/\s+/)) if (text) out.push({ text, line: i + 1 });
  });
  return out;
}

function syntax(message: string, line: number): SolverInputError {
  return new SolverInputError('BVH_SYNTAX', `line ${line}: ${message}`, { line });
}
