import { Flex, Heading, Spinner, Text } from '@radix-ui/themes';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import type { Note } from '../api/note-view';
import { useNotes } from '../api/get-notes';
import { sortNotes } from '../review/note-frames';
import { NoteItem } from './note-item';

/** Props of the notes list. */
export interface NotesPanelProps {
  showId: string;
  takeId: string;
  /** Shot frame number on screen. */
  shotFrame: number;
  userId: string;
  isAdmin: boolean;
  canResolve: boolean;
  onJump: (note: Note) => void;
}

/** The take's notes by frame; a note's frame jumps the player there. */
export function NotesPanel({
  showId,
  takeId,
  shotFrame,
  userId,
  isAdmin,
  canResolve,
  onJump,
}: NotesPanelProps) {
  const notes = useNotes(showId, takeId);
  const list = sortNotes(notes.data ?? []);
  const open = list.filter((n) => !n.resolved).length;
  return (
    <Flex direction="column" gap="2" data-testid="notes-panel">
      <Flex justify="between" align="baseline">
        <Heading as="h3" size="3">
          Notes
        </Heading>
        {notes.data ? (
          <Text size="1" color="gray">
            {open} open, {list.length - open} resolved
          </Text>
        ) : null}
      </Flex>
      {notes.isPending ? <Spinner /> : null}
      {notes.isError ? <ApiErrorCallout error={notes.error} /> : null}
      {notes.data && list.length === 0 ? (
        <Text size="2" color="gray">
          No notes on this take yet.
        </Text>
      ) : null}
      <ul className="take-notes">
        {list.map((note) => (
          <NoteItem
            key={note.id}
            showId={showId}
            note={note}
            here={note.frame === shotFrame}
            canResolve={canResolve}
            canEdit={isAdmin || note.author.id === userId}
            onJump={onJump}
          />
        ))}
      </ul>
    </Flex>
  );
}
