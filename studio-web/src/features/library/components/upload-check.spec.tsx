import { act, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { calls, mockApi } from '@/app/testing/mock-api';
import { jsonResponse } from '@/testing/mock-fetch';
import { renderWithProviders } from '@/testing/render-with-providers';
import { useLiveLibrary } from '../hooks/use-live-library';
import { UploadCheck } from './upload-check';

const ASSET_URL = '/api/shows/show-1/assets/asset-1';
const asset = (state: string, stage: string, percent: number, report: unknown = null) => ({
  id: 'asset-1',
  kind: 'clip',
  state,
  fileName: 'walk.bvh',
  size: 100,
  progress: { stage, percent },
  validationReport: report,
});

/** A stand-in for the browser's EventSource that the test drives by hand. */
class FakeEventSource {
  static last: FakeEventSource | null = null;
  onopen: (() => void) | null = null;
  onerror: (() => void) | null = null;
  private readonly listeners = new Map<string, (e: MessageEvent<string>) => void>();
  constructor(readonly url: string) {
    FakeEventSource.last = this;
  }
  addEventListener(type: string, listener: (e: MessageEvent<string>) => void) {
    this.listeners.set(type, listener);
  }
  removeEventListener(type: string) {
    this.listeners.delete(type);
  }
  close() {}
  emit(type: string, data: unknown) {
    this.listeners.get(type)?.(new MessageEvent(type, { data: JSON.stringify(data) }));
  }
}

function Page() {
  const { live } = useLiveLibrary('show-1');
  return <UploadCheck showId="show-1" assetId="asset-1" fileName="walk.bvh" live={live} />;
}

afterEach(() => {
  FakeEventSource.last = null;
});

describe('an uploaded file’s check', { timeout: 20_000 }, () => {
  it('follows the check from the show’s event stream without asking the API again', async () => {
    vi.stubGlobal('EventSource', FakeEventSource);
    let stored = asset('pending', 'queued', 0);
    const spy = mockApi({ [`GET ${ASSET_URL}`]: () => jsonResponse(stored) });
    renderWithProviders(<Page />);
    const check = await screen.findByTestId('upload-check');
    await waitFor(() => within(check).getByText('Waiting for a worker to check it'));
    const source = FakeEventSource.last as FakeEventSource;
    expect(source.url).toBe('/api/shows/show-1/events');

    act(() => {
      source.onopen?.();
      source.emit('asset.progress', {
        assetId: 'asset-1',
        kind: 'clip',
        stage: 'validating',
        percent: 60,
        state: 'pending',
      });
    });
    within(check).getByText('Checking the contents');
    within(check).getByText('60 %');
    expect(calls(spy).filter((c) => c === `GET ${ASSET_URL}`)).toHaveLength(1);
    // The check is over: the page reads the final record (metadata or report) once.
    stored = asset('ready', 'ready', 100);
    act(() => {
      source.emit('asset.progress', {
        assetId: 'asset-1',
        kind: 'clip',
        stage: 'ready',
        percent: 100,
        state: 'ready',
      });
    });
    await waitFor(() => expect(check.getAttribute('data-state')).toBe('ready'));
    within(check).getByText('Ready');
  });

  it('asks the API every few seconds when there is no event stream, and shows the refusal in words', async () => {
    vi.stubGlobal('EventSource', undefined);
    let polls = 0;
    mockApi({
      [`GET ${ASSET_URL}`]: () =>
        jsonResponse(
          ++polls === 1
            ? asset('pending', 'downloading', 30)
            : asset('rejected', 'rejected', 100, {
                code: 'BVH_CHANNEL_COUNT',
                message: 'Joint LeftArm declares 3 channels but the motion line has 2 values.',
                where: { line: 212, joint: 'LeftArm' },
              }),
        ),
    });
    renderWithProviders(<Page />);
    const check = await screen.findByTestId('upload-check');
    await waitFor(() => within(check).getByText('Reading the file'));
    // The next poll is due 2 s later; allow for a slow machine.
    await waitFor(() => expect(check.getAttribute('data-state')).toBe('rejected'), {
      timeout: 8000,
    });
    const report = within(check).getByTestId('validation-report');
    expect(report.textContent).toContain(
      'walk.bvh was not accepted: Joint LeftArm declares 3 channels',
    );
    expect(report.textContent).toContain('Where: joint LeftArm, line 212.');
    expect(report.textContent).toContain('BVH_CHANNEL_COUNT');
  });
});
