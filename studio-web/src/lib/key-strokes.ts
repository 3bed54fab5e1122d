// Key presses as the shortcut table names them, and the rule for when a key belongs to what has
// focus instead (a text field, a slider's arrows, a button's Space). Pure, so it is tested alone.

/** The parts of a key event the rules read. */
export interface KeyPress {
  key: string;
  code?: string;
  shiftKey?: boolean;
  ctrlKey?: boolean;
  metaKey?: boolean;
  altKey?: boolean;
  target?: EventTarget | null;
}

/**
 * The stroke of a key press ("Space", ",", "Shift+.", "r", "?", "Home"), or null for keys held
 * with Ctrl, Cmd or Alt: those belong to the browser and the system.
 */
export function strokeOf(e: KeyPress): string | null {
  if (e.ctrlKey || e.metaKey || e.altKey) return null;
  // Shift turns "," and "." into "<" and ">" on most layouts: read the physical key as well.
  if (e.key === '<' || (e.shiftKey && e.code === 'Comma')) return 'Shift+,';
  if (e.key === '>' || (e.shiftKey && e.code === 'Period')) return 'Shift+.';
  if (e.key === ' ' || e.key === 'Spacebar') return 'Space';
  // Letters count the same with Shift or Caps Lock.
  if (/^[a-zA-Z]$/.test(e.key)) return e.key.toLowerCase();
  return e.key;
}

// Roles that take every key while focused: typing, choosing from a list, a menu.
const TYPING_ROLES = new Set([
  'textbox',
  'searchbox',
  'combobox',
  'listbox',
  'option',
  'menu',
  'menuitem',
  'menuitemcheckbox',
  'menuitemradio',
  'spinbutton',
]);
// Keys a slider, a radio group or a tab list moves with.
const MOVING_STROKES = new Set([
  'ArrowLeft',
  'ArrowRight',
  'ArrowUp',
  'ArrowDown',
  'Home',
  'End',
  'PageUp',
  'PageDown',
]);
const MOVING_ROLES = new Set(['slider', 'radio', 'tab']);
const PRESSING_STROKES = new Set(['Space', 'Enter']);
const PRESSING_ROLES = new Set(['button', 'switch', 'checkbox', 'link', 'radio', 'tab']);
// Input types that are not typed into.
const NOT_TYPED = new Set(['checkbox', 'radio', 'button', 'submit', 'reset', 'color', 'file']);

function roleOf(el: HTMLElement): string {
  const role = el.getAttribute('role');
  if (role) return role;
  const tag = el.tagName.toLowerCase();
  if (tag === 'button' || tag === 'summary') return 'button';
  if (tag === 'a' && el.hasAttribute('href')) return 'link';
  if (tag === 'input') {
    const type = ((el as HTMLInputElement).type || 'text').toLowerCase();
    if (type === 'range') return 'slider';
    if (type === 'checkbox' || type === 'radio') return type;
    if (NOT_TYPED.has(type)) return 'button';
    return 'textbox';
  }
  if (tag === 'textarea') return 'textbox';
  if (tag === 'select') return 'listbox';
  return '';
}

/** True when `stroke` should go to the focused element rather than to a shortcut. */
export function keepsKey(target: EventTarget | null | undefined, stroke: string): boolean {
  const el = target as HTMLElement | null;
  if (!el || typeof el.tagName !== 'string' || typeof el.getAttribute !== 'function') return false;
  if (el.isContentEditable) return true;
  const role = roleOf(el);
  if (TYPING_ROLES.has(role)) return true;
  if (MOVING_ROLES.has(role) && MOVING_STROKES.has(stroke)) return true;
  return PRESSING_ROLES.has(role) && PRESSING_STROKES.has(stroke);
}

/** What the strokes typed so far amount to. */
export type StrokeMatch<C> =
  { kind: 'command'; command: C } | { kind: 'prefix' } | { kind: 'none' };

/** Matches the strokes typed so far against a table of key sequences. */
export function matchStrokes<C>(
  table: readonly { command: C; keys: readonly string[] }[],
  typed: readonly string[],
): StrokeMatch<C> {
  const same = (keys: readonly string[]) => typed.every((k, i) => keys[i] === k);
  const exact = table.find((s) => s.keys.length === typed.length && same(s.keys));
  if (exact) return { kind: 'command', command: exact.command };
  return table.some((s) => s.keys.length > typed.length && same(s.keys))
    ? { kind: 'prefix' }
    : { kind: 'none' };
}
