import { describe, expect, it } from 'vitest';
import { safeRedirect } from './safe-redirect';

describe('safeRedirect', () => {
  it('keeps a path of this site, query and fragment included', () => {
    expect(safeRedirect('/shows/1/tracking?late=true#t', '/shows')).toBe(
      '/shows/1/tracking?late=true#t',
    );
  });

  it('refuses other sites, protocol-relative and backslash tricks', () => {
    for (const bad of ['https://evil.example', '//evil.example', '/\\evil.example', 'shows', '']) {
      expect(safeRedirect(bad, '/shows')).toBe('/shows');
    }
    expect(safeRedirect(null, '/shows')).toBe('/shows');
  });
});
