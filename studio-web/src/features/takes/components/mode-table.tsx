import { Box, Checkbox, Table, Text } from '@radix-ui/themes';
import type { Mode } from '@overshoot/solver';
import { Mono } from '@/components/ui/mono';

/** Props of the modes table. */
export interface ModeTableProps {
  modes: Mode[];
  /** Live stiffness and damping relative to the take's own (frequency and ζ scale with them). */
  stiffnessFactor: number;
  dampingFactor: number;
  muted: number[];
  /** Given: the mute column is shown and calls this; absent: read-only. */
  onMute?: (mode: number, muted: boolean) => void;
  solo: number | null;
}

/** The take's modes with their live frequency and damping ratio; mutes when allowed. */
export function ModeTable({
  modes,
  stiffnessFactor,
  dampingFactor,
  muted,
  onMute,
  solo,
}: ModeTableProps) {
  return (
    <Box className="take-mode-scroll" tabIndex={0} aria-label="Modes of the take">
      <Table.Root size="1" variant="surface" className="take-mode-table" data-testid="mode-table">
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Mode</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Region</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell justify="end">Hz</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell justify="end">ζ</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell justify="end">Energy</Table.ColumnHeaderCell>
            {onMute ? <Table.ColumnHeaderCell>Mute</Table.ColumnHeaderCell> : null}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {modes.map((m, i) => {
            const isMuted = muted.includes(i);
            const silent = isMuted || (solo !== null && solo !== i);
            return (
              <Table.Row key={i} data-silent={silent || undefined}>
                <Table.RowHeaderCell>
                  <Mono size="1">{i + 1}</Mono>
                </Table.RowHeaderCell>
                <Table.Cell>
                  <Text size="1">{m.region}</Text>
                </Table.Cell>
                <Table.Cell justify="end">
                  <Mono size="1">{(m.frequencyHz * stiffnessFactor).toFixed(2)}</Mono>
                </Table.Cell>
                <Table.Cell justify="end">
                  <Mono size="1">{Math.min(1, m.dampingRatio * dampingFactor).toFixed(3)}</Mono>
                </Table.Cell>
                <Table.Cell justify="end">
                  <Mono size="1">{(m.energyShare * 100).toFixed(1)} %</Mono>
                </Table.Cell>
                {onMute ? (
                  <Table.Cell>
                    <Checkbox
                      checked={isMuted}
                      onCheckedChange={(v) => onMute(i, v === true)}
                      aria-label={`Mute mode ${i + 1} (${m.region})`}
                    />
                  </Table.Cell>
                ) : null}
              </Table.Row>
            );
          })}
        </Table.Body>
      </Table.Root>
    </Box>
  );
}
