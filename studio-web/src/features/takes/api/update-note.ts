// PATCH /api/shows/:showId/notes/:noteId: the author edits a note's text, frame or mark.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseNote, type Note, type NoteMark } from './note-view';
import { showPath, takeKeys } from './take-keys';

/** The fields to change; `mark: null` removes the mark. */
export interface UpdateNoteInput {
  showId: string;
  takeId: string;
  noteId: string;
  text?: string;
  frame?: number;
  mark?: NoteMark | null;
}

/** Edits a note. */
export function updateNote({
  showId,
  takeId: _takeId,
  noteId,
  ...body
}: UpdateNoteInput): Promise<Note> {
  return apiRequest(
    `${showPath(showId)}/notes/${encodeURIComponent(noteId)}`,
    { method: 'PATCH', body },
    parseNote,
  );
}

/** Mutation that edits a note and refreshes the take's notes. */
export function useUpdateNote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateNote,
    onSuccess: (_note, input) =>
      queryClient.invalidateQueries({ queryKey: takeKeys.notes(input.showId, input.takeId) }),
  });
}
