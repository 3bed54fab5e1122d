import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { Logo } from './logo';

/** Reads the drawn points back out of the SVG path ("M x y L x y …"). */
function curvePoints(): { x: number; y: number }[] {
  const path = screen.getByTestId('logo').querySelector('path[data-part="curve"]');
  const numbers = (path?.getAttribute('d') ?? '').match(/-?\d+(\.\d+)?/g)?.map(Number) ?? [];
  const points = [];
  for (let i = 0; i + 1 < numbers.length; i += 2) points.push({ x: numbers[i], y: numbers[i + 1] });
  return points;
}

function targetY(): number {
  const line = screen.getByTestId('logo').querySelector('line[data-part="target"]');
  return Number(line?.getAttribute('y1'));
}

describe('Logo', () => {
  it('draws a curve that rises past its target line (SVG y grows downward)', () => {
    render(<Logo />);
    const points = curvePoints();
    const target = targetY();
    const rise = points[0].y - target;
    expect(points.length).toBeGreaterThan(20);
    expect(rise).toBeGreaterThan(10);
    const highest = Math.min(...points.map((p) => p.y));
    // A visible overshoot: at least a fifth of the rise above the target.
    expect(target - highest).toBeGreaterThan(rise / 5);
  });

  it('settles onto the target line by the end of the curve', () => {
    render(<Logo />);
    const points = curvePoints();
    const target = targetY();
    const rise = points[0].y - target;
    const tail = points.slice(Math.floor(points.length * 0.85));
    for (const p of tail) expect(Math.abs(p.y - target)).toBeLessThan(rise * 0.03);
  });

  it('runs left to right with the curve starting below the target', () => {
    render(<Logo />);
    const points = curvePoints();
    for (let i = 1; i < points.length; i++) expect(points[i].x).toBeGreaterThan(points[i - 1].x);
    expect(points[0].y).toBeGreaterThan(targetY());
  });

  it('is hidden from assistive tech unless given a title', () => {
    const { rerender } = render(<Logo />);
    expect(screen.getByTestId('logo').getAttribute('aria-hidden')).toBe('true');
    rerender(<Logo title="Overshoot" />);
    expect(screen.getByRole('img', { name: 'Overshoot' })).toBeTruthy();
  });
});
