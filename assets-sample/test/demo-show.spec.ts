// The demo show seed: users for every role on a reserved domain with demo-only passwords, shots
// that reference real files and fit their clips, some late, and notes on existing shots.
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { FILES_DIR, manifest } from './helpers/sample-files.js';

interface Seed {
  invented: boolean;
  show: { code: string; name: string; fps: number };
  users: { email: string; displayName: string; role: string; demoPassword: string }[];
  members: string[];
  characters: { key: string; file: string }[];
  clips: { key: string; character: string; fps: number; frameCount: number; bvh: string; glb: string }[]; // prettier-ignore
  captures: { key: string; file: string; groundTruth: string; consent: { performer: string; expiresInDays: number } }[]; // prettier-ignore
  shots: { sequence: string; code: string; frameStart: number; frameEnd: number; fps: number; character: string; clip: string; assignees: string[]; dueInDays: number }[]; // prettier-ignore
  notes: { shot: string; frame: number; author: string; text: string; state: string }[];
}

const seed = JSON.parse(readFileSync(join(FILES_DIR, 'show', 'demo-show.json'), 'utf8')) as Seed;

describe('demo show seed', () => {
  it('says it is invented and names the show', () => {
    expect(seed.invented).toBe(true);
    expect(seed.show).toMatchObject({ code: 'SML', fps: 24 });
  });

  it('has a user for every role, on the reserved example.test domain, all members', () => {
    const roles = new Set(seed.users.map((u) => u.role));
    for (const role of ['admin', 'technical artist', 'animator', 'supervisor', 'producer']) {
      expect(roles.has(role), role).toBe(true);
    }
    for (const u of seed.users) {
      expect(u.email).toMatch(/^[a-z.]+@example\.test$/);
      expect(u.demoPassword).toMatch(/^demo-only-/);
      expect(seed.members).toContain(u.email);
    }
    expect(new Set(seed.users.map((u) => u.email)).size).toBe(seed.users.length);
  });

  it('points at files that exist and match the manifest', () => {
    const m = manifest();
    const paths = [
      ...seed.characters.map((c) => c.file),
      ...seed.clips.flatMap((c) => [c.bvh, c.glb]),
      ...seed.captures.flatMap((c) => [c.file, c.groundTruth]),
    ];
    for (const p of paths) expect(existsSync(join(FILES_DIR, p)), p).toBe(true);
    expect(seed.clips.map((c) => c.key).sort()).toEqual(m.clips.map((c) => c.key).sort());
    for (const c of seed.captures) expect(c.consent.performer).toMatch(/no real person/);
  });

  it('has shots whose character, clip and frame range fit, with assignees and some late', () => {
    const users = new Set(seed.users.map((u) => u.email));
    for (const s of seed.shots) {
      const clip = seed.clips.find((c) => c.key === s.clip)!;
      expect(clip, s.code).toBeDefined();
      expect(clip.character, s.code).toBe(s.character);
      expect(s.code.startsWith(s.sequence), s.code).toBe(true);
      const seconds = (s.frameEnd - s.frameStart) / s.fps;
      expect(seconds, s.code).toBeLessThanOrEqual((clip.frameCount - 1) / clip.fps + 1e-9);
      expect(s.assignees.length, s.code).toBeGreaterThan(0);
      for (const a of s.assignees) expect(users.has(a), a).toBe(true);
    }
    expect(seed.shots.some((s) => s.dueInDays < 0)).toBe(true);
    expect(seed.shots.some((s) => s.dueInDays > 0)).toBe(true);
  });

  it('has notes on existing shots, inside their frame ranges, by show members', () => {
    expect(seed.notes.length).toBeGreaterThanOrEqual(3);
    for (const n of seed.notes) {
      const shot = seed.shots.find((s) => s.code === n.shot)!;
      expect(shot, n.shot).toBeDefined();
      expect(n.frame).toBeGreaterThanOrEqual(shot.frameStart);
      expect(n.frame).toBeLessThanOrEqual(shot.frameEnd);
      expect(seed.members).toContain(n.author);
      expect(['open', 'resolved']).toContain(n.state);
    }
  });
});
