// Notes are pinned to shot frame numbers; the player counts frames from 0. These convert
// between the two and pick the notes that belong to the frame on screen.
import type { Note } from '../api/note-view';

/** The player frame index of a shot frame number, inside 0 … frameCount − 1. */
export function frameIndexOf(shotFrame: number, frameStart: number, frameCount: number): number {
  const index = Math.round(shotFrame) - frameStart;
  return Math.min(Math.max(0, index), Math.max(0, frameCount - 1));
}

/** The shot frame number of a player frame index. */
export function shotFrameOf(index: number, frameStart: number): number {
  return frameStart + index;
}

/** The notes pinned to a shot frame that carry a drawn mark. */
export function marksAtFrame(notes: readonly Note[], shotFrame: number): Note[] {
  return notes.filter((n) => n.frame === shotFrame && n.mark !== null);
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
