import { Card, Flex, Grid, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { LateIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import {
  RenderStateLabel,
  ReviewStateLabel,
  SolveStateLabel,
} from '@/components/ui/shot-state-labels';
import { StateLabel } from '@/components/ui/state-label';
import { RENDER_STATES, REVIEW_STATES, SOLVE_STATES } from '@/lib/shot-states';
import type { ShotSummary } from '../api/shot-summary';

function CountRow({ label, count, testId }: { label: ReactNode; count: number; testId: string }) {
  return (
    <Flex as="div" justify="between" align="center" gap="3" data-testid={testId}>
      {label}
      <Mono size="3" weight="medium">
        {count}
      </Mono>
    </Flex>
  );
}

function CountCard({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Card size="2">
      <Flex direction="column" gap="2">
        <Heading as="h3" size="2" color="gray" weight="medium">
          {title}
        </Heading>
        {children}
      </Flex>
    </Card>
  );
}

/** Shot counts by solve, review and render state, with the total and how many are late. */
export function StateCounts({ summary }: { summary: ShotSummary }) {
  return (
    <Grid columns={{ initial: '1', sm: '2', md: '4' }} gap="3">
      <CountCard title="Shots">
        <Flex direction="column" gap="2">
          <Flex align="baseline" gap="2">
            <Mono size="7" weight="bold" data-testid="count-total">
              {summary.total}
            </Mono>
            <Text color="gray">in the show</Text>
          </Flex>
          <CountRow
            testId="count-late"
            label={
              <StateLabel icon={<LateIcon />} color={summary.late.count ? 'red' : 'gray'}>
                Late
              </StateLabel>
            }
            count={summary.late.count}
          />
        </Flex>
      </CountCard>
      <CountCard title="Solve">
        {[...SOLVE_STATES, 'none' as const].map((s) => (
          <CountRow
            key={s}
            testId={`count-solve-${s}`}
            label={<SolveStateLabel state={s === 'none' ? null : s} />}
            count={summary.solve[s]}
          />
        ))}
      </CountCard>
      <CountCard title="Review">
        {[...REVIEW_STATES, 'none' as const].map((s) => (
          <CountRow
            key={s}
            testId={`count-review-${s}`}
            label={<ReviewStateLabel state={s === 'none' ? null : s} />}
            count={summary.review[s]}
          />
        ))}
      </CountCard>
      <CountCard title="Render">
        {RENDER_STATES.map((s) => (
          <CountRow
            key={s}
            testId={`count-render-${s}`}
            label={<RenderStateLabel state={s} />}
            count={summary.render[s]}
          />
        ))}
      </CountCard>
    </Grid>
  );
}
