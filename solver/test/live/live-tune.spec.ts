// Live tuning runs in the browser: its modules import nothing from Node or heavy libraries, and
// it reuses its buffers from call to call.
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { createLiveTuner, rescaleRegionGains, retarget, vertexGainField } from '../../src/index.js';
import { landingMotion, sampledClip } from '../helpers/known-clips.js';
import { fixture } from '../retarget/fixtures.js';

const SRC = resolve(dirname(fileURLToPath(import.meta.url)), '../../src');

/** Every module reachable from `entry` by relative imports, and every bare import they make. */
function importGraph(entry: string): { files: string[]; bare: string[] } {
  const files = new Set<string>();
  const bare = new Set<string>();
  const visit = (file: string) => {
    if (files.has(file)) return;
    files.add(file);
    const text = readFileSync(file, 'utf8');
    for (const m of text.matchAll(/^\s*(?:import|export)[^'"]*from\s+'([^']+)'/gm)) {
      const spec = m[1];
      if (spec.startsWith('.')) visit(resolve(dirname(file), spec.replace(/\.js$/, '.ts')));
      else if (!/^import\s+type\b/.test(m[0].trim())) bare.add(spec);
    }
  };
  visit(resolve(SRC, entry));
  return { files: [...files], bare: [...bare] };
}

describe('live tuning', () => {
  it('imports only browser-safe code', () => {
    for (const entry of [
      'live/live-tune.ts',
      'live/region-rescale.ts',
      'retarget/region-gains.ts',
      'io/take-extras.ts',
    ]) {
      const { files, bare } = importGraph(entry);
      if (entry === 'live/live-tune.ts') expect(files.length).toBeGreaterThan(3); // the walk follows imports
      expect(bare).toEqual([]);
    }
  });

  it('writes every call into the same buffers', () => {
    const { character, profile } = fixture();
    const { take } = retarget(
      profile,
      character,
      sampledClip(character, 60, 2, landingMotion(0.3)),
    );
    const tuner = createLiveTuner(take.live, take.basis);
    const first = tuner.tune({ ...take.controls, stiffness: 1.5 });
    const snapshot = first.slice();
    const second = tuner.tune({ ...take.controls, stiffness: 0.7 });
    expect(second).toBe(first);
    expect(Array.from(second)).not.toEqual(Array.from(snapshot));
  });

  it('rescales the morph targets to new region gains as a re-bake would', () => {
    const { character, profile } = fixture();
    const clip = sampledClip(character, 60, 2, landingMotion(0.3));
    const before = retarget(profile, character, clip, {
      controls: { regionGains: { chest: 2 } },
    }).take;
    const after = retarget(profile, character, clip, {
      controls: { regionGains: { chest: 0.5, spine: 3 } },
    }).take;
    const out = new Float32Array(before.basis.length);
    const lost = rescaleRegionGains(
      before.basis,
      before.vertexGains,
      vertexGainField(character, { chest: 0.5, spine: 3 }),
      out,
    );
    expect(lost).toBe(0);
    out.forEach((v, i) => expect(v).toBeCloseTo(after.basis[i], 6));
  });
});
