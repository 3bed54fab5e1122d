// Bad input to retarget: typed errors with stable codes and locations, never a crash.
import { describe, expect, it } from 'vitest';
import { retarget, type TissueProfile } from '../../src/index.js';
import { bounceMotion, sampledClip } from '../helpers/known-clips.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';
import { fixture } from './fixtures.js';

const { character, profile } = fixture();
const clip = sampledClip(character, 30, 2, bounceMotion);
const code = (c: string, where: object = {}) =>
  expect.objectContaining({ code: c, where: expect.objectContaining(where) });

describe('retarget input errors', () => {
  it('rejects a profile whose basis does not fit its source mesh', () => {
    const broken: TissueProfile = { ...profile, basis: profile.basis.subarray(0, 30) };
    expect(() => retarget(broken, character, clip)).toThrow(
      code('PROFILE_MISMATCH', { item: 'basis' }),
    );
  });

  it('rejects a profile whose dynamics and drivers disagree', () => {
    const broken: TissueProfile = { ...profile, drivers: profile.drivers.slice(1) };
    expect(() => retarget(broken, character, clip)).toThrow(
      code('PROFILE_MISMATCH', { item: 'dynamics.m' }),
    );
  });

  it('rejects a NaN in the profile, the character or the clip with its location', () => {
    const a1 = profile.dynamics.a1.slice();
    a1[1] = Number.NaN;
    expect(() =>
      retarget({ ...profile, dynamics: { ...profile.dynamics, a1 } }, character, clip),
    ).toThrow(code('NON_FINITE_VALUE', { item: 'dynamics.a1' }));
    const rest = character.restPositions.slice();
    rest[3 * 5 + 1] = Number.NaN;
    expect(() => retarget(profile, { ...character, restPositions: rest }, clip)).toThrow(
      code('NON_FINITE_VALUE', { vertex: 5 }),
    );
    const rotations = clip.rotations.slice();
    const jc = clip.jointNames.length;
    rotations[4 * (7 * jc + 2)] = Number.NaN;
    expect(() => retarget(profile, character, { ...clip, rotations })).toThrow(
      code('NON_FINITE_VALUE', { frame: 7, joint: clip.jointNames[2] }),
    );
  });

  it('rejects a character whose joints the essential drivers cannot find', () => {
    const other = syntheticCharacter({ sides: 5 });
    const names = other.skeleton.names.map((n) =>
      n === 'chest' || n === 'spine' ? `${n}_renamed` : n,
    );
    const renamed = { ...other, skeleton: { ...other.skeleton, names } };
    const shot = { ...clip, jointNames: names };
    expect(() => retarget(profile, renamed, shot)).toThrow(code('UNMAPPED_DRIVER'));
    // A joint map fixes it.
    const ok = retarget(profile, renamed, shot, {
      jointMap: { chest: 'chest_renamed', spine: 'spine_renamed' },
    });
    expect(ok.drivers.unmapped).toEqual([]);
  });

  it('rejects a clip for another skeleton, and one shorter than the pre-roll', () => {
    expect(() =>
      retarget(profile, character, { ...clip, jointNames: clip.jointNames.map((n) => `x${n}`) }),
    ).toThrow(code('MISSING_JOINT'));
    const short = sampledClip(character, 30, 0.5, bounceMotion);
    expect(() => retarget(profile, character, short, { controls: { prerollSeconds: 1 } })).toThrow(
      code('CLIP_TOO_SHORT'),
    );
    expect(
      retarget(profile, character, short, { controls: { prerollSeconds: 0.25 } }).take.frameCount,
    ).toBe(16);
  });

  it('rejects a frame range outside the clip, an unknown region and bad controls', () => {
    expect(() => retarget(profile, character, clip, { frames: [10, 500] })).toThrow(
      code('BAD_FRAME_RANGE'),
    );
    expect(() =>
      retarget(profile, character, clip, { controls: { regionGains: { tail: 2 } } }),
    ).toThrow(code('UNKNOWN_REGION', { item: 'tail' }));
    expect(() => retarget(profile, character, clip, { controls: { soloModes: [7] } })).toThrow(
      code('BAD_CONTROL'),
    );
  });
});
