import { describe, expect, it } from 'vitest';
import { navItems } from './nav-items';
import { isTyping, shortcutTarget } from './shell-shortcuts';

describe('shell shortcuts', () => {
  it('lead g + a letter to the role’s own links only', () => {
    const producer = navItems('producer', 's1');
    expect(shortcutTarget('t', producer, '/shows')).toBe('/shows/s1/tracking');
    expect(shortcutTarget('l', producer, '/shows')).toBe('/shows/s1/library');
    expect(shortcutTarget('h', producer, '/shows')).toBe('/shows');
    expect(shortcutTarget('a', producer, '/shows')).toBeUndefined();
    expect(shortcutTarget('t', navItems('animator', 's1'), '/shows')).toBeUndefined();
  });

  it('stay out of the way while typing in a field', () => {
    const text = document.createElement('input');
    const box = document.createElement('input');
    box.type = 'checkbox';
    const area = document.createElement('textarea');
    const button = document.createElement('button');
    expect(isTyping(text)).toBe(true);
    expect(isTyping(area)).toBe(true);
    expect(isTyping(box)).toBe(false);
    expect(isTyping(button)).toBe(false);
  });
});
