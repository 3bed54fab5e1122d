import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import {
  CartesianGrid,
  ComposedChart,
  Line,
  ResponsiveContainer,
  Scatter,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { RegionSpectrum } from '../api/profile-types';

const MONO = { fontFamily: 'JetBrains Mono, monospace', fontSize: 11, fill: '#b4b4b4' };

/** One region's power spectrum on a log scale, with its peaks marked and listed in words. */
export function SpectrumChart({ spectrum }: { spectrum: RegionSpectrum }) {
  // A log axis cannot show zero power: those bins are left out.
  const data = spectrum.frequencyHz
    .map((f, i) => ({ f, power: spectrum.power[i] }))
    .filter((d) => Number.isFinite(d.f) && d.power > 0);
  const peaks = spectrum.peaks
    .filter((p) => p.power > 0)
    .map((p) => ({ f: p.frequencyHz, peak: p.power }));
  const peakWords = [...spectrum.peaks]
    .sort((a, b) => a.frequencyHz - b.frequencyHz)
    .map((p) => `${p.frequencyHz.toFixed(2)} Hz`)
    .join(', ');
  return (
    <Card data-testid="spectrum" data-region={spectrum.region}>
      <Flex direction="column" gap="2">
        <Heading as="h3" size="2">
          {spectrum.region}
        </Heading>
        <div style={{ width: '100%', height: 200 }} aria-hidden>
          <ResponsiveContainer width="100%" height="100%">
            <ComposedChart data={data} margin={{ top: 8, right: 12, bottom: 18, left: 4 }}>
              <CartesianGrid stroke="#2e2e2e" />
              <XAxis
                dataKey="f"
                type="number"
                domain={['dataMin', 'dataMax']}
                tick={MONO}
                tickFormatter={(v: number) => v.toFixed(1)}
                label={{
                  value: 'Frequency (Hz)',
                  position: 'insideBottom',
                  offset: -10,
                  fill: '#8e8e8e',
                  fontSize: 11,
                }}
              />
              <YAxis
                scale="log"
                domain={['auto', 'auto']}
                allowDataOverflow
                tick={MONO}
                width={54}
                tickFormatter={(v: number) => v.toExponential(0)}
              />
              <Tooltip
                contentStyle={{
                  background: '#1f1f1f',
                  border: '1px solid #3a3a3a',
                  fontFamily: 'JetBrains Mono, monospace',
                  fontSize: 12,
                }}
                formatter={(v) => (typeof v === 'number' ? v.toExponential(2) : String(v))}
                labelFormatter={(f) => `${Number(f).toFixed(2)} Hz`}
              />
              <Line
                dataKey="power"
                name="Power"
                stroke="var(--accent-9)"
                dot={false}
                strokeWidth={1.5}
                isAnimationActive={false}
              />
              <Scatter
                data={peaks}
                dataKey="peak"
                name="Peak"
                fill="#f2efe9"
                shape="diamond"
                isAnimationActive={false}
              />
            </ComposedChart>
          </ResponsiveContainer>
        </div>
        <Text size="1" color="gray" data-testid="spectrum-peaks">
          {peakWords ? `Peaks at ${peakWords}.` : 'No peaks marked.'}
        </Text>
      </Flex>
    </Card>
  );
}
