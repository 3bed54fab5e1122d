// Invented test data: BVH text with mixed channel orders and seeded random motion.
import { seededRandom } from './random.js';

/** Joint spec: name, parent index, offset, channel names. */
const JOINTS: [string, number, [number, number, number], string[]][] = [
  [
    'Hips',
    -1,
    [0, 0.9, 0],
    ['Xposition', 'Yposition', 'Zposition', 'Zrotation', 'Xrotation', 'Yrotation'],
  ],
  ['Spine', 0, [0, 0.15, 0.01], ['Zrotation', 'Yrotation', 'Xrotation']],
  ['Head', 1, [0, 0.45, 0], ['Yrotation', 'Xrotation', 'Zrotation']],
  ['LeftArm', 1, [0.2, 0.35, 0], ['Xrotation', 'Yrotation', 'Zrotation']],
  [
    'LeftHand',
    3,
    [0.5, 0, 0],
    ['Xposition', 'Yposition', 'Zposition', 'Yrotation', 'Zrotation', 'Xrotation'],
  ],
  ['RightLeg', 0, [-0.1, -0.05, 0], ['Zrotation', 'Xrotation', 'Yrotation']],
];

/** BVH text with `frames` frames at `frameTime` seconds; angles up to `maxDeg` degrees. */
export function makeBvh(frames: number, frameTime: number, seed = 1, maxDeg = 120): string {
  const rand = seededRandom(seed);
  const lines: string[] = ['HIERARCHY'];
  const children = (p: number) => JOINTS.map((j, i) => [j, i] as const).filter(([j]) => j[1] === p);
  const emit = (i: number, depth: number) => {
    const [name, parent, offset, channels] = JOINTS[i];
    const pad = '  '.repeat(depth);
    lines.push(`${pad}${parent < 0 ? 'ROOT' : 'JOINT'} ${name}`, `${pad}{`);
    lines.push(`${pad}  OFFSET ${offset.join(' ')}`);
    lines.push(`${pad}  CHANNELS ${channels.length} ${channels.join(' ')}`);
    const kids = children(i);
    for (const [, k] of kids) emit(k, depth + 1);
    if (kids.length === 0)
      lines.push(`${pad}  End Site`, `${pad}  {`, `${pad}    OFFSET 0 0.1 0`, `${pad}  }`);
    lines.push(`${pad}}`);
  };
  emit(0, 0);
  lines.push('MOTION', `Frames: ${frames}`, `Frame Time: ${frameTime}`);
  // Channel values in hierarchy (depth-first) order, which is the order joints were emitted.
  const order: number[] = [];
  const walk = (i: number) => {
    order.push(i);
    for (const [, k] of children(i)) walk(k);
  };
  walk(0);
  for (let f = 0; f < frames; f++) {
    const row: string[] = [];
    for (const i of order) {
      for (const ch of JOINTS[i][3]) {
        const v = ch.endsWith('position') ? (rand() - 0.5) * 0.4 : (rand() * 2 - 1) * maxDeg;
        row.push(v.toFixed(4));
      }
    }
    lines.push(row.join(' '));
  }
  return lines.join('\n') + '\n';
}
