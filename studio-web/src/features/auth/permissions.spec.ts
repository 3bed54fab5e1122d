import { describe, expect, it } from 'vitest';
import { can, ROLES, type Action, type Role } from './permissions';

// Written from product.md's Roles table, row by row; the implementation is a separate table.
const EXPECTED: Record<Exclude<Role, 'admin'>, Action[]> = {
  technical_artist: [
    'upload',
    'viewCaptures',
    'deleteCapture',
    'learn',
    'createShot',
    'editShot',
    'submitJob',
    'cancelJob',
  ],
  animator: ['tuneTake', 'saveTake', 'submitJob', 'writeNote'],
  supervisor: ['viewCaptures', 'writeNote', 'resolveNote', 'decide'],
  producer: ['viewCaptures', 'planShot', 'setRenderState', 'track', 'exportReports'],
};

const ACTIONS: Action[] = [
  'upload',
  'viewCaptures',
  'deleteCapture',
  'learn',
  'createShot',
  'editShot',
  'planShot',
  'submitJob',
  'cancelJob',
  'tuneTake',
  'saveTake',
  'writeNote',
  'resolveNote',
  'decide',
  'setRenderState',
  'track',
  'exportReports',
  'admin',
];

describe('can', () => {
  it('lets an admin do everything', () => {
    for (const action of ACTIONS) expect(can('admin', action)).toBe(true);
  });

  for (const role of ROLES.filter((r): r is Exclude<Role, 'admin'> => r !== 'admin')) {
    it(`lets a ${role} do exactly what the Roles table gives them`, () => {
      const allowed = ACTIONS.filter((a) => can(role, a));
      expect(allowed.sort()).toEqual([...EXPECTED[role]].sort());
    });
  }

  it('lets nobody who is signed out do anything', () => {
    for (const action of ACTIONS) expect(can(undefined, action)).toBe(false);
  });

  it('keeps captures (biometric data) from animators', () => {
    expect(can('animator', 'viewCaptures')).toBe(false);
  });
});
