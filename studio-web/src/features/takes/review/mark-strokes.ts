// Drawn marks as the API stores them: strokes of [x, y] points normalised to the view (0–1 on
// both axes, origin top left), so a mark lands on the same spot of a view of any size.
import type { MarkPoint, NoteMark } from '../api/note-view';

/** The API's limits on a mark (pipeline-api reviews/note-mark.ts). */
export const MARK_LIMITS = { strokes: 100, pointsPerStroke: 5000, points: 20_000 } as const;

/** Points closer than this (in view fractions) to the last kept one add nothing visible. */
export const MIN_POINT_SPACING = 0.002;

/** Decimal places kept: 1/10 000 of the view is finer than any screen pixel. */
const PLACES = 4;

/** The part of a view's box a point is measured against. */
export interface ViewBox {
  left: number;
  top: number;
  width: number;
  height: number;
}

const round = (v: number) => Math.round(v * 10 ** PLACES) / 10 ** PLACES;
const clamp01 = (v: number) => Math.min(1, Math.max(0, v));

/**
 * A pointer position (client pixels) as a normalised view point; positions outside the view
 * are pulled to its edge. A view without area gives null.
 */
export function normalisePoint(clientX: number, clientY: number, box: ViewBox): MarkPoint | null {
  if (!(box.width > 0 && box.height > 0)) return null;
  if (!Number.isFinite(clientX) || !Number.isFinite(clientY)) return null;
  return [
    round(clamp01((clientX - box.left) / box.width)),
    round(clamp01((clientY - box.top) / box.height)),
  ];
}

/** Appends `point` to a stroke unless it is within MIN_POINT_SPACING of the last point. */
export function addPoint(points: MarkPoint[], point: MarkPoint | null): MarkPoint[] {
  if (!point) return points;
  const lastPoint = points[points.length - 1];
  if (
    lastPoint &&
    Math.hypot(point[0] - lastPoint[0], point[1] - lastPoint[1]) < MIN_POINT_SPACING
  ) {
    return points;
  }
  if (points.length >= MARK_LIMITS.pointsPerStroke) return points;
  return [...points, point];
}

/** Total points in a set of strokes. */
export function pointCount(strokes: readonly { points: readonly MarkPoint[] }[]): number {
  return strokes.reduce((n, s) => n + s.points.length, 0);
}

/**
 * The mark to send: empty strokes dropped, at most MARK_LIMITS strokes and points (the rest cut
 * off), or null when nothing was drawn.
 */
export function toMark(strokes: readonly { points: readonly MarkPoint[] }[]): NoteMark | null {
  const kept: NoteMark['strokes'] = [];
  let total = 0;
  for (const stroke of strokes) {
    if (stroke.points.length === 0) continue;
    if (kept.length === MARK_LIMITS.strokes) break;
    const room = MARK_LIMITS.points - total;
    if (room <= 0) break;
    const points = stroke.points.slice(0, Math.min(room, MARK_LIMITS.pointsPerStroke));
    kept.push({ points: points.map((p) => [p[0], p[1]] as MarkPoint) });
    total += points.length;
  }
  return kept.length > 0 ? { strokes: kept } : null;
}
