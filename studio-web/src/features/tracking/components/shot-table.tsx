import { Flex, Link as ThemeLink, Table, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { LateIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import {
  RenderStateLabel,
  ReviewStateLabel,
  SolveStateLabel,
} from '@/components/ui/shot-state-labels';
import { StateLabel } from '@/components/ui/state-label';
import { paths } from '@/config/paths';
import { dayCount, daysBetween, todayUtc } from '@/lib/dates';
import type { ShotFilters } from '../api/shot-filters';
import type { TrackedShot } from '../api/tracked-shot';
import { ShotPlanDialog } from './shot-plan-dialog';
import { SortHeader } from './sort-header';

/** Props of the shot table. */
export interface ShotTableProps {
  showId: string;
  shots: TrackedShot[];
  sort: ShotFilters['sort'];
  onSort: (sort: NonNullable<ShotFilters['sort']>) => void;
  /** The user may set due dates and assignees. */
  canPlan: boolean;
  /** The user may set the render state by hand. */
  canRender: boolean;
}

function DueDate({ shot, today }: { shot: TrackedShot; today: string }) {
  if (!shot.dueDate) return <Text color="gray">No due date</Text>;
  return (
    <Flex direction="column" gap="1" align="start">
      <Mono size="2">{shot.dueDate}</Mono>
      {shot.late ? (
        <StateLabel icon={<LateIcon />} color="red">
          Late by {dayCount(Math.max(1, daysBetween(shot.dueDate, today)))}
        </StateLabel>
      ) : null}
    </Flex>
  );
}

/** The show's shots with assignees, due dates and their three states; headers sort, and a row's
 * last cell updates its plan and render state for those allowed. */
export function ShotTable({ showId, shots, sort, onSort, canPlan, canRender }: ShotTableProps) {
  const today = todayUtc();
  const header = { sort, onSort };
  const editable = canPlan || canRender;
  return (
    <Table.Root variant="surface" size="1" data-testid="shot-table">
      <Table.Header>
        <Table.Row>
          <SortHeader field="code" {...header}>
            Shot
          </SortHeader>
          <SortHeader field="sequence" {...header}>
            Sequence
          </SortHeader>
          <SortHeader field="frameStart" {...header}>
            Frames
          </SortHeader>
          <Table.ColumnHeaderCell>Assignees</Table.ColumnHeaderCell>
          <SortHeader field="dueDate" {...header}>
            Due date
          </SortHeader>
          <SortHeader field="solveState" {...header}>
            Solve
          </SortHeader>
          <SortHeader field="reviewState" {...header}>
            Review
          </SortHeader>
          <SortHeader field="renderState" {...header}>
            Render
          </SortHeader>
          <Table.ColumnHeaderCell>Take</Table.ColumnHeaderCell>
          {editable ? (
            <Table.ColumnHeaderCell>
              <span className="visually-hidden">Update</span>
            </Table.ColumnHeaderCell>
          ) : null}
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {shots.map((shot) => (
          <Table.Row key={shot.id} data-testid="shot-row" data-code={shot.code} align="center">
            <Table.RowHeaderCell>
              <ThemeLink asChild>
                <Link to={paths.shot.getHref(showId, shot.id)}>
                  <Mono size="2" weight="medium">
                    {shot.code}
                  </Mono>
                </Link>
              </ThemeLink>
            </Table.RowHeaderCell>
            <Table.Cell>
              <Mono size="2">{shot.sequence}</Mono>
            </Table.Cell>
            <Table.Cell>
              <Flex direction="column" gap="1" align="start">
                <Mono size="2" className="nowrap">
                  {shot.frameStart}–{shot.frameEnd}
                </Mono>
                <Text size="1" color="gray" className="nowrap">
                  <Mono size="1">{shot.fps}</Mono> fps
                </Text>
              </Flex>
            </Table.Cell>
            <Table.Cell>
              {shot.assignees.length ? (
                shot.assignees.map((a) => a.displayName).join(', ')
              ) : (
                <Text color="gray">Nobody</Text>
              )}
            </Table.Cell>
            <Table.Cell>
              <DueDate shot={shot} today={today} />
            </Table.Cell>
            <Table.Cell>
              <SolveStateLabel state={shot.solveState} />
            </Table.Cell>
            <Table.Cell>
              <ReviewStateLabel state={shot.reviewState} />
            </Table.Cell>
            <Table.Cell>
              <RenderStateLabel state={shot.renderState} />
            </Table.Cell>
            <Table.Cell>
              {shot.latestTakeVersion ? (
                <Mono size="2">v{shot.latestTakeVersion}</Mono>
              ) : (
                <Text color="gray">None</Text>
              )}
            </Table.Cell>
            {editable ? (
              <Table.Cell justify="end">
                <ShotPlanDialog
                  showId={showId}
                  shot={shot}
                  canPlan={canPlan}
                  canRender={canRender}
                />
              </Table.Cell>
            ) : null}
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
