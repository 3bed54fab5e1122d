import { Callout } from '@radix-ui/themes';
import { CrossIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import type { ValidationReport } from '../api/library-types';

// Location fields the solver and the ingest check report, in words, in reading order.
const PLACES: [key: string, word: string][] = [
  ['frame', 'frame'],
  ['vertex', 'vertex'],
  ['joint', 'joint'],
  ['line', 'line'],
  ['item', 'in'],
];

/** The "where" of a report in words, e.g. "frame 12, vertex 3 407"; null when it says nowhere. */
export function describeWhere(where: Record<string, unknown>): string | null {
  const parts: string[] = [];
  for (const [key, word] of PLACES) {
    const v = where[key];
    if (typeof v === 'number' || (typeof v === 'string' && v !== '')) parts.push(`${word} ${v}`);
  }
  // Anything else the check named (declared and stored sizes, digests, …).
  for (const [key, v] of Object.entries(where)) {
    if (PLACES.some(([k]) => k === key)) continue;
    if (typeof v === 'number' || typeof v === 'string') parts.push(`${key} ${v}`);
  }
  return parts.length > 0 ? parts.join(', ') : null;
}

/** Why a file was refused, where in it, and what to do: plain words, the code in small print. */
export function ValidationReportCallout({
  report,
  fileName,
}: {
  report: ValidationReport;
  fileName?: string;
}) {
  const where = describeWhere(report.where);
  return (
    <Callout.Root color="red" size="1" data-testid="validation-report">
      <Callout.Icon>
        <CrossIcon size={16} />
      </Callout.Icon>
      <Callout.Text weight="medium">
        {fileName ? `${fileName} was not accepted: ` : 'Not accepted: '}
        {report.message}
      </Callout.Text>
      {where ? <Callout.Text>Where: {where}.</Callout.Text> : null}
      <Callout.Text size="1" color="gray">
        Fix the file and upload it again; nothing of this upload was kept. Code{' '}
        <Mono size="1">{report.code}</Mono>
      </Callout.Text>
    </Callout.Root>
  );
}
