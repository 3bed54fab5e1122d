// The uploads started on a library page: a small store of sessions that React follows.
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useMemo, useState, useSyncExternalStore } from 'react';
import { libraryKeys } from '../api/library-keys';
import {
  UploadSession,
  type UploadDeps,
  type UploadRequest,
  type UploadSnapshot,
} from './upload-session';

/** Holds the sessions of one page and tells React when any of them changes. */
class UploadStore {
  private sessions: UploadSession[] = [];
  private snapshots: UploadSnapshot[] = [];
  private readonly listeners = new Set<() => void>();

  constructor(
    private readonly showId: string,
    private readonly deps: Partial<UploadDeps>,
    private readonly onPhase: (s: UploadSnapshot) => void,
  ) {}

  subscribe = (listener: () => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  getSnapshot = () => this.snapshots;

  add(request: UploadRequest): UploadSession {
    const session = new UploadSession(this.showId, request, this.deps);
    let phase = session.snapshot().phase;
    session.subscribe((s) => {
      this.refresh();
      if (s.phase !== phase) {
        phase = s.phase;
        this.onPhase(s);
      }
    });
    this.sessions = [session, ...this.sessions];
    this.refresh();
    void session.start();
    return session;
  }

  find(key: string): UploadSession | undefined {
    return this.sessions.find((s) => s.snapshot().key === key);
  }

  dismiss(key: string): void {
    this.sessions = this.sessions.filter((s) => s.snapshot().key !== key);
    this.refresh();
  }

  cancelAll(): void {
    for (const s of this.sessions) void s.cancel();
  }

  private refresh(): void {
    this.snapshots = this.sessions.map((s) => s.snapshot());
    for (const listener of this.listeners) listener();
  }
}

/** What the upload list can do. */
export interface Uploads {
  uploads: readonly UploadSnapshot[];
  add: (request: UploadRequest) => void;
  retry: (key: string) => void;
  cancel: (key: string) => void;
  dismiss: (key: string) => void;
}

/** The page's uploads; leaving the page cancels those still running. */
export function useUploads(showId: string, deps: Partial<UploadDeps> = {}): Uploads {
  const queryClient = useQueryClient();
  const [store] = useState(
    () =>
      new UploadStore(showId, deps, (s) => {
        // The library lists the file as soon as it is recorded, then again once complete.
        if (s.phase === 'uploading' || s.phase === 'uploaded' || s.phase === 'canceled') {
          void queryClient.invalidateQueries({ queryKey: libraryKeys.all(showId) });
        }
      }),
  );
  useEffect(() => () => store.cancelAll(), [store]);
  const uploads = useSyncExternalStore(store.subscribe, store.getSnapshot);
  const add = useCallback((request: UploadRequest) => void store.add(request), [store]);
  const retry = useCallback((key: string) => void store.find(key)?.retry(), [store]);
  const cancel = useCallback((key: string) => void store.find(key)?.cancel(), [store]);
  const dismiss = useCallback((key: string) => store.dismiss(key), [store]);
  return useMemo(
    () => ({ uploads, add, retry, cancel, dismiss }),
    [uploads, add, retry, cancel, dismiss],
  );
}
