import { Flex, Link as RadixLink, Table, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { formatDay } from '@/features/library/components/format-date';
import type { Shot } from '../api/shot-types';
import {
  RenderStateLabel,
  ReviewStateLabel,
  SolveStateLabel,
} from '@/components/ui/shot-state-labels';
import { LateLabel } from './late-label';
import { SortHeader } from './sort-header';
import './shots.css';

/** Props of the shot table. */
export interface ShotsTableProps {
  showId: string;
  shots: Shot[];
  sort: string | undefined;
  onSort: (sort: string) => void;
}

/** One page of shots: code, frames, the three states in words, who holds it, when it is due. */
export function ShotsTable({ showId, shots, sort, onSort }: ShotsTableProps) {
  return (
    <Table.Root variant="surface" aria-label="Shots" data-testid="shots-table">
      <Table.Header>
        <Table.Row>
          <SortHeader field="code" sort={sort} onSort={onSort}>
            Shot
          </SortHeader>
          <SortHeader field="frameStart" sort={sort} onSort={onSort}>
            Frames
          </SortHeader>
          <SortHeader field="solveState" sort={sort} onSort={onSort}>
            Solve
          </SortHeader>
          <SortHeader field="reviewState" sort={sort} onSort={onSort}>
            Review
          </SortHeader>
          <SortHeader field="renderState" sort={sort} onSort={onSort}>
            Render
          </SortHeader>
          <Table.ColumnHeaderCell>Assignees</Table.ColumnHeaderCell>
          <SortHeader field="dueDate" sort={sort} onSort={onSort}>
            Due
          </SortHeader>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {shots.map((s) => (
          <Table.Row key={s.id} data-testid="shot-row" data-code={s.code}>
            <Table.RowHeaderCell>
              <Flex direction="column">
                <RadixLink asChild weight="medium">
                  <Link to={paths.shot.getHref(showId, s.id)}>
                    <Mono>{s.code}</Mono>
                  </Link>
                </RadixLink>
                <Mono size="1" color="gray">
                  {s.sequence}
                  {s.latestTakeVersion ? ` · take v${s.latestTakeVersion}` : ''}
                </Mono>
              </Flex>
            </Table.RowHeaderCell>
            <Table.Cell>
              <Mono size="2">
                {s.frameStart}–{s.frameEnd}
              </Mono>
              <Text size="1" color="gray">
                {' '}
                @ <Mono size="1">{s.fps}</Mono>
              </Text>
            </Table.Cell>
            <Table.Cell>
              <SolveStateLabel state={s.solveState} />
            </Table.Cell>
            <Table.Cell>
              <ReviewStateLabel state={s.reviewState} />
            </Table.Cell>
            <Table.Cell>
              <RenderStateLabel state={s.renderState} />
            </Table.Cell>
            <Table.Cell>
              <Text size="2">{s.assignees.map((a) => a.displayName).join(', ') || '—'}</Text>
            </Table.Cell>
            <Table.Cell>
              <Flex direction="column" gap="1" align="start">
                <Text size="2">{formatDay(s.dueDate)}</Text>
                {s.late ? <LateLabel /> : null}
              </Flex>
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
