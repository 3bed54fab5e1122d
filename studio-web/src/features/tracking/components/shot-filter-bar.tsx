import { Button, Flex, SegmentedControl, Text, TextField } from '@radix-ui/themes';
import { useEffect, useId, useState } from 'react';
import { LabelledSelect, type SelectOption } from '@/components/ui/labelled-select';
import { useShowMembers } from '@/features/shows';
import {
  NO_STATE_WORD,
  RENDER_STATE_WORDS,
  RENDER_STATES,
  REVIEW_STATE_WORDS,
  REVIEW_STATES,
  SOLVE_STATE_WORDS,
  SOLVE_STATES,
  isOneOf,
} from '@/lib/shot-states';
import type { ShotFilters } from '../api/shot-filters';

const ANY = 'any';
/** How long typing pauses before the search runs, in milliseconds. */
const SEARCH_PAUSE_MS = 300;

const anyOf = (label: string): SelectOption => ({ value: ANY, label });

const SOLVE_OPTIONS: SelectOption[] = [
  anyOf('Any solve state'),
  ...SOLVE_STATES.map((s) => ({ value: s, label: SOLVE_STATE_WORDS[s] })),
  { value: 'none', label: `${NO_STATE_WORD} (no job)` },
];
const REVIEW_OPTIONS: SelectOption[] = [
  anyOf('Any review state'),
  ...REVIEW_STATES.map((s) => ({ value: s, label: REVIEW_STATE_WORDS[s] })),
  { value: 'none', label: `${NO_STATE_WORD} (no take)` },
];
const RENDER_OPTIONS: SelectOption[] = [
  anyOf('Any render state'),
  ...RENDER_STATES.map((s) => ({ value: s, label: RENDER_STATE_WORDS[s] })),
];

/** Props of the filter bar. */
export interface ShotFilterBarProps {
  showId: string;
  filters: ShotFilters;
  onChange: (next: ShotFilters) => void;
}

/** Search, lateness, state and assignee filters of the shot table; each change goes to page 1. */
export function ShotFilterBar({ showId, filters, onChange }: ShotFilterBarProps) {
  const members = useShowMembers(showId);
  const searchId = useId();
  const lateId = useId();
  const [search, setSearch] = useState(filters.search ?? '');
  const set = (patch: Partial<ShotFilters>) => onChange({ ...filters, ...patch, page: undefined });

  // Typing waits for a pause before asking the server.
  useEffect(() => {
    const typed = search.trim() || undefined;
    if (typed === filters.search) return;
    const timer = setTimeout(
      () => onChange({ ...filters, search: typed, page: undefined }),
      SEARCH_PAUSE_MS,
    );
    return () => clearTimeout(timer);
  }, [search, filters, onChange]);

  const lateValue = filters.late === undefined ? 'all' : filters.late ? 'late' : 'on-time';
  const assigneeOptions: SelectOption[] = [
    anyOf('Anyone'),
    ...(members.data ?? []).map((m) => ({ value: m.userId, label: m.displayName })),
  ];
  const active = Object.keys(filters).some((k) => k !== 'sort' && k !== 'page');

  return (
    <Flex gap="4" wrap="wrap" align="end" role="search" aria-label="Filter shots">
      <Flex direction="column" gap="1">
        <Text as="label" htmlFor={searchId} size="1" weight="medium" color="gray">
          Search shot or sequence
        </Text>
        <TextField.Root
          id={searchId}
          value={search}
          onChange={(e) => setSearch(e.target.value)}
          placeholder="e.g. SQ010"
          style={{ width: 200 }}
        />
      </Flex>
      <Flex direction="column" gap="1">
        <Text id={lateId} size="1" weight="medium" color="gray">
          Due dates
        </Text>
        <SegmentedControl.Root
          value={lateValue}
          aria-labelledby={lateId}
          onValueChange={(v) => set({ late: v === 'all' ? undefined : v === 'late' })}
        >
          <SegmentedControl.Item value="all">All shots</SegmentedControl.Item>
          <SegmentedControl.Item value="late" data-testid="filter-late">
            Late only
          </SegmentedControl.Item>
          <SegmentedControl.Item value="on-time">Not late</SegmentedControl.Item>
        </SegmentedControl.Root>
      </Flex>
      <LabelledSelect
        label="Solve"
        value={filters.solveState ?? ANY}
        options={SOLVE_OPTIONS}
        onChange={(v) =>
          set({ solveState: v === 'none' || isOneOf(SOLVE_STATES, v) ? v : undefined })
        }
      />
      <LabelledSelect
        label="Review"
        value={filters.reviewState ?? ANY}
        options={REVIEW_OPTIONS}
        onChange={(v) =>
          set({ reviewState: v === 'none' || isOneOf(REVIEW_STATES, v) ? v : undefined })
        }
      />
      <LabelledSelect
        label="Render"
        value={filters.renderState ?? ANY}
        options={RENDER_OPTIONS}
        onChange={(v) => set({ renderState: isOneOf(RENDER_STATES, v) ? v : undefined })}
      />
      <LabelledSelect
        label="Assignee"
        value={filters.assigneeId ?? ANY}
        options={assigneeOptions}
        disabled={members.isPending}
        onChange={(v) => set({ assigneeId: v === ANY ? undefined : v })}
      />
      {active ? (
        <Button
          variant="ghost"
          color="gray"
          onClick={() => {
            setSearch('');
            onChange({ sort: filters.sort });
          }}
        >
          Clear filters
        </Button>
      ) : null}
    </Flex>
  );
}
