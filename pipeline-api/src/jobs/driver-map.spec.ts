import { describe, expect, it } from 'vitest';
import { DRIVER_MAP_DEFAULTS } from '@overshoot/solver';
import { badJointMapEntries, mapProfileDrivers } from './driver-map';
import type { TissueProfile } from '../library/entities/tissue-profile.entity';

const profile = {
  sourceJoints: ['Hips', 'Spine', 'LeftArm', 'RightArm', 'Head'],
  drivers: [
    { joint: 'Hips', energyShare: 0.5 },
    { joint: 'LeftArm', energyShare: 0.47 },
    // Below the solver's essential share: a missing joint only leaves its inputs at rest.
    { joint: 'Head', energyShare: DRIVER_MAP_DEFAULTS.essentialShare / 2 },
  ],
} as unknown as TissueProfile;
const target = ['pelvis', 'spine_01', 'upperarm_l', 'upperarm_r'];

describe('mapProfileDrivers', () => {
  it('names the drivers without a joint, and which of them the solve cannot do without', () => {
    const map = mapProfileDrivers(profile, target);
    expect(map.mapped).toEqual([]);
    expect(map.unmapped).toEqual(['Hips', 'LeftArm', 'Head']);
    expect(map.essentialUnmapped).toEqual(['Hips', 'LeftArm']);
  });

  it('matches names that differ only in case, separators and side markers', () => {
    const map = mapProfileDrivers(profile, ['hips', 'left_arm', 'head']);
    expect(map.mapped).toEqual([
      { source: 'Hips', target: 'hips' },
      { source: 'LeftArm', target: 'left_arm' },
      { source: 'Head', target: 'head' },
    ]);
  });

  it('lets a joint map fill the gaps', () => {
    const map = mapProfileDrivers(profile, target, { Hips: 'pelvis', LeftArm: 'upperarm_l' });
    expect(map.essentialUnmapped).toEqual([]);
    expect(map.unmapped).toEqual(['Head']);
  });
});

describe('badJointMapEntries', () => {
  it('lists every entry naming a joint the profile or the character lacks', () => {
    const rows = badJointMapEntries(
      { Hips: 'pelvis', Tail: 'pelvis', LeftArm: 'wing_l' },
      profile.sourceJoints as string[],
      target,
    );
    expect(rows.map((r) => r.field)).toEqual(['jointMap.Tail', 'jointMap.LeftArm']);
  });
});
