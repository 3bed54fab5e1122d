// Notes are pinned to shot frame numbers, the same numbers the transport counts in. These pick
// the notes that belong to the frame on screen and the note frames around it.
import type { Note } from '../api/note-view';

/** The notes pinned to a shot frame that carry a drawn mark. */
export function marksAtFrame(notes: readonly Note[], shotFrame: number): Note[] {
  return notes.filter((n) => n.frame === shotFrame && n.mark !== null);
}

/** The nearest note frame after (`direction` 1) or before (−1) `shotFrame`, or null. */
export function nextNoteFrame(
  frames: readonly number[],
  shotFrame: number,
  direction: 1 | -1,
): number | null {
  let best: number | null = null;
  for (const f of frames) {
    if ((f - shotFrame) * direction <= 0) continue;
    if (best === null || (f - best) * direction < 0) best = f;
  }
  return best;
}

/** Notes by frame, then oldest first, open before resolved within a frame. */
export function sortNotes(notes: readonly Note[]): Note[] {
  return [...notes].sort(
    (a, b) =>
      a.frame - b.frame ||
      Number(a.resolved) - Number(b.resolved) ||
      a.createdAt.localeCompare(b.createdAt),
  );
}
