import { Box, Flex, Text } from '@radix-ui/themes';
import { useCallback, useEffect, useState, type ReactNode } from 'react';
import type { TakeModel } from '../player/take-model';
import { TakeViewer, type CompareKind } from '../player/take-viewer';
import type { CompareLayout } from '../player/viewport-stage';

/** What the viewport shows. */
export interface TakeViewportProps {
  model: TakeModel;
  /** Current morph targets of the main take (region gains applied). */
  basis: Float32Array;
  /** Bumped whenever live tuning changed the main take's weights or basis. */
  version: number;
  frame: number;
  compare: CompareKind;
  otherModel: TakeModel | null;
  layout: CompareLayout;
  heatMap: boolean;
  /** The camera travels with the character. */
  follow: boolean;
  /** Labels of the two halves when side by side: [left, right]. */
  sideLabels: [string, string] | null;
  /** Called with the heat map's scale in millimetres (0 when off). */
  onHeatScale: (mm: number) => void;
  /** Called with the viewer once it exists (for "frame the character"). */
  onViewer: (viewer: TakeViewer | null) => void;
  /** Drawn over the 3D view (marks, the drawing layer, the legend). */
  children?: ReactNode;
}

/** The 3D view of the take: orbit with the mouse, frame by frame from the transport. */
export function TakeViewport(props: TakeViewportProps) {
  const { model, basis, version, frame, compare, otherModel, layout, heatMap, follow } = props;
  const { onHeatScale, onViewer, sideLabels, children } = props;
  const [viewer, setViewer] = useState<TakeViewer | null>(null);

  // The viewer lives as long as its canvas: made when React attaches it, freed when it goes.
  const attachCanvas = useCallback(
    (canvas: HTMLCanvasElement | null) => {
      if (!canvas) return;
      let renders = 0;
      const created = new TakeViewer(canvas, {
        onHeatScale,
        // Counted on the element (not in React state): tests wait for a drawn frame with it.
        onRender: () => canvas.setAttribute('data-renders', String(++renders)),
      });
      const box = canvas.parentElement;
      const observer = new ResizeObserver(() => {
        if (box) created.setSize(box.clientWidth, box.clientHeight);
      });
      if (box) {
        observer.observe(box);
        created.setSize(box.clientWidth, box.clientHeight);
      }
      setViewer(created);
      onViewer(created);
      return () => {
        observer.disconnect();
        onViewer(null);
        created.dispose();
      };
    },
    [onHeatScale, onViewer],
  );

  useEffect(() => viewer?.setModel(model, basis), [viewer, model, basis]);
  useEffect(() => viewer?.setCompare(compare, otherModel), [viewer, compare, otherModel]);
  useEffect(() => viewer?.setLayout(layout), [viewer, layout]);
  useEffect(() => viewer?.setHeatMap(heatMap), [viewer, heatMap]);
  useEffect(() => viewer?.setFollow(follow), [viewer, follow]);
  useEffect(() => {
    if (version > 0) viewer?.weightsChanged();
  }, [viewer, version]);
  useEffect(() => viewer?.setFrame(frame), [viewer, frame, version, compare, otherModel]);

  const split = sideLabels !== null && compare !== 'none' && layout === 'side-by-side';
  return (
    <Box className="take-viewport" data-testid="take-viewport" data-frame={frame}>
      <canvas
        ref={attachCanvas}
        className="take-viewport-canvas"
        aria-label="3D view of the take. Drag to orbit, scroll to zoom, right-drag to pan."
        role="img"
      />
      {split ? (
        <Flex className="take-viewport-sides" aria-hidden>
          {sideLabels.map((label) => (
            <Box key={label} className="take-viewport-side">
              <Text size="1" className="take-viewport-side-label">
                {label}
              </Text>
            </Box>
          ))}
        </Flex>
      ) : null}
      {children}
    </Box>
  );
}
