// The controls an animator moves, applied live to the loaded take through the solver's live
// tuner, with the time each update took.
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { LiveTuning } from '../player/live-tuning';
import type { TakeModel } from '../player/take-model';

/** The controls live tuning changes (the rest of the take's controls stay as they were). */
export interface TuningControls {
  gain: number;
  stiffness: number;
  damping: number;
  regionGains: Record<string, number>;
  mutedModes: number[];
}

/** Timing of live updates, in milliseconds. */
export interface TuneTiming {
  /** The last update. */
  last: number | null;
  /** The slowest since the page opened. */
  slowest: number | null;
  /** Updates so far. */
  count: number;
}

/** Simulation runs made while the page is idle after loading a take. */
const WARM_UP_RUNS = 5;

const num = (v: unknown, fallback: number) =>
  typeof v === 'number' && Number.isFinite(v) ? v : fallback;

/** The tunable part of a take's controls (solver defaults where the take says nothing). */
export function tuningFromControls(controls: Record<string, unknown>): TuningControls {
  const regionGains: Record<string, number> = {};
  const rg = controls.regionGains;
  if (rg && typeof rg === 'object') {
    for (const [name, g] of Object.entries(rg)) if (typeof g === 'number') regionGains[name] = g;
  }
  const muted = Array.isArray(controls.mutedModes) ? controls.mutedModes : [];
  return {
    gain: num(controls.gain, 1),
    stiffness: num(controls.stiffness, 1),
    damping: num(controls.damping, 1),
    regionGains,
    mutedModes: muted.filter((m): m is number => Number.isInteger(m)),
  };
}

/** Live tuning of `model`, starting from the controls it was made with. */
export function useLiveTuning(model: TakeModel) {
  const tuning = useMemo(() => new LiveTuning(model), [model]);
  const initial = useMemo(
    () => tuningFromControls(model.take.extras.controls as unknown as Record<string, unknown>),
    [model],
  );
  const maxDisplacement = model.take.extras.controls.maxDisplacement ?? null;
  const [controls, setControls] = useState<TuningControls>(initial);
  const [solo, setSoloState] = useState<number | null>(null);
  const [timing, setTiming] = useState<TuneTiming>({ last: null, slowest: null, count: 0 });
  const [lostVertices, setLostVertices] = useState(0);
  /** Bumped whenever the weights or the basis changed, so views repaint. */
  const [version, setVersion] = useState(0);
  const current = useRef({ controls: initial, solo: null as number | null });

  // Warm the simulation up in idle moments after loading, a few runs apart, so the first drag
  // runs compiled code (see LiveTuning.warmUp).
  useEffect(() => {
    let runs = 0;
    let timer = window.setTimeout(function run() {
      tuning.warmUp();
      if (++runs < WARM_UP_RUNS) timer = window.setTimeout(run, 50);
    }, 300);
    return () => window.clearTimeout(timer);
  }, [tuning]);

  const record = useCallback((ms: number) => {
    setTiming((t) => ({ last: ms, slowest: Math.max(t.slowest ?? 0, ms), count: t.count + 1 }));
    setVersion((v) => v + 1);
  }, []);

  const simulate = useCallback(
    (c: TuningControls, soloMode: number | null) =>
      tuning.apply({
        gain: c.gain,
        stiffness: c.stiffness,
        damping: c.damping,
        mutedModes: c.mutedModes,
        soloModes: soloMode === null ? [] : [soloMode],
        maxDisplacement,
      }).ms,
    [tuning, maxDisplacement],
  );

  /** Changes some controls and re-simulates at once (synchronously, while the slider moves). */
  const update = useCallback(
    (patch: Partial<TuningControls>) => {
      const next = { ...current.current.controls, ...patch };
      current.current.controls = next;
      let ms = 0;
      if (patch.regionGains) {
        const result = tuning.applyRegionGains(next.regionGains);
        setLostVertices(result.lostVertices);
        ms += result.ms;
      }
      const dynamics =
        patch.gain !== undefined ||
        patch.stiffness !== undefined ||
        patch.damping !== undefined ||
        patch.mutedModes !== undefined;
      if (dynamics) ms += simulate(next, current.current.solo);
      setControls(next);
      record(ms);
    },
    [tuning, simulate, record],
  );

  /** Plays one mode alone (a view setting, never saved), or all with null. */
  const setSolo = useCallback(
    (mode: number | null) => {
      current.current.solo = mode;
      setSoloState(mode);
      record(simulate(current.current.controls, mode));
    },
    [simulate, record],
  );

  /** Back to the take's own controls. */
  const reset = useCallback(() => {
    current.current.controls = initial;
    tuning.applyRegionGains(initial.regionGains);
    setControls(initial);
    setLostVertices(0);
    record(simulate(initial, current.current.solo));
  }, [initial, tuning, simulate, record]);

  // The player re-renders on every playback frame: compare only when the controls change.
  const changed = useMemo(
    () => JSON.stringify(controls) !== JSON.stringify(initial),
    [controls, initial],
  );
  const basis = tuning.basis;
  // One object per change, so panels that take it can skip re-rendering during playback.
  return useMemo(
    () => ({
      controls,
      initial,
      changed,
      solo,
      timing,
      lostVertices,
      version,
      basis,
      update,
      setSolo,
      reset,
    }),
    [
      controls,
      initial,
      changed,
      solo,
      timing,
      lostVertices,
      version,
      basis,
      update,
      setSolo,
      reset,
    ],
  );
}

/** What `useLiveTuning` returns. */
export type LiveTuningApi = ReturnType<typeof useLiveTuning>;
