import { sampleStepResponse } from '@/lib/step-response';

const WIDTH = 40;
const HEIGHT = 28;
const PAD = 3;

/** SVG geometry of the mark: the step response curve and the target line it settles on. */
function logoGeometry(): { curve: string; targetY: number } {
  const samples = sampleStepResponse();
  const duration = samples[samples.length - 1].t;
  const peak = Math.max(...samples.map((s) => s.y));
  const toX = (t: number) => PAD + (t / duration) * (WIDTH - 2 * PAD);
  const toY = (y: number) => HEIGHT - PAD - (y / peak) * (HEIGHT - 2 * PAD);
  const curve = samples
    .map((s, i) => `${i === 0 ? 'M' : 'L'}${toX(s.t).toFixed(2)} ${toY(s.y).toFixed(2)}`)
    .join(' ');
  return { curve, targetY: Number(toY(1).toFixed(2)) };
}

// Computed once: the mark never changes while the app runs.
const GEOMETRY = logoGeometry();

/** Props of the Overshoot mark. */
export interface LogoProps {
  /** Height in pixels; the width follows the mark's proportions. */
  size?: number;
  /** Accessible name; without it the mark is decorative and hidden from assistive tech. */
  title?: string;
}

/** The Overshoot mark: an underdamped step response rising past its target line and settling. */
export function Logo({ size = 24, title }: LogoProps) {
  return (
    <svg
      width={(size * WIDTH) / HEIGHT}
      height={size}
      viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
      fill="none"
      role={title ? 'img' : undefined}
      aria-hidden={title ? undefined : true}
      data-testid="logo"
    >
      {title ? <title>{title}</title> : null}
      <line
        data-part="target"
        x1={PAD}
        x2={WIDTH - PAD}
        y1={GEOMETRY.targetY}
        y2={GEOMETRY.targetY}
        stroke="var(--gray-8, #5a5a5a)"
        strokeWidth={1}
        strokeDasharray="2 2"
      />
      <path
        data-part="curve"
        d={GEOMETRY.curve}
        stroke="var(--accent-9, #ffc53d)"
        strokeWidth={2.25}
        strokeLinecap="round"
        strokeLinejoin="round"
      />
    </svg>
  );
}
