import { fireEvent, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render-with-providers';
import type { UploadSnapshot } from '../upload/upload-session';
import { UploadRow } from './upload-row';

const FAILED: UploadSnapshot = {
  key: 'upload-1',
  fileName: 'drill.glb',
  kind: 'capture',
  size: 12_000_000,
  phase: 'failed',
  sentBytes: 8_000_000,
  parts: [
    { partNumber: 1, size: 5_000_000, sent: 5_000_000, state: 'done', etag: '"a"' },
    { partNumber: 2, size: 5_000_000, sent: 0, state: 'failed' },
    { partNumber: 3, size: 2_000_000, sent: 0, state: 'failed' },
  ],
  failedParts: [2, 3],
  asset: {
    id: 'asset-1',
    kind: 'capture',
    state: 'pending',
    fileName: 'drill.glb',
    size: 12_000_000,
    progress: null,
    validationReport: null,
  },
  error: new Error('The file store could not be reached.'),
};

describe('UploadRow', () => {
  it('names the parts that failed and offers to retry them or cancel the upload', () => {
    const onRetry = vi.fn();
    const onCancel = vi.fn();
    renderWithProviders(
      <UploadRow
        upload={FAILED}
        showId="show-1"
        live
        onRetry={onRetry}
        onCancel={onCancel}
        onDismiss={() => {}}
      />,
    );
    expect(screen.getByTestId('upload-error').textContent).toBe(
      'Parts 2, 3 could not be sent. The file store could not be reached.',
    );
    screen.getByText('Upload stopped');
    screen.getByText('67 %');
    fireEvent.click(screen.getByRole('button', { name: 'Retry failed parts' }));
    fireEvent.click(screen.getByRole('button', { name: 'Cancel upload' }));
    expect(onRetry).toHaveBeenCalledTimes(1);
    expect(onCancel).toHaveBeenCalledTimes(1);
    expect(screen.queryByRole('button', { name: /Dismiss/ })).toBeNull();
  });
});
