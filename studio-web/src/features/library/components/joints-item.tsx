import { DataList, Text } from '@radix-ui/themes';

/** A detail-list row with the joint names and their count, or a dash when none are known. */
export function JointsItem({ joints }: { joints: string[] | null }) {
  return (
    <DataList.Item>
      <DataList.Label>Joints ({joints?.length ?? 0})</DataList.Label>
      <DataList.Value>
        <Text size="1" className="mono">
          {joints?.join(' · ') || '—'}
        </Text>
      </DataList.Value>
    </DataList.Item>
  );
}
