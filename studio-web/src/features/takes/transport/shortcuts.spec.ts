import { describe, expect, it } from 'vitest';
import { commandForKey, SHORTCUTS } from './shortcuts';

const el = (html: string) => {
  const host = document.createElement('div');
  host.innerHTML = html;
  return host.firstElementChild as HTMLElement;
};

describe('player shortcuts', () => {
  it('maps the documented keys to their commands', () => {
    expect(commandForKey({ key: ' ' })).toBe('togglePlay');
    expect(commandForKey({ key: ',' })).toBe('stepBack');
    expect(commandForKey({ key: '.' })).toBe('stepForward');
    expect(commandForKey({ key: '<', code: 'Comma', shiftKey: true })).toBe('stepBack10');
    expect(commandForKey({ key: '>', code: 'Period', shiftKey: true })).toBe('stepForward10');
    expect(commandForKey({ key: '[' })).toBe('setIn');
    expect(commandForKey({ key: ']' })).toBe('setOut');
    expect(commandForKey({ key: 'h' })).toBe('toggleHeatMap');
    expect(commandForKey({ key: 'x' })).toBeNull();
  });

  it('lists every command once in the table the screen and README show', () => {
    const commands = SHORTCUTS.map((s) => s.command);
    expect(new Set(commands).size).toBe(commands.length);
  });

  it('leaves keys alone while typing, on sliders, and with modifier keys', () => {
    expect(commandForKey({ key: ',', target: el('<textarea></textarea>') })).toBeNull();
    expect(commandForKey({ key: 'h', target: el('<input type="text">') })).toBeNull();
    expect(commandForKey({ key: '.', target: el('<input type="range">') })).toBeNull();
    expect(commandForKey({ key: '.', target: el('<span role="slider"></span>') })).toBeNull();
    expect(commandForKey({ key: 'h', ctrlKey: true })).toBeNull();
  });

  it('lets a focused button take Space, but still steps with "." from it', () => {
    const button = el('<button>Play</button>');
    expect(commandForKey({ key: ' ', target: button })).toBeNull();
    expect(commandForKey({ key: '.', target: button })).toBe('stepForward');
  });
});
