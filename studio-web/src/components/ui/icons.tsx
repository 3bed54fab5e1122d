// Small line icons drawn for Overshoot's state labels. Each sits beside a word, so all are
// decorative and hidden from assistive tech.
import type { ReactNode } from 'react';

/** Props shared by the state icons. */
export interface IconProps {
  /** Edge length in pixels. */
  size?: number;
}

function Icon({ size = 14, children }: IconProps & { children: ReactNode }) {
  return (
    <svg
      width={size}
      height={size}
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

/** A tick: something is up or finished well. */
export function CheckIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <path d="M3 8.5 6.5 12 13 4.5" />
    </Icon>
  );
}

/** A cross in a circle: something is down or failed. */
export function CrossIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <circle cx="8" cy="8" r="6.25" />
      <path d="M5.75 5.75 10.25 10.25M10.25 5.75 5.75 10.25" />
    </Icon>
  );
}

/** A clock: something is waiting its turn. */
export function ClockIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <circle cx="8" cy="8" r="6.25" />
      <path d="M8 4.5V8l2.5 1.5" />
    </Icon>
  );
}

/** Three rising bars: something is working. */
export function ActivityIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <path d="M3.5 12.5v-3M8 12.5v-6M12.5 12.5v-9" />
    </Icon>
  );
}

/** A triangle with a bang: a warning or a partial failure. */
export function WarningIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <path d="M8 2.25 14.5 13.5h-13Z" />
      <path d="M8 6.5v3M8 11.5v.25" />
    </Icon>
  );
}

/** A question mark in a circle: the state is not known. */
export function UnknownIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <circle cx="8" cy="8" r="6.25" />
      <path d="M6.25 6.25a1.75 1.75 0 1 1 2.5 1.6c-.5.25-.75.6-.75 1.15M8 11.25v.25" />
    </Icon>
  );
}

/** A circle with a slash: stopped on purpose (canceled). */
export function StopIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <circle cx="8" cy="8" r="6.25" />
      <path d="M3.6 12.4 12.4 3.6" />
    </Icon>
  );
}

/** A dashed circle: nothing has happened yet. */
export function EmptyIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <circle cx="8" cy="8" r="6.25" strokeDasharray="2.5 2.5" />
    </Icon>
  );
}

/** An open eye: waiting for someone to look. */
export function EyeIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <path d="M1.5 8s2.5-4.5 6.5-4.5S14.5 8 14.5 8 12 12.5 8 12.5 1.5 8 1.5 8Z" />
      <circle cx="8" cy="8" r="1.75" />
    </Icon>
  );
}

/** An arrow turning back: sent back for changes. */
export function ReturnIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <path d="M6 3.5 2.5 7 6 10.5" />
      <path d="M2.5 7h7a4 4 0 0 1 0 8h-1" />
    </Icon>
  );
}

/** A stopwatch with a bang: a date that has passed. */
export function LateIcon(props: IconProps) {
  return (
    <Icon {...props}>
      <circle cx="8" cy="8.5" r="5.75" />
      <path d="M8 5.5v3.25M8 11v.25M6 1.5h4" />
    </Icon>
  );
}
