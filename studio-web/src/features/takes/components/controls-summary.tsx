import { Card, DataList, Flex, Heading } from '@radix-ui/themes';
import { memo } from 'react';
import { Mono } from '@/components/ui/mono';
import type { TakeModel } from '../player/take-model';
import { ModeTable } from './mode-table';

/** The controls a take was made with, for those who review rather than tune. */
export const ControlsSummary = memo(function ControlsSummary({
  model,
  solo,
}: {
  model: TakeModel;
  solo: number | null;
}) {
  const c = model.take.extras.controls;
  const regions = Object.entries(c.regionGains);
  return (
    <Card asChild>
      <section aria-labelledby="controls-heading" data-testid="controls-summary">
        <Flex direction="column" gap="3">
          <Heading as="h2" size="4" id="controls-heading">
            Controls used
          </Heading>
          <DataList.Root size="1">
            <DataList.Item>
              <DataList.Label>Gain</DataList.Label>
              <DataList.Value>
                <Mono>{c.gain.toFixed(2)} ×</Mono>
              </DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Stiffness</DataList.Label>
              <DataList.Value>
                <Mono>{c.stiffness.toFixed(2)} ×</Mono>
              </DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Damping</DataList.Label>
              <DataList.Value>
                <Mono>{c.damping.toFixed(2)} ×</Mono>
              </DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Region gains</DataList.Label>
              <DataList.Value>
                {regions.length === 0
                  ? 'All 1 ×'
                  : regions.map(([r, g]) => `${r} ${g.toFixed(2)} ×`).join(', ')}
              </DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Pre-roll</DataList.Label>
              <DataList.Value>
                <Mono>{c.prerollSeconds.toFixed(2)} s</Mono>
              </DataList.Value>
            </DataList.Item>
            <DataList.Item>
              <DataList.Label>Physical scaling</DataList.Label>
              <DataList.Value>{c.physicalScaling ? 'On' : 'Off'}</DataList.Value>
            </DataList.Item>
          </DataList.Root>
          <ModeTable
            modes={model.take.extras.modes}
            stiffnessFactor={1}
            dampingFactor={1}
            muted={c.mutedModes}
            solo={solo}
          />
        </Flex>
      </section>
    </Card>
  );
});
