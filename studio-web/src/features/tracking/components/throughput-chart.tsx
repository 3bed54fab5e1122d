import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { WeekThroughput } from '../api/get-throughput';
import { ChartFrame } from './chart-frame';
import { AXIS_TICK, CHART_HEIGHT, GRID_STROKE, TOOLTIP_STYLE } from './chart-style';

/** "W07" from "2030-W07": the year is in the summary, the week number is what varies. */
const weekLabel = (week: string) => week.slice(week.indexOf('W'));

/** The chart's message in words. */
export function throughputSummary(weeks: WeekThroughput[]): string {
  if (weeks.length === 0) return 'No weeks to show.';
  const total = weeks.reduce((n, w) => n + w.approved, 0);
  const last = weeks[weeks.length - 1];
  return `${total} take${total === 1 ? '' : 's'} approved over the last ${weeks.length} weeks (${weeks[0].week} to ${last.week}); ${last.approved} this week.`;
}

/** Takes approved per ISO week, this week last. */
export function ThroughputChart({ weeks }: { weeks: WeekThroughput[] }) {
  const data = weeks.map((w) => ({ ...w, label: weekLabel(w.week) }));
  return (
    <ChartFrame title="Throughput" summary={throughputSummary(weeks)}>
      <div data-testid="throughput-chart" aria-hidden>
        <ResponsiveContainer
          width="100%"
          height={CHART_HEIGHT}
          initialDimension={{ width: 480, height: CHART_HEIGHT }}
        >
          <BarChart data={data} margin={{ top: 8, right: 8, bottom: 0, left: -16 }}>
            <CartesianGrid vertical={false} stroke={GRID_STROKE} />
            <XAxis dataKey="label" tick={AXIS_TICK} tickLine={false} axisLine={false} />
            <YAxis allowDecimals={false} tick={AXIS_TICK} tickLine={false} axisLine={false} />
            <Tooltip
              {...TOOLTIP_STYLE}
              labelFormatter={(_, payload) => {
                const week = payload?.[0]?.payload as WeekThroughput | undefined;
                return week ? `${week.week}, from ${week.start}` : '';
              }}
              formatter={(value) => [String(value), 'Takes approved']}
            />
            <Bar
              dataKey="approved"
              name="Takes approved"
              fill="var(--accent-9)"
              radius={[2, 2, 0, 0]}
            />
          </BarChart>
        </ResponsiveContainer>
      </div>
    </ChartFrame>
  );
}
