import { Button, Callout, Flex, Slider, Spinner, Switch, Text } from '@radix-ui/themes';
import { useEffect, useRef, useState } from 'react';
import { CrossIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import '../components/library.css';
import { motionBounds, type PreviewAnimation, type PreviewContent } from './preview-content';
import { PreviewViewer } from './preview-viewer';
import type { StickFigure } from './stick-figure';

/** Props of the 3D preview. */
export interface AssetPreviewProps {
  /** Downloads and reads what to show (once per mount: key the component by its content). */
  load: (signal: AbortSignal) => Promise<PreviewContent>;
  /** What is shown, for the view's accessible name, e.g. "Character Coach Madge". */
  label: string;
}

type Status = { kind: 'loading' } | { kind: 'ready' } | { kind: 'error'; message: string };

/** A framed 3D view of a library file with orbit controls, a floor grid and, for motion, playback. */
export function AssetPreview({ load, label }: AssetPreviewProps) {
  const container = useRef<HTMLDivElement>(null);
  const viewer = useRef<PreviewViewer | null>(null);
  const loadRef = useRef(load);
  const playing = useRef(true);
  const time = useRef(0);
  const [status, setStatus] = useState<Status>({ kind: 'loading' });
  const [animation, setAnimation] = useState<PreviewAnimation | null>(null);
  const skeleton = useRef<StickFigure | null>(null);
  const [hasSkeleton, setHasSkeleton] = useState(false);
  const [frame, setFrame] = useState(0);
  const [isPlaying, setIsPlaying] = useState(true);

  useEffect(() => {
    loadRef.current = load;
  });

  // The parent keys this component by its content, so one mount shows one file.
  useEffect(() => {
    const element = container.current;
    if (!element) return;
    const controller = new AbortController();
    let view: PreviewViewer | null = null;
    let content: PreviewContent | null = null;
    const start = async () => {
      try {
        view = new PreviewViewer(element);
      } catch {
        throw new Error('this browser cannot draw 3D (WebGL is off).');
      }
      viewer.current = view;
      const loaded = await loadRef.current(controller.signal);
      if (controller.signal.aborted) return loaded.dispose();
      content = loaded;
      view.show(loaded.object, motionBounds(loaded));
      skeleton.current = (loaded.object.userData.skeleton as StickFigure | undefined) ?? null;
      setHasSkeleton(skeleton.current !== null);
      const anim = loaded.animation;
      setAnimation(anim);
      if (anim) view.setFrameCallback(playback(anim));
      setStatus({ kind: 'ready' });
    };
    const playback = (anim: PreviewAnimation) => {
      let shown = 0;
      return (dt: number) => {
        if (!playing.current) return;
        time.current = (time.current + dt) % anim.duration;
        anim.seek(time.current);
        const f = Math.min(anim.frameCount - 1, Math.floor(time.current * anim.fps + 1e-6));
        if (f !== shown) {
          shown = f;
          setFrame(f);
        }
      };
    };
    start().catch((error: unknown) => {
      if (controller.signal.aborted) return;
      setStatus({ kind: 'error', message: error instanceof Error ? error.message : String(error) });
    });
    return () => {
      controller.abort();
      view?.dispose();
      content?.dispose();
      viewer.current = null;
    };
  }, []);

  const seekFrame = (f: number) => {
    if (!animation) return;
    const clamped = ((f % animation.frameCount) + animation.frameCount) % animation.frameCount;
    time.current = clamped / animation.fps;
    animation.seek(time.current);
    setFrame(clamped);
  };
  const togglePlay = () => {
    playing.current = !playing.current;
    setIsPlaying(playing.current);
  };

  return (
    <Flex direction="column" gap="2" data-testid="asset-preview" data-status={status.kind}>
      <div className="viewer" ref={container} role="img" aria-label={`3D view: ${label}`}>
        {status.kind === 'loading' ? (
          <Flex position="absolute" inset="0" align="center" justify="center" gap="2">
            <Spinner />
            <Text color="gray">Loading the file…</Text>
          </Flex>
        ) : null}
      </div>
      {status.kind === 'error' ? (
        <Callout.Root color="red" role="alert">
          <Callout.Icon>
            <CrossIcon size={16} />
          </Callout.Icon>
          <Callout.Text>The preview could not be shown: {status.message}</Callout.Text>
        </Callout.Root>
      ) : null}
      <Flex align="center" gap="3" wrap="wrap">
        {animation ? (
          <>
            <Button size="1" onClick={togglePlay} aria-pressed={isPlaying}>
              {isPlaying ? 'Pause' : 'Play'}
            </Button>
            <Button
              size="1"
              variant="soft"
              onClick={() => seekFrame(frame - 1)}
              aria-label="Previous frame"
            >
              ◂ Frame
            </Button>
            <Button
              size="1"
              variant="soft"
              onClick={() => seekFrame(frame + 1)}
              aria-label="Next frame"
            >
              Frame ▸
            </Button>
            <Flex flexGrow="1" minWidth="160px">
              <Slider
                size="1"
                min={0}
                max={animation.frameCount - 1}
                step={1}
                value={[frame]}
                onValueChange={([f]) => seekFrame(f)}
                aria-label="Frame"
              />
            </Flex>
            <Text size="1" color="gray">
              Frame{' '}
              <Mono size="2" highContrast data-testid="preview-frame">
                {frame}
              </Mono>{' '}
              of <Mono size="2">{animation.frameCount}</Mono> at{' '}
              <Mono size="2">{animation.fps}</Mono> fps
            </Text>
          </>
        ) : null}
        {hasSkeleton ? (
          <Text as="label" size="1">
            <Flex gap="2" align="center">
              <Switch
                size="1"
                onCheckedChange={(on) => {
                  if (skeleton.current) skeleton.current.visible = on;
                }}
              />
              Show skeleton
            </Flex>
          </Text>
        ) : null}
        <Button
          size="1"
          variant="ghost"
          color="gray"
          onClick={() => viewer.current?.frame()}
          disabled={status.kind !== 'ready'}
        >
          Frame the view
        </Button>
      </Flex>
    </Flex>
  );
}
