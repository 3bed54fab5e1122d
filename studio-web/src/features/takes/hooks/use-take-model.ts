// Turns a take file's bytes into a playable model, once per page visit.
import { isSolverInputError } from '@overshoot/solver';
import { useQuery } from '@tanstack/react-query';
import { loadTakeModel } from '../player/take-model';

/** The message for a file the viewer cannot read. */
export function describeModelError(error: unknown): string {
  if (isSolverInputError(error)) return `${error.message} (${error.code})`;
  return error instanceof Error ? error.message : String(error);
}

/** The playable model of a take's bytes; idle while there are none. */
export function useTakeModel(takeId: string | undefined, bytes: ArrayBuffer | undefined) {
  return useQuery({
    queryKey: ['take-model', takeId, bytes?.byteLength],
    queryFn: () => loadTakeModel(bytes as ArrayBuffer),
    enabled: takeId !== undefined && bytes !== undefined,
    staleTime: Infinity,
    // Live tuning edits a model in place: never hand a tuned one to a later visit.
    gcTime: 0,
    retry: false,
    structuralSharing: false,
  });
}
