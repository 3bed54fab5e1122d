// The generated files on disk: intact, small enough to commit, labelled as invented, accepted by
// the solver's inspector, and valid glTF (Khronos glTF validator, npm gltf-validator).
import { WebIO } from '@gltf-transform/core';
import { inspectFile } from '@overshoot/solver';
import { validateBytes } from 'gltf-validator';
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { fileBytes, manifest } from './helpers/sample-files.js';

const m = manifest();
const glbs = m.files.filter((f) => f.path.endsWith('.glb')).map((f) => f.path);
const bvhs = m.files.filter((f) => f.path.endsWith('.bvh')).map((f) => f.path);

describe('generated sample files', () => {
  it('are all present and match the manifest checksums', () => {
    for (const f of m.files) {
      const bytes = fileBytes(f.path);
      expect(bytes.length, f.path).toBe(f.bytes);
      expect(createHash('sha256').update(bytes).digest('hex'), f.path).toBe(f.sha256);
    }
  });

  it('total 30 MB or less, so they can be committed', () => {
    const total = m.files.reduce((s, f) => s + f.bytes, 0);
    expect(total).toBe(m.totalBytes);
    expect(total).toBeLessThanOrEqual(30e6);
  });

  it('include at least 3 characters, 5 clips at 24, 30 and 60 fps, and 2 captures', () => {
    expect(m.characters.length).toBeGreaterThanOrEqual(3);
    expect(m.clips.length).toBeGreaterThanOrEqual(5);
    expect(new Set(m.clips.map((c) => c.fps))).toEqual(new Set([24, 30, 60]));
    expect(m.captures.length).toBeGreaterThanOrEqual(2);
    expect(new Set(m.captures.map((c) => c.character)).size).toBe(1);
  });

  it('label every .glb as invented in extras.overshoot', async () => {
    const io = new WebIO();
    for (const path of glbs) {
      const label = (await io.readBinary(fileBytes(path))).getRoot().getExtras()['overshoot'];
      expect(label, path).toMatchObject({ invented: true, seed: m.seed });
      expect(String((label as { notice: string }).notice), path).toMatch(/invented/i);
    }
  });

  it('are accepted by the solver inspector with the kind, rate and length they claim', async () => {
    for (const c of m.characters) {
      const s = await inspectFile(fileBytes(c.file), c.file);
      expect(s, c.file).toMatchObject({ kind: 'character', triangleCount: c.triangles });
      expect(s.jointNames.length).toBe(c.joints);
      expect(s.warnings, c.file).toEqual([]);
    }
    for (const c of m.clips) {
      for (const path of [c.bvh, c.glb]) {
        const s = await inspectFile(fileBytes(path), path);
        expect(s, path).toMatchObject({ kind: 'clip', fps: c.fps, frameCount: c.frameCount });
        expect(s.warnings, path).toEqual([]);
      }
    }
    for (const c of m.captures) {
      const s = await inspectFile(fileBytes(c.file), c.file);
      expect(s, c.file).toMatchObject({ kind: 'capture', fps: 60, frameCount: c.frameCount });
      expect(s.frameCount / 60).toBeGreaterThanOrEqual(8);
      expect(s.frameCount / 60).toBeLessThanOrEqual(20);
      expect(s.jointNames.length).toBeGreaterThan(0);
      expect(s.warnings, c.file).toEqual([]);
    }
    expect(bvhs.length).toBe(m.clips.length);
  });

  // Khronos glTF validator: every .glb must report 0 errors.
  it('pass the Khronos glTF validator with no errors', async () => {
    for (const path of glbs) {
      const report = await validateBytes(fileBytes(path), { maxIssues: 20 });
      const errors = report.issues.messages.filter((x) => x.severity === 0);
      expect(
        errors.map((e) => `${e.code} ${e.pointer ?? ''} ${e.message}`),
        path,
      ).toEqual([]);
    }
  }, 60_000);
});
