import { Link as RadixLink, Table, Text } from '@radix-ui/themes';
import { Fragment } from 'react';
import { Link } from 'react-router-dom';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import type { Clip } from '../api/library-types';
import { FileStateCell, ReportRow } from './file-state-cell';
import { formatDay } from './format-date';

/** Props of the clip table. */
export interface ClipTableProps {
  showId: string;
  clips: Clip[];
  live: boolean;
  showProgress: boolean;
}

/** Length of a clip in seconds at its rate, e.g. "4.2 s"; "—" when unknown. */
export function clipSeconds(frameCount: number | null, fps: number | null): string {
  return frameCount && fps ? `${(frameCount / fps).toFixed(1)} s` : '—';
}

/** The show's clips: name, format, state, frames, rate, joints, when added. */
export function ClipTable({ showId, clips, live, showProgress }: ClipTableProps) {
  if (clips.length === 0) return <Text color="gray">No clips yet.</Text>;
  return (
    <Table.Root variant="surface" aria-label="Clips" data-testid="clip-table">
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>State</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Format</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Frames</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">fps</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Length</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Added</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {clips.map((c) => (
          <Fragment key={c.id}>
            <Table.Row data-testid="clip-row" data-name={c.name} data-state={c.state}>
              <Table.RowHeaderCell>
                {c.state === 'ready' ? (
                  <RadixLink asChild>
                    <Link to={paths.clip.getHref(showId, c.id)}>{c.name}</Link>
                  </RadixLink>
                ) : (
                  c.name
                )}
              </Table.RowHeaderCell>
              <FileStateCell item={c} showId={showId} live={live} showProgress={showProgress} />
              <Table.Cell>
                <Mono size="2">{c.format.toUpperCase()}</Mono>
              </Table.Cell>
              <Table.Cell justify="end">
                <Mono size="2">{c.frameCount ?? '—'}</Mono>
              </Table.Cell>
              <Table.Cell justify="end">
                <Mono size="2">{c.fps ?? '—'}</Mono>
              </Table.Cell>
              <Table.Cell justify="end">
                <Mono size="2">{clipSeconds(c.frameCount, c.fps)}</Mono>
              </Table.Cell>
              <Table.Cell>{formatDay(c.createdAt)}</Table.Cell>
            </Table.Row>
            <ReportRow item={c} columns={7} name={c.name} />
          </Fragment>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
