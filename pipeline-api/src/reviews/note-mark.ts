import { DomainError } from '../common/errors/domain-error';
import type { NoteMark } from './entities/note.entity';

/** Limits that keep a drawn mark a mark, not a picture. */
export const MARK_LIMITS = { strokes: 100, pointsPerStroke: 5000, points: 20_000 } as const;

const bad = (message: string, where: Record<string, unknown>) =>
  new DomainError('invalid', 'NOTE_MARK_INVALID', message, where);

/**
 * Checks a drawn mark: `{ strokes: [{ points: [[x, y], …] }, …] }` with every coordinate a finite
 * number in [0, 1] (normalised view coordinates). Returns a clean copy; null stays null.
 */
export function validateMark(value: unknown): NoteMark | null {
  if (value === null || value === undefined) return null;
  const strokes = (value as { strokes?: unknown }).strokes;
  if (typeof value !== 'object' || !Array.isArray(strokes)) {
    throw bad('mark must be an object with a strokes array.', {});
  }
  if (strokes.length === 0 || strokes.length > MARK_LIMITS.strokes) {
    throw bad(`mark needs 1 to ${MARK_LIMITS.strokes} strokes.`, { strokes: strokes.length });
  }
  let total = 0;
  const clean = strokes.map((stroke: unknown, s) => {
    const points = (stroke as { points?: unknown })?.points;
    if (
      !Array.isArray(points) ||
      points.length === 0 ||
      points.length > MARK_LIMITS.pointsPerStroke
    ) {
      throw bad(`stroke ${s} needs 1 to ${MARK_LIMITS.pointsPerStroke} points.`, { stroke: s });
    }
    total += points.length;
    if (total > MARK_LIMITS.points)
      throw bad(`mark has more than ${MARK_LIMITS.points} points.`, { stroke: s });
    return {
      points: points.map((p: unknown, i) => {
        const ok =
          Array.isArray(p) &&
          p.length === 2 &&
          p.every((c) => typeof c === 'number' && Number.isFinite(c) && c >= 0 && c <= 1);
        if (!ok) {
          throw bad(`stroke ${s}, point ${i} must be [x, y] with both in [0, 1].`, {
            stroke: s,
            point: i,
            value: p,
          });
        }
        return [p[0], p[1]] as [number, number];
      }),
    };
  });
  return { strokes: clean };
}
