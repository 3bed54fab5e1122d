import { Button, Flex, Text, TextArea } from '@radix-ui/themes';
import { useState } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { KeyHint } from '@/components/ui/key-hint';
import { Mono } from '@/components/ui/mono';
import { useCreateNote } from '../api/create-note';
import type { MarkPoint } from '../api/note-view';
import { NOTE_TEXT_ID } from '../hooks/use-player-keys';
import { pointCount, toMark } from '../review/mark-strokes';

/** Props of the new-note form. */
export interface NoteFormProps {
  showId: string;
  takeId: string;
  /** Shot frame number the note is pinned to (the frame on screen). */
  shotFrame: number;
  drawing: boolean;
  onDrawingChange: (drawing: boolean) => void;
  draft: MarkPoint[][];
  onDraftChange: (strokes: MarkPoint[][]) => void;
}

/** Write a note at the frame on screen, optionally with a mark drawn on the view. */
export function NoteForm(props: NoteFormProps) {
  const { showId, takeId, shotFrame, drawing, onDrawingChange, draft, onDraftChange } = props;
  const [text, setText] = useState('');
  const create = useCreateNote();
  const points = pointCount(draft.map((points) => ({ points })));

  const submit = () => {
    const mark = toMark(draft.map((p) => ({ points: p })));
    create.mutate(
      { showId, takeId, frame: shotFrame, text: text.trim(), ...(mark ? { mark } : {}) },
      {
        onSuccess: () => {
          setText('');
          onDraftChange([]);
          onDrawingChange(false);
        },
      },
    );
  };

  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
      data-testid="note-form"
    >
      <Flex direction="column" gap="2">
        <Flex justify="between" align="baseline">
          <Text as="label" htmlFor={NOTE_TEXT_ID} size="2" weight="medium">
            New note at frame <Mono>{shotFrame}</Mono>
          </Text>
          <KeyHint command="writeNote" />
        </Flex>
        <TextArea
          id={NOTE_TEXT_ID}
          value={text}
          onChange={(e) => setText(e.target.value)}
          placeholder="What should change at this frame?"
          rows={3}
          maxLength={5000}
        />
        <Flex gap="2" align="center" wrap="wrap">
          <Button
            type="button"
            variant={drawing ? 'solid' : 'soft'}
            color={drawing ? undefined : 'gray'}
            aria-pressed={drawing}
            onClick={() => onDrawingChange(!drawing)}
            data-testid="draw-mark"
          >
            {drawing ? 'Drawing on the view' : 'Draw a mark'} <KeyHint command="toggleDrawing" />
          </Button>
          <Button
            type="button"
            variant="ghost"
            color="gray"
            disabled={draft.length === 0}
            onClick={() => onDraftChange([])}
          >
            Clear mark
          </Button>
          {draft.length > 0 ? (
            <Text size="1" color="gray" data-testid="draft-summary">
              {draft.length} stroke{draft.length === 1 ? '' : 's'}, {points} points
            </Text>
          ) : null}
          <span className="take-transport-gap" />
          <Button type="submit" disabled={text.trim() === ''} loading={create.isPending}>
            Pin note
          </Button>
        </Flex>
        {drawing ? (
          <Text size="1" color="gray">
            Drag on the view to draw. Orbiting is paused while drawing.
          </Text>
        ) : null}
        {create.isError ? <ApiErrorCallout error={create.error} /> : null}
      </Flex>
    </form>
  );
}
