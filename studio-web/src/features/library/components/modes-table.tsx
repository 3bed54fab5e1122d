import { Badge, Flex, Table, Text } from '@radix-ui/themes';
import { Mono } from '@/components/ui/mono';
import type { Mode } from '../api/profile-types';

// The solver's mode flags in words.
const FLAG_WORDS: Record<string, string> = {
  overdamped: 'overdamped',
  'near-nyquist': 'near the Nyquist limit',
  'real-negative-pole': 'real negative pole',
};

/** A damping ratio in words, for a quick read of the table. */
export function dampingWords(ratio: number): string {
  if (ratio < 0.1) return 'rings on';
  if (ratio < 0.3) return 'bouncy';
  if (ratio < 0.7) return 'settles quickly';
  return 'barely overshoots';
}

/** The profile's modes in its own order (the order controls refer to): numbers in mono. */
export function ModesTable({ modes }: { modes: Mode[] }) {
  if (modes.length === 0) return <Text color="gray">The profile has no modes.</Text>;
  return (
    <Table.Root variant="surface" size="1" aria-label="Modes" data-testid="modes-table">
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell justify="end">Mode</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Region</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Frequency (Hz)</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Damping ratio</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Energy share</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {modes.map((m, i) => (
          <Table.Row key={i} data-testid="mode-row">
            <Table.Cell justify="end">
              <Mono>{i}</Mono>
            </Table.Cell>
            <Table.RowHeaderCell>
              <Flex gap="2" align="center" wrap="wrap">
                {m.region || '—'}
                {m.flags.map((f) => (
                  <Badge key={f} size="1" color="orange" variant="soft">
                    {FLAG_WORDS[f] ?? f.replace(/[_-]+/g, ' ')}
                  </Badge>
                ))}
              </Flex>
            </Table.RowHeaderCell>
            <Table.Cell justify="end">
              <Mono>{m.frequencyHz.toFixed(2)}</Mono>
            </Table.Cell>
            <Table.Cell justify="end">
              <Mono>{m.dampingRatio.toFixed(3)}</Mono>{' '}
              <Text size="1" color="gray">
                {dampingWords(m.dampingRatio)}
              </Text>
            </Table.Cell>
            <Table.Cell>
              <Flex align="center" gap="2">
                <div
                  aria-hidden
                  style={{
                    width: `${Math.max(2, Math.round(m.energyShare * 120))}px`,
                    height: 6,
                    borderRadius: 3,
                    background: 'var(--accent-9)',
                  }}
                />
                <Mono>{(m.energyShare * 100).toFixed(1)} %</Mono>
              </Flex>
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
