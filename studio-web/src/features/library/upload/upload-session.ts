// One file's upload: fingerprint → open the upload → PUT every part straight to the S3 store
// (a few at a time, each retried a couple of times) → complete. Parts that still fail can be
// retried by hand with freshly signed URLs; cancel stops the PUTs and drops the upload.
import { abortUpload } from '../api/abort-upload';
import { completeUpload, type UploadedPart } from '../api/complete-upload';
import { createUpload } from '../api/create-upload';
import type { Asset, AssetKind } from '../api/library-types';
import { signUploadParts } from '../api/sign-upload-parts';
import type { ConsentInput, PartUrl } from '../api/upload-types';
import { fileSha256 } from './file-sha256';
import { putPartWithXhr, type PutPart } from './put-part';

/** Where an upload is. */
export type UploadPhase =
  | 'hashing'
  | 'starting'
  | 'uploading'
  | 'completing'
  | 'uploaded'
  | 'failed'
  | 'canceling'
  | 'canceled';

/** What to upload and what to record with it. */
export interface UploadRequest {
  file: File;
  kind: AssetKind;
  name?: string;
  characterId?: string;
  consent?: ConsentInput;
}

/** One part as the upload tracks it. */
export interface PartProgress {
  partNumber: number;
  size: number;
  sent: number;
  state: 'waiting' | 'sending' | 'done' | 'failed';
  etag?: string;
}

/** Everything the upload list shows about one file; replaced (never mutated) on each change. */
export interface UploadSnapshot {
  key: string;
  fileName: string;
  kind: AssetKind;
  size: number;
  phase: UploadPhase;
  /** Bytes the store has received (finished parts plus those in flight). */
  sentBytes: number;
  parts: readonly PartProgress[];
  /** Parts that failed after every automatic attempt. */
  failedParts: readonly number[];
  /** The recorded file, once the upload is open. */
  asset: Asset | null;
  /** Why the upload stopped, when it failed. */
  error: unknown;
}

/** The calls an upload makes; the defaults talk to the API and the S3 store. */
export interface UploadDeps {
  createUpload: typeof createUpload;
  signUploadParts: typeof signUploadParts;
  completeUpload: typeof completeUpload;
  abortUpload: typeof abortUpload;
  putPart: PutPart;
  sha256: (file: Blob) => Promise<string>;
}

/** Tuning of an upload. */
export interface UploadOptions {
  /** Parts in flight at once. */
  concurrency?: number;
  /** Tries per part before it counts as failed (the first one included). */
  attemptsPerPart?: number;
  /** Pause before an automatic retry of a part, times the try number, in milliseconds. */
  retryDelayMs?: number;
}

/** Defaults: three parts in flight, three tries each, one second between tries. */
export const UPLOAD_DEFAULTS: Required<UploadOptions> = {
  concurrency: 3,
  attemptsPerPart: 3,
  retryDelayMs: 1000,
};

const DEFAULT_DEPS: UploadDeps = {
  createUpload,
  signUploadParts,
  completeUpload,
  abortUpload,
  putPart: putPartWithXhr,
  sha256: fileSha256,
};

let nextKey = 1;

const isAbort = (e: unknown) => e instanceof DOMException && e.name === 'AbortError';
const wait = (ms: number) => new Promise<void>((r) => setTimeout(r, ms));

/** A file's upload with its live state; subscribe to follow it. */
export class UploadSession {
  private state: UploadSnapshot;
  private readonly listeners = new Set<(s: UploadSnapshot) => void>();
  private readonly controller = new AbortController();
  private partSize = 0;
  private running: Promise<void> | null = null;
  private readonly deps: UploadDeps;
  private readonly options: Required<UploadOptions>;

  constructor(
    private readonly showId: string,
    private readonly request: UploadRequest,
    deps: Partial<UploadDeps> = {},
    options: UploadOptions = {},
  ) {
    this.deps = { ...DEFAULT_DEPS, ...deps };
    this.options = { ...UPLOAD_DEFAULTS, ...options };
    this.state = {
      key: `upload-${nextKey++}`,
      fileName: request.file.name,
      kind: request.kind,
      size: request.file.size,
      phase: 'hashing',
      sentBytes: 0,
      parts: [],
      failedParts: [],
      asset: null,
      error: null,
    };
  }

  /** The current state. */
  snapshot(): UploadSnapshot {
    return this.state;
  }

