// The app shell's keyboard shortcuts: `g` then a letter goes somewhere; `?` lists them all.
// Pages may add their own keys (the take player does); these are ignored while typing.
import type { NavItem } from './nav-items';

/** How long after `g` the second key still counts, in milliseconds. */
export const SEQUENCE_MS = 1500;

/** One line of the shortcut list. */
export interface ShortcutHelp {
  keys: string[];
  does: string;
}

/** Every shell shortcut, as the list dialog and README show them. */
export const SHELL_SHORTCUTS: ShortcutHelp[] = [
  { keys: ['g', 'h'], does: 'Go to all your shows' },
  { keys: ['g', 'l'], does: 'Go to the Library of the current show' },
  { keys: ['g', 's'], does: 'Go to the Shots of the current show' },
  { keys: ['g', 't'], does: 'Go to Tracking of the current show (producers, admins)' },
  { keys: ['g', 'a'], does: 'Go to Admin (admins)' },
  { keys: ['?'], does: 'Show this list' },
  { keys: ['Esc'], does: 'Close a dialog or menu' },
];

/** True when keys typed at `target` belong to a text field, not to the shell. */
export function isTyping(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable) return true;
  const tag = target.tagName;
  if (tag === 'TEXTAREA' || tag === 'SELECT') return true;
  if (tag !== 'INPUT') return false;
  const type = (target as HTMLInputElement).type;
  return !['checkbox', 'radio', 'button', 'submit', 'reset', 'range', 'color'].includes(type);
}

/** Where `g` + `key` leads, given the links the user has; undefined if nowhere. */
export function shortcutTarget(
  key: string,
  items: NavItem[],
  allShowsHref: string,
): string | undefined {
  if (key === 'h') return allShowsHref;
  return items.find((item) => item.shortcut === key)?.href;
}
