// Keyboard shortcuts of the take player (documented in studio-web/README.md, "Take player
// shortcuts"). Pure: maps a key press to a player command, or null when the key is not ours or
// the user is typing or working a control that needs the key itself.

/** A player command a key can trigger. */
export type PlayerCommand =
  | 'togglePlay'
  | 'stepBack'
  | 'stepForward'
  | 'stepBack10'
  | 'stepForward10'
  | 'setIn'
  | 'setOut'
  | 'clearRange'
  | 'toRangeStart'
  | 'toRangeEnd'
  | 'toggleLoop'
  | 'toggleHeatMap'
  | 'frameCharacter';

/** The keys, in the words the screens and README show. */
export const SHORTCUTS: readonly { keys: string; command: PlayerCommand; does: string }[] = [
  { keys: 'Space', command: 'togglePlay', does: 'Play or pause' },
  { keys: ',', command: 'stepBack', does: 'One frame back' },
  { keys: '.', command: 'stepForward', does: 'One frame forward' },
  { keys: 'Shift + ,', command: 'stepBack10', does: 'Ten frames back' },
  { keys: 'Shift + .', command: 'stepForward10', does: 'Ten frames forward' },
  { keys: '[', command: 'setIn', does: 'Loop in at this frame' },
  { keys: ']', command: 'setOut', does: 'Loop out at this frame' },
  { keys: '\\', command: 'clearRange', does: 'Clear the loop range' },
  { keys: 'Home', command: 'toRangeStart', does: 'Go to loop in' },
  { keys: 'End', command: 'toRangeEnd', does: 'Go to loop out' },
  { keys: 'R', command: 'toggleLoop', does: 'Loop on or off' },
  { keys: 'H', command: 'toggleHeatMap', does: 'Heat map on or off' },
  { keys: 'F', command: 'frameCharacter', does: 'Frame the character' },
];

/** The parts of a key event the mapping reads. */
export interface KeyPress {
  key: string;
  code?: string;
  shiftKey?: boolean;
  ctrlKey?: boolean;
  metaKey?: boolean;
  altKey?: boolean;
  target?: EventTarget | null;
}

// Roles whose keys belong to the control itself (arrows on a slider, space on a button).
const KEY_HUNGRY_ROLES = new Set(['slider', 'textbox', 'combobox', 'listbox', 'menu', 'option']);

/** True when the key should go to what has focus (a field, a slider, a button) instead. */
export function isTypingTarget(target: EventTarget | null | undefined, key: string): boolean {
  const el = target as HTMLElement | null;
  if (!el || typeof el.tagName !== 'string') return false;
  const tag = el.tagName.toLowerCase();
  if (tag === 'textarea' || tag === 'select' || el.isContentEditable) return true;
  if (tag === 'input') return true;
  const role = el.getAttribute?.('role');
  if (role && KEY_HUNGRY_ROLES.has(role)) return true;
  // Space and Enter press a focused button or switch; keep that, it is what the user expects.
  const pressable = tag === 'button' || role === 'button' || role === 'switch' || tag === 'a';
  return pressable && (key === ' ' || key === 'Enter');
}

/** The command for a key press, or null. */
export function commandForKey(e: KeyPress): PlayerCommand | null {
  if (e.ctrlKey || e.metaKey || e.altKey) return null;
  if (isTypingTarget(e.target, e.key)) return null;
  // Shift turns "," and "." into "<" and ">" on most layouts: read the physical key as well.
  const comma = e.key === ',' || e.key === '<' || e.code === 'Comma';
  const period = e.key === '.' || e.key === '>' || e.code === 'Period';
  if (comma) return e.shiftKey ? 'stepBack10' : 'stepBack';
  if (period) return e.shiftKey ? 'stepForward10' : 'stepForward';
  switch (e.key) {
    case ' ':
      return 'togglePlay';
    case '[':
      return 'setIn';
    case ']':
      return 'setOut';
    case '\\':
      return 'clearRange';
    case 'Home':
      return 'toRangeStart';
    case 'End':
      return 'toRangeEnd';
    case 'r':
    case 'R':
      return 'toggleLoop';
    case 'h':
    case 'H':
      return 'toggleHeatMap';
    case 'f':
    case 'F':
      return 'frameCharacter';
    default:
      return null;
  }
}