  /** Calls `listener` on every change; returns the unsubscribe function. */
  subscribe(listener: (s: UploadSnapshot) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  /** Runs the upload from the start; resolves when it is uploaded, failed or canceled. */
  start(): Promise<void> {
    this.running ??= this.run(() => this.open());
    return this.running;
  }

  /** After a failure: opens the upload again, resends the failed parts, or completes again. */
  retry(): Promise<void> {
    if (this.state.phase !== 'failed') return this.running ?? Promise.resolve();
    const again = this.state.asset ? () => this.resendFailed() : () => this.open();
    this.running = this.run(again);
    return this.running;
  }

  /** Stops the PUTs and drops the upload in the API (nothing half-stored stays). */
  async cancel(): Promise<void> {
    const { phase, asset } = this.state;
    if (phase === 'uploaded' || phase === 'canceled' || phase === 'canceling') return;
    this.update({ phase: 'canceling' });
    this.controller.abort();
    await this.running?.catch(() => undefined);
    try {
      if (asset) await this.deps.abortUpload(this.showId, asset.id);
      this.update({ phase: 'canceled', error: null });
    } catch (error) {
      this.update({ phase: 'failed', error });
    }
  }

  private async run(step: () => Promise<void>): Promise<void> {
    try {
      await step();
    } catch (error) {
      if (this.controller.signal.aborted) return;
      this.update({ phase: 'failed', error });
    }
  }

  private async open(): Promise<void> {
    const { file, kind, name, characterId, consent } = this.request;
    this.update({ phase: 'hashing', error: null });
    const sha256 = await this.deps.sha256(file);
    this.throwIfCanceled();
    this.update({ phase: 'starting' });
    const upload = await this.deps.createUpload(
      this.showId,
      {
        kind,
        fileName: file.name,
        size: file.size,
        sha256,
        ...(file.type ? { contentType: file.type } : {}),
        ...(name ? { name } : {}),
        ...(characterId ? { characterId } : {}),
        ...(consent ? { consent } : {}),
      },
      { signal: this.controller.signal },
    );
    this.partSize = upload.partSize;
    const parts = Array.from({ length: upload.partCount }, (_, i) => ({
      partNumber: i + 1,
      size: Math.min(upload.partSize, file.size - i * upload.partSize),
      sent: 0,
      state: 'waiting' as const,
    }));
    this.update({ asset: upload.asset, parts, phase: 'uploading' });
    await this.sendAndComplete(upload.parts);
  }

  private async resendFailed(): Promise<void> {
    const asset = this.state.asset as Asset;
    const pending = this.state.parts.filter((p) => p.state !== 'done').map((p) => p.partNumber);
    this.update({ phase: 'uploading', error: null, failedParts: [] });
    if (pending.length === 0) return this.complete();
    // The first URLs may have expired: sign the parts again.
    const urls = await this.deps.signUploadParts(this.showId, asset.id, pending, {
      signal: this.controller.signal,
    });
    await this.sendAndComplete(urls);
  }

  private async sendAndComplete(urls: PartUrl[]): Promise<void> {
    const queue = urls.filter((u) => this.part(u.partNumber)?.state !== 'done');
    const worker = async () => {
      for (let next = queue.shift(); next; next = queue.shift()) await this.sendPart(next);
    };
    const workers = Math.min(this.options.concurrency, queue.length);
    await Promise.all(Array.from({ length: workers }, worker));
    this.throwIfCanceled();
    const failed = this.state.parts.filter((p) => p.state === 'failed').map((p) => p.partNumber);
    if (failed.length > 0) {
      this.update({ phase: 'failed', failedParts: failed });
      throw this.state.error ?? new Error(`Parts ${failed.join(', ')} could not be sent.`);
    }
    await this.complete();
  }

  private async sendPart({ partNumber, url }: PartUrl): Promise<void> {
    const { file } = this.request;
    const start = (partNumber - 1) * this.partSize;
    const body = file.slice(start, start + this.partSize);
    for (let attempt = 1; attempt <= this.options.attemptsPerPart; attempt++) {
      this.throwIfCanceled();
      this.setPart(partNumber, { state: 'sending', sent: 0 });
      try {
        const etag = await this.deps.putPart(url, body, {
          signal: this.controller.signal,
          onProgress: (sent) => this.setPart(partNumber, { sent }),
        });
        this.setPart(partNumber, { state: 'done', sent: body.size, etag });
        return;
      } catch (error) {
        if (isAbort(error) || this.controller.signal.aborted) throw error;
        this.setPart(partNumber, { state: 'failed', sent: 0 });
        this.update({ error });
        if (attempt < this.options.attemptsPerPart) await wait(this.options.retryDelayMs * attempt);
      }
    }
  }

  private async complete(): Promise<void> {
    const asset = this.state.asset as Asset;
    this.update({ phase: 'completing' });
    const parts: UploadedPart[] = this.state.parts.map((p) => ({
      partNumber: p.partNumber,
      etag: p.etag as string,
    }));
    const done = await this.deps.completeUpload(this.showId, asset.id, parts, {
      signal: this.controller.signal,
    });
    this.update({ phase: 'uploaded', asset: done, error: null });
  }

  private throwIfCanceled(): void {
    if (this.controller.signal.aborted) {
      throw new DOMException('The upload was canceled.', 'AbortError');
    }
  }

  private part(partNumber: number): PartProgress | undefined {
    return this.state.parts.find((p) => p.partNumber === partNumber);
  }

  private setPart(partNumber: number, change: Partial<PartProgress>): void {
    const parts = this.state.parts.map((p) =>
      p.partNumber === partNumber ? { ...p, ...change } : p,
    );
    this.update({ parts, sentBytes: parts.reduce((sum, p) => sum + p.sent, 0) });
  }

  private update(change: Partial<UploadSnapshot>): void {
    this.state = { ...this.state, ...change };
    for (const listener of this.listeners) listener(this.state);
  }
}
