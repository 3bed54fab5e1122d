// The generated characters as the solver reads them: rig size, weights, regions, resolution,
// naming conventions, and skinning through every clip without broken weights.
import {
  clipFramePose,
  createPose,
  matchClipJoints,
  readCharacter,
  readClip,
  skinningMatrices,
  skinPositions,
  worldMatrices,
  type Character,
} from '@overshoot/solver';
import { beforeAll, describe, expect, it } from 'vitest';
import { fileBytes, manifest } from './helpers/sample-files.js';

const m = manifest();
const characters = new Map<string, Character>();

beforeAll(async () => {
  for (const c of m.characters) characters.set(c.key, await readCharacter(fileBytes(c.file)));
});

describe('generated characters', () => {
  it('have 20 to 60 joints and normalised weights on at most 4 joints', () => {
    for (const [key, ch] of characters) {
      const joints = ch.skeleton.names.length;
      expect(joints, key).toBeGreaterThanOrEqual(20);
      expect(joints, key).toBeLessThanOrEqual(60);
      expect(ch.skinWeights.length, key).toBe((4 * ch.restPositions.length) / 3);
      for (let i = 0; i < ch.skinWeights.length; i += 4) {
        const w = ch.skinWeights.subarray(i, i + 4);
        expect(Math.min(...w), key).toBeGreaterThanOrEqual(0);
        expect(Math.abs(w[0] + w[1] + w[2] + w[3] - 1), key).toBeLessThan(1e-6);
      }
    }
  });

  it('carry named soft-tissue regions, each covering vertices', () => {
    for (const c of m.characters) {
      const ch = characters.get(c.key)!;
      expect(ch.regions?.source, c.key).toBe('attribute');
      expect(ch.regions!.names, c.key).toEqual(c.regions);
      const counts = new Map<number, number>();
      ch.regions!.labels.forEach((l) => counts.set(l, (counts.get(l) ?? 0) + 1));
      c.regions.forEach((name, r) => expect(counts.get(r) ?? 0, `${c.key} ${name}`).toBeGreaterThan(10)); // prettier-ignore
      expect(c.regions).toContain('belly');
    }
  });

  it('differ in proportions and resolution; one is about 15,000 triangles', () => {
    const tris = m.characters.map((c) => c.triangles);
    expect(tris.some((t) => t >= 14_000 && t <= 16_000)).toBe(true);
    expect(new Set(tris).size).toBe(tris.length);
    const height = (ch: Character) => {
      let lo = Infinity, hi = -Infinity, wlo = Infinity, whi = -Infinity; // prettier-ignore
      for (let i = 0; i < ch.restPositions.length; i += 3) {
        lo = Math.min(lo, ch.restPositions[i + 1]);
        hi = Math.max(hi, ch.restPositions[i + 1]);
        wlo = Math.min(wlo, ch.restPositions[i + 2]);
        whi = Math.max(whi, ch.restPositions[i + 2]);
      }
      return { height: hi - lo, depth: whi - wlo };
    };
    const shapes = m.characters.map((c) => height(characters.get(c.key)!));
    // Stout, lanky, creature: depth-to-height ratios far apart.
    const ratios = shapes.map((s) => s.depth / s.height);
    expect(Math.max(...ratios) / Math.min(...ratios)).toBeGreaterThan(1.5);
  });

  it('use different joint naming conventions, so clips need mapping between rigs', () => {
    const names = [...characters.values()].map((ch) => new Set(ch.skeleton.names));
    for (let a = 0; a < names.length; a++) {
      for (let b = a + 1; b < names.length; b++) {
        const shared = [...names[a]].filter((n) => names[b].has(n));
        expect(shared.length).toBeLessThan(0.1 * Math.min(names[a].size, names[b].size));
      }
    }
    const all = [...characters.values()].flatMap((ch) => ch.skeleton.names);
    expect(all).toContain('LeftUpLeg');
    expect(all).toContain('thigh_l');
  });

  it('skin through every clip authored on them without broken weights', async () => {
    for (const c of m.clips) {
      const ch = characters.get(c.character)!;
      const clip = await readClip(fileBytes(c.glb), 'gltf');
      const jc = ch.skeleton.names.length;
      const map = matchClipJoints(clip, ch.skeleton, { requireAll: true });
      const pose = createPose(jc);
      const skin = new Float64Array(16 * jc);
      const out = new Float32Array(ch.restPositions.length);
      const p = ch.restPositions;
      const t = ch.triangles;
      let lo = Infinity;
      let hi = 0;
      for (let f = 0; f < clip.frameCount; f += 6) {
        clipFramePose(clip, f, ch.skeleton, map, pose);
        skinningMatrices(ch.skeleton, worldMatrices(ch.skeleton, pose, skin), skin);
        skinPositions(p, ch.skinJoints, ch.skinWeights, skin, out);
        for (let i = 0; i < t.length; i += 3) {
          for (let e = 0; e < 3; e++) {
            const a = 3 * t[i + e], b = 3 * t[i + ((e + 1) % 3)]; // prettier-ignore
            const rest = Math.hypot(p[a] - p[b], p[a + 1] - p[b + 1], p[a + 2] - p[b + 2]);
            const now = Math.hypot(out[a] - out[b], out[a + 1] - out[b + 1], out[a + 2] - out[b + 2]); // prettier-ignore
            lo = Math.min(lo, now / rest);
            hi = Math.max(hi, now / rest);
          }
        }
      }
      // Linear blend skinning folds armpits and knee backs; a vertex bound to a wrong bone
      // would stretch its edges many times over.
      expect(hi, c.key).toBeLessThan(3.5);
      expect(lo, c.key).toBeGreaterThan(0.08);
    }
  });
});
