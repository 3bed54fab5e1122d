// Every keyboard shortcut of the studio in one table: the shell's, the take player's transport,
// view and notes keys. The help dialog ('?') and studio-web/README.md show this table; one
// listener (components/layouts/shortcuts-provider.tsx) reads it, so no key can mean two things.

/** What a shortcut does; pages register a handler for the ones they offer. */
export type ShortcutCommand =
  | 'goShows'
  | 'goLibrary'
  | 'goShots'
  | 'goTracking'
  | 'goAdmin'
  | 'showHelp'
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
  | 'frameCharacter'
  | 'writeNote'
  | 'toggleDrawing'
  | 'previousNote'
  | 'nextNote';

/** Where a shortcut works, as the help dialog groups them. */
export type ShortcutGroup = 'go' | 'anywhere' | 'transport' | 'view' | 'notes';

/** Group headings of the help dialog, in order. */
export const SHORTCUT_GROUPS: readonly { group: ShortcutGroup; title: string }[] = [
  { group: 'go', title: 'Go to' },
  { group: 'anywhere', title: 'Anywhere' },
  { group: 'transport', title: 'Take player: transport' },
  { group: 'view', title: 'Take player: view' },
  { group: 'notes', title: 'Take player: notes' },
];

/**
 * One shortcut. `keys` is the sequence of strokes (see lib/key-strokes.ts): one stroke, or a
 * prefix and a second stroke typed within SEQUENCE_MS.
 */
export interface Shortcut {
  command: ShortcutCommand;
  group: ShortcutGroup;
  keys: readonly string[];
  does: string;
}

/** How long after a prefix key the second key still counts, in milliseconds. */
export const SEQUENCE_MS = 1500;

/** The prefix of the navigation shortcuts ("go"). */
export const GO_PREFIX = 'g';

/** Every shortcut of the studio. */
export const SHORTCUTS: readonly Shortcut[] = [
  { command: 'goShows', group: 'go', keys: [GO_PREFIX, 'h'], does: 'All your shows' },
  {
    command: 'goLibrary',
    group: 'go',
    keys: [GO_PREFIX, 'l'],
    does: 'Library of this show',
  },
  {
    command: 'goShots',
    group: 'go',
    keys: [GO_PREFIX, 's'],
    does: 'Shots of this show',
  },
  {
    command: 'goTracking',
    group: 'go',
    keys: [GO_PREFIX, 't'],
    does: 'Tracking of this show (producers, admins)',
  },
  { command: 'goAdmin', group: 'go', keys: [GO_PREFIX, 'a'], does: 'Admin (admins)' },
  { command: 'showHelp', group: 'anywhere', keys: ['?'], does: 'Show this list' },
  { command: 'togglePlay', group: 'transport', keys: ['Space'], does: 'Play or pause' },
  { command: 'stepBack', group: 'transport', keys: [','], does: 'One frame back' },
  { command: 'stepForward', group: 'transport', keys: ['.'], does: 'One frame forward' },
  { command: 'stepBack10', group: 'transport', keys: ['Shift+,'], does: 'Ten frames back' },
  { command: 'stepForward10', group: 'transport', keys: ['Shift+.'], does: 'Ten frames forward' },
  { command: 'setIn', group: 'transport', keys: ['['], does: 'Loop in at this frame' },
  { command: 'setOut', group: 'transport', keys: [']'], does: 'Loop out at this frame' },
  { command: 'clearRange', group: 'transport', keys: ['\\'], does: 'Clear the loop range' },
  { command: 'toRangeStart', group: 'transport', keys: ['Home'], does: 'Go to loop in' },
  { command: 'toRangeEnd', group: 'transport', keys: ['End'], does: 'Go to loop out' },
  { command: 'toggleLoop', group: 'transport', keys: ['r'], does: 'Loop the range on or off' },
  { command: 'toggleHeatMap', group: 'view', keys: ['m'], does: 'Heat map on or off' },
  { command: 'frameCharacter', group: 'view', keys: ['f'], does: 'Frame the character' },
  { command: 'writeNote', group: 'notes', keys: ['w'], does: 'Write a note at this frame' },
  {
    command: 'toggleDrawing',
    group: 'notes',
    keys: ['d'],
    does: 'Draw a mark on the view, or stop',
  },
  { command: 'previousNote', group: 'notes', keys: ['p'], does: 'Go to the previous note' },
  { command: 'nextNote', group: 'notes', keys: ['n'], does: 'Go to the next note' },
];

/** The shortcut of a command. */
export function shortcutOf(command: ShortcutCommand): Shortcut {
  const found = SHORTCUTS.find((s) => s.command === command);
  if (!found) throw new Error(`No shortcut for ${command}.`);
  return found;
}

/** A stroke as people read it: "Space", "Shift + ,", "R". */
export function strokeLabel(stroke: string): string {
  if (stroke.startsWith('Shift+')) return `Shift + ${stroke.slice('Shift+'.length)}`;
  return /^[a-z]$/.test(stroke) ? stroke.toUpperCase() : stroke;
}

/** The keys of a command as people read them, e.g. ["G", "H"] or ["Shift + ."]. */
export function keyLabels(command: ShortcutCommand): string[] {
  return shortcutOf(command).keys.map(strokeLabel);
}
