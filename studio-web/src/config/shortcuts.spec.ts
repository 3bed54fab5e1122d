import { describe, expect, it } from 'vitest';
import { strokeOf, type KeyPress } from '@/lib/key-strokes';
import { GO_PREFIX, SHORTCUTS, keyLabels, strokeLabel } from './shortcuts';

// A key press that types `stroke` on a common layout (Shift + , gives "<").
function pressFor(stroke: string): KeyPress {
  if (stroke === 'Space') return { key: ' ', code: 'Space' };
  if (stroke === 'Shift+,') return { key: '<', code: 'Comma', shiftKey: true };
  if (stroke === 'Shift+.') return { key: '>', code: 'Period', shiftKey: true };
  if (stroke === '?') return { key: '?', code: 'Slash', shiftKey: true };
  return { key: stroke };
}

describe('the shortcut table', () => {
  it('gives each command one shortcut', () => {
    const commands = SHORTCUTS.map((s) => s.command);
    expect(new Set(commands).size).toBe(commands.length);
  });

  it('gives each key sequence one command, and no sequence starts another', () => {
    const sequences = SHORTCUTS.map((s) => s.keys.join(' '));
    expect(new Set(sequences).size).toBe(sequences.length);
    for (const a of SHORTCUTS) {
      for (const b of SHORTCUTS) {
        if (a === b || a.keys.length >= b.keys.length) continue;
        expect(b.keys.slice(0, a.keys.length), `${a.command} starts ${b.command}`).not.toEqual(
          a.keys,
        );
      }
    }
  });

  it('uses every key for one thing only, also as the second key of a "go" sequence', () => {
    const uses = new Map<string, string[]>();
    for (const s of SHORTCUTS) {
      for (const k of s.keys) {
        if (k === GO_PREFIX && s.keys.length > 1) continue;
        uses.set(k, [...(uses.get(k) ?? []), s.command]);
      }
    }
    const twice = [...uses].filter(([, commands]) => commands.length > 1);
    expect(twice).toEqual([]);
    // The prefix itself does nothing alone.
    expect(uses.has(GO_PREFIX)).toBe(false);
  });

  it('names only strokes a key press can make', () => {
    for (const s of SHORTCUTS) {
      for (const k of s.keys) expect(strokeOf(pressFor(k)), `${s.command}: ${k}`).toBe(k);
    }
  });

  it('shows keys the way they are printed on a keyboard', () => {
    expect(keyLabels('goShows')).toEqual(['G', 'H']);
    expect(keyLabels('stepForward10')).toEqual(['Shift + .']);
    expect(strokeLabel('Space')).toBe('Space');
  });
});
