import { Checkbox, Flex, Select, Text, TextField } from '@radix-ui/themes';
import { useEffect, useState } from 'react';
import { FormField } from '@/components/ui/form-field';
import {
  NO_STATE_WORD,
  RENDER_STATE_WORDS,
  RENDER_STATES,
  REVIEW_STATE_WORDS,
  REVIEW_STATES,
  SOLVE_STATE_WORDS,
  SOLVE_STATES,
} from '@/lib/shot-states';
import type { ShotListParams } from '../api/get-shots';

const ANY = 'any';

/** Props of the shot table's toolbar. */
export interface ShotsToolbarProps {
  params: ShotListParams;
  onChange: (change: Partial<ShotListParams>) => void;
}

/** Waits this long after the last keystroke before searching, in milliseconds. */
const SEARCH_DELAY_MS = 300;

/** Search and state filters of the shot table. */
export function ShotsToolbar({ params, onChange }: ShotsToolbarProps) {
  const [search, setSearch] = useState(params.search ?? '');
  useEffect(() => {
    if ((params.search ?? '') === search.trim()) return;
    const timer = setTimeout(
      () => onChange({ search: search.trim() || undefined }),
      SEARCH_DELAY_MS,
    );
    return () => clearTimeout(timer);
  }, [search, params.search, onChange]);

  const select = (
    label: string,
    value: string | undefined,
    options: { value: string; label: string }[],
    key: keyof ShotListParams,
  ) => (
    <FormField label={label}>
      {(control) => (
        <Select.Root
          value={value ?? ANY}
          onValueChange={(v) => onChange({ [key]: v === ANY ? undefined : v })}
        >
          <Select.Trigger {...control} />
          <Select.Content>
            <Select.Item value={ANY}>Any</Select.Item>
            {options.map((o) => (
              <Select.Item key={o.value} value={o.value}>
                {o.label}
              </Select.Item>
            ))}
          </Select.Content>
        </Select.Root>
      )}
    </FormField>
  );

  return (
    <Flex gap="3" align="end" wrap="wrap" data-testid="shots-toolbar">
      <Flex flexGrow="1" minWidth="200px" direction="column">
        <FormField label="Search shot or sequence code">
          {(control) => (
            <TextField.Root
              {...control}
              type="search"
              value={search}
              onChange={(e) => setSearch(e.target.value)}
            />
          )}
        </FormField>
      </Flex>
      {select(
        'Solve',
        params.solveState,
        [
          { value: 'none', label: NO_STATE_WORD },
          ...SOLVE_STATES.map((s) => ({ value: s, label: SOLVE_STATE_WORDS[s] })),
        ],
        'solveState',
      )}
      {select(
        'Review',
        params.reviewState,
        [
          { value: 'none', label: NO_STATE_WORD },
          ...REVIEW_STATES.map((s) => ({ value: s, label: REVIEW_STATE_WORDS[s] })),
        ],
        'reviewState',
      )}
      {select(
        'Render',
        params.renderState,
        RENDER_STATES.map((s) => ({ value: s, label: RENDER_STATE_WORDS[s] })),
        'renderState',
      )}
      <Text as="label" size="2">
        <Flex gap="2" align="center" pb="2">
          <Checkbox
            checked={params.late === true}
            onCheckedChange={(on) => onChange({ late: on === true ? true : undefined })}
          />
          Late only
        </Flex>
      </Text>
    </Flex>
  );
}
