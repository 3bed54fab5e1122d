// Shapes of review notes and decisions as the API shows them, and their checks.
import { asArray, asObject, num, oneOf, optStr, person, str, type Json } from '@/lib/parse-answer';

/** A point of a drawn mark: [x, y] in normalised view coordinates (0–1, y down). */
export type MarkPoint = [number, number];

/** A drawn mark: strokes of normalised points. */
export interface NoteMark {
  strokes: { points: MarkPoint[] }[];
}

/** A review remark pinned to a take and a frame. */
export interface Note {
  id: string;
  takeId: string;
  /** Shot frame number (inside the shot's frame range). */
  frame: number;
  text: string;
  mark: NoteMark | null;
  author: { id: string; displayName: string };
  resolved: boolean;
  resolvedBy: string | null;
  resolvedAt: string | null;
  createdAt: string;
}

function parseMark(value: unknown): NoteMark | null {
  if (value === null || value === undefined) return null;
  const strokes = (value as Json).strokes;
  if (!Array.isArray(strokes)) throw new TypeError('A note mark has no strokes.');
  return {
    strokes: strokes.map((s) => {
      const points = (s as Json)?.points;
      if (!Array.isArray(points)) throw new TypeError('A stroke of a note mark has no points.');
      return {
        points: points.map((p) => {
          if (!Array.isArray(p) || typeof p[0] !== 'number' || typeof p[1] !== 'number') {
            throw new TypeError('A point of a note mark is not [x, y].');
          }
          return [p[0], p[1]] as MarkPoint;
        }),
      };
    }),
  };
}

/** Checks a note answer and returns it typed. */
export function parseNote(value: unknown): Note {
  const what = 'note';
  const b = asObject(value, what);
  return {
    id: str(b, 'id', what),
    takeId: str(b, 'takeId', what),
    frame: num(b, 'frame', what),
    text: typeof b.text === 'string' ? b.text : '',
    mark: parseMark(b.mark),
    author: person(b.author, 'author', what),
    resolved: b.resolved === true,
    resolvedBy: optStr(b, 'resolvedBy'),
    resolvedAt: optStr(b, 'resolvedAt'),
    createdAt: str(b, 'createdAt', what),
  };
}

/** Checks a list of notes. */
export function parseNotes(value: unknown): Note[] {
  return asArray(value, 'notes').map(parseNote);
}

/** What a supervisor decided about a take. */
export type Decision = 'approved' | 'changes_requested';

/** One review decision. */
export interface ReviewDecision {
  id: string;
  takeId: string;
  decision: Decision;
  comment: string | null;
  supervisor: { id: string; displayName: string };
  at: string;
}

/** Checks a decision answer and returns it typed. */
export function parseDecision(value: unknown): ReviewDecision {
  const what = 'decision';
  const b = asObject(value, what);
  return {
    id: str(b, 'id', what),
    takeId: str(b, 'takeId', what),
    decision: oneOf(b, 'decision', ['approved', 'changes_requested'] as const, what),
    comment: optStr(b, 'comment'),
    supervisor: person(b.supervisor, 'supervisor', what),
    at: str(b, 'at', what),
  };
}

/** Checks a list of decisions. */
export function parseDecisions(value: unknown): ReviewDecision[] {
  return asArray(value, 'decisions').map(parseDecision);
}
