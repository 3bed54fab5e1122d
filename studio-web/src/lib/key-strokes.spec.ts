import { describe, expect, it } from 'vitest';
import { keepsKey, matchStrokes, strokeOf } from './key-strokes';

const el = (html: string) => {
  const host = document.createElement('div');
  host.innerHTML = html;
  return host.firstElementChild as HTMLElement;
};

describe('key strokes', () => {
  it('read letters the same with Shift or Caps Lock, and Shift + , . by the physical key', () => {
    expect(strokeOf({ key: 'M', shiftKey: true })).toBe('m');
    expect(strokeOf({ key: ' ' })).toBe('Space');
    expect(strokeOf({ key: '<', code: 'Comma', shiftKey: true })).toBe('Shift+,');
    expect(strokeOf({ key: ';', code: 'Comma', shiftKey: true })).toBe('Shift+,');
    expect(strokeOf({ key: '.', code: 'Period' })).toBe('.');
  });

  it('leave keys held with Ctrl, Cmd or Alt to the browser', () => {
    expect(strokeOf({ key: 'f', ctrlKey: true })).toBeNull();
    expect(strokeOf({ key: 'r', metaKey: true })).toBeNull();
    expect(strokeOf({ key: 'h', altKey: true })).toBeNull();
  });

  it('leave every key to text fields, lists and menus', () => {
    for (const html of [
      '<textarea></textarea>',
      '<input type="text">',
      '<input type="date">',
      '<select></select>',
      '<button role="combobox"></button>',
      '<div role="menuitem"></div>',
      '<div contenteditable="true"></div>',
    ]) {
      expect(keepsKey(el(html), 'm'), html).toBe(true);
    }
  });

  it('leave a slider its arrows, Home and End, but not the player’s other keys', () => {
    const slider = el('<span role="slider"></span>');
    expect(keepsKey(slider, 'ArrowRight')).toBe(true);
    expect(keepsKey(slider, 'Home')).toBe(true);
    expect(keepsKey(slider, '.')).toBe(false);
    expect(keepsKey(el('<input type="range">'), 'End')).toBe(true);
  });

  it('leave a focused button or switch its Space and Enter, and nothing else', () => {
    const button = el('<button>Play</button>');
    expect(keepsKey(button, 'Space')).toBe(true);
    expect(keepsKey(button, 'Enter')).toBe(true);
    expect(keepsKey(button, '.')).toBe(false);
    expect(keepsKey(el('<button role="switch"></button>'), 'Space')).toBe(true);
    expect(keepsKey(document.body, 'Space')).toBe(false);
  });

  it('match a sequence key by key', () => {
    const table = [
      { command: 'a', keys: ['g', 'h'] },
      { command: 'b', keys: ['m'] },
    ];
    expect(matchStrokes(table, ['g'])).toEqual({ kind: 'prefix' });
    expect(matchStrokes(table, ['g', 'h'])).toEqual({ kind: 'command', command: 'a' });
    expect(matchStrokes(table, ['g', 'm'])).toEqual({ kind: 'none' });
    expect(matchStrokes(table, ['m'])).toEqual({ kind: 'command', command: 'b' });
  });
});
