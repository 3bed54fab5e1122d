// POST /api/shows/:showId/takes/:takeId/notes: pin a note (text, optional mark) to a frame.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseNote, type Note, type NoteMark } from './note-view';
import { showPath, takeKeys } from './take-keys';

/** A new note. */
export interface CreateNoteInput {
  showId: string;
  takeId: string;
  /** Shot frame number. */
  frame: number;
  text: string;
  mark?: NoteMark;
}

/** Writes a note. */
export function createNote({ showId, takeId, ...body }: CreateNoteInput): Promise<Note> {
  return apiRequest(
    `${showPath(showId)}/takes/${encodeURIComponent(takeId)}/notes`,
    { method: 'POST', body },
    parseNote,
  );
}

/** Mutation that writes a note and refreshes the take's notes. */
export function useCreateNote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createNote,
    onSuccess: (_note, input) =>
      queryClient.invalidateQueries({ queryKey: takeKeys.notes(input.showId, input.takeId) }),
  });
}
