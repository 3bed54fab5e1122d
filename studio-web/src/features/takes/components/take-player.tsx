import { Button, Flex, Text } from '@radix-ui/themes';
import { useCallback, useMemo, useReducer, useRef, useState } from 'react';
import { KeyHint } from '@/components/ui/key-hint';
import { useOpenShortcutHelp } from '@/components/layouts/shortcuts-provider';
import { usePermissions, useSession } from '@/features/auth';
import type { Shot } from '@/features/shots/api/shot-types';
import { useShotTakes } from '../api/get-shot-takes';
import { useNotes } from '../api/get-notes';
import { useTakeFile } from '../api/get-take-file';
import type { MarkPoint, Note } from '../api/note-view';
import type { Take } from '../api/take-view';
import { useLiveTuning } from '../hooks/use-live-tuning';
import { usePlaybackClock } from '../hooks/use-playback-clock';
import { usePlayerKeys } from '../hooks/use-player-keys';
import { useTakeModel } from '../hooks/use-take-model';
import { useUrlFrame } from '../hooks/use-url-frame';
import type { TakeModel } from '../player/take-model';
import type { TakeViewer } from '../player/take-viewer';
import { marksAtFrame } from '../review/note-frames';
import { takeFrameRange, takeIndexOf } from '../transport/shot-frames';
import { initialTransport, transportReducer } from '../transport/transport-state';
import { ControlsPanel } from './controls-panel';
import { ControlsSummary } from './controls-summary';
import { HeatMapLegend } from './heat-map-legend';
import { MarkLayer } from './mark-layer';
import { ReviewPanel } from './review-panel';
import { TakeViewport } from './take-viewport';
import { TransportBar } from './transport-bar';
import { modeLabel, ViewOptions, type ViewSettings } from './view-options';

/** Props of the player. */
export interface TakePlayerProps {
  showId: string;
  take: Take;
  /** The take's shot: its frame range and rate place the take's frames. */
  shot: Pick<Shot, 'frameStart' | 'frameEnd' | 'fps'>;
  model: TakeModel;
}

