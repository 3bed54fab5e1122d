// The take player's keyboard shortcuts (config/shortcuts.ts: transport, view and notes), wired
// to the player while it is on screen.
import type { Dispatch } from 'react';
import {
  useShortcutHandlers,
  type ShortcutHandlers,
} from '@/components/layouts/shortcuts-provider';
import type { Note } from '../api/note-view';
import { nextNoteFrame, sortNotes } from '../review/note-frames';
import type { TransportAction, TransportState } from '../transport/transport-state';

/** The element id of the new-note text field, which "write a note" focuses. */
export const NOTE_TEXT_ID = 'new-note-text';

/** What the player's keys act on. */
export interface PlayerKeys {
  transport: TransportState;
  dispatch: Dispatch<TransportAction>;
  toggleHeatMap: () => void;
  frameCharacter: () => void;
  notes: readonly Note[];
  /** Goes to a note's frame and picks it out (as clicking its frame does). */
  onJump: (note: Note) => void;
  /** Whether the user may write notes (and so draw marks). */
  canWrite: boolean;
  toggleDrawing: () => void;
}

/** Registers the player's shortcuts; notes keys only for people who may write notes. */
export function usePlayerKeys(keys: PlayerKeys): void {
  const { transport, dispatch } = keys;
  const jumpTo = (direction: 1 | -1) => {
    const sorted = sortNotes(keys.notes);
    const frame = nextNoteFrame(
      sorted.map((n) => n.frame),
      transport.frame,
      direction,
    );
    const note = sorted.find((n) => n.frame === frame);
    if (note) keys.onJump(note);
  };
  const handlers: ShortcutHandlers = {
    togglePlay: () => dispatch({ type: 'toggle' }),
    stepBack: () => dispatch({ type: 'step', by: -1 }),
    stepForward: () => dispatch({ type: 'step', by: 1 }),
    stepBack10: () => dispatch({ type: 'step', by: -10 }),
    stepForward10: () => dispatch({ type: 'step', by: 10 }),
    setIn: () => dispatch({ type: 'setIn' }),
    setOut: () => dispatch({ type: 'setOut' }),
    clearRange: () => dispatch({ type: 'clearRange' }),
    toRangeStart: () => dispatch({ type: 'toRangeStart' }),
    toRangeEnd: () => dispatch({ type: 'toRangeEnd' }),
    toggleLoop: () => dispatch({ type: 'setLoop', loop: !transport.loop }),
    toggleHeatMap: keys.toggleHeatMap,
    frameCharacter: keys.frameCharacter,
    previousNote: () => jumpTo(-1),
    nextNote: () => jumpTo(1),
  };
  if (keys.canWrite) {
    handlers.writeNote = () => {
      const field = document.getElementById(NOTE_TEXT_ID);
      field?.scrollIntoView({ block: 'nearest' });
      field?.focus();
    };
    handlers.toggleDrawing = keys.toggleDrawing;
  }
  useShortcutHandlers(handlers);
}
