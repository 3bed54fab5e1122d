import { describe, expect, it } from 'vitest';
import type { MarkPoint } from '../api/note-view';
import { addPoint, MARK_LIMITS, MIN_POINT_SPACING, normalisePoint, toMark } from './mark-strokes';

const box = { left: 100, top: 50, width: 800, height: 400 };

describe('mark strokes', () => {
  it('measures a pointer position as a fraction of the view, origin top left', () => {
    expect(normalisePoint(100, 50, box)).toEqual([0, 0]);
    expect(normalisePoint(900, 450, box)).toEqual([1, 1]);
    // 300 px into 800, 100 px into 400.
    expect(normalisePoint(400, 150, box)).toEqual([0.375, 0.25]);
  });

  it('pulls positions outside the view to its edge and keeps four decimals', () => {
    expect(normalisePoint(50, 1000, box)).toEqual([0, 1]);
    // 1/3 of 800 px = 266.666… px.
    expect(normalisePoint(100 + 800 / 3, 50, box)).toEqual([0.3333, 0]);
  });

  it('gives no point for a view without area or a position that is not a number', () => {
    expect(normalisePoint(10, 10, { ...box, width: 0 })).toBeNull();
    expect(normalisePoint(Number.NaN, 10, box)).toBeNull();
  });

  it('skips points closer than the spacing to the last one', () => {
    let points: MarkPoint[] = [];
    points = addPoint(points, [0.5, 0.5]);
    points = addPoint(points, [0.5 + MIN_POINT_SPACING / 2, 0.5]);
    points = addPoint(points, [0.5 + MIN_POINT_SPACING * 2, 0.5]);
    expect(points).toEqual([
      [0.5, 0.5],
      [0.5 + MIN_POINT_SPACING * 2, 0.5],
    ]);
  });

  it('sends null for nothing drawn and drops empty strokes', () => {
    expect(toMark([])).toBeNull();
    expect(toMark([{ points: [] }])).toBeNull();
    expect(toMark([{ points: [] }, { points: [[0.1, 0.2]] }])).toEqual({
      strokes: [{ points: [[0.1, 0.2]] }],
    });
  });

  it('cuts a mark down to the API limits on strokes and points', () => {
    const many = Array.from({ length: MARK_LIMITS.strokes + 5 }, () => ({
      points: [[0.5, 0.5]] as MarkPoint[],
    }));
    expect(toMark(many)?.strokes).toHaveLength(MARK_LIMITS.strokes);
    const long = Array.from({ length: 5 }, () => ({
      points: Array.from(
        { length: MARK_LIMITS.pointsPerStroke },
        (_, i) => [i / 1e4, 0] as MarkPoint,
      ),
    }));
    const mark = toMark(long);
    const total = mark?.strokes.reduce((n, s) => n + s.points.length, 0);
    expect(total).toBe(MARK_LIMITS.points);
  });
});