/** The take player: viewport, transport, compare and heat map, controls, and review. */
export function TakePlayer({ showId, take, shot, model }: TakePlayerProps) {
  const { user, role } = useSession();
  const { can } = usePermissions();
  // The take holds one frame per shot frame, from the shot's first: frames on screen and in the
  // address are shot frames, and the viewer is posed by the take's own index.
  const range = useMemo(
    () => takeFrameRange(shot.frameStart, model.frameCount),
    [shot.frameStart, model.frameCount],
  );
  const [transport, dispatch] = useReducer(transportReducer, undefined, () =>
    initialTransport(range, shot.fps),
  );
  const tuning = useLiveTuning(model);
  const [view, setView] = useState<ViewSettings>({
    compare: 'none',
    otherTakeId: null,
    layout: 'side-by-side',
    heatMap: false,
    follow: true,
  });
  const changeView = useCallback(
    (patch: Partial<ViewSettings>) => setView((v) => ({ ...v, ...patch })),
    [],
  );
  const shotTakes = useShotTakes(showId, take.shotId);
  const otherTakeId = view.compare === 'take' ? (view.otherTakeId ?? undefined) : undefined;
  const otherFile = useTakeFile(showId, otherTakeId);
  const otherModel = useTakeModel(otherTakeId, otherFile.data);
  const [heatScaleMm, setHeatScaleMm] = useState(0);
  const viewer = useRef<TakeViewer | null>(null);
  const onViewer = useCallback((v: TakeViewer | null) => {
    viewer.current = v;
  }, []);
  const [drawing, setDrawing] = useState(false);
  const [draft, setDraft] = useState<MarkPoint[][]>([]);
  const [activeNoteId, setActiveNoteId] = useState<string | null>(null);
  const notes = useNotes(showId, take.id);

  const frameCharacter = useCallback(() => {
    viewer.current?.frameCharacter();
  }, []);

  usePlaybackClock(transport.playing, dispatch);
  useUrlFrame(transport, dispatch);

  const onJump = useCallback((note: Note) => {
    setActiveNoteId(note.id);
    dispatch({ type: 'pause' });
    dispatch({ type: 'seek', frame: note.frame });
  }, []);

  const canWrite = can('writeNote');
  usePlayerKeys({
    transport,
    dispatch,
    toggleHeatMap: () => changeView({ heatMap: !view.heatMap }),
    frameCharacter,
    notes: notes.data ?? [],
    onJump,
    canWrite,
    toggleDrawing: () => setDrawing((d) => !d),
  });
  const openHelp = useOpenShortcutHelp();

  const shotFrame = transport.frame;
  const marks = marksAtFrame(notes.data ?? [], shotFrame);
  const others = (shotTakes.data ?? []).filter((t) => t.id !== take.id);
  const otherTake = others.find((t) => t.id === otherTakeId);
  const comparing = view.compare === 'skinning' || (view.compare === 'take' && otherModel.data);
  const sideLabels: [string, string] | null = comparing
    ? [
        view.compare === 'skinning' ? 'Skinning only' : `Take v${otherTake?.version ?? '?'}`,
        `Take v${take.version}${tuning.changed ? ' (tuned)' : ''}`,
      ]
    : null;
  const modes = model.take.extras.modes;
  const soloNote =
    tuning.solo === null ? null : `Solo: ${modeLabel(modes[tuning.solo], tuning.solo)}`;

  return (
    <div className="take-layout" data-testid="take-player" data-take-version={take.version}>
      <div className="take-stage">
        <TakeViewport
          model={model}
          basis={tuning.basis}
          version={tuning.version}
          frame={takeIndexOf(transport.frame, range)}
          compare={comparing ? view.compare : 'none'}
          otherModel={view.compare === 'take' ? (otherModel.data ?? null) : null}
          layout={view.layout}
          heatMap={view.heatMap}
          follow={view.follow}
          sideLabels={sideLabels}
          onHeatScale={setHeatScaleMm}
          onViewer={onViewer}
        >
          <MarkLayer
            notes={marks}
            activeNoteId={activeNoteId}
            drawing={drawing}
            draft={draft}
            onDraftChange={setDraft}
          />
          {view.heatMap && heatScaleMm > 0 ? (
            <div className="take-viewport-legend">
              <HeatMapLegend scaleMm={heatScaleMm} note={soloNote} />
            </div>
          ) : null}
        </TakeViewport>
        {comparing && view.layout === 'overlay' ? (
          <Text size="1" color="gray">
            Overlaid: {sideLabels?.[0]} drawn as an amber wireframe over take v{take.version}.
          </Text>
        ) : null}
        {view.compare === 'take' && otherModel.isError ? (
          <Text size="2" color="red">
            The other take cannot be shown: {String(otherModel.error)}
          </Text>
        ) : null}
        <TransportBar state={transport} shotFps={shot.fps} dispatch={dispatch} />
        {range.last !== shot.frameEnd ? (
          <Text size="1" color="amber" data-testid="range-mismatch">
            This take has {model.frameCount} frames ({range.first}–{range.last}); the shot is now{' '}
            {shot.frameStart}–{shot.frameEnd}. Solve the shot again for a take of its range.
          </Text>
        ) : null}
        <Flex gap="4" align="end" justify="between" wrap="wrap">
          <ViewOptions
            settings={view}
            onChange={changeView}
            otherTakes={others}
            modes={modes}
            solo={tuning.solo}
            onSolo={tuning.setSolo}
            onFrameCharacter={frameCharacter}
          />
          <Flex height="32px" align="center">
            <Button variant="ghost" color="gray" onClick={openHelp} data-testid="open-shortcuts">
              Keyboard shortcuts <KeyHint command="showHelp" />
            </Button>
          </Flex>
        </Flex>
      </div>
      <div className="take-panels">
        {can('tuneTake') ? (
          <ControlsPanel
            showId={showId}
            take={take}
            model={model}
            tuning={tuning}
            canSave={can('saveTake')}
          />
        ) : null}
        <ReviewPanel
          showId={showId}
          take={take}
          shotFrame={shotFrame}
          userId={user.id}
          isAdmin={role === 'admin'}
          canWrite={canWrite}
          canResolve={can('resolveNote')}
          canDecide={can('decide')}
          drawing={drawing}
          onDrawingChange={setDrawing}
          draft={draft}
          onDraftChange={setDraft}
          onJump={onJump}
        />
        {can('tuneTake') ? null : <ControlsSummary model={model} solo={tuning.solo} />}
      </div>
    </div>
  );
}
