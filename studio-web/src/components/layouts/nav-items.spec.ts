import { describe, expect, it } from 'vitest';
import { navItems, navTargets } from './nav-items';

const keys = (...args: Parameters<typeof navItems>) => navItems(...args).map((i) => i.key);

describe('navItems', () => {
  it('offers a producer the show’s Library, Shots and Tracking', () => {
    expect(keys('producer', 's1')).toEqual(['library', 'shots', 'tracking', 'status']);
  });

  it('hides Tracking and Admin from animators, technical artists and supervisors', () => {
    for (const role of ['animator', 'technical_artist', 'supervisor'] as const) {
      expect(keys(role, 's1')).toEqual(['library', 'shots', 'status']);
    }
  });

  it('gives admins Admin as well', () => {
    expect(keys('admin', 's1')).toEqual(['library', 'shots', 'tracking', 'admin', 'status']);
  });

  it('leaves out the show’s links until a show is chosen', () => {
    expect(keys('producer', undefined)).toEqual(['status']);
    expect(keys('admin', undefined)).toEqual(['admin', 'status']);
  });

  it('offers only Status to the signed-out', () => {
    expect(keys(undefined, 's1')).toEqual(['status']);
  });

  it('links into the chosen show', () => {
    const tracking = navItems('producer', 'abc').find((i) => i.key === 'tracking');
    expect(tracking?.href).toBe('/shows/abc/tracking');
  });

  it('leads the "go" shortcuts to the role’s own links only', () => {
    expect(navTargets(navItems('producer', 's1'), '/shows')).toEqual({
      goShows: '/shows',
      goLibrary: '/shows/s1/library',
      goShots: '/shows/s1/shots',
      goTracking: '/shows/s1/tracking',
    });
    expect(navTargets(navItems('animator', 's1'), '/shows').goTracking).toBeUndefined();
    expect(navTargets(navItems('admin', undefined), '/shows')).toEqual({
      goShows: '/shows',
      goAdmin: '/admin/users',
    });
  });
});
