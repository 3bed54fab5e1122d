// Joint mapping across naming conventions: the three sample characters name joints as
// `LeftUpLeg`, `thigh_l` and `flipper_upper.L`.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  jointNameKey,
  mapDrivers,
  mapJoints,
  parseJointMap,
  readCharacter,
  type LinearDynamics,
} from '../../src/index.js';

const CHARACTERS = new URL('../../../assets-sample/files/characters/', import.meta.url);
const names = async (file: string) =>
  (await readCharacter(new Uint8Array(readFileSync(new URL(file, CHARACTERS))))).skeleton.names;

/** Dynamics whose drivers (one signal each) carry the given input energy shares. */
function dynamicsWithShares(shares: number[]): LinearDynamics {
  const m = 3 * shares.length;
  const b0 = new Float64Array(m);
  shares.forEach((s, i) => (b0[3 * i] = Math.sqrt(s)));
  return {
    k: 1,
    m,
    a1: new Float64Array(1),
    a2: new Float64Array(1),
    b0,
    b1: new Float64Array(m),
    inputMean: new Float64Array(m),
    inputScale: new Float64Array(m).fill(1),
  };
}

describe('joint mapping', () => {
  it('gives one key to one joint across naming conventions', () => {
    const same = [
      'LeftUpLeg',
      'UpLeg_L',
      'upleg.l',
      'l_UpLeg',
      'Left_UpLeg',
      'UpLegLeft',
      'rig:LeftUpLeg',
      'UpLeg.L',
    ];
    expect(new Set(same.map(jointNameKey))).toEqual(new Set(['l:upleg']));
    expect(jointNameKey('RightArm')).toBe('r:arm');
    expect(jointNameKey('LeftArm')).not.toBe(jointNameKey('RightArm'));
    expect(new Set(['spine.002', 'spine_02', 'Spine2'].map(jointNameKey))).toEqual(
      new Set([':spine2']),
    );
    // Words that merely start with "left" are not a side marker.
    expect(jointNameKey('leftover')).toBe(':leftover');
  });

  it('maps camel-case names onto the creature’s dotted names', async () => {
    const creature = await names('creature-grumbletusk.glb');
    const source = ['LeftFlipperUpper', 'RightHindflipperFoot', 'Spine003', 'Head', 'Tail'];
    const map = mapJoints(source, creature);
    expect(map.entries.map((e) => e.target)).toEqual([
      'flipper_upper.L',
      'hindflipper_foot.R',
      'spine.003',
      'head',
      null,
    ]);
    expect(map.entries.map((e) => e.how)).toEqual([
      'normalised',
      'normalised',
      'normalised',
      'normalised',
      'unmapped',
    ]);
  });

  it('reports what names cannot match between the coach and the swimmer, and a JSON map fills the gap', async () => {
    const coach = await names('coach-madge.glb');
    const swimmer = await names('swimmer-otto.glb');
    const auto = mapJoints(coach, swimmer);
    const byName = new Map(auto.entries.map((e) => [e.source, e]));
    expect(byName.get('Head')).toMatchObject({ target: 'head', how: 'normalised' });
    expect(byName.get('Hips')).toMatchObject({ target: null, how: 'unmapped' });
    expect(byName.get('LeftUpLeg')).toMatchObject({ target: null, how: 'unmapped' });
    const file = parseJointMap(
      JSON.stringify({ Hips: 'pelvis', LeftUpLeg: 'thigh_l', Head: 'neck_01' }),
    );
    const manual = new Map(mapJoints(coach, swimmer, file).entries.map((e) => [e.source, e]));
    expect(manual.get('Hips')).toMatchObject({ target: 'pelvis', how: 'file' });
    expect(manual.get('LeftUpLeg')).toMatchObject({ target: 'thigh_l', how: 'file' });
    expect(manual.get('Head')).toMatchObject({ target: 'neck_01', how: 'file' }); // the file wins
  });

  it('reports unmapped drivers and rejects unmapped essential ones with UNMAPPED_DRIVER', async () => {
    const coach = await names('coach-madge.glb');
    const swimmer = await names('swimmer-otto.glb');
    const drivers = [
      { joint: 'Head', signals: ['specificForce' as const] },
      { joint: 'Hips', signals: ['specificForce' as const] },
    ];
    const minor = mapDrivers(drivers, dynamicsWithShares([0.99, 0.01]), coach, swimmer);
    expect(minor.unmapped).toEqual(['Hips']);
    expect(Array.from(minor.targetJoints)).toEqual([swimmer.indexOf('head'), -1]);
    expect(minor.entries[1]).toMatchObject({ essential: false });
    expect(() => mapDrivers(drivers, dynamicsWithShares([0.5, 0.5]), coach, swimmer)).toThrow(
      expect.objectContaining({ code: 'UNMAPPED_DRIVER', where: { joint: 'Hips' } }),
    );
    const fixed = mapDrivers(drivers, dynamicsWithShares([0.5, 0.5]), coach, swimmer, {
      overrides: { Hips: 'pelvis' },
    });
    expect(fixed.unmapped).toEqual([]);
  });

  it('rejects a malformed joint map or one naming missing joints with BAD_JOINT_MAP', () => {
    expect(() => parseJointMap('{ not json')).toThrow(
      expect.objectContaining({ code: 'BAD_JOINT_MAP' }),
    );
    expect(() => parseJointMap('["a"]')).toThrow(
      expect.objectContaining({ code: 'BAD_JOINT_MAP' }),
    );
    expect(() => parseJointMap('{"a": 3}')).toThrow(
      expect.objectContaining({ code: 'BAD_JOINT_MAP' }),
    );
    expect(() => mapJoints(['a'], ['b'], { a: 'nope' })).toThrow(
      expect.objectContaining({ code: 'BAD_JOINT_MAP' }),
    );
    expect(() => mapJoints(['a'], ['b'], { zz: 'b' })).toThrow(
      expect.objectContaining({ code: 'BAD_JOINT_MAP' }),
    );
  });
});
