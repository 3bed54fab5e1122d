import { DataList, Text } from '@radix-ui/themes';
import { Mono } from '@/components/ui/mono';

// The fit figures the solver reports, in words, with how to read each.
const KNOWN: Record<string, { label: string; hint: string; percent?: boolean }> = {
  oneStepNrmse: {
    label: 'One-step error',
    hint: 'normalised RMS on held-out frames; lower is better',
  },
  freeRunNrmse: {
    label: 'Free-run error',
    hint: 'normalised RMS running alone on held-out frames; lower is better',
  },
  varianceExplained: {
    label: 'Variance explained',
    hint: 'of the dynamic tissue motion',
    percent: true,
  },
  stabilityMargin: {
    label: 'Stability margin',
    hint: '1 − largest pole radius; above 0 is stable',
  },
  poseShare: {
    label: 'Pose-driven share',
    hint: 'of the motion skinning leaves, explained by pose',
    percent: true,
  },
  dynamicShare: {
    label: 'Dynamic share',
    hint: 'of the motion skinning leaves, explained by the dynamics',
    percent: true,
  },
  trainFrames: { label: 'Frames learned from', hint: 'the first 80 % of the capture' },
  heldOutFrames: {
    label: 'Frames held out',
    hint: 'never seen while learning; the errors above are on these',
  },
};

function figure(value: unknown, percent?: boolean): string {
  if (typeof value === 'number') {
    if (percent) return `${(value * 100).toFixed(1)} %`;
    return Number.isInteger(value) ? String(value) : value.toPrecision(3);
  }
  if (typeof value === 'string' || typeof value === 'boolean') return String(value);
  return JSON.stringify(value);
}

/** The profile's fit report: known figures first, in words; the rest as the solver named them. */
export function FitReport({ report }: { report: Record<string, unknown> }) {
  const known = Object.keys(KNOWN).filter((k) => k in report);
  const others = Object.keys(report).filter(
    (k) => !(k in KNOWN) && ['number', 'string', 'boolean'].includes(typeof report[k]),
  );
  return (
    <DataList.Root data-testid="fit-report">
      {known.map((k) => (
        <DataList.Item key={k}>
          <DataList.Label minWidth="180px">{KNOWN[k].label}</DataList.Label>
          <DataList.Value>
            <Mono>{figure(report[k], KNOWN[k].percent)}</Mono>
            <Text size="1" color="gray">
              &nbsp;· {KNOWN[k].hint}
            </Text>
          </DataList.Value>
        </DataList.Item>
      ))}
      {others.map((k) => (
        <DataList.Item key={k}>
          <DataList.Label minWidth="180px">
            {k.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase()}
          </DataList.Label>
          <DataList.Value>
            <Mono>{figure(report[k])}</Mono>
          </DataList.Value>
        </DataList.Item>
      ))}
    </DataList.Root>
  );
}
