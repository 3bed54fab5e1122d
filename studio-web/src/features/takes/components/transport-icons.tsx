// Line icons of the transport, drawn for Overshoot. Each sits beside a word, so all are
// decorative and hidden from assistive tech.
import type { ReactNode } from 'react';

function Icon({ children }: { children: ReactNode }) {
  return (
    <svg
      width={14}
      height={14}
      viewBox="0 0 16 16"
      fill="none"
      stroke="currentColor"
      strokeWidth={1.75}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden
    >
      {children}
    </svg>
  );
}

/** A right-pointing triangle: play. */
export function PlayIcon() {
  return (
    <Icon>
      <path d="M5 3.5v9l7-4.5Z" fill="currentColor" />
    </Icon>
  );
}

/** Two bars: pause. */
export function PauseIcon() {
  return (
    <Icon>
      <path d="M5.5 3.5v9M10.5 3.5v9" />
    </Icon>
  );
}

/** A bar and a chevron: one frame back (mirrored: forward). */
export function StepIcon({ forward = false }: { forward?: boolean }) {
  return (
    <Icon>
      <g transform={forward ? 'translate(16 0) scale(-1 1)' : undefined}>
        <path d="M4 3.5v9M12 4 7 8l5 4" />
      </g>
    </Icon>
  );
}

/** A bracket: loop in (mirrored: loop out). */
export function BracketIcon({ out = false }: { out?: boolean }) {
  return (
    <Icon>
      <path d={out ? 'M7 3h3v10H7' : 'M9 3H6v10h3'} />
    </Icon>
  );
}

/** Two arrows chasing round: loop. */
export function LoopIcon() {
  return (
    <Icon>
      <path d="M3 7.5a4.5 4.5 0 0 1 8-2.8M13 8.5a4.5 4.5 0 0 1-8 2.8" />
      <path d="M11.5 2.5v2.5H9M4.5 13.5V11H7" />
    </Icon>
  );
}
