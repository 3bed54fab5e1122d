// Shared look of the tracking charts: theme colours and the mono face for numbers.

/** Axis ticks: the theme's secondary text colour in the mono face. */
export const AXIS_TICK = {
  fill: 'var(--gray-11)',
  fontSize: 12,
  fontFamily: "'JetBrains Mono', ui-monospace, monospace",
};

/** Grid lines, faint. */
export const GRID_STROKE = 'var(--gray-a4)';

/** The tooltip box in the theme's panel colours. */
export const TOOLTIP_STYLE = {
  contentStyle: {
    background: 'var(--gray-2)',
    border: '1px solid var(--gray-a6)',
    borderRadius: 4,
    color: 'var(--gray-12)',
  },
  labelStyle: { color: 'var(--gray-12)' },
  itemStyle: { color: 'var(--gray-12)' },
  cursor: { fill: 'var(--gray-a3)' },
};

/** Height of a chart's plot, in pixels. */
export const CHART_HEIGHT = 220;
