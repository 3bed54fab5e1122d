import { Badge, Button, Flex, Text, TextArea } from '@radix-ui/themes';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { CheckIcon, ClockIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { StateLabel } from '@/components/ui/state-label';
import { paths } from '@/config/paths';
import type { Note } from '../api/note-view';
import { useReopenNote } from '../api/reopen-note';
import { useResolveNote } from '../api/resolve-note';
import { useUpdateNote } from '../api/update-note';

/** Props of one note. */
export interface NoteItemProps {
  showId: string;
  note: Note;
  /** The note is pinned to the frame on screen. */
  here: boolean;
  canResolve: boolean;
  canEdit: boolean;
  onJump: (note: Note) => void;
}

/** A note: its frame (a link that jumps there), text, author, state and what the user may do. */
export function NoteItem({ showId, note, here, canResolve, canEdit, onJump }: NoteItemProps) {
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(note.text);
  const resolve = useResolveNote();
  const reopen = useReopenNote();
  const update = useUpdateNote();
  const ids = { showId, takeId: note.takeId, noteId: note.id };
  const error = resolve.error ?? reopen.error ?? update.error;

  return (
    <li
      className="take-note"
      data-here={here || undefined}
      data-resolved={note.resolved || undefined}
      data-testid="note-item"
    >
      <Flex direction="column" gap="1">
        <Flex align="center" gap="2" wrap="wrap">
          <Link
            to={paths.take.getHref(showId, note.takeId, note.frame)}
            onClick={() => onJump(note)}
            className="take-note-frame"
            aria-label={`Go to frame ${note.frame}`}
            preventScrollReset
          >
            <Mono size="2">{note.frame}</Mono>
          </Link>
          {note.resolved ? (
            <StateLabel icon={<CheckIcon />} color="green">
              Resolved
            </StateLabel>
          ) : (
            <StateLabel icon={<ClockIcon />} color="amber">
              Open
            </StateLabel>
          )}
          {note.mark ? (
            <Badge variant="outline" color="gray" radius="full">
              Has a mark
            </Badge>
          ) : null}
          <Text size="1" color="gray">
            {note.author.displayName}
          </Text>
        </Flex>
        {editing ? (
          <Flex direction="column" gap="2">
            <TextArea
              aria-label={`Text of the note at frame ${note.frame}`}
              value={text}
              onChange={(e) => setText(e.target.value)}
              rows={3}
              maxLength={5000}
            />
            <Flex gap="2">
              <Button
                size="1"
                disabled={text.trim() === ''}
                loading={update.isPending}
                onClick={() =>
                  update.mutate(
                    { ...ids, text: text.trim() },
                    { onSuccess: () => setEditing(false) },
                  )
                }
              >
                Save note
              </Button>
              <Button size="1" variant="ghost" color="gray" onClick={() => setEditing(false)}>
                Cancel
              </Button>
            </Flex>
          </Flex>
        ) : (
          <Text size="2" className="take-note-text">
            {note.text}
          </Text>
        )}
        {(canEdit && !editing) || canResolve ? (
          <Flex gap="3">
            {canEdit && !editing ? (
              <Button
                size="1"
                variant="ghost"
                onClick={() => (setText(note.text), setEditing(true))}
              >
                Edit
              </Button>
            ) : null}
            {canResolve && !note.resolved ? (
              <Button
                size="1"
                variant="ghost"
                loading={resolve.isPending}
                onClick={() => resolve.mutate(ids)}
              >
                Resolve
              </Button>
            ) : null}
            {canResolve && note.resolved ? (
              <Button
                size="1"
                variant="ghost"
                color="gray"
                loading={reopen.isPending}
                onClick={() => reopen.mutate(ids)}
              >
                Reopen
              </Button>
            ) : null}
          </Flex>
        ) : null}
        {error ? <ApiErrorCallout error={error} /> : null}
      </Flex>
    </li>
  );
}
