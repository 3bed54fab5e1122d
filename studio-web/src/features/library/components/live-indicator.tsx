import { Text } from '@radix-ui/themes';
import { LIBRARY_POLL_MS } from '../api/library-keys';
import './library.css';

/** Whether the page follows the show live (event stream open) or asks again every few seconds. */
export function LiveIndicator({ live }: { live: boolean }) {
  return (
    <Text size="1" color="gray" data-testid="live-indicator" data-live={live ? 'true' : 'false'}>
      {/* The text is grey, which re-tints the accent: name the accent's own colour. */}
      <span
        aria-hidden
        className="live-dot"
        style={
          live ? { backgroundColor: 'var(--amber-9)', borderColor: 'var(--amber-9)' } : undefined
        }
      />
      {live ? 'Live updates' : `Updates every ${LIBRARY_POLL_MS / 1000} s`}
    </Text>
  );
}
