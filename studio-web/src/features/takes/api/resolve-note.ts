// POST /api/shows/:showId/notes/:noteId/resolve: a supervisor marks a note resolved.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseNote, type Note } from './note-view';
import { showPath, takeKeys } from './take-keys';

/** Which note, and the take whose notes to refresh. */
export interface ResolveNoteInput {
  showId: string;
  takeId: string;
  noteId: string;
}

/** Resolves a note. */
export function resolveNote({ showId, noteId }: ResolveNoteInput): Promise<Note> {
  return apiRequest(
    `${showPath(showId)}/notes/${encodeURIComponent(noteId)}/resolve`,
    { method: 'POST' },
    parseNote,
  );
}

/** Mutation that marks a note resolved and refreshes the take's notes. */
export function useResolveNote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resolveNote,
    onSuccess: (_note, input) =>
      queryClient.invalidateQueries({ queryKey: takeKeys.notes(input.showId, input.takeId) }),
  });
}
