import { Text } from '@radix-ui/themes';
import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { LateShot, ShotSummary } from '../api/shot-summary';
import { ChartFrame } from './chart-frame';
import { AXIS_TICK, GRID_STROKE, TOOLTIP_STYLE } from './chart-style';

/** Late shots drawn, the latest first; the table lists them all. */
export const LATE_BARS = 12;

const ROW_HEIGHT = 22;

/** The chart's message in words. */
export function latenessSummary(late: ShotSummary['late']): string {
  if (late.count === 0) return 'No shot is late.';
  const worst = late.shots.reduce<LateShot | undefined>(
    (a, s) => (a && a.daysLate >= s.daysLate ? a : s),
    undefined,
  );
  const shown = Math.min(LATE_BARS, late.shots.length);
  const most = worst
    ? ` The latest, ${worst.code}, is ${worst.daysLate} days past its due date.`
    : '';
  return `${late.count} shot${late.count === 1 ? ' is' : 's are'} late.${most}${late.count > shown ? ` The ${shown} latest are drawn.` : ''}`;
}

/** Days past the due date of each late shot, the latest first. */
export function LatenessChart({ late }: { late: ShotSummary['late'] }) {
  const data = [...late.shots].sort((a, b) => b.daysLate - a.daysLate).slice(0, LATE_BARS);
  const height = Math.max(3, data.length) * ROW_HEIGHT + 40;
  return (
    <ChartFrame title="Lateness" summary={latenessSummary(late)}>
      {data.length === 0 ? (
        <Text size="2" color="gray">
          Every shot with a due date is on time or approved.
        </Text>
      ) : (
        <div data-testid="lateness-chart" aria-hidden>
          <ResponsiveContainer
            width="100%"
            height={height}
            initialDimension={{ width: 480, height }}
          >
            <BarChart
              data={data}
              layout="vertical"
              margin={{ top: 0, right: 16, bottom: 0, left: 8 }}
            >
              <CartesianGrid horizontal={false} stroke={GRID_STROKE} />
              <XAxis
                type="number"
                allowDecimals={false}
                tick={AXIS_TICK}
                tickLine={false}
                axisLine={false}
              />
              <YAxis
                type="category"
                dataKey="code"
                width={110}
                tick={AXIS_TICK}
                tickLine={false}
                axisLine={false}
              />
              <Tooltip
                {...TOOLTIP_STYLE}
                labelFormatter={(_, payload) => {
                  const shot = payload?.[0]?.payload as LateShot | undefined;
                  return shot ? `${shot.code}, due ${shot.dueDate}` : '';
                }}
                formatter={(value) => [`${String(value)} days`, 'Past due']}
              />
              <Bar
                dataKey="daysLate"
                name="Days past due"
                fill="var(--orange-9)"
                radius={[0, 2, 2, 0]}
              />
            </BarChart>
          </ResponsiveContainer>
        </div>
      )}
    </ChartFrame>
  );
}
