import { useEffect, useRef, type PointerEvent } from 'react';
import type { MarkPoint, Note } from '../api/note-view';
import { addPoint, normalisePoint } from '../review/mark-strokes';

/** Props of the layer of marks over the viewport. */
export interface MarkLayerProps {
  /** Notes at the frame on screen whose marks are shown. */
  notes: Note[];
  /** The note whose mark is highlighted (the one last jumped to). */
  activeNoteId: string | null;
  /** Drawing is on: the layer takes the pointer instead of the 3D view. */
  drawing: boolean;
  /** The mark being drawn (normalised strokes). */
  draft: MarkPoint[][];
  onDraftChange: (strokes: MarkPoint[][]) => void;
}

const svgPoints = (points: MarkPoint[]) => points.map(([x, y]) => `${x},${y}`).join(' ');

/** Marks of notes at this frame, and the surface a new mark is drawn on. */
export function MarkLayer({ notes, activeNoteId, drawing, draft, onDraftChange }: MarkLayerProps) {
  const svg = useRef<SVGSVGElement>(null);
  const strokes = useRef<MarkPoint[][]>(draft);
  const active = useRef(false);

  // Drawing starts from the note form, often scrolled below the view: bring the view back.
  useEffect(() => {
    if (drawing) svg.current?.scrollIntoView({ block: 'nearest' });
  }, [drawing]);

  const point = (e: PointerEvent<SVGSVGElement>) => {
    const box = svg.current?.getBoundingClientRect();
    return box ? normalisePoint(e.clientX, e.clientY, box) : null;
  };
  const onPointerDown = (e: PointerEvent<SVGSVGElement>) => {
    if (!drawing || e.button !== 0) return;
    e.currentTarget.setPointerCapture(e.pointerId);
    active.current = true;
    strokes.current = [...draft, addPoint([], point(e))];
    onDraftChange(strokes.current);
  };
  const onPointerMove = (e: PointerEvent<SVGSVGElement>) => {
    if (!active.current) return;
    const list = strokes.current;
    const last = list[list.length - 1];
    const next = addPoint(last, point(e));
    if (next === last) return;
    strokes.current = [...list.slice(0, -1), next];
    onDraftChange(strokes.current);
  };
  const onPointerUp = () => {
    active.current = false;
  };

  return (
    <svg
      ref={svg}
      className="take-mark-layer"
      data-drawing={drawing || undefined}
      data-testid="mark-layer"
      viewBox="0 0 1 1"
      preserveAspectRatio="none"
      aria-label={drawing ? 'Drawing surface for the note mark' : undefined}
      aria-hidden={drawing ? undefined : true}
      role={drawing ? 'img' : undefined}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      onPointerCancel={onPointerUp}
    >
      {notes.map((note) =>
        note.mark?.strokes.map((s, i) => (
          <polyline
            key={`${note.id}-${i}`}
            points={svgPoints(s.points)}
            className="take-mark-stroke"
            data-active={note.id === activeNoteId || undefined}
            data-testid="note-mark-stroke"
          />
        )),
      )}
      {draft.map((s, i) => (
        <polyline
          key={`draft-${i}`}
          points={svgPoints(s)}
          className="take-mark-stroke take-mark-draft"
        />
      ))}
    </svg>
  );
}
