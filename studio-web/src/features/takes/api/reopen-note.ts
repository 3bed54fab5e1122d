// POST /api/shows/:showId/notes/:noteId/reopen: a supervisor opens a resolved note again.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseNote, type Note } from './note-view';
import { showPath, takeKeys } from './take-keys';

/** Which note, and the take whose notes to refresh. */
export interface ReopenNoteInput {
  showId: string;
  takeId: string;
  noteId: string;
}

/** Reopens a note. */
export function reopenNote({ showId, noteId }: ReopenNoteInput): Promise<Note> {
  return apiRequest(
    `${showPath(showId)}/notes/${encodeURIComponent(noteId)}/reopen`,
    { method: 'POST' },
    parseNote,
  );
}

/** Mutation that opens a resolved note again and refreshes the take's notes. */
export function useReopenNote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reopenNote,
    onSuccess: (_note, input) =>
      queryClient.invalidateQueries({ queryKey: takeKeys.notes(input.showId, input.takeId) }),
  });
}
