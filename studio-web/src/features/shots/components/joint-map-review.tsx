import { Flex, Select, Table, Text } from '@radix-ui/themes';
import { CheckIcon, CrossIcon, WarningIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { StateLabel } from '@/components/ui/state-label';
import type { JointMap } from '../api/get-joint-map';
import './shots.css';

const UNSET = 'unset';

/** Props of the joint map review. */
export interface JointMapReviewProps {
  map: JointMap;
  /** The shot character's joints, to map the missing ones by hand. */
  targetJoints: readonly string[];
  /** Joints mapped by hand: profile joint → character joint. */
  overrides: Record<string, string>;
  onOverride: (source: string, target: string | null) => void;
}

/** Profile joints still without a partner after the hand-made choices; the essential ones first. */
export function stillUnmapped(
  map: JointMap,
  overrides: Record<string, string>,
): { all: string[]; essential: string[] } {
  const all = map.unmapped.filter((j) => !overrides[j]);
  return { all, essential: map.essentialUnmapped.filter((j) => !overrides[j]) };
}

/** The automatic joint map for review: pairs found, and each unmapped joint highlighted with a way to map it. */
export function JointMapReview({ map, targetJoints, overrides, onOverride }: JointMapReviewProps) {
  const left = stillUnmapped(map, overrides);
  const total = map.mapped.length + map.unmapped.length;
  const essential = new Set(map.essentialUnmapped);
  return (
    <Flex direction="column" gap="2" data-testid="joint-map">
      <Text size="2" data-testid="joint-map-summary">
        <Mono size="2">{total - left.all.length}</Mono> of <Mono size="2">{total}</Mono> profile
        joints mapped
        {left.all.length > 0 ? (
          <>
            ; <Mono size="2">{left.all.length}</Mono> not mapped
            {left.essential.length > 0 ? (
              <>
                , <Mono size="2">{left.essential.length}</Mono> of them needed by the solve
              </>
            ) : null}
          </>
        ) : null}
        .
      </Text>
      <Table.Root variant="surface" size="1" aria-label="Joint map">
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Profile joint</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Character joint</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>State</Table.ColumnHeaderCell>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {map.unmapped.map((source) => {
            const needed = essential.has(source);
            const chosen = overrides[source];
            return (
              <Table.Row
                key={source}
                className={
                  chosen ? undefined : needed ? 'joint-unmapped-essential' : 'joint-unmapped'
                }
                data-testid="joint-row"
                data-joint={source}
                data-unmapped={chosen ? 'false' : 'true'}
                data-essential={needed ? 'true' : 'false'}
              >
                <Table.RowHeaderCell>
                  <Mono size="2">{source}</Mono>
                </Table.RowHeaderCell>
                <Table.Cell>
                  <Select.Root
                    value={chosen ?? UNSET}
                    onValueChange={(v) => onOverride(source, v === UNSET ? null : v)}
                    size="1"
                  >
                    <Select.Trigger aria-label={`Character joint for ${source}`} />
                    <Select.Content>
                      <Select.Item value={UNSET}>Leave unmapped</Select.Item>
                      {targetJoints.map((j) => (
                        <Select.Item key={j} value={j}>
                          {j}
                        </Select.Item>
                      ))}
                    </Select.Content>
                  </Select.Root>
                </Table.Cell>
                <Table.Cell>
                  {chosen ? (
                    <StateLabel icon={<CheckIcon />} color="jade">
                      Mapped by hand
                    </StateLabel>
                  ) : needed ? (
                    <StateLabel icon={<CrossIcon />} color="red">
                      Needed, not mapped
                    </StateLabel>
                  ) : (
                    <StateLabel icon={<WarningIcon />} color="orange">
                      Not mapped
                    </StateLabel>
                  )}
                </Table.Cell>
              </Table.Row>
            );
          })}
          {map.mapped.map((pair) => (
            <Table.Row
              key={pair.source}
              data-testid="joint-row"
              data-joint={pair.source}
              data-unmapped="false"
            >
              <Table.RowHeaderCell>
                <Mono size="2">{pair.source}</Mono>
              </Table.RowHeaderCell>
              <Table.Cell>
                <Mono size="2">{pair.target}</Mono>
              </Table.Cell>
              <Table.Cell>
                <StateLabel icon={<CheckIcon />} color="jade">
                  Mapped
                </StateLabel>
              </Table.Cell>
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </Flex>
  );
}
