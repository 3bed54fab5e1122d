// BVH text from a clip: HIERARCHY with the clip's bone offsets, MOTION with the root's position
// relative to its rest offset and every joint's rotation as Z, X, Y Euler angles in degrees
// (channels listed in that order compose intrinsically, R = Rz·Rx·Ry). Lengths are in metres, the
// clip's own unit.
import type { Clip } from '@overshoot/solver';
import { Euler, Quaternion } from 'three';

/** Options for writing BVH. */
export interface WriteBvhOptions {
  /** End Site offset (metres) per leaf joint name; leaves without one get a short bone up. */
  endSites?: Record<string, [number, number, number]>;
  /** Decimal places of every number. */
  decimals?: number;
}

/** Default BVH write options. */
export const WRITE_BVH_DEFAULTS: Required<WriteBvhOptions> = { endSites: {}, decimals: 6 };

function num(v: number, decimals: number): string {
  const s = v.toFixed(decimals);
  // No "-0.000000": a value that rounds to zero is written as zero.
  return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}

/** Serialises a clip as BVH text. */
export function writeBvh(clip: Clip, options: WriteBvhOptions = {}): string {
  const opts = { ...WRITE_BVH_DEFAULTS, ...options };
  const jc = clip.jointNames.length;
  const children: number[][] = Array.from({ length: jc }, () => []);
  clip.parents.forEach((p, j) => {
    if (p >= 0) children[p].push(j);
  });
  const order: number[] = [];
  const lines = ['HIERARCHY'];
  const fmt = (v: number) => num(v, opts.decimals);
  const emit = (j: number, depth: number) => {
    order.push(j);
    const pad = '  '.repeat(depth);
    const root = clip.parents[j] < 0;
    const o = clip.offsets;
    lines.push(`${pad}${root ? 'ROOT' : 'JOINT'} ${clip.jointNames[j]}`, `${pad}{`);
    lines.push(`${pad}  OFFSET ${fmt(o[3 * j])} ${fmt(o[3 * j + 1])} ${fmt(o[3 * j + 2])}`);
    lines.push(
      root
        ? `${pad}  CHANNELS 6 Xposition Yposition Zposition Zrotation Xrotation Yrotation`
        : `${pad}  CHANNELS 3 Zrotation Xrotation Yrotation`,
    );
    for (const c of children[j]) emit(c, depth + 1);
    if (children[j].length === 0) {
      const end = opts.endSites[clip.jointNames[j]] ?? [0, 0.05, 0];
      lines.push(`${pad}  End Site`, `${pad}  {`, `${pad}    OFFSET ${end.map(fmt).join(' ')}`, `${pad}  }`); // prettier-ignore
    }
    lines.push(`${pad}}`);
  };
  clip.parents.forEach((p, j) => {
    if (p < 0) emit(j, 0);
  });
  lines.push('MOTION', `Frames: ${clip.frameCount}`, `Frame Time: ${(1 / clip.fps).toFixed(9)}`);
  const q = new Quaternion();
  const e = new Euler();
  const deg = 180 / Math.PI;
  for (let f = 0; f < clip.frameCount; f++) {
    const row: string[] = [];
    for (const j of order) {
      const k = f * jc + j;
      if (clip.parents[j] < 0) {
        // Position channels add to the OFFSET, which holds the root's rest position.
        const t = clip.translations;
        const o = clip.offsets;
        row.push(fmt(t[3 * k] - o[3 * j]), fmt(t[3 * k + 1] - o[3 * j + 1]), fmt(t[3 * k + 2] - o[3 * j + 2])); // prettier-ignore
      }
      const r = clip.rotations;
      q.set(r[4 * k], r[4 * k + 1], r[4 * k + 2], r[4 * k + 3]).normalize();
      e.setFromQuaternion(q, 'ZXY');
      row.push(fmt(e.z * deg), fmt(e.x * deg), fmt(e.y * deg));
    }
    lines.push(row.join(' '));
  }
  return lines.join('\n') + '\n';
}
